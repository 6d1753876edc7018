/**
 * The measurement engine from the command line. Prints JSON on stdout. A mention has `kind`
 * (size, score, length, diameter or range), `inches`, `approx`, `text`, `display`, and when they
 * apply `mm`, `corrected`, `every` (the step of repeated score lines, as {inches, display, mm};
 * `inches` then holds the first line) and `count` (how many were said before it).
 * Exit 0 on success; exit 2 with {"error": "..."} for bad arguments or an unreadable file.
 *
 *   measure "<text>" [--unit in|mm|cm]
 *   measure --file <transcript.vtt|.srt|.txt> [--unit in|mm|cm]
 *   measure wrap --diameter "6 3/8" [--pieces 2] [--overlap "1/2"] [--caliper 0.012] [--precision 16]
 *   measure lid --diameter 4 [--wall 0.012] [--clearance "1/32"] [--precision 16]
 *   measure card (--size "4 1/4 x 5 1/2" | --width "4 1/4" --height "5 1/2") --fold side|top|gatefold|z-fold|tri-fold|shutter|easel
 *                [--relief "1/16"] [--caliper "0.3 mm"] [--outer-flap "1 1/2"] [--stopper 1] [--precision 16]
 *   measure plan --file <pieces.json>
 */
import { readFileSync } from 'node:fs';
import { z } from 'zod';
import {
  extractMentions,
  extractMentionsFromCues,
  formatLength,
  inchesNumber,
  isRulerPrecision,
  mmNumber,
  readLength,
  type Length,
  type LengthUnit,
  type Mention,
  type RulerPrecision,
} from '@shared/measure';
import { cardBase, FOLD_STYLES, lidCircle, placementsOf, planSheets, sheetSize, wrapStrip, type FoldStyle } from '@shared/geometry';
import { sheetPlanTooLarge } from '@shared/schemas/sheet-plan';
import { parseUsableTranscript, TranscriptParseError } from '@shared/transcript/parse';

class UsageError extends Error {}

const USAGE = [
  'measure "<text>" [--unit in|mm|cm]',
  'measure --file <transcript> [--unit in|mm|cm]',
  'measure wrap --diameter <length> [--pieces N] [--overlap <length>] [--caliper <length>] [--precision 8|16|32]',
  'measure lid --diameter <length> [--wall <length>] [--clearance <length>] [--precision 8|16|32]',
  `measure card (--size "<w> x <h>" | --width <length> --height <length>) --fold ${FOLD_STYLES.join('|')} [--relief <length>] [--caliper <length>] [--outer-flap <length>] [--stopper <length>] [--precision 8|16|32]`,
  'measure plan --file <pieces.json>',
];

type Flags = { positional: string[]; flags: Map<string, string> };

function parseArgs(args: readonly string[], allowed: readonly string[]): Flags {
  const positional: string[] = [];
  const flags = new Map<string, string>();
  for (let i = 0; i < args.length; i++) {
    const a = args[i]!;
    if (a.startsWith('--') && a.length > 2) {
      const eq = a.indexOf('=');
      const name = eq > 0 ? a.slice(2, eq) : a.slice(2);
      if (!allowed.includes(name)) throw new UsageError(`unknown option --${name}`);
      let value: string | undefined;
      if (eq > 0) value = a.slice(eq + 1);
      else {
        value = args[i + 1];
        if (value === undefined) throw new UsageError(`--${name} needs a value`);
        i++;
      }
      flags.set(name, value);
    } else positional.push(a);
  }
  return { positional, flags };
}

function readLengthArg(name: string, text: string, unit: LengthUnit = 'in'): Length {
  const r = readLength(text, { defaultUnit: unit });
  if (!r) throw new UsageError(`--${name}: cannot read ${JSON.stringify(text)} as a length`);
  return r.length;
}

function optionalLength(f: Flags, name: string): Length | undefined {
  const v = f.flags.get(name);
  return v === undefined ? undefined : readLengthArg(name, v);
}

function requiredLength(f: Flags, name: string): Length {
  const v = f.flags.get(name);
  if (v === undefined) throw new UsageError(`--${name} is required`);
  return readLengthArg(name, v);
}

function precisionArg(f: Flags): RulerPrecision | undefined {
  const v = f.flags.get('precision');
  if (v === undefined) return undefined;
  const n = Number(v);
  if (!isRulerPrecision(n)) throw new UsageError(`--precision must be 8, 16 or 32 (got ${JSON.stringify(v)})`);
  return n;
}

function unitArg(f: Flags): LengthUnit {
  const v = f.flags.get('unit') ?? 'in';
  if (v !== 'in' && v !== 'mm' && v !== 'cm') throw new UsageError(`--unit must be in, mm or cm (got ${JSON.stringify(v)})`);
  return v;
}

function noPositional(f: Flags): void {
  if (f.positional.length > 0) throw new UsageError(`unexpected argument ${JSON.stringify(f.positional[0])}`);
}

