import { createSupplySchema, type SupplyCategory } from '@shared/schemas/supply';

/** One supply read from a pasted line, in the shape the create endpoint takes. */
export type ParsedSupply = {
  category: SupplyCategory;
  name: string;
  quantity: string;
  note: string;
  url: string | null;
  discountCode: string | null;
};

/** A pasted line and what was read from it; `problem` says in words why it cannot be added. */
export type ParsedLine = { line: number; text: string; supply: ParsedSupply | null; problem: string | null };

// Which word decides the category. Longer phrases win over the words inside them
// ("washi tape" is an embellishment although "tape" is an adhesive; "glue gun" is a tool).
const WORDS: [string, SupplyCategory][] = [
  ...(
    [
      'knife',
      'knives',
      'craft knife',
      'trimmer',
      'paper trimmer',
      'scissors',
      'snips',
      'cutter',
      'circle cutter',
      'punch',
      'bone folder',
      'folder',
      'scoring board',
      'score board',
      'scoring tool',
      'scoring blade',
      'ruler',
      'cutting mat',
      'self-healing mat',
      'craft mat',
      'stylus',
      'awl',
      'piercer',
      'tweezers',
      'compass',
      'pencil',
      'eraser',
      'brayer',
      'heat tool',
      'glue gun',
      'clip',
      'bulldog clip',
      'clothespin',
      'clamp',
      'die',
      'stamp',
      'cutting machine',
      'guillotine',
      'blade',
      'burnisher',
      'spatula',
      'brush',
      'stencil',
      'embossing folder',
    ] as const
  ).map((w): [string, SupplyCategory] => [w, 'tool']),
  ...(
    [
      'glue',
      'glue stick',
      'glue dot',
      'tape',
      'double-sided tape',
      'foam tape',
      'adhesive',
      'foam dot',
      'foam square',
      'foam pad',
      'mounting tape',
      'paste',
    ] as const
  ).map((w): [string, SupplyCategory] => [w, 'adhesive']),
  ...(['cardstock', 'card stock', 'cover stock', 'chipboard', 'cardboard', 'card base', 'card blank', 'card panel'] as const).map(
    (w): [string, SupplyCategory] => [w, 'cardstock'],
  ),
  ...(['paper', 'vellum', 'tissue', 'acetate', 'paper pad', 'designer paper', 'patterned paper'] as const).map((w): [string, SupplyCategory] => [w, 'paper']),
  ...(
    [
      'ribbon',
      'gem',
      'rhinestone',
      'jewel',
      'sequin',
      'pearl',
      'enamel dot',
      'button',
      'brad',
      'eyelet',
      'twine',
      'string',
      'cord',
      'lace',
      'sticker',
      'washi',
      'washi tape',
      'flower',
      'charm',
      'glitter',
      'bow',
      'tag',
      'die cut',
      'die-cut',
      'ephemera',
      'embossing powder',
      'bead',
      'tassel',
      'sentiment',
    ] as const
  ).map((w): [string, SupplyCategory] => [w, 'embellishment']),
];

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
// A phrase matches as whole words, with a plural ending, a space or a hyphen between its words.
const MATCHERS = WORDS.map(([phrase, category]) => ({
  phrase,
  category,
  re: new RegExp(
    `(?<![a-z])${phrase
      .split(/[\s-]+/)
      .map(escape)
      .join('[\\s-]*')}(?:e?s)?(?![a-z])`,
    'gi',
  ),
}));

function lastSupplyWord(text: string): SupplyCategory | null {
  let best: { end: number; length: number; category: SupplyCategory } | null = null;
  for (const m of MATCHERS) {
    for (const hit of text.matchAll(m.re)) {
      const end = hit.index + hit[0].length;
      if (!best || end > best.end || (end === best.end && hit[0].length > best.length)) best = { end, length: hit[0].length, category: m.category };
    }
  }
  return best?.category ?? null;
}

/**
 * Guesses a supply's category from its name. The word that names the thing comes last before
 * "for", "with", "and", a comma and the like ("paper trimmer with a scoring blade" is a tool,
 * "scissors for ribbon" too), so that part decides; failing that, any supply word in the name;
 * failing that, "other".
 */
