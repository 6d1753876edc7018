import Fraction from 'fraction.js';
import type { Length, LengthUnit } from './length';
import { phraseAt, type Token } from './tokenize';
import {
  APPROX_PHRASES,
  APPROX_SUFFIXES,
  EVERY_WORDS,
  INTERVAL_WORDS,
  RANGE_JOINS,
  RANGE_LEADS,
  RANGE_STARTS,
  START_AT_WORDS,
  TOLERANCE_HEDGES,
  CIRCLE_GAP_WORDS,
  CIRCLE_WORDS,
  COMPOUND_DENOMINATORS,
  DENOMINATORS,
  DIGIT_WORDS,
  DIMENSION_WORDS,
  IMPLICIT_DENOMINATORS,
  IN_PREPOSITION_NEXT,
  NON_LENGTH_NOUNS,
  ORDINAL_SUFFIXES,
  SCORE_CONNECTORS,
  SCORE_CONNECTORS_BEFORE_AT,
  SCORE_WORDS,
  SMALL_NUMBERS,
  TENS,
  UNIT_WORDS,
} from './words';

/** The shape a mention takes. */
export type MentionKind = 'size' | 'score' | 'length' | 'diameter' | 'range';

/** Options shared by the parser and the mention finder. */
export interface ParseOptions {
  /** Unit for a length said without one (inches unless set). */
  defaultUnit?: LengthUnit;
}

type AmountForm = 'int' | 'decimal' | 'fraction' | 'mixed';

interface Amount {
  value: Fraction;
  end: number;
  form: AmountForm;
  /** Denominator of the fraction part, when there is one. */
  den?: bigint;
  /** The fraction was written in digits ("3/8") or as a unicode character. */
  digits?: boolean;
  unicode?: boolean;
  /** "quarter", "half" with no numerator: only a length when a unit follows. */
  implicit?: boolean;
  /** "an" standing for one before a unit. */
  article?: boolean;
}

/** A length found at a token position. */
export interface ParsedLength {
  length: Length;
  explicitUnit: boolean;
  /** Counts as a length on its own (has a unit, or a fraction); a bare number needs context. */
  strong: boolean;
  approx: boolean;
  /** Index of the first token (an approximate prefix included). */
  first: number;
  /** Index after the last token. */
  end: number;
  /** The unit was joined to the number by a hyphen ("two-inch") or said in the singular before a noun: an adjective. */
  adjectival?: boolean;
}

/** A mention in token positions, before it is tied to text. */
export interface RawMention {
  kind: MentionKind;
  values: Length[];
  approx: boolean;
  first: number;
  end: number;
  corrected?: boolean;
  /** Repeated score lines: the step between them ("every quarter inch"). */
  every?: Length;
  /** How many pieces were said before the size ("three 4 by 6 mats"). */
  count?: number;
}

const ONE = new Fraction(1);
// Millimetres per unit, to order a range's ends (1 in = 25.4 mm, NIST SP 811).
const UNIT_MM: Record<LengthUnit, Fraction> = { in: new Fraction(127, 5), mm: new Fraction(1), cm: new Fraction(10) };

const byFirstWord = (phrases: readonly (readonly string[])[]) => {
  const map = new Map<string, (readonly string[])[]>();
  for (const p of phrases) {
    const list = map.get(p[0]!) ?? [];
    list.push(p);
    map.set(p[0]!, list);
  }
  return map;
};
// Phrases come longest first, so the first match is the longest.
const PREFIX_HEDGES = byFirstWord(APPROX_PHRASES);
const SUFFIX_HEDGES = byFirstWord(APPROX_SUFFIXES);

/** Words that only glue hedges to the number ("I'd say it's about 4", "roughly, maybe 5"). */
const HEDGE_GLUE: ReadonlySet<string> = new Set(["it's", 'it', 'is', "that's", 'be', "it'll", 'its']);

/** Unit words that stand for one of themselves before "and a fraction" ("inch and a half"). */
const BARE_UNITS: ReadonlySet<string> = new Set(['inch', 'centimeter', 'centimetre', 'millimeter', 'millimetre']);
const SINGULAR_UNITS: ReadonlySet<string> = new Set(['inch', 'centimeter', 'centimetre', 'millimeter', 'millimetre', 'cm', 'mm', 'in']);

