import type { LengthUnit } from './length';

/** Cardinal words below twenty. */
export const SMALL_NUMBERS: ReadonlyMap<string, number> = new Map([
  ['zero', 0],
  ['one', 1],
  ['two', 2],
  ['three', 3],
  ['four', 4],
  ['five', 5],
  ['six', 6],
  ['seven', 7],
  ['eight', 8],
  ['nine', 9],
  ['ten', 10],
  ['eleven', 11],
  ['twelve', 12],
  ['thirteen', 13],
  ['fourteen', 14],
  ['fifteen', 15],
  ['sixteen', 16],
  ['seventeen', 17],
  ['eighteen', 18],
  ['nineteen', 19],
]);

export const TENS: ReadonlyMap<string, number> = new Map([
  ['twenty', 20],
  ['thirty', 30],
  ['forty', 40],
  ['fourty', 40],
  ['fifty', 50],
  ['sixty', 60],
  ['seventy', 70],
  ['eighty', 80],
  ['ninety', 90],
]);

/** Single digits as read after "point" ("one point oh five"). */
export const DIGIT_WORDS: ReadonlyMap<string, number> = new Map([['oh', 0], ['o', 0], ...[...SMALL_NUMBERS].filter(([, n]) => n < 10)]);

/**
 * Fraction denominators in words, singular and plural alike since speakers
 * mix them ("thirteen sixteenth"). "second" is left out on purpose: alone it
 * is a unit of time; thirty-seconds come from the two-word form.
 */
export const DENOMINATORS: ReadonlyMap<string, number> = new Map([
  ['half', 2],
  ['halves', 2],
  ['halfs', 2],
  ['third', 3],
  ['thirds', 3],
  ['quarter', 4],
  ['quarters', 4],
  ['fourth', 4],
  ['fourths', 4],
  ['fifth', 5],
  ['fifths', 5],
  ['sixth', 6],
  ['sixths', 6],
  ['eighth', 8],
  ['eighths', 8],
  ['eigth', 8],
  ['eigths', 8],
  ['tenth', 10],
  ['tenths', 10],
  ['twelfth', 12],
  ['twelfths', 12],
  ['sixteenth', 16],
  ['sixteenths', 16],
]);

/** Two-word denominators: "thirty-second(s)", "sixty-fourth(s)". */
export const COMPOUND_DENOMINATORS: ReadonlyMap<string, ReadonlyMap<string, number>> = new Map([
  [
    'thirty',
    new Map([
      ['second', 32],
      ['seconds', 32],
    ]),
  ],
  [
    'sixty',
    new Map([
      ['fourth', 64],
      ['fourths', 64],
    ]),
  ],
]);

/** Ordinal endings glued to digits: "16ths", "32nds". */
export const ORDINAL_SUFFIXES: ReadonlySet<string> = new Set(['th', 'ths', 'nd', 'nds', 'rd', 'rds', "th's"]);

/**
 * Denominators that the half/quarter shorthand may use without a numerator
 * ("quarter inch", "half an inch").
 */
export const IMPLICIT_DENOMINATORS: ReadonlySet<string> = new Set(['half', 'quarter', 'third', 'eighth', 'sixteenth']);

/** Unit words. "in" is special-cased by the grammar because it is also a preposition. */
export const UNIT_WORDS: ReadonlyMap<string, LengthUnit> = new Map<string, LengthUnit>([
  ['inch', 'in'],
  ['inches', 'in'],
  ['in', 'in'],
  ['inchs', 'in'],
  ['inche', 'in'],
  ['ins', 'in'],
  ['mm', 'mm'],
  ['millimeter', 'mm'],
  ['millimeters', 'mm'],
  ['millimetre', 'mm'],
  ['millimetres', 'mm'],
  ['cm', 'cm'],
  ['centimeter', 'cm'],
  ['centimeters', 'cm'],
  ['centimetre', 'cm'],
  ['centimetres', 'cm'],
  ['cms', 'cm'],
]);

/**
 * After a number, "in" followed by one of these is a preposition
 * ("fold 2 in half", "4 in diameter"), not the inch unit.
 */
