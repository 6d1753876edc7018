/**
 * The kit planner (C2): every piece of the cut list times the kits (seats plus spares), the
 * sheets of each material from the sheet plan (its rotation and grain rules), what those sheets
 * cost at the material's price per stock sheet, the cost per kit and in total, and the margin
 * against the kit fee. Money stays in integer minor units.
 */
import type { RulerPrecision } from '@shared/measure';
import { divideRounded, formatMoney } from '@shared/money';
import type { z } from 'zod';
import type { KitPlanDto, materialPriceSchema } from '@shared/schemas/class';
import type { SheetPlanDto } from '@shared/schemas/piece';
import type { CraftClass, Material, Tutorial } from '../models';
import { loadCutList, usablePieces } from './cut-list';
import { sheetPlanJson } from './sheet-plan';
import { pieceSizeText } from './publish/sizes';

/** Sets (or clears) a material's price per stock sheet; a cleared price has no currency. */
export function setSheetPrice(m: Material, input: z.output<typeof materialPriceSchema>): Promise<Material> {
  return m.update({ sheetPriceCents: input.sheetPriceCents, sheetPriceCurrency: input.sheetPriceCents === null ? null : input.sheetPriceCurrency });
}

/** The kit plan of a class: pieces, sheets, cost and margin (see above). */
export async function kitPlan(k: CraftClass, tutorial: Tutorial): Promise<KitPlanDto> {
  const kits = k.seats + k.spares;
  const cut = await loadCutList(tutorial);
  const base = { classId: k.id, seats: k.seats, spares: k.spares, kits, currency: k.currency, kitFeeCents: k.kitFeeCents };
  if (cut.pieces.length === 0) {
    return {
      ...base,
      empty: true,
      emptyMessage: `“${tutorial.title}” has no cut list yet. Add its pieces in the tutorial’s Cut list section (with the material each is cut from), then give each material its stock sheet and price: the kit planner fills in from there.`,
      pieces: [],
      materials: [],
      totalCostCents: 0,
      costPerKitCents: 0,
      marginCents: k.kitFeeCents * k.seats,
      marginPerSeatCents: k.kitFeeCents,
      complete: false,
      working: [],
    };
  }
  const precision = tutorial.precision as RulerPrecision;
  const pieces = usablePieces(cut).map((p) => {
    const size = pieceSizeText(p, precision, { unitEach: true });
    return {
      name: p.name,
      material: p.material || 'unassigned',
      perKit: p.quantity,
      total: p.quantity * kits,
      sizeInches: size.inches,
      sizeMm: size.mm,
      shape: p.shape,
    };
  });
  // One plan per material for all the kits at once: pieces share sheets across kits.
  const plans = (JSON.parse(await sheetPlanJson(tutorial, k.seats, k.spares)) as SheetPlanDto).materials;
  const money = (n: number) => formatMoney(n, k.currency);
  const working: string[] = [`Kits: ${k.seats} seats + ${k.spares} spare${k.spares === 1 ? '' : 's'} = ${kits}.`];
  const materials = plans.map((p) => {
    const row = p.materialId ? cut.materials.find((m) => m.id === p.materialId) : undefined;
    const price = row?.sheetPriceCents ?? null;
    const currency = row?.sheetPriceCurrency ?? (price !== null ? k.currency : null);
    let costCents: number | null = null;
    let costNote: string | null = null;
    if (!row) costNote = `Add “${p.material}” as a material in the Cut list to give it a stock sheet and a price.`;
    else if (price === null) costNote = 'No price per sheet yet.';
    else if (currency !== k.currency) costNote = `Priced in ${currency}; the class is in ${k.currency}, so it is left out of the total.`;
    else {
      costCents = p.sheets * price;
      working.push(`${p.material}: ${p.sheets} sheet${p.sheets === 1 ? '' : 's'} x ${money(price)} = ${money(costCents)}.`);
    }
    return {
      material: p.material,
      materialId: p.materialId,
      sheetLabel: p.sheet.label,
      sheets: p.sheets,
      sheetPriceCents: price,
      sheetPriceCurrency: currency,
      costCents,
      costNote,
      errors: p.errors.map((e) => e.reason),
    };
  });
  const totalCostCents = materials.reduce((s, m) => s + (m.costCents ?? 0), 0);
  const costPerKitCents = divideRounded(totalCostCents, kits);
  const marginCents = k.kitFeeCents * k.seats - totalCostCents;
  const marginPerSeatCents = Math.round(marginCents / k.seats);
  working.push(
    `Total: ${money(totalCostCents)}; per kit ${money(totalCostCents)} / ${kits} = ${money(costPerKitCents)} (rounded to the nearest ${k.currency === 'JPY' ? 'yen' : 'cent'}).`,
    `Margin: ${money(k.kitFeeCents)} x ${k.seats} seats - ${money(totalCostCents)} = ${money(marginCents)} (${money(marginPerSeatCents)} a seat; spares are paid for by the seats).`,
  );
  return {
    ...base,
    empty: false,
    emptyMessage: null,
    pieces,
    materials,
    totalCostCents,
    costPerKitCents,
    marginCents,
    marginPerSeatCents,
    complete: materials.every((m) => m.costCents !== null),
    working,
  };
}
