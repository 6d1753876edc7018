/**
 * Turns spoken words into written sentences: fillers, stutters and repeated words out,
 * measurements in their display form, sentences with capitals and full stops. Deterministic
 * and pure (the browser runs it too). A line break in the input marks a pause: a sentence
 * ends there.
 */
import { SMALL_NUMBERS, TENS } from '../measure/words';
import { showMeasurements, type MeasurementOptions } from './show-measurements';

export interface CleanOptions extends MeasurementOptions {
  /** Rewrite measurements in their display form (default true). */
  measurements?: boolean;
}

const NUMBER_WORDS = new Set([...SMALL_NUMBERS.keys(), ...TENS.keys(), 'hundred', 'half', 'quarter']);
// Repeats that can be grammatical ("I had had", "I know that that works").
const REPEAT_OK = new Set(['had', 'that']);
// Sentences left with nothing but these say nothing.
const EMPTY_SENTENCE = /^(?:okay|ok|alright|all right|yeah|yep|right|so|well|and|um|uh)$/i;

// Filled pauses ("um", "uh", "er", "hmm", "mhm"); never "mm", which is millimetres.
const FILLED_PAUSE = /(?:,\s*)?(?<![\w'])(?:u+m+|u+h+m*|e+r+m*|a+h+|h+m+|m+h+m+)(?![\w'])[,;]?/gi;
const PHRASE_FILLERS: RegExp[] = [
  /(?:,\s*)?(?<![\w'])(?:like|as) I said(?![\w'])[,;]?/gi,
  /(?<![\w'])(?:okay|ok|alright|all right)\s*,?\s+so(?![\w'])[,;]?/gi,
  /(?<![\w'])(?:so yeah|yeah so)(?![\w'])[,;]?/gi,
  // "like" set off by commas is a filler ("a bit extra, like, for the overlap"); "cut it like this" is not.
  /,\s*like\s*,/gi,
];
// "you know" is a filler unless it asks or tells something ("do you know", "you know how").
const YOU_KNOW = /(?:,\s*)?(?<![\w'])you know(?![\w'])[,;]?/gi;
const YOU_KNOW_BEFORE = /\b(?:do|did|don't|didn't|if|as|to|would|will|you'll|let|might|may|already|probably)\s*$/i;
const YOU_KNOW_AFTER = /^\s*(?:how|what|where|when|why|which|whether|who|the way|about)\b/i;
// "okay," or "alright," opening a clause.
const OPENING_OKAY = /(^\s*|[.!?\n]\s*|,\s*)(?:okay|ok|alright|all right)(?:\s*[,;]|\s+(?=now|next|let's|then|we|I|you)\b)\s*/gi;
// A cut-off start of a word: "th- the", "we'll cu- trim".
const FRAGMENT = /(?<![\w'-])([a-z']+)[-\u2013\u2014]\s+(?=([a-z']+))/gi;

function stripFillers(text: string): string {
  let s = text;
  for (const re of PHRASE_FILLERS) s = s.replace(re, ' ');
  s = s.replace(YOU_KNOW, (match, offset: number, whole: string) =>
    YOU_KNOW_BEFORE.test(whole.slice(0, offset)) || YOU_KNOW_AFTER.test(whole.slice(offset + match.length)) ? match : ' ',
  );
  s = s.replace(FILLED_PAUSE, ' ');
  s = s.replace(OPENING_OKAY, '$1');
  return s;
}

function stripStutters(text: string): string {
  return text.replace(FRAGMENT, (match, frag: string, next: string) => (next.toLowerCase().startsWith(frag.toLowerCase()) || frag.length <= 3 ? '' : match));
}

function core(word: string): string {
  return word.toLowerCase().replace(/^[^\w']+|[^\w']+$/g, '');
}

function isNumber(w: string): boolean {
  return /^\d/.test(w) || NUMBER_WORDS.has(w);
}

/** Drops a word (or two-word phrase) said twice in a row: "the the", "and then and then". */
function stripRepeats(line: string): string {
  const w = line.split(' ').filter(Boolean);
  // A repeat only counts when nothing but a comma sits between the two.
  const joinable = (word: string) => !/[.!?;:]$/.test(word);
  let changed = true;
  while (changed) {
    changed = false;
    for (let i = 0; i + 3 < w.length; i++) {
      const a = [core(w[i]!), core(w[i + 1]!)];
      if (a[0] && a[0] === core(w[i + 2]!) && a[1] === core(w[i + 3]!) && joinable(w[i + 1]!) && !isNumber(a[0]) && !isNumber(a[1]!)) {
        w.splice(i, 2);
        changed = true;
      }
    }
    for (let i = 0; i + 1 < w.length; i++) {
      const a = core(w[i]!);
      if (a && a === core(w[i + 1]!) && joinable(w[i]!) && !isNumber(a) && !REPEAT_OK.has(a)) {
        // Keep the first word's capital and the second word's punctuation.
        const lead = w[i]!.replace(/[,]+$/, '');
        const trail = /[^\w']*$/.exec(w[i + 1]!)![0];
        w.splice(i, 2, lead.replace(/[^\w']*$/, '') + trail);
        changed = true;
      }
    }
  }
  return w.join(' ');
}

function tidyPunctuation(text: string): string {
  return text
    .replace(/[ \t]+/g, ' ')
    .replace(/ +([,.!?;:])/g, '$1')
    .replace(/([.!?])(?:\s*[.!?])+/g, '$1')
    .replace(/([,;:])(?:\s*[,;:])+/g, '$1')
    .replace(/[,;:]+(\s*[.!?])/g, '$1')
    .replace(/(^|[.!?]\s+|\n)[,;:]\s*/g, '$1')
    .replace(/ *\n */g, '\n')
    .trim();
}

/** Fillers, stutters and repeats out; line breaks (pauses) kept. */
export function tidySpokenWords(text: string): string {
  const normal = String(text ?? '')
    .replace(/[\u2018\u2019]/g, "'")
    // Caption annotations such as "[music]" or "[laughs]" and note signs.
    .replace(/\[[^\]\n]*\]|[\u266A\u266B]/g, ' ')
    .replace(/\r\n?/g, '\n');
  const lines = tidyPunctuation(stripStutters(stripFillers(normal))).split('\n');
  return lines
    .map((l) => tidyPunctuation(stripRepeats(l)))
    .filter(Boolean)
    .join('\n');
}

const SPLIT_BEFORE = /\s(?=(?:so|now|next|okay|alright)\s)/gi;
const NOT_AFTER = /\b(?:right|for|by|until|the|to|from|and|or|not|just|even|is|was)$/i;
const NOT_BEFORE = /^\s*(?:so|now|next)\s+(?:that|much|many|far|long|on|to|time|week|one)\b/i;

/** A long run with no punctuation is cut before a new-topic word ("so", "now", "next"). */
function splitLong(sentence: string): string[] {
  if (sentence.split(' ').length <= 20 || /[.!?,;]\s/.test(sentence)) return [sentence];
  const parts: string[] = [];
  let from = 0;
  for (const m of sentence.matchAll(SPLIT_BEFORE)) {
    const cut = m.index!;
    const before = sentence.slice(from, cut);
    if (before.split(' ').length < 4 || NOT_AFTER.test(before.trim()) || NOT_BEFORE.test(sentence.slice(cut))) continue;
    if (sentence.slice(cut).trim().split(' ').length < 4) break;
    parts.push(before);
    from = cut + 1;
  }
  parts.push(sentence.slice(from));
  return parts;
}

function finish(sentence: string): string | null {
  let s = sentence
    .trim()
    .replace(/^[,;:\-\s]+/, '')
    .replace(/[,;:\-\s]+$/, '');
  // Spoken openers that a written sentence does without.
  s = s.replace(/^(?:and so|and|so)\b[,]?\s+(?=\S)/i, '').replace(/[\s,]+(?:and so|and then|and|so|but|or)$/i, '');
  if (!/[\p{L}\p{N}]/u.test(s) || EMPTY_SENTENCE.test(s.replace(/[.!?]+$/, ''))) return null;
  s = s.replace(/(?<![\w'])i(?=(?:'m|'ll|'ve|'d)?(?![\w']))/g, 'I');
  s = s.replace(/^([^\p{L}\p{N}]*)(\p{Ll})/u, (_, lead: string, c: string) => lead + c.toUpperCase());
  if (!/[.!?]$/.test(s)) s += '.';
  return s;
}

/** The cleaned text as a list of sentences (see `cleanSpokenText`). */
export function spokenSentences(text: string, opts: CleanOptions = {}): string[] {
  let s = tidySpokenWords(text);
  if (opts.measurements !== false) s = showMeasurements(s, { defaultUnit: opts.defaultUnit });
  const out: string[] = [];
  for (const line of s.split('\n')) {
    // A full stop followed by a space ends a sentence; "2.5 mm" has no space after its point.
    for (const raw of line.split(/(?<=[.!?])\s+/))
      for (const part of splitLong(raw)) {
        const done = finish(part);
        if (done) out.push(done);
      }
  }
  return out;
}

/**
 * Spoken words as written sentences: fillers ("um", "uh", "you know", "like I said",
 * "okay so"), stutters ("th- the") and repeated words ("the the", "I I") removed,
 * measurements in display form ("10 9/16 in"), each sentence with a capital and a full stop.
 */
export function cleanSpokenText(text: string, opts: CleanOptions = {}): string {
  return spokenSentences(text, opts).join(' ');
}