export const IN_PREPOSITION_NEXT: ReadonlySet<string> = new Set([
  'the',
  'a',
  'an',
  'half',
  'halves',
  'thirds',
  'quarters',
  'each',
  'every',
  'this',
  'that',
  'these',
  'those',
  'there',
  'here',
  'it',
  'its',
  "it's",
  'them',
  'my',
  'your',
  'his',
  'her',
  'our',
  'their',
  'total',
  'place',
  'order',
  'front',
  'between',
  'which',
  'what',
  'all',
  'some',
  'case',
  'fact',
  'mind',
  'diameter',
  'width',
  'height',
  'length',
  'size',
  'line',
  'both',
  'any',
  'two',
  'pieces',
]);

/**
 * Nouns that make a preceding number something other than a length:
 * times, counts of money, weights, angles.
 */
export const NON_LENGTH_NOUNS: ReadonlySet<string> = new Set([
  'minute',
  'minutes',
  'min',
  'mins',
  'second',
  'seconds',
  'sec',
  'secs',
  'hour',
  'hours',
  'hr',
  'hrs',
  'day',
  'days',
  'week',
  'weeks',
  'month',
  'months',
  'year',
  'years',
  'time',
  'times',
  'percent',
  'per',
  'dollar',
  'dollars',
  'buck',
  'bucks',
  'cent',
  'cents',
  'pound',
  'pounds',
  'lb',
  'lbs',
  'ounce',
  'ounces',
  'oz',
  'gram',
  'grams',
  'g',
  'gsm',
  'kg',
  'degree',
  'degrees',
  'points',
  'pt',
  'pts',
  'people',
  'am',
  'pm',
  "o'clock",
  'oclock',
  'euros',
  'euro',
  'quid',
  'ml',
  'feet',
  'foot',
  'ft',
  'yard',
  'yards',
  'meter',
  'meters',
  'metre',
  'metres',
  'm',
  'k',
  'fps',
  'p',
  'mb',
  'gb',
]);

/** Words that may follow a length as the side it measures. */
export const DIMENSION_WORDS: ReadonlySet<string> = new Set(['wide', 'long', 'tall', 'high', 'deep', 'square', 'thick', 'width', 'height', 'length', 'across']);

/** Words that begin a diameter phrase before the length ("a circle 4 in across"). */
export const CIRCLE_WORDS: ReadonlySet<string> = new Set(['circle', 'circles', 'disc', 'disk', 'discs', 'disks', 'round', 'rounds']);

/** Words allowed between "circle" and its length. */
export const CIRCLE_GAP_WORDS: ReadonlySet<string> = new Set([
  'that',
  'is',
  "that's",
  "it's",
  'its',
  'of',
  'with',
  'a',
  'an',
  'diameter',
  'measuring',
  'exactly',
  'which',
  'about',
  'around',
  'roughly',
  'approximately',
  'probably',
  'just',
  'will',
  'be',
  'should',
  'the',
]);

/** Words that start a score list ("score it at ..."). */
export const SCORE_WORDS: ReadonlySet<string> = new Set([
  'score',
  'scored',
  'scoring',
  'scores',
  'scoreline',
  'scorelines',
  'crease',
  'creased',
  'creasing',
  'creases',
]);

/** Words that may sit between items of a score list and can never start a length. */
export const SCORE_CONNECTORS: ReadonlySet<string> = new Set([
  'and',
  'at',
  'then',
  'also',
  'plus',
  'again',
  'it',
  'score',
  'scored',
  'scoring',
  'scores',
  'line',
  'lines',
  'next',
  'finally',
  'last',
  'lastly',
  'another',
  'too',
  'as',
  'well',
  'once',
  'more',
]);

/** Words that sit between score items only when "at" follows ("and one at 6", "a second at 8"). */
export const SCORE_CONNECTORS_BEFORE_AT: ReadonlySet<string> = new Set(['one', 'a', 'second', 'third', 'fourth', 'another']);

/** Spoken fillers dropped before parsing; two-word ones are matched as pairs. */
export const FILLERS: ReadonlySet<string> = new Set([
  'um',
  'umm',
  'ummm',
  'uh',
  'uhh',
  'uhm',
  'er',
  'erm',
  'ah',
  'ahh',
  'hmm',
  'hm',
  'mhm',
  'like',
  'basically',
  'literally',
  'okay',
  'ok',
  'alright',
]);
export const FILLER_PAIRS: readonly (readonly [string, string])[] = [
  ['you', 'know'],
  ['kind', 'of'],
  ['sort', 'of'],
  ['you', 'see'],
];