const START_WORDS: ReadonlySet<string> = new Set<string>([
  ...SMALL_NUMBERS.keys(),
  ...TENS.keys(),
  ...IMPLICIT_DENOMINATORS,
  ...PREFIX_HEDGES.keys(),
  ...SCORE_WORDS,
  ...CIRCLE_WORDS,
  ...RANGE_LEADS,
  ...RANGE_STARTS,
  ...BARE_UNITS,
  'a',
  'an',
  'point',
  'diameter',
]);

/** A word that names counted things ("strips", "mats", "pieces"): a plural that is not a unit. */
export function isCountNoun(w: string | undefined): boolean {
  return (
    w !== undefined &&
    w.length > 3 &&
    w.endsWith('s') &&
    !w.endsWith('ss') &&
    !UNIT_WORDS.has(w) &&
    !DIMENSION_WORDS.has(w) &&
    !NON_LENGTH_NOUNS.has(w) &&
    !INTERVAL_WORDS.has(w) &&
    !SCORE_CONNECTORS.has(w) &&
    !DENOMINATORS.has(w) &&
    w !== 'thereabouts' &&
    w !== 'tops' &&
    w !== 'always' &&
    w !== 'is' &&
    w !== 'was' &&
    w !== 'this'
  );
}

function isPowerOfTwo(d: bigint): boolean {
  return d > 0n && (d & (d - 1n)) === 0n;
}

/**
 * The length grammar over cleaned tokens. Every method looks ahead from a
 * token index and never backtracks more than a few tokens, so a transcript
 * is read in one linear pass.
 */
export class Grammar {
  private readonly t: readonly Token[];
  private readonly defaultUnit: LengthUnit;

  constructor(tokens: readonly Token[], opts: ParseOptions = {}) {
    this.t = tokens;
    this.defaultUnit = opts.defaultUnit ?? 'in';
  }

  get length(): number {
    return this.t.length;
  }

  private word(i: number): string | undefined {
    const tk = this.t[i];
    return tk !== undefined && tk.kind === 'word' ? tk.text : undefined;
  }

  /** Whether a mention could begin at token i (cheap pre-check). */
  canStart(i: number): boolean {
    const tk = this.t[i]!;
    if (tk.kind === 'num' || tk.kind === 'frac') return true;
    return tk.kind === 'word' && START_WORDS.has(tk.text);
  }

  // ---------- numbers ----------

  /** A whole number in digits or words (to 999). */
  private cardinal(i: number): { value: bigint; end: number } | null {
    const tk = this.t[i];
    if (!tk) return null;
    if (tk.kind === 'num') {
      if (tk.decimal || tk.value === null || tk.value.d !== 1n) return null;
      return { value: tk.value.n, end: i + 1 };
    }
    const below = this.below100(i);
    if (!below) return null;
    let value = BigInt(below.value);
    let end = below.end;
    if (this.word(end) === 'hundred' && value >= 1n && value <= 9n) {
      value *= 100n;
      end++;
      let k = end;
      if (this.word(k) === 'and') k++;
      const rest = this.below100(k);
      // "one hundred and twenty" but not "one hundred and a half"; nor "... and three sixteenths"
      if (rest && !this.denominator(rest.end) && (k === end || this.word(rest.end) !== 'and')) {
        value += BigInt(rest.value);
        end = rest.end;
      }
    }
    return { value, end };
  }

  private below100(i: number): { value: number; end: number } | null {
    const w = this.word(i);
    if (w === undefined) return null;
    const small = SMALL_NUMBERS.get(w);
    if (small !== undefined) return { value: small, end: i + 1 };
    const tens = TENS.get(w);
    if (tens === undefined) return null;
    const unit = SMALL_NUMBERS.get(this.word(i + 1) ?? '');
    if (unit !== undefined && unit >= 1 && unit <= 9) return { value: tens + unit, end: i + 2 };
    return { value: tens, end: i + 1 };
  }

