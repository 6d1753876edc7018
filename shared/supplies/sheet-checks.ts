/**
 * The cross-check between the Supplies list and the sheet plan: a supply line that names a
 * material of the cut list ("Kraft cardstock, 12 x 12 in", "2 sheets") should list at least as
 * many sheets as the sheet plan lays that material's pieces on for one make. When it lists fewer,
 * the crafter is warned and offered the plan's figure; they may also accept the lower figure on
 * purpose (offcuts from another project, circles nested by hand), which holds while the plan
 * still needs that many.
 */

/** One material's plan for one make, as the sheet plan worked it out. */
export interface PlannedMaterial {
  material: string;
  /** Sheets the plan lays the pieces on. */
  sheets: number;
  /** "12 x 12 in". */
  sheetLabel: string;
  /** False when some pieces did not fit the sheet at all (the cut list's checks say so): the count is then too low to trust. */
  complete: boolean;
}

/** A supply line as the check reads it. */
export interface SupplyLine {
  id: string;
  name: string;
  category: string;
  quantity: string;
  /** The plan's figure the crafter accepted a lower count against, or null. */
  acceptedSheetNeed: number | null;
}

export type SheetCheckStatus = 'ok' | 'short' | 'accepted';

/** One supply line checked against its material's plan. */
export interface SupplySheetCheck {
  supplyId: string;
  supplyName: string;
  material: string;
  sheetLabel: string;
  /** Sheets the supply line says. */
  stated: number;
  /** Sheets the plan needs. */
  needed: number;
  status: SheetCheckStatus;
  /** In words, for the Supplies and Publish sections and the publish confirmation. */
  message: string;
  /** The quantity text that makes the line agree with the plan (its own wording kept), or null when it agrees. */
  fix: { quantity: string } | null;
}

const NUMBER_WORDS: Record<string, number> = {
  a: 1,
  an: 1,
  one: 1,
  two: 2,
  three: 3,
  four: 4,
  five: 5,
  six: 6,
  seven: 7,
  eight: 8,
  nine: 9,
  ten: 10,
  eleven: 11,
  twelve: 12,
  dozen: 12,
  fifteen: 15,
  twenty: 20,
};

const COUNT = `(\\d+|${Object.keys(NUMBER_WORDS).join('|')})`;
// Between the count and "sheets" only a size may stand ("3 x 12 x 12 in sheets"), never other words ("1 pack of 10 sheets").
const SIZE_WORDS = `(?:[\\d\\s./x×"]|in\\b|inch(?:es)?\\b|mm\\b|cm\\b)*?`;
const SHEETS_RE = new RegExp(`^\\s*${COUNT}\\s+${SIZE_WORDS}sheets?\\b`, 'i');
const BARE_RE = new RegExp(`^\\s*${COUNT}\\s*$`, 'i');

/**
 * The number of sheets a supply's quantity says: "2 sheets", "two sheets", "3 x 12 x 12 sheets",
 * "a sheet"; a bare number ("2") for paper and cardstock, which come by the sheet. Null when the
 * quantity is not a count of sheets ("1 pack", "a few", empty).
 */
export function readSheetCount(quantity: string, category: string): number | null {
  const word = (s: string) => (/^\d+$/.test(s) ? Number(s) : (NUMBER_WORDS[s.toLowerCase()] ?? null));
  const m = SHEETS_RE.exec(quantity);
  if (m) return word(m[1]!);
  const bare = BARE_RE.exec(quantity);
  if (bare && (category === 'paper' || category === 'cardstock')) {
    const n = word(bare[1]!);
    // "a" alone is not a count.
    return /^(a|an)$/i.test(bare[1]!) ? null : n;
  }
  return null;
}

const normal = (s: string) =>
  ` ${s
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, ' ')
    .trim()} `;

/** The material a supply line names: the longest material name found in it as whole words, or null. */
export function supplyMaterial(supplyName: string, materials: readonly string[]): string | null {
  const name = normal(supplyName);
  let best: string | null = null;
  for (const m of materials) {
    const key = normal(m);
    if (key.trim() === '' || !name.includes(key)) continue;
    if (best === null || key.length > normal(best).length) best = m;
  }
  return best;
}

/** The quantity with its count changed to `n`, its own wording kept: "2 sheets" -> "3 sheets", "two sheets" -> "3 sheets", "2" -> "3". */
export function withSheetCount(quantity: string, n: number): string {
  const m = new RegExp(`^(\\s*)${COUNT}(\\s+)(sheets?\\b)?`, 'i').exec(quantity);
  if (!m) return BARE_RE.test(quantity) || quantity.trim() === '' ? String(n) : `${n} sheets`;
  const noun = m[4] ? (n === 1 ? 'sheet' : 'sheets') : '';
  return `${m[1]}${n}${m[3]}${noun}${quantity.slice(m[0].length)}`;
}

const sheetsText = (n: number) => `${n} sheet${n === 1 ? '' : 's'}`;

/**
 * Checks every supply line that names a planned material and counts sheets. Lines naming the
 * same material are added up; a shortfall is reported on the first of them, whose fix makes the
 * total agree with the plan.
 */
export function supplySheetChecks(supplies: readonly SupplyLine[], plans: readonly PlannedMaterial[]): SupplySheetCheck[] {
  const byMaterial = new Map<string, { plan: PlannedMaterial; lines: { s: SupplyLine; count: number }[] }>();
  for (const s of supplies) {
    const count = readSheetCount(s.quantity, s.category);
    if (count === null) continue;
    const material = supplyMaterial(
      s.name,
      plans.map((p) => p.material),
    );
    const plan = plans.find((p) => p.material === material);
    if (!plan || !plan.complete || plan.sheets === 0) continue;
    const entry = byMaterial.get(plan.material) ?? { plan, lines: [] };
    entry.lines.push({ s, count });
    byMaterial.set(plan.material, entry);
  }
  const out: SupplySheetCheck[] = [];
  for (const { plan, lines } of byMaterial.values()) {
    const stated = lines.reduce((n, l) => n + l.count, 0);
    const first = lines[0]!;
    const base = { supplyId: first.s.id, supplyName: first.s.name, material: plan.material, sheetLabel: plan.sheetLabel, stated, needed: plan.sheets };
    if (stated >= plan.sheets) {
      out.push({ ...base, status: 'ok', message: `${first.s.name}: ${sheetsText(stated)}, and the sheet plan needs ${plan.sheets}`, fix: null });
      continue;
    }
    const accepted = lines.some((l) => l.s.acceptedSheetNeed === plan.sheets);
    const fixCount = plan.sheets - (stated - first.count);
    const message = `${first.s.name}: the supplies say ${sheetsText(stated)}, but the sheet plan needs ${sheetsText(plan.sheets)} of ${plan.sheetLabel} ${plan.material}`;
    out.push({
      ...base,
      status: accepted ? 'accepted' : 'short',
      message: accepted ? `${message} (accepted on purpose)` : message,
      fix: { quantity: withSheetCount(first.s.quantity, fixCount) },
    });
  }
  return out;
}

/** The warnings still open: shortfalls nobody accepted. */
export function unresolvedSheetWarnings(checks: readonly SupplySheetCheck[]): string[] {
  return checks.filter((c) => c.status === 'short').map((c) => c.message);
}
