import type { JSONContent } from '@tiptap/core';
import { Node as PMNode } from '@tiptap/pm/model';
import { getEditorSchema, HEADING_LEVELS } from './extensions';
import { CUT_LIST_UNITS } from './types';
import { isSafeImageSrc, isSafeLinkHref } from './urls';

/** The outcome of `validateDoc`: the document rebuilt from the schema, or why it was refused. */
export type ValidateResult = { ok: true; doc: JSONContent } | { ok: false; error: string };

export interface ValidateOptions {
  /**
   * Drop what is unsafe or unknown instead of refusing the document: unknown nodes and marks,
   * links with an unsafe address (their text stays), stills with an unsafe image; bad plain
   * attributes fall back to their defaults. Structure errors are still refused.
   */
  strip?: boolean;
}

const MAX_DEPTH = 48;
const MAX_NODES = 50_000;
const MAX_TEXT = 100_000;
const ID = /^[A-Za-z0-9_-]{1,64}$/;
// 100 hours: longer than any recording we accept.
const MAX_AT_MS = 100 * 3600 * 1000;
const LIST_TYPES = new Set(['1', 'a', 'A', 'i', 'I']);

class Refusal extends Error {}

type Attrs = Record<string, unknown>;
/** A checker returns the attributes to keep, or a reason with what strip mode does about it. */
type Check = { attrs: Attrs } | { error: string; fallback: Attrs | 'drop' };

// ProseMirror builds attrs with a null prototype, JSON.parse with Object's: both are plain data.
function isPlainObject(v: unknown): v is Record<string, unknown> {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) return false;
  const proto = Object.getPrototypeOf(v);
  return proto === Object.prototype || proto === null;
}

const isId = (v: unknown) => v === null || v === undefined || (typeof v === 'string' && ID.test(v));
const isSize = (v: unknown) => v === null || v === undefined || (Number.isInteger(v) && (v as number) > 0 && (v as number) <= 20_000);
const shortText = (v: unknown, max: number) => v === undefined || (typeof v === 'string' && v.length <= max);

function problems(list: [boolean, string][]): string | null {
  for (const [ok, why] of list) if (!ok) return why;
  return null;
}

const NODE_CHECKS: Record<string, (a: Attrs) => Check> = {
  heading(a) {
    if ((HEADING_LEVELS as readonly unknown[]).includes(a.level)) return { attrs: { level: a.level } };
    return { error: `heading level must be one of ${HEADING_LEVELS.join(', ')}`, fallback: { level: 2 } };
  },
  orderedList(a) {
    const why = problems([
      [a.start === undefined || (Number.isInteger(a.start) && (a.start as number) >= 0 && (a.start as number) <= 100_000), 'list start must be a whole number'],
      [a.type === undefined || a.type === null || (typeof a.type === 'string' && LIST_TYPES.has(a.type)), 'list type must be 1, a, A, i or I'],
    ]);
    return why ? { error: why, fallback: { start: 1, type: null } } : { attrs: { start: a.start ?? 1, type: a.type ?? null } };
  },
  step(a) {
    const atOk = a.atMs === null || a.atMs === undefined || (Number.isInteger(a.atMs) && (a.atMs as number) >= 0 && (a.atMs as number) <= MAX_AT_MS);
    const why = problems([
      [atOk, 'step time (atMs) must be a whole number of milliseconds or null'],
      [isId(a.chapterId), 'chapterId must be a short id or null'],
      [isId(a.id), 'a step id must be a short id or null'],
    ]);
    const fallback = {
      id: isId(a.id) ? (a.id ?? null) : null,
      atMs: atOk ? (a.atMs ?? null) : null,
      chapterId: isId(a.chapterId) ? (a.chapterId ?? null) : null,
    };
    return why ? { error: why, fallback } : { attrs: { id: a.id ?? null, atMs: a.atMs ?? null, chapterId: a.chapterId ?? null } };
  },
  still(a) {
    if (!isSafeImageSrc(a.src)) return { error: `still image address not allowed: ${JSON.stringify(String(a.src ?? '')).slice(0, 80)}`, fallback: 'drop' };
    const why = problems([
      [isId(a.stillId), 'stillId must be a short id or null'],
      [shortText(a.alt, 1000), 'alt must be text of at most 1000 characters'],
      [shortText(a.caption, 2000), 'caption must be text of at most 2000 characters'],
      [isSize(a.width) && isSize(a.height), 'width and height must be whole numbers of pixels or null'],
    ]);
    const attrs = {
      stillId: isId(a.stillId) ? (a.stillId ?? null) : null,
      src: a.src,
      alt: shortText(a.alt, 1000) ? (a.alt ?? '') : '',
      caption: shortText(a.caption, 2000) ? (a.caption ?? '') : '',
      width: isSize(a.width) ? (a.width ?? null) : null,
      height: isSize(a.height) ? (a.height ?? null) : null,
    };
    return why ? { error: why, fallback: attrs } : { attrs };
  },
  cutList(a) {
    if (a.units === undefined || (CUT_LIST_UNITS as readonly unknown[]).includes(a.units)) return { attrs: { units: a.units ?? 'both' } };
    return { error: `cut list units must be one of ${CUT_LIST_UNITS.join(', ')}`, fallback: { units: 'both' } };
  },
  supplyList(a) {
    if (a.grouped === undefined || typeof a.grouped === 'boolean') return { attrs: { grouped: a.grouped ?? true } };
    return { error: 'supply list "grouped" must be true or false', fallback: { grouped: true } };
  },
};