  /** A whole number or a decimal ("1.75", "one point five"). */
  private number(i: number): Amount | null {
    const tk = this.t[i];
    if (!tk) return null;
    if (tk.kind === 'num' && tk.decimal && tk.value) return { value: tk.value, end: i + 1, form: 'decimal' };
    const c = this.cardinal(i);
    const p = c ? c.end : i;
    if (this.word(p) === 'point' && (c === null || this.t[i]!.kind === 'word')) {
      let digits = '';
      let k = p + 1;
      for (;;) {
        const w = this.word(k);
        const dw = w !== undefined ? DIGIT_WORDS.get(w) : undefined;
        if (dw !== undefined) {
          digits += String(dw);
          k++;
          continue;
        }
        const nt = this.t[k];
        if (nt && nt.kind === 'num' && !nt.decimal && digits === '') {
          digits = nt.text;
          k++;
        }
        break;
      }
      if (digits !== '') {
        const scale = 10n ** BigInt(digits.length);
        const whole = c ? c.value : 0n;
        return { value: new Fraction(whole * scale + BigInt(digits), scale), end: k, form: 'decimal' };
      }
    }
    if (c) return { value: new Fraction(c.value), end: c.end, form: 'int' };
    return null;
  }

  /** A denominator in words or digits-with-ordinal ("sixteenths", "thirty-seconds", "16ths"). */
  private denominator(i: number): { den: bigint; end: number } | null {
    const w = this.word(i);
    if (w !== undefined) {
      const d = DENOMINATORS.get(w);
      if (d !== undefined) return { den: BigInt(d), end: i + 1 };
      const comp = COMPOUND_DENOMINATORS.get(w);
      const second = this.word(i + 1);
      if (comp && second !== undefined && comp.has(second)) return { den: BigInt(comp.get(second)!), end: i + 2 };
      return null;
    }
    const tk = this.t[i];
    const suffix = this.t[i + 1];
    if (
      tk &&
      tk.kind === 'num' &&
      !tk.decimal &&
      tk.value &&
      tk.value.n > 0n &&
      suffix &&
      suffix.adj &&
      suffix.kind === 'word' &&
      ORDINAL_SUFFIXES.has(suffix.text)
    ) {
      return { den: tk.value.n, end: i + 2 };
    }
    return null;
  }

  /** A fraction: "9/16", "⅝", "nine sixteenths", "a quarter"; with allowImplicit also a bare "quarter". */
  private fraction(i: number, allowImplicit: boolean): Amount | null {
    const tk = this.t[i];
    if (!tk) return null;
    if (tk.kind === 'frac' && tk.value) {
      return { value: tk.value, end: i + 1, form: 'fraction', den: tk.value.d, digits: true, unicode: tk.unicode };
    }
    let num: bigint | null = null;
    let j = i;
    const w = this.word(i);
    if (w === 'a' || w === 'an') {
      num = 1n;
      j = i + 1;
    } else {
      const c = this.cardinal(i);
      if (c) {
        num = c.value;
        j = c.end;
      }
    }
    if (num !== null) {
      const d = this.denominator(j);
      if (d) return { value: new Fraction(num, d.den), end: d.end, form: 'fraction', den: d.den };
    }
    if (allowImplicit && w !== undefined && IMPLICIT_DENOMINATORS.has(w)) {
      const d = BigInt(DENOMINATORS.get(w)!);
      return { value: new Fraction(1n, d), end: i + 1, form: 'fraction', den: d, implicit: true };
    }
    return null;
  }

  /** An amount: a mixed number, a fraction, or a plain number. */
  private amount(i: number): Amount | null {
    const whole = this.number(i);
    if (whole && whole.form === 'int') {
      const k = whole.end;
      let f: Amount | null = null;
      const next = this.t[k];
      // "twelve 1/2 inch dots": a number in words before a written fraction is a count, not a mixed number
      if (next && next.kind === 'frac') f = this.t[i]!.kind === 'word' && !next.unicode ? null : this.fraction(k, false);
      else if (this.word(k) === 'and') f = this.fraction(k + 1, false);
      else if (next && next.kind === 'word' && next.text !== 'a' && next.text !== 'an') f = this.fraction(k, false);
      if (f && f.value.compare(ONE) < 0 && f.value.n > 0n) {
        return { value: whole.value.add(f.value), end: f.end, form: 'mixed', den: f.den, digits: f.digits, unicode: f.unicode };
      }
    }
    const frac = this.fraction(i, true);
    if (frac) return frac;
    return whole;
  }

  // ---------- units ----------

