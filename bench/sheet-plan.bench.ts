/**
 * A sheet plan of 300 pieces (a class of kits: bases, mats, strips, tags) on
 * 12 x 12 in sheets, rotation allowed. The sheet count is printed beside the
 * area lower bound, ceil(total area / sheet area). Target: under 300 ms.
 *
 *   npx tsx bench/sheet-plan.bench.ts [--pieces 300] [--runs 7]
 */
import { planSheets, type PlanPiece } from '@shared/geometry';
import { inches } from '@shared/measure';
import { isMain, ms, numberArg, seeded, timeSync, verdict } from './lib';

const TARGET_MS = 300;

/** `n` pieces with sizes in sixteenths, from 1/2 in to 11 in a side. */
export function makePieces(n: number, seed = 11): PlanPiece[] {
  const rand = seeded(seed);
  const side = () => inches([8 + Math.floor(rand() * 168), 16]);
  return Array.from({ length: n }, (_, i) => ({ name: `piece ${i + 1}`, width: side(), height: side(), qty: 1 }));
}

export function benchSheetPlan(pieces = 300, runs = 7): { ms: number; sheets: number; lowerBound: number; pass: boolean } {
  const input = { sheet: { width: inches(12), height: inches(12) }, rotate: true, kits: 1, pieces: makePieces(pieces) };
  let plan = planSheets(input);
  const t = timeSync(() => {
    plan = planSheets(input);
  }, runs);
  const pass = t.median < TARGET_MS;
  console.log(
    `sheet plan: ${pieces} pieces  ${ms(t.median)}  target < ${TARGET_MS} ms  ${verdict(t.median, TARGET_MS)}  sheets ${plan.sheets} (area lower bound ${plan.areaLowerBound})  waste ${(plan.waste * 100).toFixed(1)}%`,
  );
  return { ms: t.median, sheets: plan.sheets, lowerBound: plan.areaLowerBound, pass };
}

if (isMain(import.meta.url)) {
  const r = benchSheetPlan(numberArg('pieces', 300), numberArg('runs', 7));
  if (!r.pass) process.exitCode = 1;
}