const MARK_CHECKS: Record<string, (a: Attrs) => Check> = {
  link(a) {
    if (!isSafeLinkHref(a.href)) return { error: `link address not allowed: ${JSON.stringify(String(a.href ?? '')).slice(0, 80)}`, fallback: 'drop' };
    const why = problems([
      [a.target === undefined || a.target === null || a.target === '_blank', 'link target must be _blank or null'],
      [a.rel === undefined || a.rel === null || (typeof a.rel === 'string' && /^[a-z ]{0,100}$/.test(a.rel)), 'link rel must be plain words'],
      [a.class === undefined || a.class === null, 'link class is not allowed'],
      [a.title === undefined || a.title === null || (typeof a.title === 'string' && a.title.length <= 500), 'link title must be short text'],
    ]);
    // Only what was given, so the schema's defaults (rel) fill the rest.
    const attrs: Attrs = { href: a.href };
    if (a.target === '_blank' || a.target === null) attrs.target = a.target;
    if (a.rel === null || (typeof a.rel === 'string' && /^[a-z ]{0,100}$/.test(a.rel))) attrs.rel = a.rel;
    if (a.class !== undefined) attrs.class = null;
    if (a.title === null || (typeof a.title === 'string' && a.title.length <= 500)) attrs.title = a.title;
    return why ? { error: why, fallback: attrs } : { attrs };
  },
};

class Cleaner {
  private count = 0;
  private readonly schema = getEditorSchema();

  constructor(private readonly strip: boolean) {}

  private refuseOr<T>(path: string, why: string, stripped: T): T {
    if (!this.strip) throw new Refusal(`${path || '/'}: ${why}`);
    return stripped;
  }

  private attrs(path: string, raw: unknown, check: ((a: Attrs) => Check) | undefined): Attrs | 'drop' | undefined {
    let given = raw;
    if (given !== undefined && !isPlainObject(given)) given = this.refuseOr(`${path}/attrs`, 'attrs must be an object', {});
    // Nodes without a checker have no attributes in the schema: anything given is dropped.
    if (!check) return undefined;
    const result = check((given ?? {}) as Attrs);
    if ('attrs' in result) return result.attrs;
    return this.refuseOr(`${path}/attrs`, result.error, result.fallback);
  }

  private marks(path: string, raw: unknown): JSONContent['marks'] | undefined {
    if (raw === undefined) return undefined;
    if (!Array.isArray(raw)) return this.refuseOr(`${path}/marks`, 'marks must be a list', undefined);
    const out: NonNullable<JSONContent['marks']> = [];
    raw.forEach((m, i) => {
      const at = `${path}/marks/${i}`;
      if (!isPlainObject(m) || typeof m.type !== 'string') return this.refuseOr(at, 'a mark must be an object with a type', undefined);
      if (!this.schema.marks[m.type]) return this.refuseOr(at, `unknown mark "${m.type.slice(0, 40)}"`, undefined);
      const attrs = this.attrs(at, m.attrs, MARK_CHECKS[m.type]);
      if (attrs === 'drop') return;
      out.push(attrs ? { type: m.type, attrs } : { type: m.type });
    });
    return out.length ? out : undefined;
  }

  node(raw: unknown, path: string, depth: number): JSONContent | null {
    if (++this.count > MAX_NODES) throw new Refusal(`the document has more than ${MAX_NODES} nodes`);
    if (depth > MAX_DEPTH) throw new Refusal(`${path}: nested deeper than ${MAX_DEPTH} levels`);
    if (!isPlainObject(raw) || typeof raw.type !== 'string') return this.refuseOr(path, 'a node must be an object with a type', null);
    const type = raw.type;
    if (!this.schema.nodes[type]) return this.refuseOr(path, `unknown node type "${type.slice(0, 40)}"`, null);
    if (type === 'text') {
      if (typeof raw.text !== 'string' || raw.text === '') return this.refuseOr(path, 'a text node needs non-empty text', null);
      if (raw.text.length > MAX_TEXT) return this.refuseOr(path, `text longer than ${MAX_TEXT} characters`, null);
      const marks = this.marks(path, raw.marks);
      return marks ? { type, text: raw.text, marks } : { type, text: raw.text };
    }
    const attrs = this.attrs(path, raw.attrs, NODE_CHECKS[type]);
    if (attrs === 'drop') return null;
    const out: JSONContent = { type };
    if (attrs) out.attrs = attrs;
    const marks = this.marks(path, raw.marks);
    if (marks) out.marks = marks;
    if (raw.content !== undefined) {
      if (!Array.isArray(raw.content)) return this.refuseOr(`${path}/content`, 'content must be a list', null);
      const children: JSONContent[] = [];
      raw.content.forEach((c, i) => {
        const child = this.node(c, `${path}/content/${i}`, depth + 1);
        if (child) children.push(child);
      });
      if (children.length) out.content = children;
    }
    return out;
  }
}

/**
 * Checks a stored or submitted write-up against the schema: every node and mark known, every
 * attribute of the right kind, link and image addresses safe, content where the schema allows
 * it (ProseMirror `Node.fromJSON` then `check()`). Returns the document rebuilt from the schema
 * (unknown attributes dropped) or the first problem, with its JSON path.
 */
export function validateDoc(json: unknown, opts: ValidateOptions = {}): ValidateResult {
  try {
    if (!isPlainObject(json) || json.type !== 'doc') return { ok: false, error: '/: a document must be an object of type "doc"' };
    const cleaned = new Cleaner(opts.strip === true).node(json, '', 0);
    if (!cleaned) return { ok: false, error: '/: nothing left of the document' };
    const node = PMNode.fromJSON(getEditorSchema(), cleaned);
    node.check();
    return { ok: true, doc: node.toJSON() as JSONContent };
  } catch (e) {
    if (e instanceof Refusal) return { ok: false, error: e.message };
    return { ok: false, error: `does not fit the write-up schema: ${e instanceof Error ? e.message : String(e)}` };
  }
}