  private unit(i: number): { unit: LengthUnit; end: number } | null {
    const tk = this.t[i];
    if (!tk) return null;
    if (tk.kind === 'inch') return { unit: 'in', end: i + 1 };
    if (tk.kind !== 'word') return null;
    const u = UNIT_WORDS.get(tk.text);
    if (u === undefined) return null;
    let end = i + 1;
    if (tk.text === 'in') {
      const next = this.t[i + 1];
      if (next && next.kind === 'word' && IN_PREPOSITION_NEXT.has(next.text)) return null;
    }
    const after = this.t[end];
    // abbreviation point: "in.", "mm."
    if ((tk.text === 'in' || tk.text === 'mm' || tk.text === 'cm') && after && after.kind === 'stop' && after.adj && after.text === '.') {
      end++;
    }
    return { unit: u, end };
  }

  /** After the hedges before a length ("about", "a tad over", "I'd say it's roughly"), or i when there are none. */
  private approxPrefix(i: number): number {
    let j = i;
    let hedged = false;
    for (let guard = 0; guard < 6; guard++) {
      const len = phraseAt(this.t, j, PREFIX_HEDGES);
      if (len > 0) {
        hedged = true;
        j += len;
        // "approx.", "ca.": the abbreviation point
        const dot = this.t[j];
        if (dot && dot.kind === 'stop' && dot.text === '.' && dot.adj) j++;
        if (this.t[j]?.kind === 'comma') j++;
        continue;
      }
      const w = this.word(j);
      if (hedged && w !== undefined && HEDGE_GLUE.has(w)) {
        j++;
        continue;
      }
      break;
    }
    return hedged ? j : i;
  }

  /** After the hedges that follow a length ("or so", "-ish", "give or take an eighth"), or i when there are none. */
  private approxSuffix(i: number): number {
    let k = i;
    if (this.t[k]?.kind === 'comma' && phraseAt(this.t, k + 1, SUFFIX_HEDGES) > 0) k++;
    const len = phraseAt(this.t, k, SUFFIX_HEDGES);
    if (len === 0) return i;
    const phrase = this.t
      .slice(k, k + len)
      .map((t) => t.text)
      .join(' ');
    let end = k + len;
    if (TOLERANCE_HEDGES.has(phrase)) {
      // "plus or minus a sixteenth": the tolerance belongs to the hedge
      const tol = this.lengthAt(end, undefined, true);
      if (tol) end = tol.end;
      return end;
    }
    // "4 inches, probably 5": a hedge that starts the next length is not this one's
    const next = this.t[end];
    if (next && (next.kind === 'num' || next.kind === 'frac' || (next.kind === 'word' && (SMALL_NUMBERS.has(next.text) || TENS.has(next.text))))) return i;
    return end;
  }

  // ---------- lengths ----------

