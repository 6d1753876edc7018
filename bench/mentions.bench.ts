/**
 * Finding mentions in a long transcript: a generated 10,000-cue WebVTT file of
 * our own crafting chatter. Extraction from the parsed cues is timed beside
 * parsing the file alone, in the same run. Target: extraction under 250 ms.
 *
 *   npx tsx bench/mentions.bench.ts [--cues 10000] [--runs 7]
 */
import { extractMentionsFromCues } from '@shared/measure';
import { parseTranscript } from '@shared/transcript/parse';
import { isMain, ms, numberArg, seeded, timeSync, verdict } from './lib';

const TARGET_MS = 250;

const LENGTHS = [
  'four and a quarter',
  '5 1/2',
  'ten and nine sixteenths',
  '3½',
  'two and a half inches',
  '6 3/8',
  'half an inch',
  '13 mm',
  'an inch and a quarter',
  'one point five',
  '⅝',
  'nine sixteenths',
];
const SENTENCES: ((l: () => string) => string)[] = [
  (l) => `okay so um cut your card base ${l()} by ${l()} and set it aside`,
  (l) => `then you want to score it at ${l()} and at ${l()}`,
  (l) => `grab the the patterned paper and trim it to about ${l()}`,
  (l) => `for the lid cut a circle ${l()} across`,
  () => 'you know I really love this color it is so pretty',
  () => 'give it about ten minutes to dry and then we will come back',
  () => 'I used two pieces of kraft cardstock and three buttons',
  (l) => `the strip for the round gift box is ${l()} long sorry ${l()}`,
  (l) => `and the mat is like ${l()} wide by ${l()} long`,
  () => 'the kit is $4.99 at the shop and the class starts at 3:15',
];

/** hh:mm:ss.ttt as WebVTT writes it. */
function vttTime(t: number): string {
  const p = (n: number, w = 2) => String(n).padStart(w, '0');
  return `${p(Math.floor(t / 3_600_000))}:${p(Math.floor(t / 60_000) % 60)}:${p(Math.floor(t / 1000) % 60)}.${p(t % 1000, 3)}`;
}

/** A WebVTT file of `n` cues; some measurements run over a cue boundary. */
export function makeTranscript(n: number, seed = 7): string {
  const rand = seeded(seed);
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(rand() * xs.length)]!;
  const out = ['WEBVTT', ''];
  let t = 0;
  let carry = '';
  for (let i = 0; i < n; i++) {
    const words = (carry + pick(SENTENCES)(() => pick(LENGTHS))).trim().split(' ');
    // split about a third of sentences across the next cue
    const cut = rand() < 0.33 ? Math.max(1, Math.floor(words.length * rand())) : words.length;
    carry = words.slice(cut).join(' ') + ' ';
    const dur = 2000 + Math.floor(rand() * 3000);
    out.push(`${vttTime(t)} --> ${vttTime(t + dur)}`, words.slice(0, cut).join(' ') || 'and', '');
    t += dur;
  }
  return out.join('\n');
}

export function benchMentions(cues = 10_000, runs = 7): { extractMs: number; parseMs: number; mentions: number; pass: boolean } {
  const vtt = makeTranscript(cues);
  const parse = timeSync(() => parseTranscript(vtt), runs);
  const parsed = parseTranscript(vtt).cues;
  let found = 0;
  const extract = timeSync(() => {
    found = extractMentionsFromCues(parsed).length;
  }, runs);
  const pass = extract.median < TARGET_MS;
  console.log(
    `mentions: ${parsed.length} cues  extract ${ms(extract.median)}  (parse only ${ms(parse.median)})  target < ${TARGET_MS} ms  ${verdict(extract.median, TARGET_MS)}`,
  );
  console.log(`  ${found} mentions found; median of ${runs} runs, extract min ${ms(extract.min)} max ${ms(extract.max)}`);
  return { extractMs: extract.median, parseMs: parse.median, mentions: found, pass };
}

if (isMain(import.meta.url)) {
  const r = benchMentions(numberArg('cues', 10_000), numberArg('runs', 7));
  if (!r.pass) process.exitCode = 1;
}
