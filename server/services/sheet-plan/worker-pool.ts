import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import { UnavailableError } from '../../lib/errors';
import type { MaterialJob } from './plan-materials';
import type { PlanRequest } from './plan-worker';

/** The ES module build of tsx's API (require.resolve would give the CommonJS one, which cannot load in an eval thread). */
function tsxEsmApi(): string {
  const require = createRequire(import.meta.url);
  const pkgPath = require.resolve('tsx/package.json');
  const pkg = JSON.parse(readFileSync(pkgPath, 'utf8')) as { exports: Record<string, { import: { default: string } }> };
  return pathToFileURL(path.join(path.dirname(pkgPath), pkg.exports['./esm/api']!.import.default)).href;
}

type Task = { req: PlanRequest; resolve: (json: string) => void; reject: (e: Error) => void };

export type PlanPoolOptions = {
  /** A plan still running after this long is stopped (its thread ended) and answered 503. */
  hardLimitMs: number;
  /** Plans waiting beyond this many are turned away with 503 instead of piling up. */
  maxWaiting: number;
};

/**
 * One planning thread, started on first use and kept. Plans run one at a time (the machine
 * has few cores and the web server needs one); a plan past its hard limit ends the thread,
 * and the next plan starts a fresh one.
 */
export class PlanPool {
  private worker: Worker | null = null;
  private running: (Task & { timer: NodeJS.Timeout }) | null = null;
  private waiting: Task[] = [];
  private nextId = 1;

  constructor(private readonly opts: PlanPoolOptions) {}

  run(jobs: MaterialJob[], kits: number, spares: number, budgetMs: number): Promise<string> {
    if (this.waiting.length >= this.opts.maxWaiting)
      return Promise.reject(new UnavailableError('Several sheet plans are being worked out; try again in a moment', { retryAfter: 5 }));
    return new Promise((resolve, reject) => {
      this.waiting.push({ req: { id: this.nextId++, jobs, kits, spares, budgetMs }, resolve, reject });
      this.pump();
    });
  }

  /** Starts the thread ahead of the first plan (it compiles the planner once, off the event loop). */
  warm(): void {
    this.worker ??= this.start();
  }

  /** Ends the thread (and fails any plan still waiting); the next plan starts a new one. */
  async close(): Promise<void> {
    const w = this.worker;
    this.worker = null;
    this.fail(new UnavailableError('The server is stopping; try again in a moment'));
    await w?.terminate();
  }

  private fail(e: Error) {
    if (this.running) {
      clearTimeout(this.running.timer);
      this.running.reject(e);
      this.running = null;
    }
    for (const t of this.waiting.splice(0)) t.reject(e);
  }

  private start(): Worker {
    // The worker is TypeScript like the rest of the server: tsx compiles it inside the thread.
    const tsx = tsxEsmApi();
    const entry = new URL('./plan-worker.ts', import.meta.url).href;
    const w = new Worker(`import(${JSON.stringify(tsx)}).then((m) => m.tsImport(${JSON.stringify(entry)}, ${JSON.stringify(entry)}));`, {
      eval: true,
      // a runaway plan cannot take the server's memory with it
      resourceLimits: { maxOldGenerationSizeMb: 512 },
    });
    w.unref();
    w.on('message', (m: { id: number; result?: string; error?: string }) => {
      const t = this.running;
      if (!t || t.req.id !== m.id) return;
      clearTimeout(t.timer);
      this.running = null;
      if (m.error !== undefined) t.reject(new Error(`sheet plan: ${m.error}`));
      else t.resolve(m.result!);
      this.pump();
    });
    const lost = (e: Error) => {
      if (this.worker !== w) return;
      this.worker = null;
      const t = this.running;
      this.running = null;
      if (t) {
        clearTimeout(t.timer);
        t.reject(e);
      }
      this.pump();
    };
    w.on('error', (e) => lost(e));
    w.on('exit', (code) => lost(new Error(`the sheet-plan thread stopped (exit ${code})`)));
    return w;
  }

  private pump() {
    if (this.running) return;
    const t = this.waiting.shift();
    if (!t) return;
    this.worker ??= this.start();
    const w = this.worker;
    const timer = setTimeout(() => {
      if (this.running?.req.id !== t.req.id) return;
      this.running = null;
      this.worker = null;
      void w.terminate();
      t.reject(new UnavailableError('The sheet plan took too long and was stopped; plan fewer kits at a time, or fewer pieces per material'));
      this.pump();
    }, this.opts.hardLimitMs);
    timer.unref();
    this.running = { ...t, timer };
    w.postMessage(t.req);
  }
}
