/**
 * Reading the write-up (a Tiptap JSON document, shared/editor schema) for the outputs that do
 * not render it whole: the intro, the numbered steps, the callouts and the plain text.
 */
import type { JSONContent } from '@tiptap/core';
import { plainText } from '@shared/editor/render-parts';

/** One numbered step, numbered by its position among the document's steps (as the page numbers it). */
export interface DocStep {
  number: number;
  title: string;
  /** Where the step starts in the video, or null. */
  atMs: number | null;
  /** The nodes after the title: paragraphs, lists, quotes, stills, tips and cautions. */
  body: JSONContent[];
}

/** Every step of the document, in order, with "Step N" for an empty title. */
export function docSteps(doc: JSONContent): DocStep[] {
  const steps: DocStep[] = [];
  const visit = (nodes: readonly JSONContent[] | undefined) => {
    for (const n of nodes ?? []) {
      if (n.type !== 'step') continue;
      const number = steps.length + 1;
      const [first, ...rest] = n.content ?? [];
      const hasTitle = first?.type === 'stepTitle';
      const atMs = n.attrs?.atMs;
      steps.push({
        number,
        title: (hasTitle ? plainText(first).trim() : '') || `Step ${number}`,
        atMs: typeof atMs === 'number' && Number.isFinite(atMs) && atMs >= 0 ? atMs : null,
        body: hasTitle ? rest : (n.content ?? []),
      });
    }
  };
  visit(doc?.content);
  return steps;
}

/**
 * The introduction: the top-level paragraphs before the first section heading, step or live
 * list (the document's own h1 title is skipped).
 */
export function docIntro(doc: JSONContent): JSONContent[] {
  const out: JSONContent[] = [];
  for (const n of doc?.content ?? []) {
    if (n.type === 'heading' && n.attrs?.level === 1) continue;
    if (n.type !== 'paragraph') break;
    if (plainText(n).trim()) out.push(n);
  }
  return out;
}

/** The introduction as one line of plain text ('' when there is none). */
export function introText(doc: JSONContent): string {
  return docIntro(doc)
    .map((p) => inlineText(p.content).trim())
    .filter(Boolean)
    .join(' ');
}

/** A tip or caution at the top level of the document (not inside a step). */
export interface DocCallout {
  kind: 'tip' | 'caution';
  content: JSONContent[];
}

/** The document's own tips and cautions outside the steps. */
export function topLevelCallouts(doc: JSONContent): DocCallout[] {
  return (doc?.content ?? [])
    .filter((n) => n.type === 'tip' || n.type === 'caution')
    .map((n) => ({ kind: n.type as 'tip' | 'caution', content: n.content ?? [] }));
}

/** "papershop.example/kraft-80": an address short enough to type from paper (no scheme, query or fragment). */
export function shortUrl(url: string, max = 48): string {
  let s: string;
  try {
    const u = new URL(url);
    s = `${u.hostname.replace(/^www\./, '')}${u.pathname === '/' ? '' : u.pathname.replace(/\/$/, '')}`;
  } catch {
    s = url.replace(/^[a-z]+:\/\//i, '');
  }
  return s.length > max ? `${s.slice(0, max - 1)}…` : s;
}

/**
 * The text of inline nodes. With `links: 'short'` a linked run is followed by its short address
 * in parentheses (for print, where nobody can click), unless the text already is the address.
 */
export function inlineText(nodes: readonly JSONContent[] | undefined, options: { links?: 'short' | 'none' } = {}): string {
  let out = '';
  let openHref: string | null = null;
  let runText = '';
  const closeLink = () => {
    if (openHref && options.links === 'short') {
      const short = shortUrl(openHref);
      if (!runText.includes(short) && !runText.includes(openHref)) out += ` (${short})`;
    }
    openHref = null;
    runText = '';
  };
  for (const n of nodes ?? []) {
    const link = n.type === 'text' ? n.marks?.find((m) => m.type === 'link') : undefined;
    const href = typeof link?.attrs?.href === 'string' && /^https?:/i.test(link.attrs.href) ? link.attrs.href : null;
    if (href !== openHref) closeLink();
    if (href) openHref = href;
    if (n.type === 'text') {
      out += n.text ?? '';
      if (href) runText += n.text ?? '';
    } else if (n.type === 'hardBreak') out += ' ';
  }
  closeLink();
  return out.replace(/\s+/g, ' ');
}

/** All the words of some blocks, one space between blocks (stills and live lists say nothing). */
export function blocksText(nodes: readonly JSONContent[] | undefined): string {
  const parts: string[] = [];
  const visit = (list: readonly JSONContent[] | undefined) => {
    for (const n of list ?? []) {
      if (n.type === 'paragraph' || n.type === 'heading' || n.type === 'stepTitle') parts.push(inlineText(n.content).trim());
      else if (n.content) visit(n.content);
    }
  };
  visit(nodes);
  return parts.filter(Boolean).join(' ');
}

/** The stills inside some blocks, in order (including those inside lists and callouts). */
export function stillsIn(nodes: readonly JSONContent[] | undefined): JSONContent[] {
  const out: JSONContent[] = [];
  const visit = (list: readonly JSONContent[] | undefined) => {
    for (const n of list ?? []) {
      if (n.type === 'still') out.push(n);
      else if (n.content) visit(n.content);
    }
  };
  visit(nodes);
  return out;
}