  /** A single length starting at token i, or null. */
  lengthAt(i: number, inherit?: LengthUnit, noSuffix = false): ParsedLength | null {
    if (i >= this.t.length) return null;
    const j = this.approxPrefix(i);
    let approx = j > i;
    let a = this.amount(j);
    let u: { unit: LengthUnit; end: number } | null = null;
    if (!a) {
      const w = this.word(j);
      if (w === 'a' || w === 'an') {
        u = this.unit(j + 1);
        if (u && this.word(j + 1) !== 'in') a = { value: ONE, end: j + 1, form: 'int', article: true };
        else u = null;
      } else if (w !== undefined && BARE_UNITS.has(w) && this.word(j + 1) === 'and') {
        // "inch and five eighths", "mark it inch and an eighth": one unit and a fraction
        const f = this.fraction(j + 2, false);
        u = this.unit(j);
        if (u && f && f.value.compare(ONE) < 0 && f.value.n > 0n) {
          const unitWord = w;
          const value = ONE.add(f.value);
          const s = noSuffix ? f.end : this.approxSuffix(f.end);
          return {
            length: { value, unit: u.unit },
            explicitUnit: true,
            strong: true,
            approx: approx || s > f.end,
            first: i,
            end: s,
            adjectival: unitWord === 'inch' && isCountNoun(this.word(s)),
          };
        }
        u = null;
      }
      if (!a) return null;
    }
    let k = a.end;
    let value = a.value;
    let form = a.form;
    // "six-ish inches", "4ish cm"
    if (this.word(k) === 'ish') {
      approx = true;
      k++;
    }
    if (!u) {
      if (a.implicit) {
        // "quarter inch", "half an inch", "half of an inch"
        let m = k;
        if (this.word(m) === 'of') m++;
        if (this.word(m) === 'a' || this.word(m) === 'an') m++;
        u = this.unit(m);
        if (!u) return null;
      } else {
        u = this.unit(k);
        // "a sixteenth of an inch", "a half an inch"
        if (!u && form === 'fraction') {
          let m = k;
          if (this.word(m) === 'of') m++;
          if (this.word(m) === 'a' || this.word(m) === 'an') m++;
          if (m > k) u = this.unit(m);
        }
      }
    }
    if (u) {
      k = u.end;
      // "an inch and a quarter", "two inches and three eighths"
      if (form === 'int' && this.word(k) === 'and') {
        const f = this.fraction(k + 1, false);
        if (f && f.value.compare(ONE) < 0 && f.value.n > 0n) {
          value = value.add(f.value);
          form = 'mixed';
          a = { ...a, den: f.den, digits: f.digits, unicode: f.unicode };
          k = f.end;
        }
      }
    } else {
      const next = this.t[k];
      if (next) {
        if (next.kind === 'feet' || next.kind === 'pct' || next.kind === 'time' || next.kind === 'money') return null;
        if (next.kind === 'word' && NON_LENGTH_NOUNS.has(next.text)) return null;
        // "three quarters of the way", "a sixteenth of a second"
        if (form === 'fraction' && next.kind === 'word' && next.text === 'of') return null;
      }
    }
    const den = a.den ?? 1n;
    // "cut it seven-ish", "make it about six.": a hedged bare number that ends the phrase is a length
    const after = this.t[k];
    const hedgedAlone =
      approx &&
      (after === undefined ||
        after.kind === 'comma' ||
        after.kind === 'stop' ||
        after.kind === 'corr' ||
        (after.kind === 'word' && (DIMENSION_WORDS.has(after.text) || after.text === 'off' || this.approxSuffix(k) > k)));
    const strong =
      hedgedAlone ||
      u !== null ||
      form === 'mixed' ||
      (form === 'fraction' && (a.unicode === true || (a.digits === true ? isPowerOfTwo(den) && den >= 2n && den <= 64n : den >= 8n)));
    // a unit joined by a hyphen ("two-inch strips") or singular before a plural noun ("2 inch strips") is an adjective
    const unitTok = u ? this.t[u.end - 1] : undefined;
    const adjectival =
      u !== null &&
      unitTok !== undefined &&
      (unitTok.hyph === true || (unitTok.kind === 'word' && SINGULAR_UNITS.has(unitTok.text) && isCountNoun(this.word(k))));
    if (!noSuffix) {
      const s = this.approxSuffix(k);
      if (s > k) {
        approx = true;
        k = s;
      }
    }
    return {
      length: { value, unit: u?.unit ?? inherit ?? this.defaultUnit },
      explicitUnit: u !== null,
      strong,
      approx,
      first: i,
      end: k,
      adjectival,
    };
  }

  private isBy(i: number): boolean {
    const tk = this.t[i];
    if (!tk) return false;
    if (tk.kind === 'x') return true;
    return tk.kind === 'word' && (tk.text === 'by' || tk.text === 'x');
  }

  private dimensionEnd(i: number): number {
    const w = this.word(i);
    return w !== undefined && DIMENSION_WORDS.has(w) && w !== 'across' ? i + 1 : i;
  }

  /** A repeat of the same value ("four and a half four and a half inches") or a bare number restarted as a length. */
  private absorbRepeats(l: ParsedLength, inherit?: LengthUnit): ParsedLength {
    let cur = l;
    // bounded, so a long run of repeats cannot make the scan quadratic
    for (let k = 0; k < 8; k++) {
      const next = this.lengthAt(cur.end, inherit);
      if (!next) return cur;
      const same = next.length.value.equals(cur.length.value) && (next.length.unit === cur.length.unit || !cur.explicitUnit || !next.explicitUnit);
      // "two two-inch strips": a count before an adjective, not a stutter
      if (same && !cur.explicitUnit && next.adjectival) return cur;
      if (!(same || (!cur.strong && next.strong))) return cur;
      const keep = next.explicitUnit || !cur.explicitUnit ? next : cur;
      cur = {
        length: keep.length,
        explicitUnit: keep.explicitUnit,
        strong: cur.strong || next.strong,
        approx: cur.approx || next.approx,
        // a stutter quotes both; a bare count before a real length ("2 4 inch squares") is left out
        first: same ? cur.first : next.first,
        end: next.end,
      };
    }
    return cur;
  }

