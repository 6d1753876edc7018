import type { JSONContent } from '@tiptap/core';
import { isSafeImageSrc } from '../editor/urls';
import { validateDoc } from '../editor/validate-doc';
import type { LengthUnit } from '../measure';
import { spokenSentences } from './clean-spoken-text';
import { showMeasurements } from './show-measurements';

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

// Greetings and sign-offs belong to the video, not to a step (common practice of spoken tutorials).
const GREETING =
  /^(?:hi|hello|hey|hiya|howdy|good (?:morning|afternoon|evening)|welcome(?: back)?)\b|\bwelcome (?:back )?to (?:my|the|our)\b|\bwelcome back\b/i;
const PROJECT = /^(?:today|this (?:time|week)|in (?:this|today['’]s) (?:video|tutorial))\b|\btoday (?:we|i)['’]?(?:re| are| am|m|['’]ll| will)?\b/i;
const PROJECT_ANYWHERE = /\b(?:today|this (?:time|week)|in (?:this|today['’]s) (?:video|tutorial))\b/i;
const VIDEO_SIGN_OFF =
  /\b(?:thanks?|thank you)(?: (?:so|very) much)? for (?:watching|joining|tuning in|stopping by|following along|crafting (?:along )?with me)\b|\bsee you (?:next time|soon|in the next|tomorrow)\b|\bsubscribe\b|\bhit the bell\b|\b(?:leave|drop) (?:me )?a comment\b|\bcomments? below\b|^(?:bye|goodbye|bye[- ]bye|cheers)\b/i;
const KIND_SIGN_OFF = /^(?:happy crafting|have fun|enjoy)\b|\bI hope you (?:enjoyed|like|give it a (?:go|try))\b/i;

/** Splits a section's sentences into the video's greetings, the project line, the steps' words and the sign-off. */
function sortOut(sentences: string[], first: boolean, last: boolean) {
  const intro: string[] = [];
  const outro: string[] = [];
  let body = [...sentences];
  if (first) {
    // Opening sentences: greetings go, "today we're making ..." goes to the intro paragraph.
    while (body.length && (GREETING.test(body[0]!) || PROJECT.test(body[0]!))) {
      const s = body.shift()!;
      const project = PROJECT_ANYWHERE.exec(s);
      // "Hi everyone, so today we're making a box": the greeting goes, the project line stays.
      if (project) intro.push(capitalised(s.slice(project.index)));
    }
  }
  if (last) {
    const kept: string[] = [];
    while (body.length && (VIDEO_SIGN_OFF.test(body[body.length - 1]!) || KIND_SIGN_OFF.test(body[body.length - 1]!))) {
      const s = body.pop()!;
      if (KIND_SIGN_OFF.test(s) && !VIDEO_SIGN_OFF.test(s)) kept.unshift(s);
    }
    outro.push(...kept);
  }
  body = body.filter((s) => !VIDEO_SIGN_OFF.test(s));
  return { intro, body, outro };
}

function capitalised(t: string): string {
  const s = t.replace(/\s+/g, ' ').trim();
  return s.charAt(0).toUpperCase() + s.slice(1);
}

/**
 * A first draft of the write-up from the Footage section, the same every time for the same
 * input: the title, an intro (what the video said we make, then an overview), the supplies and
 * cut-list blocks, then one step per chapter with its cleaned words, its time in the video and
 * the first still taken within the chapter, and a closing line when the maker signed off with one.
 * Greetings and video sign-offs ("thanks for watching") are left out of the steps.
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
    // A heading shows its measurements as written ("Cut the 18 in strips", not "eighteen inches").
    const chapterTitle = capitalised(showMeasurements(ch.title ?? '', { defaultUnit: input.defaultUnit }));
    const sorted = sortOut(spokenSentences(spoken(own), { defaultUnit: input.defaultUnit }), k === 0, k === chapters.length - 1);
    return {
      chapter: ch,
      title: chapterTitle,
      sentences: sorted.body,
      intro: sorted.intro,
      outro: sorted.outro,
      still: stills.find((s) => s.atMs >= from && s.atMs < to),
      // An opening chapter whose words were all greeting and introduction has nothing left to do.
      empty: k === 0 && chapters.length > 1 && sorted.body.length === 0 && sorted.intro.length > 0,
    };
  });
  const stepSections = sections.filter((s) => !s.empty || s.still);

  // Every chapter becomes a step (W2: one step per chapter), so the steps line up with the video's
  // chapter list, except an opening chapter that only greeted and said what we make: that line
  // opens the intro instead. "Thanks for watching" and the like stay in the video.
  const n = stepSections.length;
  const content: JSONContent[] = [heading(1, title)];
  const projectLine = sections.flatMap((s) => s.intro).join(' ');
  const overview = `Here is how to make it, step by step: the supplies, the cut list, then ${n} ${n === 1 ? 'step' : 'steps'}.`;
  content.push({ type: 'paragraph', content: text(projectLine ? `${projectLine} ${overview}` : overview) });
  content.push(heading(2, 'Supplies'), { type: 'supplyList', attrs: { grouped: true } });
  content.push(heading(2, 'Cut list'), { type: 'cutList', attrs: { units: 'both' } });
  content.push(heading(2, 'Steps'));
  stepSections.forEach((s, k) => {
    const stepTitle = s.title || `Step ${k + 1}`;
    const body: JSONContent[] = [...paragraphs(s.sentences)];
    if (s.still) body.push(stillNode(s.still, stepTitle));
    content.push({
      type: 'step',
      attrs: { atMs: Math.max(0, Math.round(s.chapter.startMs)), chapterId: ID.test(s.chapter.id) ? s.chapter.id : null },
      content: [{ type: 'stepTitle', content: text(stepTitle) }, ...body],
    });
  });
  const outro = sections.flatMap((s) => s.outro);
  if (outro.length) content.push({ type: 'paragraph', content: text(outro.join(' ')) });

  const result = validateDoc({ type: 'doc', content });
  // Everything above is built to the schema; a refusal here is a bug, not bad input.
  if (!result.ok) throw new Error(`draft does not fit the schema: ${result.error}`);
  return result.doc;
}
