/**
 * Side-by-side comparison of two versions (DESIGN.md T4). Text goes through jsdiff (`diff` on
 * npm): blocks are matched as a sequence (diffArrays), and a block replaced by another is shown
 * word by word (diffWords). Lists (pieces, supplies) are matched by their ids and compared field
 * by field, so a piece renamed is one changed row, not a removal and an addition.
 */
import { diffArrays, diffWords } from 'diff';
import type { ChangeStatus, FieldChangeDto, FieldDto, RowChangeDto, SectionCompareDto, TextPartDto, TextRowDto } from '../schemas/version';

/** A block of text with the place it sits in ("Step 2"). */
export type TextBlock = { label: string; text: string };

/** A row of a list: its id, its name, and its fields as the crafter reads them. */
export type CompareRow = { id: string; name: string; values: Record<string, string> };

/** The added, removed and changed rows apart, and how many stayed the same. */
function section<Row extends { status: ChangeStatus }>(rows: Row[]): SectionCompareDto<Row> {
  return {
    rows,
    added: rows.filter((r) => r.status === 'added'),
    removed: rows.filter((r) => r.status === 'removed'),
    changed: rows.filter((r) => r.status === 'changed'),
    unchanged: rows.filter((r) => r.status === 'same').length,
  };
}

/** The words of two texts, each side with what only it has marked. */
export function wordParts(before: string, after: string): { beforeParts: TextPartDto[]; afterParts: TextPartDto[] } {
  const beforeParts: TextPartDto[] = [];
  const afterParts: TextPartDto[] = [];
  for (const c of diffWords(before, after)) {
    if (c.added) afterParts.push({ text: c.value, added: true });
    else if (c.removed) beforeParts.push({ text: c.value, removed: true });
    else {
      beforeParts.push({ text: c.value });
      afterParts.push({ text: c.value });
    }
  }
  return { beforeParts, afterParts };
}

/**
 * Two sequences of blocks side by side: blocks in both are "same"; where blocks were taken out
 * and others put in at the same place, they pair up as "changed" (word by word), and what is
 * left over is "removed" or "added".
 */
export function compareBlocks(before: readonly TextBlock[], after: readonly TextBlock[]): SectionCompareDto<TextRowDto> {
  const rows: TextRowDto[] = [];
  let i = 0;
  let j = 0;
  let removed: TextBlock[] = [];
  const flush = (added: TextBlock[]) => {
    const pairs = Math.min(removed.length, added.length);
    for (let k = 0; k < pairs; k++) {
      const b = removed[k]!;
      const a = added[k]!;
      rows.push({ status: 'changed', label: a.label, before: b.text, after: a.text, ...wordParts(b.text, a.text) });
    }
    for (const b of removed.slice(pairs)) rows.push({ status: 'removed', label: b.label, before: b.text, after: null });
    for (const a of added.slice(pairs)) rows.push({ status: 'added', label: a.label, before: null, after: a.text });
    removed = [];
  };
  for (const c of diffArrays(
    before.map((b) => b.text),
    after.map((a) => a.text),
  )) {
    if (c.removed) {
      removed.push(...before.slice(i, i + c.count));
      i += c.count;
    } else if (c.added) {
      flush(after.slice(j, j + c.count) as TextBlock[]);
      j += c.count;
    } else {
      flush([]);
      for (let k = 0; k < c.count; k++) rows.push({ status: 'same', label: after[j + k]!.label, before: before[i + k]!.text, after: after[j + k]!.text });
      i += c.count;
      j += c.count;
    }
  }
  flush([]);
  return section(rows);
}

/**
 * Two lists side by side, matched by id: a row only before is "removed", only after "added", in
 * both with a field that differs "changed" (each such field listed). Rows keep the after order;
 * a removed row sits after the row it followed before.
 */
export function compareRows(
  before: readonly CompareRow[],
  after: readonly CompareRow[],
  fields: readonly FieldDto[],
): SectionCompareDto<RowChangeDto> & { fields: FieldDto[] } {
  const beforeById = new Map(before.map((r) => [r.id, r]));
  const afterIds = new Set(after.map((r) => r.id));
  const rows: RowChangeDto[] = after.map((a) => {
    const b = beforeById.get(a.id);
    if (!b) return { id: a.id, status: 'added', name: a.name, before: null, after: a.values, changes: [] };
    const changes: FieldChangeDto[] = fields
      .filter((f) => (b.values[f.key] ?? '') !== (a.values[f.key] ?? ''))
      .map((f) => ({ field: f.key, label: f.label, before: b.values[f.key] ?? '', after: a.values[f.key] ?? '' }));
    return { id: a.id, status: changes.length ? 'changed' : 'same', name: a.name, before: b.values, after: a.values, changes };
  });
  let previous: string | null = null;
  for (const b of before) {
    if (afterIds.has(b.id)) {
      previous = b.id;
      continue;
    }
    const at = previous === null ? 0 : rows.findIndex((r) => r.id === previous) + 1;
    rows.splice(at, 0, { id: b.id, status: 'removed', name: b.name, before: b.values, after: null, changes: [] });
    previous = b.id;
  }
  return { ...section(rows), fields: [...fields] };
}