/**
 * Self-corrections: what speakers say between a value they take back and the one they mean
 * ("4 inches, no wait, 5"; "three and a half. Sorry, three and five eighths"). Matched longest
 * first; punctuation around them is part of the correction. Built from how people correct
 * themselves out loud: apologies, interjections, "I mean" forms, and "make/scratch/strike that".
 */
export const CORRECTION_PHRASES: readonly (readonly string[])[] = [
  ['sorry'],
  ['sorry', 'about', 'that'],
  ["i'm", 'sorry'],
  ['im', 'sorry'],
  ['i', 'am', 'sorry'],
  ['my', 'bad'],
  ['my', 'mistake'],
  ['pardon'],
  ['pardon', 'me'],
  ['excuse', 'me'],
  ['oops'],
  ['whoops'],
  ['oopsie'],
  ['oh', 'no'],
  ['no'],
  ['nope'],
  ['nah'],
  ['wait'],
  ['no', 'wait'],
  ['wait', 'no'],
  ['hold', 'on'],
  ['hang', 'on'],
  ['actually'],
  ['correction'],
  ['rather'],
  ['or', 'rather'],
  ['i', 'mean'],
  ['i', 'meant'],
  ['i', 'meant', 'to', 'say'],
  ['i', 'mean', 'to', 'say'],
  ['what', 'i', 'meant', 'was'],
  ['what', 'i', 'mean', 'is'],
  ['i', 'misspoke'],
  ['i', 'said', 'that', 'wrong'],
  ["that's", 'wrong'],
  ["that's", 'not', 'right'],
  ['let', 'me', 'correct', 'that'],
  ['let', 'me', 'correct', 'myself'],
  ['let', 'me', 'rephrase'],
  ['scratch', 'that'],
  ['strike', 'that'],
  ['make', 'that'],
  ['change', 'that', 'to'],
  ['let', 'me', 'change', 'that', 'to'],
];

/** Single-word and two-word corrections (kept for callers that match text with a pattern). */
export const CORRECTION_WORDS: ReadonlySet<string> = new Set(CORRECTION_PHRASES.filter((p) => p.length === 1).map((p) => p[0]!));
export const CORRECTION_PAIRS: readonly (readonly [string, string])[] = CORRECTION_PHRASES.filter((p) => p.length === 2).map((p) => [p[0]!, p[1]!] as const);

/**
 * Words a speaker may put between a correction and the value meant ("no wait, make it 5",
 * "sorry, it should be 5", "actually let's go with 5 and a quarter"). Only a few are skipped.
 */
export const RESTATE_WORDS: ReadonlySet<string> = new Set([
  'it',
  "it's",
  'its',
  'that',
  "that's",
  'is',
  'was',
  'should',
  'be',
  "should've",
  'make',
  'made',
  "let's",
  'lets',
  'go',
  'with',
  'do',
  'use',
  'cut',
  'i',
  'meant',
  'mean',
  'want',
  'wanted',
  'need',
  'needs',
  'we',
  'you',
  'to',
  'so',
  'say',
  'said',
  'call',
  'then',
]);

/**
 * Hedges: what makes a spoken length approximate. They are built from how people talk about
 * measuring rather than listed one by one:
 * - a small amount and a direction: "a bit over", "a tad under", "a touch more than", "a hair
 *   shy of", "slightly less than", "just past" (HEDGE_AMOUNTS x HEDGE_DIRECTIONS);
 * - words of nearness or estimate before the number: "about", "roughly", "nearly", "almost",
 *   "barely", "close to", "in the region of", "somewhere around", "I'd say";
 * - bounds, which leave the length open: "at least", "no more than", "up to";
 * - words after the number: "or so", "-ish", "give or take", "plus or minus an eighth",
 *   "or thereabouts", "and a bit", "tops".
 */
