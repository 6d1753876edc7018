import { Extension, type JSONContent } from '@tiptap/core';
import { Plugin, PluginKey } from '@tiptap/pm/state';

/**
 * Steps carry a stable id so a comment can point at one wherever it moves. The editor gives a
 * new step an id (and a pasted copy a fresh one); the server fills any missing one on save, so a
 * document from an older client or the API still gets ids. (Tiptap's own unique-id extension pins
 * an older core than ours; this is the small part of it we need.)
 */

const HEX = '0123456789abcdef';

/** A short random id ("s" and 12 hex digits), from the platform's crypto in the browser and in Node. */
export function newStepId(): string {
  const bytes = new Uint8Array(6);
  globalThis.crypto.getRandomValues(bytes);
  let out = 's';
  for (const b of bytes) out += HEX[b >> 4] + HEX[b & 15];
  return out;
}

/**
 * The document with an id on every step, duplicates (a copied step) given fresh ones. A step that
 * comes without an id (a document from the API or an older client) keeps the id of the previous
 * document's step with the same title, else of the step at the same place, so comments stay put.
 * Unchanged input is returned as is.
 */
export function ensureStepIds(doc: JSONContent, previous?: JSONContent | null): JSONContent {
  const before = previous ? stepsOf(previous) : [];
  const given = new Set(
    stepsOf(doc)
      .map((s) => s.id)
      .filter((id): id is string => !!id),
  );
  const seen = new Set<string>();
  let changed = false;
  let index = 0;
  const reuse = (title: string, at: number): string | null => {
    const free = (id: string | null): id is string => !!id && !given.has(id) && !seen.has(id);
    const byTitle = before.filter((s) => title && s.title === title && free(s.id));
    if (byTitle.length === 1) return byTitle[0]!.id;
    const same = before[at];
    return same && free(same.id) ? same.id : null;
  };
  const walk = (n: JSONContent): JSONContent => {
    if (n.type === 'step') {
      const at = index++;
      const id = n.attrs?.id;
      if (typeof id !== 'string' || !id || seen.has(id)) {
        changed = true;
        const fresh = (typeof id !== 'string' || !id ? reuse(titleOf(n), at) : null) ?? newStepId();
        seen.add(fresh);
        return { ...n, attrs: { ...n.attrs, id: fresh } };
      }
      seen.add(id);
      return n;
    }
    if (!n.content) return n;
    const content = n.content.map(walk);
    return content.some((c, i) => c !== n.content![i]) ? { ...n, content } : n;
  };
  const out = walk(doc);
  return changed ? out : doc;
}

const textOf = (n: JSONContent): string =>
  n.type === 'text' ? (n.text ?? '') : (n.content ?? []).map(textOf).join(n.type === 'doc' || n.type === 'step' ? '\n' : '');
const titleOf = (step: JSONContent) => (step.content?.[0] ? textOf(step.content[0]).trim() : '');

/** Each step's id and plain text (title and body), in document order. */
export function stepsOf(doc: JSONContent): { id: string | null; number: number; title: string; text: string }[] {
  const out: { id: string | null; number: number; title: string; text: string }[] = [];
  const walk = (n: JSONContent) => {
    if (n.type === 'step') {
      const [title, ...body] = n.content ?? [];
      out.push({
        id: typeof n.attrs?.id === 'string' ? n.attrs.id : null,
        number: out.length + 1,
        title: titleOf(n),
        text: [title, ...body]
          .filter(Boolean)
          .map((c) => textOf(c!))
          .join('\n'),
      });
      return;
    }
    for (const c of n.content ?? []) walk(c);
  };
  walk(doc);
  return out;
}

/** The editor side: every transaction that adds a step without an id, or a copy of one, gets ids in the same update. */
export const StepIds = Extension.create({
  name: 'stepIds',
  addProseMirrorPlugins() {
    return [
      new Plugin({
        key: new PluginKey('stepIds'),
        appendTransaction: (transactions, _old, state) => {
          if (!transactions.some((t) => t.docChanged)) return null;
          const seen = new Set<string>();
          const tr = state.tr;
          state.doc.descendants((node, pos) => {
            if (node.type.name !== 'step') return true;
            const id = node.attrs.id as string | null;
            if (!id || seen.has(id)) {
              const fresh = newStepId();
              seen.add(fresh);
              tr.setNodeAttribute(pos, 'id', fresh);
            } else seen.add(id);
            // Steps do not nest.
            return false;
          });
          if (!tr.docChanged) return null;
          // Not an edit of the person's: undo should skip it.
          return tr.setMeta('addToHistory', false);
        },
      }),
    ];
  },
});
