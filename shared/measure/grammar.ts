import Fraction from 'fraction.js';
import type { Length, LengthUnit } from './length';
import type { Token } from './tokenize';
import {
  APPROX_PHRASES,
  APPROX_SUFFIXES,
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
export type MentionKind = 'size' | 'score' | 'length' | 'diameter';

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
}

/** A mention in token positions, before it is tied to text. */
export interface RawMention {
  kind: MentionKind;
  values: Length[];
  approx: boolean;
  first: number;
  end: number;
  corrected?: boolean;
}

const ONE = new Fraction(1);

const START_WORDS: ReadonlySet<string> = new Set<string>([
  ...SMALL_NUMBERS.keys(),
  ...TENS.keys(),
  ...IMPLICIT_DENOMINATORS,
  ...APPROX_PHRASES.map((p) => p[0]!),
  ...SCORE_WORDS,
  ...CIRCLE_WORDS,
  'a', 'an', 'point', 'diameter',
]);

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
    if (tk && tk.kind === 'num' && !tk.decimal && tk.value && tk.value.n > 0n && suffix && suffix.adj && suffix.kind === 'word' && ORDINAL_SUFFIXES.has(suffix.text)) {
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
      if (next && next.kind === 'frac') f = this.fraction(k, false);
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

  private approxPrefix(i: number): number {
    for (const phrase of APPROX_PHRASES) {
      let ok = true;
      for (let k = 0; k < phrase.length; k++) {
        const tk = this.t[i + k];
        if (!tk || tk.kind !== 'word' || tk.text !== phrase[k]) {
          ok = false;
          break;
        }
      }
      if (ok) return i + phrase.length;
    }
    return i;
  }

  private approxSuffix(i: number): number {
    for (const phrase of APPROX_SUFFIXES) {
      let ok = true;
      for (let k = 0; k < phrase.length; k++) {
        if (this.word(i + k) !== phrase[k]) {
          ok = false;
          break;
        }
      }
      if (ok) return i + phrase.length;
    }
    return i;
  }

  // ---------- lengths ----------

  /** A single length starting at token i, or null. */
  lengthAt(i: number, inherit?: LengthUnit): ParsedLength | null {
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
      }
      if (!a) return null;
    }
    let k = a.end;
    let value = a.value;
    let form = a.form;
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
    const strong =
      u !== null ||
      form === 'mixed' ||
      (form === 'fraction' && (a.unicode === true || (a.digits === true ? isPowerOfTwo(den) && den >= 2n && den <= 64n : den >= 8n)));
    const s = this.approxSuffix(k);
    if (s > k) {
      approx = true;
      k = s;
    }
    return {
      length: { value, unit: u?.unit ?? inherit ?? this.defaultUnit },
      explicitUnit: u !== null,
      strong,
      approx,
      first: i,
      end: k,
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
      if (tk.kind === 'stop' || tk.kind === 'num' || tk.kind === 'frac') return null;
      if (tk.kind === 'word' && tk.text === 'at') break;
      j++;
    }
    if (this.word(j) !== 'at') return null;
    const items: ParsedLength[] = [];
    let k = j + 1;
    let sawCorr = false;
    let sawConnector = true;
    for (;;) {
      const l = this.lengthAt(k);
      if (!l) break;
      // "score at 4 and 3 pieces": a count, not a score line
      const after = this.t[l.end];
      if (items.length > 0 && !l.strong && after && after.kind === 'word' && after.text.length > 3 && after.text.endsWith('s') && !after.text.endsWith('ss')) break;
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
