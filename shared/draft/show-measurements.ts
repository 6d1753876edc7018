import { extractMentions, formatAmount, formatLength, type Length, type LengthUnit, type TextMention } from '../measure';
import { APPROX_PHRASES, APPROX_SUFFIXES, CIRCLE_WORDS, CORRECTION_PAIRS, CORRECTION_WORDS, DIMENSION_WORDS } from '../measure/words';

export interface MeasurementOptions {
  /** Unit for a length said without one (inches unless set). */
  defaultUnit?: LengthUnit;
}

function words(s: string): string[] {
  return s
    .toLowerCase()
    .split(/[^a-z~']+/)
    .filter(Boolean);
}

/** The approximate phrase the speaker used ("roughly", "just over"), as written. */
function approxPrefix(span: string): string | null {
  const w = words(span);
  for (const phrase of APPROX_PHRASES) {
    if (phrase.every((p, i) => w[i] === p)) {
      const m = new RegExp(`^\\W*${phrase.map((p) => p.replace(/[~]/g, '\\$&')).join('\\W+')}`, 'i').exec(span);
      if (m) return m[0].trim();
    }
  }
  return null;
}

function approxSuffix(span: string): string | null {
  const w = words(span);
  for (const phrase of APPROX_SUFFIXES) {
    const tail = w.slice(-phrase.length);
    if (tail.length === phrase.length && phrase.every((p, i) => tail[i] === p)) {
      const m = new RegExp(`${phrase.join('\\W+')}\\W*$`, 'i').exec(span);
      if (m) return m[0].trim();
    }
  }
  return null;
}

function list(items: string[]): string {
  return items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** "10 9/16 x 4 1/4 in" when both sides share a unit, else each with its own. */
function sizeText(values: readonly Length[]): string {
  const unit = values[0]?.unit;
  if (unit && values.every((v) => v.unit === unit)) return `${values.map((v) => formatAmount(v.value, v.unit)).join(' x ')} ${unit}`;
  return values.map(formatLength).join(' x ');
}

/** The display form of one mention, keeping the speaker's own framing words. */
export function mentionDisplay(m: TextMention): string {
  const span = m.text;
  const lower = span.toLowerCase();
  const spanWords = words(span);
  if (m.kind === 'score' && m.every) {
    // "score every quarter inch down the flap" reads "score every 1/4 in"
    const lead = span.split(/\s+/)[0];
    const first = m.values[0];
    const from = first && !(first.unit === m.every.unit && first.value.equals(m.every.value)) ? ` starting at ${formatLength(first)}` : '';
    return `${lead} every ${formatLength(m.every)}${from}`;
  }
  if (m.kind === 'range') {
    // both ends kept: a range never becomes one length
    const [a, b] = m.values as [Length, Length];
    const lead = /^(?:(?:somewhere|anywhere|anything|something)\s+)?(?:from|between)\b/i.exec(span);
    const ends =
      a.unit === b.unit
        ? `${formatAmount(a.value, a.unit)} ${lead && /between/i.test(lead[0]) ? 'and' : 'to'} ${formatAmount(b.value, b.unit)} ${a.unit}`
        : `${formatLength(a)} to ${formatLength(b)}`;
    return lead ? `${lead[0]} ${ends}` : ends;
  }
  if (m.kind === 'score') {
    const at = /\bat\s+/i.exec(span);
    const lead = at ? span.slice(0, at.index + at[0].length) : `${span.split(/\s+/)[0]} at `;
    return `${lead}${list(m.values.map(formatLength))}`;
  }
  const pre = m.approx ? approxPrefix(span) : null;
  const post = m.approx && !pre ? approxSuffix(span) : null;
  let core: string;
  if (m.kind === 'diameter') {
    const circle = spanWords.find((w) => CIRCLE_WORDS.has(w));
    core = `${formatLength(m.values[0]!)} ${circle ?? 'diameter'}`;
  } else if (m.kind === 'size') core = sizeText(m.values);
  else core = formatLength(m.values[0]!);
  // "a half inch border" keeps its article; "an inch" becomes "1 in".
  const article = /^(a|an)\s+(half|quarter|third|eighth|sixteenth)\b/i.exec(span);
  if (article && !pre) core = `${article[1]} ${core}`;
  const last = spanWords[spanWords.length - 1];
  const dimension = m.kind !== 'diameter' && last && DIMENSION_WORDS.has(last) && !post ? ` ${span.slice(lower.lastIndexOf(last))}` : '';
  if (m.approx && !pre && !post) return `about ${core}${dimension}`;
  return `${pre ? `${pre} ` : ''}${core}${dimension}${post ? ` ${post}` : ''}`;
}

const CORRECTIONS = [...CORRECTION_PAIRS.map((p) => p.join('\\s+')), ...CORRECTION_WORDS].join('|');
// Only correction words and punctuation between two values: the first was withdrawn.
const ONLY_CORRECTION = new RegExp(`^[\\s,.;:!-]*(?:(?:${CORRECTIONS})[\\s,.;:!-]*)+$`, 'i');

// Only a pause, a comma or a "that's", "I mean", "so", "again" between a value and the same value
// again: the second is a spoken repeat ("ten and a half, ten and a half inches").
const ONLY_REPEAT_GLUE = /^[\s,.;:!\u2013\u2014-]*(?:(?:that['’]s|that is|i mean|so|again|yeah|okay|ok|or)[\s,.;:!\u2013\u2014-]*)*$/i;
const sameValues = (a: TextMention, b: TextMention) =>
  (a.kind === b.kind || (a.values.length === 1 && b.values.length === 1)) &&
  a.values.length === b.values.length &&
  a.values.every((v, i) => formatLength(v) === formatLength(b.values[i]!));

/**
 * Rewrites every spoken measurement in its display form ("ten and nine sixteenths" becomes
 * "10 9/16 in", "four and a quarter by five and a half" becomes "4 1/4 x 5 1/2 in").
 * A value the speaker withdrew ("five inches, sorry, five and a quarter") is dropped along
 * with the correction, leaving the value meant; a value said twice in a row ("ten and a half,
 * ten and a half inches") is written once.
 */
export function showMeasurements(text: string, opts: MeasurementOptions = {}): string {
  const mentions = extractMentions(text, { defaultUnit: opts.defaultUnit });
  let out = '';
  let cursor = 0;
  for (let i = 0; i < mentions.length; i++) {
    const m = mentions[i]!;
    if (m.start < cursor) continue;
    out += text.slice(cursor, m.start);
    const next = mentions[i + 1];
    if (next && (m.corrected || ONLY_CORRECTION.test(text.slice(m.end, next.start)))) {
      cursor = next.start;
      continue;
    }
    // Said twice in a row: written once, in the fuller of the two wordings ("score at", "long").
    if (next && !next.corrected && sameValues(m, next) && ONLY_REPEAT_GLUE.test(text.slice(m.end, next.start))) {
      const [a, b] = [mentionDisplay(m), mentionDisplay(next)];
      out += b.length > a.length ? b : a;
      cursor = next.end;
      i++;
      continue;
    }
    out += mentionDisplay(m);
    cursor = m.end;
  }
  return out + text.slice(cursor);
}