  /** After a value in a size: a self-correction that replaces it ("5 sorry 6"), unless it starts a new size. */
  private correctedValue(l: ParsedLength, inherit?: LengthUnit): ParsedLength {
    const corr = this.t[l.end];
    if (!corr || corr.kind !== 'corr') return l;
    const next = this.lengthAt(l.end + 1, inherit);
    if (!next || this.isBy(this.dimensionEnd(next.end))) return l;
    return { ...next, first: l.first, approx: next.approx };
  }

  /** Gives each unitless value the unit said next to it (the nearest following, else preceding). */
  private shareUnits(items: ParsedLength[]): Length[] {
    return items.map((it, idx) => {
      if (it.explicitUnit) return it.length;
      let unit: LengthUnit | undefined;
      for (let k = idx + 1; k < items.length && !unit; k++) if (items[k]!.explicitUnit) unit = items[k]!.length.unit;
      for (let k = idx - 1; k >= 0 && !unit; k--) if (items[k]!.explicitUnit) unit = items[k]!.length.unit;
      return unit ? { value: it.length.value, unit } : it.length;
    });
  }

  /** "4 by 6", "4 1/4 in wide by 5 1/2 long", a bare length, or a length followed by "circle"/"diameter". */
  fromLength(i: number, weakOk: boolean, inherit?: LengthUnit): RawMention | null {
    const parsed = this.lengthAt(i, inherit);
    if (!parsed) return null;
    const l1 = this.absorbRepeats(parsed, inherit);
    let j = l1.end;
    const dim1 = this.dimensionEnd(j);
    const hasDim1 = dim1 > j;
    j = dim1;
    if (this.isBy(j) || (hasDim1 && this.word(j) === 'and')) {
      const viaAnd = !this.isBy(j);
      let l2 = this.lengthAt(j + 1, l1.explicitUnit ? undefined : inherit);
      if (l2) {
        l2 = this.correctedValue(this.absorbRepeats(l2), undefined);
        const d2 = this.dimensionEnd(l2.end);
        if (!viaAnd || d2 > l2.end) {
          const items = [l1, l2];
          let end = d2;
          if (this.isBy(end)) {
            const l3raw = this.lengthAt(end + 1);
            if (l3raw) {
              const l3 = this.correctedValue(this.absorbRepeats(l3raw));
              items.push(l3);
              end = this.dimensionEnd(l3.end);
            }
          }
          return { kind: 'size', values: this.shareUnits(items), approx: items.some((x) => x.approx), first: l1.first, end };
        }
      }
    }
    const w = this.word(j);
    if (w === 'diameter') return { kind: 'diameter', values: [l1.length], approx: l1.approx, first: l1.first, end: j + 1 };
    if (w === 'in' && this.word(j + 1) === 'diameter') return { kind: 'diameter', values: [l1.length], approx: l1.approx, first: l1.first, end: j + 2 };
    if (w !== undefined && l1.strong && (CIRCLE_WORDS.has(w) || w === 'across')) {
      return { kind: 'diameter', values: [l1.length], approx: l1.approx, first: l1.first, end: j + 1 };
    }
    if (!l1.strong && !weakOk) return null;
    return { kind: 'length', values: [l1.length], approx: l1.approx, first: l1.first, end: j };
  }

