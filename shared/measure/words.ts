import type { LengthUnit } from './length';

/** Cardinal words below twenty. */
export const SMALL_NUMBERS: ReadonlyMap<string, number> = new Map([
  ['zero', 0], ['one', 1], ['two', 2], ['three', 3], ['four', 4], ['five', 5], ['six', 6],
  ['seven', 7], ['eight', 8], ['nine', 9], ['ten', 10], ['eleven', 11], ['twelve', 12],
  ['thirteen', 13], ['fourteen', 14], ['fifteen', 15], ['sixteen', 16], ['seventeen', 17],
  ['eighteen', 18], ['nineteen', 19],
]);

export const TENS: ReadonlyMap<string, number> = new Map([
  ['twenty', 20], ['thirty', 30], ['forty', 40], ['fourty', 40], ['fifty', 50],
  ['sixty', 60], ['seventy', 70], ['eighty', 80], ['ninety', 90],
]);

/** Single digits as read after "point" ("one point oh five"). */
export const DIGIT_WORDS: ReadonlyMap<string, number> = new Map([
  ['zero', 0], ['oh', 0], ['o', 0], ['one', 1], ['two', 2], ['three', 3], ['four', 4],
  ['five', 5], ['six', 6], ['seven', 7], ['eight', 8], ['nine', 9],
]);

/**
 * Fraction denominators in words, singular and plural alike since speakers
 * mix them ("thirteen sixteenth"). "second" is left out on purpose: alone it
 * is a unit of time; thirty-seconds come from the two-word form.
 */
export const DENOMINATORS: ReadonlyMap<string, number> = new Map([
  ['half', 2], ['halves', 2], ['halfs', 2],
  ['third', 3], ['thirds', 3],
  ['quarter', 4], ['quarters', 4], ['fourth', 4], ['fourths', 4],
  ['fifth', 5], ['fifths', 5],
  ['sixth', 6], ['sixths', 6],
  ['eighth', 8], ['eighths', 8], ['eigth', 8], ['eigths', 8],
  ['tenth', 10], ['tenths', 10],
  ['twelfth', 12], ['twelfths', 12],
  ['sixteenth', 16], ['sixteenths', 16],
]);

/** Two-word denominators: "thirty-second(s)", "sixty-fourth(s)". */
export const COMPOUND_DENOMINATORS: ReadonlyMap<string, ReadonlyMap<string, number>> = new Map([
  ['thirty', new Map([['second', 32], ['seconds', 32]])],
  ['sixty', new Map([['fourth', 64], ['fourths', 64]])],
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
  ['inch', 'in'], ['inches', 'in'], ['in', 'in'], ['inchs', 'in'], ['inche', 'in'], ['ins', 'in'],
  ['mm', 'mm'], ['millimeter', 'mm'], ['millimeters', 'mm'], ['millimetre', 'mm'], ['millimetres', 'mm'],
  ['cm', 'cm'], ['centimeter', 'cm'], ['centimeters', 'cm'], ['centimetre', 'cm'], ['centimetres', 'cm'],
  ['cms', 'cm'],
]);

/**
 * After a number, "in" followed by one of these is a preposition
 * ("fold 2 in half", "4 in diameter"), not the inch unit.
 */
export const IN_PREPOSITION_NEXT: ReadonlySet<string> = new Set([
  'the', 'a', 'an', 'half', 'halves', 'thirds', 'quarters', 'each', 'every', 'this', 'that', 'these',
  'those', 'there', 'here', 'it', 'its', "it's", 'them', 'my', 'your', 'his', 'her', 'our', 'their',
  'total', 'place', 'order', 'front', 'between', 'which', 'what', 'all', 'some', 'case', 'fact',
  'mind', 'diameter', 'width', 'height', 'length', 'size', 'line', 'both', 'any', 'two', 'pieces',
]);

/**
 * Nouns that make a preceding number something other than a length:
 * times, counts of money, weights, angles.
 */
export const NON_LENGTH_NOUNS: ReadonlySet<string> = new Set([
  'minute', 'minutes', 'min', 'mins', 'second', 'seconds', 'sec', 'secs', 'hour', 'hours', 'hr', 'hrs',
  'day', 'days', 'week', 'weeks', 'month', 'months', 'year', 'years', 'time', 'times',
  'percent', 'per', 'dollar', 'dollars', 'buck', 'bucks', 'cent', 'cents', 'pound', 'pounds', 'lb', 'lbs',
  'ounce', 'ounces', 'oz', 'gram', 'grams', 'g', 'gsm', 'kg', 'degree', 'degrees', 'points', 'pt', 'pts',
  'people', 'am', 'pm', "o'clock", 'oclock', 'euros', 'euro', 'quid', 'ml', 'feet', 'foot', 'ft',
  'yard', 'yards', 'meter', 'meters', 'metre', 'metres', 'm', 'k', 'fps', 'p', 'mb', 'gb',
]);