const HEDGE_AMOUNTS: readonly (readonly string[])[] = [
  ['a', 'bit'],
  ['a', 'little'],
  ['a', 'little', 'bit'],
  ['a', 'tiny', 'bit'],
  ['a', 'wee', 'bit'],
  ['a', 'tad'],
  ['a', 'touch'],
  ['a', 'hair'],
  ['a', 'smidge'],
  ['a', 'smidgen'],
  ['a', 'smidgeon'],
  ['a', 'skosh'],
  ['a', 'scooch'],
  ['a', 'titch'],
  ['a', 'fraction'],
  ['a', 'shade'],
  ['a', 'whisker'],
  ['a', 'trifle'],
  ['just', 'a', 'bit'],
  ['just', 'a', 'little'],
  ['just', 'a', 'touch'],
  ['just', 'a', 'hair'],
  ['just', 'a', 'tad'],
  ['ever', 'so', 'slightly'],
  ['slightly'],
  ['somewhat'],
  ['marginally'],
  ['fractionally'],
  ['just'],
  ['only', 'just'],
  ['barely'],
  ['well'],
  ['way'],
];

const HEDGE_DIRECTIONS: readonly (readonly string[])[] = [
  ['over'],
  ['under'],
  ['above'],
  ['below'],
  ['past'],
  ['beyond'],
  ['more', 'than'],
  ['less', 'than'],
  ['longer', 'than'],
  ['shorter', 'than'],
  ['bigger', 'than'],
  ['smaller', 'than'],
  ['larger', 'than'],
  ['wider', 'than'],
  ['narrower', 'than'],
  ['taller', 'than'],
  ['greater', 'than'],
  ['shy', 'of'],
  ['short', 'of'],
  ['north', 'of'],
  ['south', 'of'],
];

/** Hedges that stand before the number on their own. */
const HEDGE_WORDS_BEFORE: readonly (readonly string[])[] = [
  ['about'],
  ['around'],
  ['round', 'about'],
  ['roundabout'],
  ['roughly'],
  ['approximately'],
  ['approx'],
  ['circa'],
  ['ca'],
  ['nearly'],
  ['almost'],
  ['barely'],
  ['very', 'nearly'],
  ['not', 'quite'],
  ['just', 'about'],
  ['pretty', 'much'],
  ['practically'],
  ['virtually'],
  ['close', 'to'],
  ['closer', 'to'],
  ['pretty', 'close', 'to'],
  ['close', 'on'],
  ['near'],
  ['nigh', 'on'],
  ['getting', 'on', 'for'],
  ['something', 'like'],
  ['somewhere', 'around'],
  ['somewhere', 'about'],
  ['somewhere', 'near'],
  ['someplace', 'around'],
  ['in', 'the', 'region', 'of'],
  ['in', 'the', 'neighborhood', 'of'],
  ['in', 'the', 'neighbourhood', 'of'],
  ['on', 'the', 'order', 'of'],
  ['in', 'the', 'ballpark', 'of'],
  ['ballpark'],
  ['more', 'or', 'less'],
  ['give', 'or', 'take'],
  ['plus', 'or', 'minus'],
  ['plus', 'minus'],
  ['±'],
  ['~'],
  ['maybe'],
  ['probably'],
  ['perhaps'],
  ['possibly'],
  ['estimated'],
  ['an', 'estimated'],
  ['guessing'],
  ['i', 'think'],
  ['i', 'guess'],
  ['i', 'believe'],
  ['i', 'reckon'],
  ["i'd", 'say'],
  ['i', 'would', 'say'],
  ['at', 'least'],
  ['at', 'most'],
  ['at', 'the', 'most'],
  ['at', 'the', 'very', 'least'],
  ['no', 'more', 'than'],
  ['no', 'less', 'than'],
  ['not', 'more', 'than'],
  ['not', 'less', 'than'],
  ['not', 'much', 'more', 'than'],
  ['not', 'much', 'over'],
  ['upwards', 'of'],
  ['up', 'to'],
  ['eyeball'],
  ['eyeballing'],
];