  /** "score at X", "score it at X and at Y", "score at X, at Y and at Z". */
  score(i: number): RawMention | null {
    const w = this.word(i);
    if (w === undefined || !SCORE_WORDS.has(w)) return null;
    let j = i + 1;
    const limit = Math.min(this.t.length, i + 10);
    while (j < limit) {
      const tk = this.t[j]!;
      if (tk.kind === 'stop') return null;
      if (tk.kind === 'word' && (tk.text === 'at' || EVERY_WORDS.has(tk.text))) break;
      // "score lines a quarter inch apart"
      const step = this.canStart(j) ? this.stepAt(j) : null;
      if (step) return this.repeat(i, step);
      if (tk.kind === 'num' || tk.kind === 'frac') return null;
      j++;
    }
    const atWord = this.word(j);
    if (atWord !== undefined && EVERY_WORDS.has(atWord)) {
      const step = this.everyAt(j);
      return step ? this.repeat(i, step) : null;
    }
    if (atWord !== 'at') return null;
    // "score at one inch intervals", "score at every half inch"
    const step = this.stepAt(j + 1) ?? (EVERY_WORDS.has(this.word(j + 1) ?? '') ? this.everyAt(j + 1) : null);
    if (step) return this.repeat(i, step);
    const items: ParsedLength[] = [];
    let k = j + 1;
    let sawCorr = false;
    let sawConnector = true;
    for (;;) {
      const l = this.lengthAt(k);
      if (!l) break;
      // "score at 4 and 3 pieces": a count, not a score line
      const after = this.t[l.end];
      if (items.length > 0 && !l.strong && after && after.kind === 'word' && after.text.length > 3 && after.text.endsWith('s') && !after.text.endsWith('ss'))
        break;
      const last = items[items.length - 1];
      if (last && sawCorr) items[items.length - 1] = { ...l, first: last.first };
      else if (last && !sawConnector && l.length.value.equals(last.length.value)) items[items.length - 1] = { ...l, first: last.first };
      else items.push(l);
      k = l.end;
      sawCorr = false;
      sawConnector = false;
      for (;;) {
        const tk = this.t[k];
        if (!tk) break;
        if (tk.kind === 'comma' || (tk.kind === 'word' && SCORE_CONNECTORS.has(tk.text))) {
          sawConnector = true;
          k++;
        } else if (tk.kind === 'corr') {
          sawCorr = true;
          k++;
        } else if (tk.kind === 'word' && SCORE_CONNECTORS_BEFORE_AT.has(tk.text) && this.word(k + 1) === 'at') {
          sawConnector = true;
          k++;
        } else break;
      }
      // "score at 4 1/4 on the long side and at 8 1/2": skip a short aside that ends in "and at"
      if (!this.lengthAt(k)) {
        const jump = this.asideToAt(k);
        if (jump < 0) break;
        k = jump;
        sawConnector = true;
      }
    }
    if (items.length === 0) return null;
    const lastItem = items[items.length - 1]!;
    return { kind: 'score', values: this.shareUnits(items), approx: items.some((x) => x.approx), first: i, end: lastItem.end };
  }

  /** "one inch intervals", "a quarter inch apart", "1/4 in increments": a length said as a step. */
  private stepAt(k: number): ParsedLength | null {
    const l = this.lengthAt(k);
    if (!l) return null;
    const w = this.word(l.end);
    if (w !== undefined && INTERVAL_WORDS.has(w)) return { ...l, end: l.end + 1 };
    // "at intervals of half an inch"
    return null;
  }

  /** "every quarter inch", "every other inch", "each 1/2 in", "every inch": the step after "every". */
  private everyAt(k: number): ParsedLength | null {
    let j = k + 1;
    let times = 1;
    if (this.word(j) === 'other') {
      times = 2;
      j++;
    }
    let l = this.lengthAt(j);
    if (!l) {
      // "every inch", "every centimetre": one unit
      const u = this.unit(j);
      if (!u || this.word(j) === 'in') return null;
      l = { length: { value: ONE, unit: u.unit }, explicitUnit: true, strong: true, approx: false, first: j, end: u.end };
    }
    if (l.length.value.n === 0n) return null;
    return times === 1 ? l : { ...l, length: { value: l.length.value.mul(times), unit: l.length.unit } };
  }

  /** Repeated score lines from a step, with where they start when said ("starting at 1 inch"). */
  private repeat(i: number, step: ParsedLength): RawMention {
    let end = step.end;
    let first = step.length;
    // "down the flap", "along the long side": a few words before "starting at"
    for (let k = end; k < Math.min(this.t.length, end + 6); k++) {
      const w = this.word(k);
      if (w === undefined) break;
      if (START_AT_WORDS.has(w)) {
        let m = k + 1;
        if (this.word(m) === 'at' || this.word(m) === 'from') m++;
        const start = this.lengthAt(m, step.explicitUnit ? step.length.unit : undefined);
        if (start) {
          first = start.length;
          end = start.end;
        }
        break;
      }
    }
    return { kind: 'score', values: [first], every: step.length, approx: step.approx, first: i, end };
  }

