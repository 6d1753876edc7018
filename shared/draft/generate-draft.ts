import type { JSONContent } from '@tiptap/core';
import { isSafeImageSrc } from '../editor/urls';
import { validateDoc } from '../editor/validate-doc';
import type { LengthUnit } from '../measure';
import { spokenSentences } from './clean-spoken-text';

export interface DraftChapter {
  id: string;
  title: string;
  startMs: number;
}

export interface DraftCue {
  startMs: number;
  endMs: number;
  text: string;
}

export interface DraftStill {
  id: string;
  atMs: number;
  url: string;
  caption?: string | null;
  alt?: string | null;
  width?: number | null;
  height?: number | null;
}

export interface DraftInput {
  title: string;
  chapters: DraftChapter[];
  cues: DraftCue[];
  stills: DraftStill[];
  durationMs?: number;
  /** Unit for lengths said without one. */
  defaultUnit?: LengthUnit;
}

/** A gap this long between two cues is a pause: the sentence ends there. */
export const PAUSE_MS = 700;
/** Sentences per paragraph in a drafted step. */
export const SENTENCES_PER_PARAGRAPH = 4;
const ID = /^[A-Za-z0-9_-]{1,64}$/;

function text(t: string): JSONContent[] {
  return t ? [{ type: 'text', text: t }] : [];
}

function heading(level: 1 | 2, t: string): JSONContent {
  return { type: 'heading', attrs: { level }, content: text(t) };
}

function paragraphs(sentences: string[]): JSONContent[] {
  const out: JSONContent[] = [];
  for (let i = 0; i < sentences.length; i += SENTENCES_PER_PARAGRAPH) {
    out.push({ type: 'paragraph', content: text(sentences.slice(i, i + SENTENCES_PER_PARAGRAPH).join(' ')) });
  }
  return out;
}

/** The cues' words in order, a line break wherever the speaker paused. */
function spoken(cues: DraftCue[]): string {
  let out = '';
  let lastEnd = -Infinity;
  for (const c of cues) {
    const words = c.text.replace(/\s+/g, ' ').trim();
    if (!words) continue;
    if (out) out += c.startMs - lastEnd >= PAUSE_MS ? '\n' : ' ';
    out += words;
    lastEnd = Math.max(lastEnd, c.endMs);
  }
  return out;
}

function stillNode(s: DraftStill, fallbackAlt: string): JSONContent {
  const size = (v: number | null | undefined) => (Number.isInteger(v) && v! > 0 && v! <= 20_000 ? v! : null);
  return {
    type: 'still',
    attrs: {
      stillId: ID.test(s.id) ? s.id : null,
      src: s.url,
      alt: (s.alt?.trim() || s.caption?.trim() || fallbackAlt).slice(0, 1000),
      caption: (s.caption?.trim() ?? '').slice(0, 2000),
      width: size(s.width),
      height: size(s.height),
    },
  };
}

function capitalised(t: string): string {
  const s = t.replace(/\s+/g, ' ').trim();
  return s.charAt(0).toUpperCase() + s.slice(1);
}

/**
 * A first draft of the write-up from the Footage section, the same every time for the same
 * input: the title, a one-line intro, the supplies and cut-list blocks, then one step per
 * chapter with its cleaned words,
 * its time in the video and the first still taken within the chapter.
 */
export function generateDraft(input: DraftInput): JSONContent {
  const title = capitalised(input.title ?? '') || 'Untitled tutorial';
  const chapters = [...(input.chapters ?? [])]
    .filter((c) => Number.isFinite(c.startMs))
    .map((c, i) => ({ ...c, i }))
    .sort((a, b) => a.startMs - b.startMs || a.i - b.i);
  if (!chapters.length) chapters.push({ id: '', title, startMs: 0, i: 0 });
  const cues = [...(input.cues ?? [])].filter((c) => Number.isFinite(c.startMs)).sort((a, b) => a.startMs - b.startMs);
  const stills = [...(input.stills ?? [])].filter((s) => Number.isFinite(s.atMs) && isSafeImageSrc(s.url)).sort((a, b) => a.atMs - b.atMs);
  const end = input.durationMs !== undefined && Number.isFinite(input.durationMs) ? input.durationMs : Infinity;

  const sections = chapters.map((ch, k) => {
    const from = ch.startMs;
    const to = chapters[k + 1]?.startMs ?? end;
    // Words said before the first chapter mark belong to the first chapter.
    const own = cues.filter((c) => (k === 0 || c.startMs >= from) && c.startMs < to);
    const chapterTitle = capitalised(ch.title ?? '');
    return {
      chapter: ch,
      title: chapterTitle,
      sentences: spokenSentences(spoken(own), { defaultUnit: input.defaultUnit }),
      still: stills.find((s) => s.atMs >= from && s.atMs < to),
    };
  });

  // Every chapter becomes a step, an opening "Introduction" too (W2: one step per chapter), so the
  // steps line up with the video's chapter list; the intro is one line for the maker to rewrite.
  const n = sections.length;
  const content: JSONContent[] = [heading(1, title)];
  content.push({ type: 'paragraph', content: text(`Here is how to make it, step by step: the supplies, the cut list, then ${n} ${n === 1 ? 'step' : 'steps'}.`) });
  content.push(heading(2, 'Supplies'), { type: 'supplyList', attrs: { grouped: true } });
  content.push(heading(2, 'Cut list'), { type: 'cutList', attrs: { units: 'both' } });
  content.push(heading(2, 'Steps'));
  sections.forEach((s, k) => {
    const stepTitle = s.title || `Step ${k + 1}`;
    const body: JSONContent[] = [...paragraphs(s.sentences)];
    if (s.still) body.push(stillNode(s.still, stepTitle));
    content.push({
      type: 'step',
      attrs: { atMs: Math.max(0, Math.round(s.chapter.startMs)), chapterId: ID.test(s.chapter.id) ? s.chapter.id : null },
      content: [{ type: 'stepTitle', content: text(stepTitle) }, ...body],
    });
  });

  const result = validateDoc({ type: 'doc', content });
  // Everything above is built to the schema; a refusal here is a bug, not bad input.
  if (!result.ok) throw new Error(`draft does not fit the schema: ${result.error}`);
  return result.doc;
}