/** Words that may follow a length as the side it measures. */
export const DIMENSION_WORDS: ReadonlySet<string> = new Set([
  'wide', 'long', 'tall', 'high', 'deep', 'square', 'thick', 'width', 'height', 'length', 'across',
]);

/** Words that begin a diameter phrase before the length ("a circle 4 in across"). */
export const CIRCLE_WORDS: ReadonlySet<string> = new Set(['circle', 'circles', 'disc', 'disk', 'discs', 'disks', 'round', 'rounds']);

/** Words allowed between "circle" and its length. */
export const CIRCLE_GAP_WORDS: ReadonlySet<string> = new Set([
  'that', 'is', "that's", "it's", 'its', 'of', 'with', 'a', 'an', 'diameter', 'measuring', 'exactly',
  'which', 'about', 'around', 'roughly', 'approximately', 'probably', 'just', 'will', 'be', 'should',
  'the',
]);

/** Words that start a score list ("score it at ..."). */
export const SCORE_WORDS: ReadonlySet<string> = new Set(['score', 'scored', 'scoring', 'scores', 'scoreline', 'scorelines']);

/** Words that may sit between items of a score list and can never start a length. */
export const SCORE_CONNECTORS: ReadonlySet<string> = new Set([
  'and', 'at', 'then', 'also', 'plus', 'again', 'it', 'score', 'scored', 'scoring', 'scores', 'line', 'lines',
  'next', 'finally', 'last', 'lastly', 'another', 'too', 'as', 'well', 'once', 'more',
]);

/** Words that sit between score items only when "at" follows ("and one at 6", "a second at 8"). */
export const SCORE_CONNECTORS_BEFORE_AT: ReadonlySet<string> = new Set(['one', 'a', 'second', 'third', 'fourth', 'another']);

/** Spoken fillers dropped before parsing; two-word ones are matched as pairs. */
export const FILLERS: ReadonlySet<string> = new Set([
  'um', 'umm', 'ummm', 'uh', 'uhh', 'uhm', 'er', 'erm', 'ah', 'ahh', 'hmm', 'hm', 'mhm', 'like',
  'basically', 'literally', 'okay', 'ok', 'alright',
]);
export const FILLER_PAIRS: readonly (readonly [string, string])[] = [
  ['you', 'know'], ['kind', 'of'], ['sort', 'of'], ['you', 'see'],
];

/** Self-corrections; they separate a withdrawn value from the one meant. */
export const CORRECTION_WORDS: ReadonlySet<string> = new Set(['sorry', 'no', 'nope', 'wait', 'oops', 'whoops', 'actually', 'correction', 'rather']);
export const CORRECTION_PAIRS: readonly (readonly [string, string])[] = [
  ['i', 'mean'], ['or', 'rather'], ['scratch', 'that'], ['make', 'that'], ['no', 'wait'], ['sorry', 'no'],
];

/**
 * Words that mark the next length approximate. Sequences are matched
 * longest first.
 */
export const APPROX_PHRASES: readonly (readonly string[])[] = [
  ['a', 'little', 'bit', 'more', 'than'],
  ['a', 'little', 'bit', 'longer', 'than'],
  ['a', 'little', 'bit', 'less', 'than'],
  ['a', 'little', 'bit', 'shorter', 'than'],
  ['a', 'little', 'bit', 'over'],
  ['a', 'little', 'bit', 'under'],
  ['a', 'little', 'more', 'than'],
  ['a', 'little', 'longer', 'than'],
  ['a', 'little', 'less', 'than'],
  ['a', 'little', 'shorter', 'than'],
  ['a', 'little', 'over'],
  ['a', 'little', 'under'],
  ['a', 'bit', 'more', 'than'],
  ['a', 'bit', 'less', 'than'],
  ['a', 'bit', 'over'],
  ['a', 'bit', 'under'],
  ['just', 'over'],
  ['just', 'under'],
  ['just', 'shy', 'of'],
  ['close', 'to'],
  ['more', 'or', 'less'],
  ['about'],
  ['around'],
  ['roughly'],
  ['approximately'],
  ['approx'],
  ['probably'],
  ['almost'],
  ['nearly'],
  ['maybe'],
  ['circa'],
  ['~'],
];

/** Words after a length that make it approximate ("4 inches or so"). */
export const APPROX_SUFFIXES: readonly (readonly string[])[] = [
  ['or', 'so'],
  ['ish'],
  ['give', 'or', 'take'],
  ['roughly'],
  ['approximately'],
  ['more', 'or', 'less'],
];