  /**
   * A range: "somewhere from a quarter to three eighths", "between two and two and a half",
   * "5 to 6 mm", "4-5 inches", "three or four inches". Always approximate: the speaker did not
   * settle on one length.
   */
  range(i: number): RawMention | null {
    let j = i;
    const w0 = this.word(j);
    if (w0 !== undefined && RANGE_LEADS.has(w0) && RANGE_STARTS.has(this.word(j + 1) ?? '')) j++;
    const lead = this.word(j);
    const between = lead === 'between';
    const prefixed = lead !== undefined && RANGE_STARTS.has(lead);
    if (prefixed) j++;
    else if (j !== i) return null;
    const l1 = this.lengthAt(j);
    if (!l1) return null;
    const k = this.dimensionEnd(l1.end);
    const join = this.word(k);
    if (join === undefined) return null;
    if (between ? join !== 'and' : !RANGE_JOINS.has(join) && !(prefixed && join === 'and')) return null;
    const l2 = this.lengthAt(k + 1, l1.explicitUnit ? l1.length.unit : undefined);
    if (!l2) return null;
    // "between 2 and 3 pieces", "cut 2 or 3 strips": counts, not lengths
    if (!l2.explicitUnit && isCountNoun(this.word(l2.end))) return null;
    if (!prefixed && !l1.strong && !l2.strong) return null;
    if (join === 'or' && !l2.strong) return null;
    const [a, b] = this.shareUnits([l1, l2]) as [Length, Length];
    const cmp = a.value.mul(UNIT_MM[a.unit]).compare(b.value.mul(UNIT_MM[b.unit]));
    // "trim it from 12 to 11 inches" is a change, not a range; "between" may name the ends either way
    if (cmp === 0 || (cmp > 0 && !between)) return null;
    const values = cmp > 0 ? [b, a] : [a, b];
    return { kind: 'range', values, approx: true, first: i, end: this.dimensionEnd(l2.end) };
  }

  private asideToAt(k: number): number {
    const limit = Math.min(this.t.length, k + 7);
    for (let m = k; m < limit; m++) {
      const tk = this.t[m]!;
      if (tk.kind !== 'word' && tk.kind !== 'comma') return -1;
      if (tk.kind === 'word' && tk.text === 'at' && m > k) {
        const before = this.t[m - 1]!;
        if (before.kind === 'comma' || (before.kind === 'word' && (before.text === 'and' || before.text === 'then'))) return m + 1;
        return -1;
      }
    }
    return -1;
  }

  /** "a circle 4 in across", "circle of 3 1/2", "diameter of 6". */
  circle(i: number): RawMention | null {
    const w = this.word(i);
    if (w === undefined) return null;
    if ((CIRCLE_WORDS.has(w) && w !== 'round' && w !== 'rounds') || w === 'diameter') {
      const limit = Math.min(this.t.length, i + 6);
      for (let k = i + 1; k < limit; k++) {
        const l = this.lengthAt(k);
        if (l) {
          let end = l.end;
          const after = this.word(end);
          if (after === 'across' || after === 'wide' || after === 'diameter') end++;
          else if (after === 'in' && this.word(end + 1) === 'diameter') end += 2;
          else if (!l.strong && w !== 'diameter') return null;
          return { kind: 'diameter', values: [l.length], approx: l.approx, first: i, end };
        }
        const gw = this.word(k);
        if (gw === undefined || !CIRCLE_GAP_WORDS.has(gw)) return null;
      }
    }
    return null;
  }

  /** The explicit unit of the last value of a mention, to carry over a self-correction ("4 inches, no, 5"). */
  lastExplicitUnit(m: RawMention, from: number): LengthUnit | undefined {
    for (let k = m.end - 1; k >= from; k--) {
      const u = this.unit(k);
      if (u) return u.unit;
    }
    return undefined;
  }

  isCorrection(i: number): boolean {
    return this.t[i]?.kind === 'corr';
  }
}