function lengthJson(l: Length) {
  return { inches: inchesNumber(l), display: formatLength(l), mm: mmNumber(l) };
}

function mentionJson(m: Mention, timing?: { startMs: number; endMs: number }) {
  const out: Record<string, unknown> = {
    kind: m.kind,
    inches: m.values.map(inchesNumber),
    approx: m.approx,
    text: m.text,
    display: m.values.map(formatLength),
  };
  if (m.values.some((v) => v.unit !== 'in')) out.mm = m.values.map(mmNumber);
  if (m.corrected) out.corrected = true;
  // repeated score lines: the step; `inches` holds the first line
  if (m.every) out.every = lengthJson(m.every);
  if (m.count !== undefined) out.count = m.count;
  if (timing) {
    out.startMs = timing.startMs;
    out.endMs = timing.endMs;
  }
  return out;
}

function readText(path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (e) {
    throw new UsageError(`cannot read ${path}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`);
  }
}

function mentionsCommand(args: readonly string[]): unknown {
  const f = parseArgs(args, ['file', 'unit']);
  const unit = unitArg(f);
  const file = f.flags.get('file');
  if (file !== undefined) {
    noPositional(f);
    let parsed;
    try {
      parsed = parseUsableTranscript(readText(file));
    } catch (e) {
      if (e instanceof TranscriptParseError) throw new UsageError(e.message);
      throw e;
    }
    const mentions = extractMentionsFromCues(parsed.cues, { defaultUnit: unit }).map((m) => mentionJson(m, m));
    // what the reader skipped or kept with a note ("line 3: skipped a title ..."), only when there is any
    return parsed.notices ? { mentions, notices: parsed.notices.map((n) => n.message) } : { mentions };
  }
  if (f.positional.length === 0) throw new UsageError('give a text to read, or --file <transcript>');
  return { mentions: extractMentions(f.positional.join(' '), { defaultUnit: unit }).map((m) => mentionJson(m)) };
}

function wrapCommand(args: readonly string[]): unknown {
  const f = parseArgs(args, ['diameter', 'pieces', 'overlap', 'caliper', 'precision']);
  noPositional(f);
  const piecesText = f.flags.get('pieces') ?? '1';
  const pieces = Number(piecesText);
  if (!/^\d+$/.test(piecesText) || pieces < 1) throw new UsageError(`--pieces must be a whole number of at least 1 (got ${JSON.stringify(piecesText)})`);
  const r = wrapStrip({
    diameter: requiredLength(f, 'diameter'),
    pieces,
    overlap: optionalLength(f, 'overlap'),
    thickness: optionalLength(f, 'caliper'),
    precision: precisionArg(f),
  });
  return { stripLength: lengthJson(r.stripLength), unroundedInches: r.unroundedInches, working: r.working };
}

function lidCommand(args: readonly string[]): unknown {
  const f = parseArgs(args, ['diameter', 'wall', 'clearance', 'precision']);
  noPositional(f);
  const r = lidCircle({
    diameter: requiredLength(f, 'diameter'),
    wall: optionalLength(f, 'wall'),
    clearance: optionalLength(f, 'clearance'),
    precision: precisionArg(f),
  });
  return { lidDiameter: lengthJson(r.lidDiameter), working: r.working };
}

function cardCommand(args: readonly string[]): unknown {
  const f = parseArgs(args, ['size', 'width', 'height', 'fold', 'relief', 'caliper', 'outer-flap', 'stopper', 'precision']);
  noPositional(f);
  const fold = f.flags.get('fold') ?? 'side';
  if (!(FOLD_STYLES as readonly string[]).includes(fold)) throw new UsageError(`--fold must be one of ${FOLD_STYLES.join(', ')} (got ${JSON.stringify(fold)})`);
  let width: Length;
  let height: Length;
  const size = f.flags.get('size');
  if (size !== undefined) {
    if (f.flags.has('width') || f.flags.has('height')) throw new UsageError('give --size or --width and --height, not both');
    const m = extractMentions(size);
    if (m.length !== 1 || m[0]!.kind !== 'size' || m[0]!.values.length !== 2)
      throw new UsageError(`--size: cannot read ${JSON.stringify(size)} as a size like "4 1/4 x 5 1/2"`);
    [width, height] = m[0]!.values as [Length, Length];
  } else {
    width = requiredLength(f, 'width');
    height = requiredLength(f, 'height');
  }
  const r = cardBase({
    width,
    height,
    fold: fold as FoldStyle,
    relief: optionalLength(f, 'relief'),
    caliper: optionalLength(f, 'caliper'),
    outerFlap: optionalLength(f, 'outer-flap'),
    stopper: optionalLength(f, 'stopper'),
    precision: precisionArg(f),
  });
  return {
    flat: { width: lengthJson(r.flatWidth), height: lengthJson(r.flatHeight) },
    scoreLines: r.scoreLines.map((s) => ({ axis: s.axis, at: lengthJson(s.at) })),
    panels: r.panels.map((p) => ({ name: p.name, size: lengthJson(p.size) })),
    grain: r.grain,
    ...(r.stopper
      ? { stopper: { fromEdge: lengthJson(r.stopper.fromEdge), fromFold: lengthJson(r.stopper.fromFold), leanDegrees: r.stopper.leanDegrees } }
      : {}),
    working: r.working,
  };
}