export function guessCategory(name: string): SupplyCategory {
  const head = name.split(/\s+(?:for|with|of|on|to|in|from|and|or|plus)\s+|[,;(—–]|\s-\s/i)[0] ?? '';
  return lastSupplyWord(head) ?? lastSupplyWord(name) ?? 'other';
}

const UNICODE_FRACTIONS: Record<string, string> = {
  '½': '1/2',
  '⅓': '1/3',
  '⅔': '2/3',
  '¼': '1/4',
  '¾': '3/4',
  '⅛': '1/8',
  '⅜': '3/8',
  '⅝': '5/8',
  '⅞': '7/8',
};
const FRACTION_CHARS = Object.keys(UNICODE_FRACTIONS).join('');
const NUMBER_WORDS: Record<string, string> = {
  one: '1',
  two: '2',
  three: '3',
  four: '4',
  five: '5',
  six: '6',
  seven: '7',
  eight: '8',
  nine: '9',
  ten: '10',
  eleven: '11',
  twelve: '12',
  fifteen: '15',
  twenty: '20',
  'a dozen': '12',
  dozen: '12',
  'a couple of': '2',
  'a couple': '2',
  'a pair of': '1 pair',
  'pair of': '1 pair',
  'half a': '1/2',
  half: '1/2',
  'a few': 'a few',
  several: 'several',
  'a handful of': 'a handful',
  'a handful': 'a handful',
};
const NUMBER = new RegExp(`^(\\d+\\s+\\d+/\\d+|\\d+/\\d+|\\d+(?:\\.\\d+)?\\s?[${FRACTION_CHARS}]|\\d+(?:\\.\\d+)?|[${FRACTION_CHARS}])`);
const WORD_NUMBER = new RegExp(
  `^(${Object.keys(NUMBER_WORDS)
    .sort((a, b) => b.length - a.length)
    .map(escape)
    .join('|')})(?![a-z])`,
  'i',
);
const ARTICLE = /^(an?)\s+(?=\S)/i;
// What a count or an amount is measured in; lengths are marked so a tool's size is not taken for an amount.
const UNIT =
  /^(sheets?|pieces?|pcs?|strips?|packs?|packets?|pads?|rolls?|spools?|reels?|skeins?|bundles?|bottles?|tubes?|jars?|sets?|pairs?|bags?|sticks?|panels?|lengths?|yards?|yds?|feet|foot|ft|inch(?:es)?|in|cm|mm|metres?|meters?|m|"|”)(?![a-z])/i;
const LENGTH_UNIT = /^(yards?|yds?|feet|foot|ft|inch(?:es)?|in|cm|mm|metres?|meters?|m|"|”)$/i;
// "12 x 12 in paper" starts with a size, not a count.
const SIZE_AFTER_NUMBER = /^\s*(?:in(?:ch(?:es)?)?\b|cm\b|mm\b|["”])?\s*(?:x|×|by)\s*\d/i;
// "80 lb kraft cardstock", "120 gsm vellum": a paper weight or caliper, not a count.
const SPEC_AFTER_NUMBER = /^\s*(?:lbs?|#|gsm|g\/m2|g\/m²|g|pt|mil|%)(?![a-z])/i;

const normalizeNumber = (n: string) =>
  n
    .replace(new RegExp(`(\\d)\\s?([${FRACTION_CHARS}])`), (_m, d: string, f: string) => `${d} ${UNICODE_FRACTIONS[f]}`)
    .replace(new RegExp(`[${FRACTION_CHARS}]`), (f) => UNICODE_FRACTIONS[f]!);

type Quantity = { quantity: string; rest: string; length: boolean };

/** Reads a leading amount ("2 sheets of", "1½ yards", "a few", "3 x") off the front of a supply's text. */
export function readLeadingQuantity(text: string): Quantity | null {
  let rest = text.trimStart();
  let amount: string;
  let article = false;
  const n = NUMBER.exec(rest);
  if (n) {
    const after = rest.slice(n[0].length);
    if (SIZE_AFTER_NUMBER.test(after) || SPEC_AFTER_NUMBER.test(after)) return null;
    // "3D foam squares": a letter right after the number belongs to a word, unless it is a unit ("2pcs", "2x").
    if (/^[a-z]/i.test(after) && !UNIT.test(after) && !/^[x×](?![a-z])/i.test(after)) return null;
    amount = normalizeNumber(n[1]!);
    rest = rest.slice(n[0].length);
  } else {
    const w = WORD_NUMBER.exec(rest);
    if (w) {
      amount = NUMBER_WORDS[w[1]!.toLowerCase()]!;
      rest = rest.slice(w[0].length);
    } else {
      const a = ARTICLE.exec(rest);
      if (!a) return null;
      // "a" or "an" counts only when a unit follows: "a sheet of vellum", not "a bone folder".
      amount = '1';
      article = true;
      rest = rest.slice(a[0].length);
    }
  }
  rest = rest.trimStart();
  const u = UNIT.exec(rest);
  if (article && !u) return null;
  let unit = '';
  if (u && !amount.includes('pair')) {
    unit = /^["”]$/.test(u[1]!) ? 'in' : u[1]!;
    rest = rest.slice(u[0].length);
  } else {
    const times = /^[x×](?![a-z\d])/i.exec(rest);
    if (times) rest = rest.slice(times[0].length);
  }
  rest = rest.replace(/^\s*of(?![a-z])/i, '').trim();
  return { quantity: unit ? `${amount} ${unit}` : amount, rest, length: LENGTH_UNIT.test(unit) };
}

// Trailing punctuation is not part of a pasted address (the same rule as GFM's extended autolinks).
function trimUrl(raw: string): string {
  let url = raw;
  for (;;) {
    if (/[?!.,:;*_~'"]$/.test(url)) url = url.slice(0, -1);
    else if (url.endsWith(')') && (url.match(/\(/g)?.length ?? 0) < (url.match(/\)/g)?.length ?? 0)) url = url.slice(0, -1);
    else return url;
  }
}

const SEPARATORS = /^[\s\-–—:|,;]+|[\s\-–—:|,;]+$/g;
const tidy = (s: string) =>
  s
    .replace(/\(\s*\)|\[\s*\]|<\s*>/g, ' ')
    .replace(/\s{2,}/g, ' ')
    .replace(SEPARATORS, '')
    .trim();

const FIELD_LABELS: Record<string, string> = {
  name: 'Name',
  quantity: 'Quantity',
  note: 'Note',
  url: 'Shop link',
  discountCode: 'Discount code',
  category: 'Category',
};

/**
 * Reads one pasted line ("2 sheets kraft cardstock", "liquid glue - https://shop.example/glue")
 * into a supply: the shop link and a discount code are split off, a leading amount becomes the
 * quantity, text after " - " or in closing brackets becomes the note, and the category is
 * guessed from the name. A line that cannot be added says why.
 */
export function parseSupplyLine(line: string): { supply: ParsedSupply | null; problem: string | null } {
  let s = line
    .trim()
    .replace(/^(?:[-*•·▪‣–—]|\d{1,3}[.)])\s+/, '')
    .replace(/^\[[ xX]\]\s+/, '');

  let url: string | null = null;
  const md = /\[([^\]]+)\]\(((?:https?:\/\/|www\.)[^)\s]+)\)/i.exec(s);
  if (md) {
    url = md[2]!;
    s = s.replace(md[0], md[1]!);
  } else {
    const u = /(?:https?:\/\/|www\.)[^\s<>]+/i.exec(s);
    if (u) {
      url = trimUrl(u[0]);
      s = s.slice(0, u.index) + s.slice(u.index + url.length);
    }
  }
  if (url && /^www\./i.test(url)) url = `https://${url}`;

  let discountCode: string | null = null;
  const code = /\b(?:(?:use|discount|promo|coupon)\s+code\s*[:=]?\s*|code\s*[:=]\s*)([a-z0-9][a-z0-9_-]*)/i.exec(s);
  if (code) {
    discountCode = code[1]!;
    s = s.replace(code[0], ' ');
  }
  s = tidy(s);

  let quantity = '';
  const times = /(?:\s+[x×]\s?(\d+)|\s*\(\s*[x×]\s?(\d+)\s*\))\s*$/i.exec(s);
  // Not the second side of a size ("patterned paper 12 x 12").
  if (times && !/\d\s*(?:in|cm|mm|["”])?$/i.test(s.slice(0, times.index))) {
    quantity = times[1] ?? times[2]!;
    s = s.slice(0, times.index);
  }

  let note = '';
  const bracket = /\s*\(([^()]*)\)\s*$/.exec(s);
  if (bracket && bracket.index > 0) {
    note = bracket[1]!.trim();
    s = s.slice(0, bracket.index);
  }
  const dash = /\s+[-–—]\s+/.exec(s);
  if (dash) {
    note = tidy([s.slice(dash.index + dash[0].length), note].filter(Boolean).join('; '));
    s = s.slice(0, dash.index);
  }

  let name = tidy(s);
  if (!quantity) {
    const q = readLeadingQuantity(name);
    if (q && q.rest) {
      // A length before a tool or an adhesive is its size ("12 in trimmer", "1/4 in tape"), not an amount.
      const category = guessCategory(q.rest);
      if (!(q.length && (category === 'tool' || category === 'adhesive'))) {
        quantity = q.quantity;
        name = q.rest;
      }
    }
  }
  name = tidy(name.replace(/^(?:an?|the)\s+(?=\S)/i, ''));
  if (!name) return { supply: null, problem: url ? 'Only a link on this line: write what the supply is before it' : 'No supply name on this line' };
  name = name.charAt(0).toUpperCase() + name.slice(1);

  const supply: ParsedSupply = { category: guessCategory(name), name, quantity, note, url, discountCode };
  const checked = createSupplySchema.safeParse({ ...supply, url: url ?? undefined, discountCode: discountCode ?? undefined });
  if (!checked.success) {
    const issue = checked.error.issues[0]!;
    const field = FIELD_LABELS[String(issue.path[0])] ?? 'This line';
    return { supply, problem: `${field}: ${issue.message}` };
  }
  return { supply, problem: null };
}

/** Reads a pasted list, one supply a line; blank lines are skipped, line numbers are the pasted ones (from 1). */
export function parseSupplyLines(text: string): ParsedLine[] {
  return text
    .split(/\r\n|\r|\n/)
    .map((raw, i) => ({ raw, line: i + 1 }))
    .filter(({ raw }) => raw.trim() !== '')
    .map(({ raw, line }) => ({ line, text: raw.trim(), ...parseSupplyLine(raw) }));
}
