/**
 * Sheet plans, in one run:
 *  1. the packer alone: 300 distinct pieces (a class's bases, mats, strips, tags) x 30 kits on
 *     12 x 12 in sheets, rotation allowed (target: under 1 s), beside the same pieces for one kit
 *     (the baseline), and the largest plan the API allows (1,000 pieces x 100 kits);
 *  2. through the HTTP API: /api/health answered again and again while that largest plan is worked
 *     out (target: every answer under 100 ms), beside health answers with nothing running.
 * The sheet count is printed beside the area lower bound, ceil(total area / sheet area).
 *
 *   npx tsx bench/sheet-plan.bench.ts [--pieces 300] [--kits 30] [--runs 5] [--no-api]
 */
import pg from 'pg';
import { planSheets, type PlanPiece } from '@shared/geometry';
import { inches } from '@shared/measure';
import { SHEET_PLAN_LIMITS } from '@shared/schemas/sheet-plan';
import { isMain, median, ms, numberArg, seeded, timeSync, verdict } from './lib';
import { BenchClient, startBenchServer } from './support/client';

const PLAN_TARGET_MS = 1000;
const HEALTH_TARGET_MS = 100;
const twelve = { width: inches(12), height: inches(12) };

/** `n` pieces with sizes in sixteenths, from 1/2 in to 11 in a side. */
export function makePieces(n: number, seed = 11): PlanPiece[] {
  const rand = seeded(seed);
  const side = () => inches([8 + Math.floor(rand() * 168), 16]);
  return Array.from({ length: n }, (_, i) => ({ name: `piece ${i + 1}`, width: side(), height: side(), qty: 1 }));
}

function timePlan(label: string, pieces: number, kits: number, runs: number, target?: number) {
  const input = { sheet: twelve, rotate: true, kits, pieces: makePieces(pieces) };
  let plan = planSheets(input, { budgetMs: 2000 });
  const t = timeSync(() => {
    plan = planSheets(input, { budgetMs: 2000 });
  }, runs);
  const goal = target === undefined ? '' : `  target < ${target} ms  ${verdict(t.median, target)}`;
  console.log(
    `${label}: ${pieces} pieces x ${kits} kits  ${ms(t.median)}${goal}  sheets ${plan.sheets} (area lower bound ${plan.areaLowerBound}) in ${plan.patterns.length} patterns  waste ${(plan.waste * 100).toFixed(1)}%${plan.complete ? '' : '  (budget reached)'}`,
  );
  return { ms: t.median, sheets: plan.sheets, lowerBound: plan.areaLowerBound };
}

export function benchSheetPlan(pieces = 300, kits = 30, runs = 5): { ms: number; sheets: number; lowerBound: number; pass: boolean } {
  timePlan('baseline, one kit', pieces, 1, runs);
  const r = timePlan('packer', pieces, kits, runs, PLAN_TARGET_MS);
  timePlan('largest allowed', SHEET_PLAN_LIMITS.pieces, SHEET_PLAN_LIMITS.copies / SHEET_PLAN_LIMITS.pieces, Math.min(runs, 3));
  return { ...r, pass: r.ms < PLAN_TARGET_MS };
}

/** Health answers while the API works out the largest allowed plan, beside answers with nothing running. */
export async function benchHealthDuringPlan(): Promise<{ idle: number; worst: number; pass: boolean }> {
  const server = await startBenchServer();
  try {
    const base = `http://127.0.0.1:${server.port}`;
    const c = new BenchClient(base);
    await c.signIn(server.email, server.password);
    const db = new pg.Client({ connectionString: server.databaseUrl });
    await db.connect();
    const pieces = makePieces(SHEET_PLAN_LIMITS.pieces);
    for (let i = 0; i < pieces.length; i++) {
      const p = pieces[i]!;
      await db.query(
        `INSERT INTO pieces (id, tutorial_id, position, name, material, quantity, shape, width, height, score_lines, notes, created_at, updated_at)
         VALUES (gen_random_uuid(), $1, $2, $3, 'kraft', 1, 'rect', $4, $5, '[]', '', now(), now())`,
        [server.tutorialId, i, p.name, `${p.width.value.n}/${p.width.value.d} in`, `${p.height.value.n}/${p.height.value.d} in`],
      );
    }
    await db.end();
    const health = async () => {
      const t = performance.now();
      const r = await fetch(`${base}/api/health`);
      await r.json();
      return performance.now() - t;
    };
    const idle: number[] = [];
    for (let i = 0; i < 20; i++) idle.push(await health());

    const kits = SHEET_PLAN_LIMITS.copies / SHEET_PLAN_LIMITS.pieces;
    const during: number[] = [];
    let done = false;
    const t0 = performance.now();
    const plan = c.request('GET', `/api/tutorials/${server.tutorialId}/sheet-plan?kits=${kits}`).finally(() => (done = true));
    while (!done) {
      during.push(await health());
      await new Promise((r) => setTimeout(r, 20));
    }
    const res = await plan;
    const planMs = performance.now() - t0;
    const worst = Math.max(...during);
    if (process.env.BENCH_DEBUG) console.log(during.map((d) => d.toFixed(0)).join(' '));
    const m = res.json?.materials?.[0];
    console.log(
      `plan through the API: ${SHEET_PLAN_LIMITS.pieces} pieces x ${kits} kits  ${ms(planMs)}  status ${res.status}  sheets ${m?.sheets} in ${m?.patterns?.length} patterns`,
    );
    console.log(
      `health while it ran: ${during.length} answers  median ${ms(median(during))}  worst ${ms(worst)}  target < ${HEALTH_TARGET_MS} ms  ${verdict(worst, HEALTH_TARGET_MS)}  (baseline, nothing running: median ${ms(median(idle))}, worst ${ms(Math.max(...idle))})`,
    );
    return { idle: median(idle), worst, pass: worst < HEALTH_TARGET_MS && res.status === 200 };
  } finally {
    server.child.kill('SIGTERM');
  }
}

if (isMain(import.meta.url)) {
  const r = benchSheetPlan(numberArg('pieces', 300), numberArg('kits', 30), numberArg('runs', 5));
  let pass = r.pass;
  if (!process.argv.includes('--no-api')) pass = (await benchHealthDuringPlan()).pass && pass;
  if (!pass) process.exitCode = 1;
}