const lengthField = z.union([z.string().min(1), z.number().nonnegative()]).transform((v) => String(v));
const planSchema = z.object({
  sheet: z.union([z.string().min(1), z.object({ width: lengthField, height: lengthField })]),
  rotate: z.boolean().default(true),
  kits: z.number().int().min(0).default(1),
  spares: z.number().int().min(0).default(0),
  pieces: z.array(z.object({ name: z.string().min(1), width: lengthField, height: lengthField, qty: z.number().int().min(0).default(1) })).min(1),
});

function planCommand(args: readonly string[]): unknown {
  const f = parseArgs(args, ['file']);
  noPositional(f);
  const file = f.flags.get('file');
  if (file === undefined) throw new UsageError('--file <pieces.json> is required');
  let json: unknown;
  try {
    json = JSON.parse(readText(file));
  } catch (e) {
    if (e instanceof UsageError) throw e;
    throw new UsageError(`${file} is not valid JSON: ${(e as Error).message}`);
  }
  const parsed = planSchema.safeParse(json);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    const where = issue.path.length ? issue.path.join('.') : '(top level)';
    throw new UsageError(`${file}: ${where}: ${issue.message}`);
  }
  const spec = parsed.data;
  const at = (path: string, text: string) => {
    const r = readLength(text);
    if (!r) throw new UsageError(`${file}: ${path}: cannot read ${JSON.stringify(text)} as a length`);
    return r.length;
  };
  let sheet: { width: Length; height: Length };
  if (typeof spec.sheet === 'string') {
    const named = sheetSize(spec.sheet);
    if (!named) throw new UsageError(`${file}: sheet: unknown sheet size ${JSON.stringify(spec.sheet)}`);
    sheet = { width: named.width, height: named.height };
  } else sheet = { width: at('sheet.width', spec.sheet.width), height: at('sheet.height', spec.sheet.height) };
  const tooLarge = sheetPlanTooLarge(
    spec.pieces.length,
    spec.pieces.reduce((n, p) => n + p.qty, 0),
    spec.kits + spec.spares,
  );
  if (tooLarge) throw new UsageError(`${file}: ${tooLarge}`);
  const plan = planSheets({
    sheet,
    rotate: spec.rotate,
    kits: spec.kits,
    spares: spec.spares,
    pieces: spec.pieces.map((p, i) => ({ name: p.name, width: at(`pieces.${i}.width`, p.width), height: at(`pieces.${i}.height`, p.height), qty: p.qty })),
  });
  const lengthIn = (l: Length) => inchesNumber(l);
  return {
    sheets: plan.sheets,
    // identical sheets once, with their count ("7 sheets like this"); blocks are across x down copies
    patterns: plan.patterns.map((pt) => ({
      first: pt.first,
      count: pt.count,
      pieces: pt.pieces,
      blocks: pt.blocks.map((b) => ({
        name: b.name,
        x: lengthIn(b.x),
        y: lengthIn(b.y),
        width: lengthIn(b.width),
        height: lengthIn(b.height),
        rotated: b.rotated,
        across: b.across,
        down: b.down,
      })),
    })),
    // and every piece on every sheet, one by one
    placements: placementsOf(plan).map((p) => ({
      sheet: p.sheet,
      name: p.name,
      x: inchesNumber(p.x),
      y: inchesNumber(p.y),
      width: inchesNumber(p.width),
      height: inchesNumber(p.height),
      rotated: p.rotated,
    })),
    waste: plan.waste,
    areaLowerBound: plan.areaLowerBound,
    errors: plan.errors.map((e) => ({ name: e.name, count: e.count, reason: e.reason })),
  };
}

function run(args: readonly string[]): unknown {
  const [sub, ...rest] = args;
  if (sub === '--help' || sub === '-h') return { usage: USAGE };
  if (sub === undefined) throw new UsageError(`nothing to do; usage: ${USAGE.join(' | ')}`);
  switch (sub) {
    case 'wrap':
      return wrapCommand(rest);
    case 'lid':
      return lidCommand(rest);
    case 'card':
      return cardCommand(rest);
    case 'plan':
      return planCommand(rest);
    default:
      return mentionsCommand(args);
  }
}

try {
  process.stdout.write(`${JSON.stringify(run(process.argv.slice(2)))}\n`);
} catch (e) {
  if (e instanceof UsageError || e instanceof RangeError) {
    process.stdout.write(`${JSON.stringify({ error: e.message })}\n`);
    process.exitCode = 2;
  } else throw e;
}
