import type { CompareDto, CompareQuery, FieldDto, VersionRefDto } from '@shared/schemas/version';
import { compareBlocks, compareRows, type CompareRow } from '@shared/compare/compare';
import { docBlocks } from '@shared/compare/doc-blocks';
import { CATEGORY_LABELS, inchSize } from '@shared/editor/render-parts';
import { SHAPE_LABELS } from '@shared/geometry/shapes';
import { formatTimestamp } from '@shared/transcript/timestamp';
import type { RulerPrecision } from '@shared/measure';
import { TutorialVersion, type Tutorial } from '../../models';
import type { VersionContent } from '../../models/tutorial-version';
import { NotFoundError } from '../../lib/errors';
import { toPiece } from '../cut-list';
import { toRenderPieces } from '../publish/render-inputs';
import { draftContent } from './content';
import { liveContent } from './versions';

const GRAIN_WORDS = { length: 'along the length', width: 'along the width', any: 'any' } as const;

const PIECE_FIELDS: FieldDto[] = [
  { key: 'name', label: 'Name' },
  { key: 'material', label: 'Material' },
  { key: 'quantity', label: 'Quantity' },
  { key: 'size', label: 'Size' },
  { key: 'scoreLines', label: 'Score lines' },
  { key: 'grain', label: 'Grain' },
  { key: 'matOn', label: 'Mat on' },
  { key: 'notes', label: 'Notes' },
];

const SUPPLY_FIELDS: FieldDto[] = [
  { key: 'category', label: 'Category' },
  { key: 'name', label: 'Name' },
  { key: 'quantity', label: 'Quantity' },
  { key: 'note', label: 'Note' },
  { key: 'url', label: 'Shop link' },
  { key: 'sponsored', label: 'Sponsored' },
  { key: 'discountCode', label: 'Discount code' },
];

const DETAIL_FIELDS: FieldDto[] = [{ key: 'value', label: 'Value' }];
const FOOTAGE_FIELDS: FieldDto[] = [
  { key: 'time', label: 'Time' },
  { key: 'words', label: 'Title or caption' },
  { key: 'alt', label: 'Alt text' },
];

/** The cut list's rows in the crafter's words: sizes as they write them ("4 1/4 x 5 1/2 in"), at that version's ruler. */
function pieceRows(c: VersionContent): CompareRow[] {
  const pieces = c.pieces.map(toPiece);
  const shown = toRenderPieces(pieces, c.precision as RulerPrecision);
  const names = new Map(c.pieces.map((p) => [p.id, p.name]));
  return c.pieces.map((p, i) => {
    const r = shown[i]!;
    return {
      id: p.id,
      name: p.name,
      values: {
        name: p.name,
        material: p.material,
        quantity: String(p.quantity),
        size: `${inchSize(r)} (${r.widthMm} x ${r.heightMm} mm)${p.shape === 'rect' ? '' : `, ${SHAPE_LABELS[p.shape]}`}`,
        scoreLines: r.scoreLines.join('; '),
        grain: GRAIN_WORDS[p.grain] ?? p.grain,
        matOn: p.matOnId ? (names.get(p.matOnId) ?? 'a piece no longer listed') : '',
        notes: p.notes.trim(),
      },
    };
  });
}

function supplyRows(c: VersionContent): CompareRow[] {
  return c.supplies.map((s) => ({
    id: s.id,
    name: s.name,
    values: {
      category: CATEGORY_LABELS[s.category] ?? s.category,
      name: s.name,
      quantity: s.quantity.trim(),
      note: s.note.trim(),
      url: s.url ?? '',
      sponsored: s.sponsored ? 'yes' : 'no',
      discountCode: s.discountCode?.trim() ?? '',
    },
  }));
}

function detailRows(c: VersionContent): CompareRow[] {
  const row = (id: string, name: string, value: string) => ({ id, name, values: { value } });
  return [
    row('title', 'Title', c.title),
    row('videoUrl', 'Video address', c.videoUrl ?? ''),
    row('precision', 'Ruler', `1/${c.precision} in`),
    row('disclosure', 'Sponsorship disclosure', c.disclosure ?? ''),
  ];
}

function footageRows(c: VersionContent): CompareRow[] {
  return [
    ...c.chapters.map((ch) => ({ id: ch.id, name: `Chapter “${ch.title}”`, values: { time: formatTimestamp(ch.startMs), words: ch.title, alt: '' } })),
    ...c.stills.map((s) => ({
      id: s.id,
      name: `Still at ${formatTimestamp(s.atMs)}`,
      values: { time: formatTimestamp(s.atMs), words: s.caption.trim(), alt: s.alt.trim() },
    })),
  ];
}

const KIND_WORDS = { published: 'published', approved: 'approved', sent_back: 'sent back' } as const;

type Side = { ref: VersionRefDto; content: VersionContent };

const versionSide = (v: TutorialVersion, live: boolean): Side => ({
  ref: {
    kind: v.kind,
    id: v.id,
    label: live ? 'What readers see now' : `As ${KIND_WORDS[v.kind]}`,
    at: v.createdAt.toISOString(),
  },
  content: v.content,
});

/** A side of the comparison by name or id; 404 when the tutorial has no such version. */
async function resolveSide(tutorial: Tutorial, which: string): Promise<Side> {
  if (which === 'draft') return { ref: { kind: 'draft', id: null, label: 'The draft now', at: null }, content: await draftContent(tutorial) };
  if (which === 'published') {
    if (tutorial.state !== 'published') throw NotFoundError.saying('This tutorial is not published, so there is no published version to compare with');
    const content = await liveContent(tutorial);
    const v = await TutorialVersion.findByPk(tutorial.liveVersionId!);
    return v ? versionSide(v, true) : { ref: { kind: 'published', id: null, label: 'What readers see now', at: null }, content };
  }
  const v =
    which === 'sent_back' || which === 'approved'
      ? await TutorialVersion.findOne({ where: { tutorialId: tutorial.id, kind: which }, order: [['createdAt', 'DESC']] })
      : await TutorialVersion.findOne({ where: { tutorialId: tutorial.id, id: which } });
  if (!v) {
    if (which === 'sent_back') throw NotFoundError.saying('This tutorial has not been sent back yet');
    if (which === 'approved') throw NotFoundError.saying('This tutorial has not been approved yet');
    throw new NotFoundError('Version');
  }
  return versionSide(v, v.id === tutorial.liveVersionId);
}

/** Two versions of a tutorial side by side: the write-up block by block, the cut list, supplies and footage row by row. */
export async function compareVersions(tutorial: Tutorial, q: CompareQuery): Promise<CompareDto> {
  const [from, to] = await Promise.all([resolveSide(tutorial, q.from), resolveSide(tutorial, q.to)]);
  const a = from.content;
  const b = to.content;
  const result = {
    details: compareRows(detailRows(a), detailRows(b), DETAIL_FIELDS),
    writeUp: compareBlocks(docBlocks(a.doc), docBlocks(b.doc)),
    cutList: compareRows(pieceRows(a), pieceRows(b), PIECE_FIELDS),
    supplies: compareRows(supplyRows(a), supplyRows(b), SUPPLY_FIELDS),
    footage: compareRows(footageRows(a), footageRows(b), FOOTAGE_FIELDS),
  };
  const identical = Object.values(result).every((s) => s.unchanged === s.rows.length);
  return { from: from.ref, to: to.ref, identical, ...result };
}
