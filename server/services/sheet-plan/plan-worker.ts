/**
 * The sheet-plan worker thread: plans arrive as plain messages and go back as the response's JSON, so a
 * large plan never holds the web server's event loop.
 */
import { parentPort } from 'node:worker_threads';
import type { SheetPlanDto } from '../../../shared/schemas/sheet-plan';
import { planMaterials, type MaterialJob } from './plan-materials';

export type PlanRequest = { id: number; jobs: MaterialJob[]; kits: number; spares: number; budgetMs: number };

parentPort?.on('message', (req: PlanRequest) => {
  try {
    const dto: SheetPlanDto = { kits: req.kits, spares: req.spares, materials: planMaterials(req.jobs, req.kits, req.spares, req.budgetMs) };
    // a string crosses to the main thread as one copy, and the server sends it as it is
    parentPort!.postMessage({ id: req.id, result: JSON.stringify(dto) });
  } catch (e) {
    parentPort!.postMessage({ id: req.id, error: e instanceof Error ? e.message : String(e) });
  }
});
