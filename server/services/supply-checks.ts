/**
 * The Supplies list checked against the sheet plan (shared/supplies/sheet-checks): each supply
 * line that counts the sheets of a cut-list material, against the sheets the plan lays that
 * material's pieces on for one make. The Supplies and Publish sections show the result, and
 * publishing asks to confirm the warnings still open.
 */
import { supplySheetChecks, unresolvedSheetWarnings, type PlannedMaterial } from '@shared/supplies/sheet-checks';
import type { SheetPlanDto } from '@shared/schemas/sheet-plan';
import type { SupplySheetCheckDto } from '@shared/schemas/supply';
import type { Tutorial } from '../models';
import { UnprocessableError } from '../lib/errors';
import { sheetPlanJson } from './sheet-plan';
import { loadSupplies } from './supplies';

/** "12 x 12 in" as a supply line says it, from "12 in" and "12 in" (the unit once when both share it). */
function sheetLabel(width: string, height: string): string {
  const unit = / (in|mm|cm)$/.exec(width)?.[1];
  return unit && height.endsWith(` ${unit}`) ? `${width.slice(0, -unit.length - 1)} x ${height}` : `${width} x ${height}`;
}

/** Each material's plan for one make, trusted only when every piece fitted and the search finished. */
async function plannedMaterials(tutorial: Tutorial): Promise<PlannedMaterial[]> {
  try {
    const plan = JSON.parse(await sheetPlanJson(tutorial, 1, 0)) as SheetPlanDto;
    return plan.materials.map((m) => ({
      material: m.material,
      sheets: m.sheets,
      sheetLabel: sheetLabel(m.sheet.width.display, m.sheet.height.display),
      complete: m.complete && m.errors.length === 0,
    }));
  } catch (e) {
    // A cut list past the plan's limits has no plan to check against; the Cut list section says why.
    if (e instanceof UnprocessableError) return [];
    throw e;
  }
}

/** The cross-checks of a tutorial's supplies and the warnings nobody has resolved or accepted. */
export async function supplyChecks(tutorial: Tutorial): Promise<{ checks: SupplySheetCheckDto[]; unresolved: string[] }> {
  const [{ rows }, plans] = await Promise.all([loadSupplies(tutorial), plannedMaterials(tutorial)]);
  const checks = supplySheetChecks(
    rows.map((s) => ({ id: s.id, name: s.name, category: s.category, quantity: s.quantity, acceptedSheetNeed: s.acceptedSheetNeed ?? null })),
    plans,
  );
  return { checks, unresolved: unresolvedSheetWarnings(checks) };
}

/** The warnings publishing must have confirmed: open supply cross-checks. */
export async function publishWarnings(tutorial: Tutorial): Promise<string[]> {
  const rows = await loadSupplies(tutorial);
  // No supply counts sheets: nothing to plan for.
  if (!rows.rows.some((s) => /\d|sheet/i.test(s.quantity))) return [];
  return (await supplyChecks(tutorial)).unresolved;
}