/** Words after a length that make it approximate ("4 inches or so", "six-ish", "5 cm, give or take"). */
const HEDGE_WORDS_AFTER: readonly (readonly string[])[] = [
  ['or', 'so'],
  ['ish'],
  ['or', 'thereabouts'],
  ['or', 'thereabout'],
  ['thereabouts'],
  ['give', 'or', 'take'],
  ['plus', 'or', 'minus'],
  ['plus', 'minus'],
  ['±'],
  ['more', 'or', 'less'],
  ['roughly'],
  ['approximately'],
  ['approx'],
  ['or', 'about'],
  ['or', 'around'],
  ['near', 'enough'],
  ['or', 'near', 'enough'],
  ['or', 'close', 'to', 'it'],
  ['or', 'close'],
  ['or', 'something'],
  ['or', 'something', 'like', 'that'],
  ['or', 'whatever'],
  ['and', 'change'],
  ['and', 'a', 'bit'],
  ['and', 'a', 'little'],
  ['and', 'a', 'smidge'],
  ['and', 'a', 'hair'],
  ['plus', 'a', 'bit'],
  ['or', 'more'],
  ['or', 'less'],
  ['or', 'a', 'bit', 'more'],
  ['or', 'a', 'bit', 'less'],
  ['or', 'a', 'little', 'more'],
  ['or', 'a', 'little', 'less'],
  ['or', 'a', 'touch', 'more'],
  ['or', 'a', 'touch', 'less'],
  ['or', 'just', 'over'],
  ['or', 'just', 'under'],
  ['or', 'a', 'hair', 'under'],
  ['or', 'a', 'hair', 'over'],
  ['at', 'most'],
  ['at', 'least'],
  ['tops'],
  ['max'],
  ['if', 'that'],
  ['at', 'a', 'guess'],
  ['ballpark'],
  ['i', 'think'],
  ['i', 'guess'],
  ['i', 'believe'],
  ["i'd", 'say'],
  ['maybe'],
  ['probably'],
  ['roughly', 'speaking'],
];

/** Hedges after a length that may carry a tolerance ("plus or minus a sixteenth"). */
export const TOLERANCE_HEDGES: ReadonlySet<string> = new Set(['give or take', 'plus or minus', 'plus minus', '±']);

/** Every hedge said before a length, longest first. */
export const APPROX_PHRASES: readonly (readonly string[])[] = [
  ...HEDGE_AMOUNTS.flatMap((a) => HEDGE_DIRECTIONS.map((d) => [...a, ...d])),
  ...HEDGE_WORDS_BEFORE,
].sort((a, b) => b.length - a.length);

/** Every hedge said after a length, longest first. */
export const APPROX_SUFFIXES: readonly (readonly string[])[] = [...HEDGE_WORDS_AFTER].sort((a, b) => b.length - a.length);

/** Words that end in "-ish" glued on ("sixish", "quarterish") are read as the word plus "ish". */
export const ISH_SUFFIX = 'ish';

/** Words before a range's ends ("somewhere from ... to ...", "between ... and ..."). */
export const RANGE_LEADS: ReadonlySet<string> = new Set(['somewhere', 'anywhere', 'anything', 'something', 'ranging', 'range', 'varies', 'vary', 'varying']);
export const RANGE_STARTS: ReadonlySet<string> = new Set(['from', 'between']);
/** Words that join a range's ends ("5 to 6 mm", "4 or 5 inches", "2 through 3"). */
export const RANGE_JOINS: ReadonlySet<string> = new Set(['to', 'through', 'thru', 'or', 'til', 'till', 'until']);

/** Words after a length that make it a step between repeated score lines ("at one inch intervals"). */
export const INTERVAL_WORDS: ReadonlySet<string> = new Set([
  'interval',
  'intervals',
  'increment',
  'increments',
  'spacing',
  'spacings',
  'spaces',
  'apart',
  'steps',
  'gaps',
  'distance',
  'distances',
  'centers',
  'centres',
]);
/** Words before a length that make it a step: "every quarter inch", "each inch". */
export const EVERY_WORDS: ReadonlySet<string> = new Set(['every', 'each']);
/** Words that give where a repeat of score lines starts ("starting at 1 inch"). */
export const START_AT_WORDS: ReadonlySet<string> = new Set(['starting', 'beginning', 'start', 'begin', 'from']);

/** Counts said in words that are not numbers ("a pair of 4 inch strips", "a dozen 2 inch squares"). */
export const COUNT_PHRASES: readonly (readonly [readonly string[], number])[] = [
  [['a', 'pair', 'of'], 2],
  [['pair', 'of'], 2],
  [['a', 'couple', 'of'], 2],
  [['a', 'couple'], 2],
  [['a', 'dozen'], 12],
  [['half', 'a', 'dozen'], 6],
  [['a', 'half', 'dozen'], 6],
  [['both'], 2],
];

/** Words between a counted noun and its length ("three strips at 2 by 11", "two circles of 3 inches"). */
export const COUNT_GAP_WORDS: ReadonlySet<string> = new Set(['at', 'of', 'measuring', 'each', 'that', 'are', "that're", 'which', 'all']);
