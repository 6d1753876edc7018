/**
 * Reading the words around a spoken measurement: which piece the crafter named ("wall strip",
 * "front panel", "mat") and which material they said ("from the kraft cardstock"). Pure and
 * deterministic, so the server's "make pieces" and the browser's previews agree.
 */
import { COLOUR_WORDS } from './colour-words';

/** What was said around a mention: the clause before it, the words after it, the mention's own words, and the topic (its chapter's title). */
export type MentionWords = { before: string; said: string; after: string; topic?: string };

/** Nouns crafters use for a piece of a project (common practice in papercraft instructions). */
const PIECE_NOUNS = new Set([
  'panel',
  'strip',
  'mat',
  'layer',
  'base',
  'lid',
  'circle',
  'wall',
  'band',
  'tag',
  'label',
  'card',
  'flap',
  'pocket',
  'insert',
  'liner',
  'lining',
  'rim',
  'topper',
  'frame',
  'border',
  'square',
  'rectangle',
  'piece',
  'oval',
  'envelope',
  'sleeve',
  'tray',
  'drawer',
  'cover',
  'spine',
  'divider',
  'window',
  'background',
  'front',
  'back',
  'side',
  'bottom',
  'top',
  'box',
  'belly',
  'scallop',
  'pennant',
  'banner',
  'sentiment',
  'handle',
  'hinge',
  'gusset',
  'shelf',
  'stand',
  'easel',
  'blank',
  'template',
  'gate',
  'shutter',
]);

/** Nouns that name a shape more than a part: a name needs the part they belong to ("lid" + "circle"). */
const GENERIC = new Set(['strip', 'circle', 'panel', 'piece', 'square', 'rectangle', 'mat', 'layer', 'oval', 'band', 'scallop']);

/** Words for what a piece is cut from; a material word is never part of a piece's name. */
const MATERIAL_WORDS = new Set([
  'kraft',
  'cardstock',
  'cardboard',
  'chipboard',
  'card-stock',
  'paper',
  'patterned',
  'pattern',
  'designer',
  'printed',
  'vellum',
  'acetate',
  'glitter',
  'foil',
  'mirror',
  'metallic',
  'textured',
  'linen',
  'watercolor',
  'watercolour',
  'plain',
  'solid',
  ...COLOUR_WORDS,
  'coordinating',
  'contrasting',
  'heavyweight',
  'lightweight',
]);

const STOP = new Set([
  'a',
  'an',
  'the',
  'of',
  'for',
  'from',
  'to',
  'in',
  'on',
  'at',
  'and',
  'or',
  'with',
  'cut',
  'make',
  'glue',
  'score',
  'fold',
  'trim',
  'punch',
  'stamp',
  'adhere',
  'add',
  'attach',
  'emboss',
  'ink',
  'place',
  'put',
  'use',
  'wrap',
  'notch',
  'snip',
  'pop',
  'take',
  'grab',
  'need',
  'some',
  'your',
  'my',
  'our',
  'this',
  'that',
  'these',
  'those',
  'another',
  'each',
  'other',
  'one',
  'two',
  'three',
  'four',
  'five',
  'six',
  'seven',
  'eight',
  'nine',
  'ten',
  'next',
  'then',
  'now',
  'first',
  'last',
  'finally',
  'we',
  'i',
  'you',
  'it',
  'is',
  'are',
  'be',
  'will',
  'um',
  'uh',
  'so',
  'just',
  'about',
  'little',
  'small',
  'big',
  'large',
  'long',
  'short',
  'thin',
  'thick',
  'wide',
  'tall',
  'narrow',
  'skinny',
  'new',
  'same',
  'second',
  'third',
  'extra',
  'main',
  "let's",
  "we're",
  "i'm",
  "you'll",
  "that's",
  'going',
  'gonna',
  'want',
  'also',
  'here',
  'there',
  'our',
  'which',
  'what',
  'as',
  'by',
  'up',
  'out',
]);

const singular = (w: string) => {
  if (w.endsWith('ies') && w.length > 4) return `${w.slice(0, -3)}y`;
  if (/(?:ss|sh|ch|x)es$/.test(w)) return w.slice(0, -2);
  if (w.endsWith('s') && !w.endsWith('ss') && w.length > 3) return w.slice(0, -1);
  return w;
};

const words = (s: string) =>
  s
    .toLowerCase()
    .replace(/[’‘]/g, "'")
    .split(/[^a-z'-]+/)
    .map((w) => w.replace(/^['-]+|['-]+$/g, ''))
    .filter(Boolean);

const isPieceNoun = (w: string) => PIECE_NOUNS.has(singular(w));
/** Verbs of the craft that are nouns after an article ("the wrap band", "a score board", "the fold line"). */
const VERB_NOUNS = new Set(['wrap', 'score', 'fold', 'notch', 'stamp', 'glue', 'punch']);
const ARTICLES = new Set(['a', 'an', 'the', 'your', 'my', 'our', 'this', 'that']);
// A word that may sit in front of a piece noun in its name ("front", "wall", "inner").
const isModifier = (w: string) => /^[a-z]+$/.test(w) && !STOP.has(w) && !MATERIAL_WORDS.has(w);

type Phrase = { head: string; words: string[] };

/** The noun phrases ending in a piece noun, in the order said: "the wall strips" -> wall strip. */
function phrases(text: string): Phrase[] {
  const w = words(text);
  const out: Phrase[] = [];
  for (let i = 0; i < w.length; i++) {
    if (!isPieceNoun(w[i]!)) continue;
    // A piece noun followed by another piece noun is a modifier of it ("lid rim", "wall strip").
    if (i + 1 < w.length && isPieceNoun(w[i + 1]!)) continue;
    const head = singular(w[i]!);
    const mods: string[] = [];
    for (let k = i - 1; k >= 0 && mods.length < 2; k--) {
      const x = w[k]!;
      const asNoun = VERB_NOUNS.has(x) && k > 0 && ARTICLES.has(w[k - 1]!);
      if (!isModifier(x) && !asNoun) break;
      mods.unshift(singular(x));
    }
    out.push({ head, words: [...mods, head] });
  }
  return out;
}

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * The piece's name from the crafter's own words, or null when they named none. The nearest
 * piece noun before the measurement wins ("two strips of kraft"), its part taken from earlier in
 * the clause ("the wall strips, two strips ..." -> "Wall strip"; "the lid rim is two strips" ->
 * "Lid rim strip"), or from the chapter when only a shape was said ("Make the lid": "a circle"
 * -> "Lid circle"). A noun after the measurement counts when none came before ("... for the front
 * panel").
 */
export function pieceNameFromWords(m: MentionWords): string | null {
  const before = phrases(`${m.before} ${m.said}`);
  let chosen = before[before.length - 1];
  if (!chosen) {
    const after = phrases(m.after)[0];
    if (after) chosen = after;
  }
  if (!chosen) return null;
  let name = chosen.words;
  if (name.length === 1 && GENERIC.has(chosen.head)) {
    // Only a shape: find the part it belongs to, earlier in the clause, just after it, else in the chapter title.
    const earlier = before.slice(0, -1).reverse()[0];
    const named = (p: Phrase) => !GENERIC.has(p.head) || p.words.length > 1;
    // "a circle three inches across for the sentiment": the part said just after
    const after = phrases(m.after).find(named);
    const topic = phrases(m.topic ?? '').find(named);
    const part = earlier ?? after ?? topic;
    if (part) name = part.head === chosen.head ? part.words : [...part.words, chosen.head];
  }
  return capital(name.join(' '));
}

/** Material phrases in a text, as said: "kraft cardstock", "patterned paper", "white". */
function materialPhrases(text: string): string[] {
  const w = words(text);
  const out: string[] = [];
  for (let i = 0; i < w.length; i++) {
    if (!MATERIAL_WORDS.has(w[i]!)) continue;
    let j = i;
    while (j + 1 < w.length && MATERIAL_WORDS.has(w[j + 1]!)) j++;
    out.push(w.slice(i, j + 1).join(' '));
    i = j;
  }
  return out;
}

/** Words that name the stuff itself; the others only describe it ("patterned", "kraft", "teal"). */
const MATERIAL_NOUNS = new Set(['cardstock', 'card-stock', 'cardboard', 'chipboard', 'paper', 'vellum', 'acetate', 'foil', 'linen']);
const PAPER_WORDS = new Set(['patterned', 'pattern', 'designer', 'printed', 'watercolor', 'watercolour']);

/** A material said only by how it looks gets its usual noun: "patterned" paper, "kraft" cardstock (common practice). */
function withNoun(said: string): string {
  const w = said.split(' ');
  if (w.some((x) => MATERIAL_NOUNS.has(x))) return said;
  return `${said} ${w.some((x) => PAPER_WORDS.has(x)) ? 'paper' : 'cardstock'}`;
}

/** How well a said phrase matches a known material's name: the share of the phrase's words the name holds. */
function matchScore(said: string, known: string): number {
  const k = new Set(words(known).map(singular));
  const s = words(said).map(singular);
  return s.filter((w) => k.has(w)).length / s.length;
}

/**
 * The material of a piece: one said next to the measurement ("two strips of kraft", "from the
 * kraft cardstock", "a patterned mat"), matched to the tutorial's materials or the studio's
 * earlier ones where the words agree ("kraft" -> "kraft cardstock"); else, when the tutorial
 * has a single material, that one; else null (the crafter picks it).
 */
export function materialFromWords(m: MentionWords, known: readonly string[]): string | null {
  return materialSaid(m, known) ?? (known.length === 1 ? known[0]! : null);
}

/** The material said next to a measurement, matched to a known name where the words agree; null when none was said. */
export function materialSaid(m: MentionWords, known: readonly string[]): string | null {
  const near = [...materialPhrases(`${m.before} ${m.said}`).reverse(), ...materialPhrases(m.after)];
  for (const said of near) {
    let best: { name: string; score: number } | null = null;
    for (const k of known) {
      const score = matchScore(said, k);
      if (score > 0 && (!best || score > best.score)) best = { name: k, score };
    }
    if (best) return best.name;
    // A colour alone ("a white one") is not a material name to keep.
    if (said.split(' ').some((w) => !['white', 'black', 'cream', 'ivory', 'plain', 'solid'].includes(w))) return withNoun(said);
  }
  return null;
}

const COUNT_WORDS: Record<string, number> = { two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10, twelve: 12, both: 2, pair: 2 };

/**
 * How many pieces the words before a measurement ask for, when the measurement itself carries no
 * count: a number before a plural piece noun in the same clause ("two strips of kraft", "the lid
 * rim is two strips", "a pair of panels"). Null when none was said.
 */
export function countFromWords(m: MentionWords): number | null {
  const w = words(m.before);
  for (let i = w.length - 1; i >= 0; i--) {
    const n = COUNT_WORDS[w[i]!] ?? (/^\d{1,3}$/.test(w[i]!) ? Number(w[i]) : undefined);
    if (n === undefined || n < 2) continue;
    // the noun comes within three words ("two strips", "two kraft strips", "a pair of panels")
    for (let k = i + 1; k <= Math.min(i + 3, w.length - 1); k++) {
      const x = w[k]!;
      if (isPieceNoun(x) && singular(x) !== x) return n;
    }
  }
  return null;
}
