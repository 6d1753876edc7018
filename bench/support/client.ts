import { spawn, type ChildProcess } from 'node:child_process';
import { createReadStream, readFileSync, statSync } from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { PROJECT_ROOT } from '../../scripts/lib/cluster';

export type BenchServer = { port: number; pid: number; tutorialId: string; email: string; password: string; databaseUrl: string; child: ChildProcess };

/**
 * Starts bench-server.ts in a child process and waits for its JSON line. `workers`: the queue
 * workers run in the server process, as `npm start` runs them (default: off, nothing but the API).
 */
export async function startBenchServer(o: { workers?: boolean } = {}): Promise<BenchServer> {
  const child = spawn(process.execPath, [path.join(PROJECT_ROOT, 'node_modules/tsx/dist/cli.mjs'), path.join(PROJECT_ROOT, 'bench/support/bench-server.ts')], {
    cwd: PROJECT_ROOT,
    env: { ...process.env, WORKERS: o.workers ? 'on' : 'off' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const lines = createInterface({ input: child.stdout! });
  for await (const line of lines) {
    if (line.startsWith('{')) return { ...JSON.parse(line), child };
  }
  throw new Error('the bench server exited before it was ready');
}

/** The resident and peak memory of a process, in bytes (Linux /proc). */
export function memoryOf(pid: number): { rss: number; hwm: number } {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = (key: string) => Number(new RegExp(`^${key}:\\s+(\\d+) kB`, 'm').exec(status)?.[1] ?? 0) * 1024;
  return { rss: kb('VmRSS'), hwm: kb('VmHWM') };
}

/** A minimal cookie-keeping client that sends the CSRF token like the browser does. */
export class BenchClient {
  cookie = '';
  csrf = '';
  constructor(private base: string) {}
  async request(method: string, url: string, body?: unknown): Promise<{ status: number; json: any }> {
    const headers: Record<string, string> = { cookie: this.cookie };
    if (method !== 'GET') headers['x-csrf-token'] = this.csrf;
    if (body !== undefined) headers['content-type'] = 'application/json';
    const res = await fetch(this.base + url, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
    const set = res.headers.get('set-cookie');
    if (set) this.cookie = set.split(';')[0];
    return { status: res.status, json: await res.json().catch(() => null) };
  }
  async signIn(email: string, password: string) {
    this.csrf = (await this.request('GET', '/api/auth/csrf')).json.token;
    const r = await this.request('POST', '/api/auth/sign-in', { email, password });
    this.csrf = r.json.csrfToken;
  }
  /** Streams a file as multipart field `file` (never read whole into memory). */
  upload(url: string, file: string, name: string): Promise<{ status: number; body: string }> {
    const boundary = `----cardwright${Date.now()}`;
    const head = Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="${name}"\r\nContent-Type: video/mp4\r\n\r\n`);
    const tail = Buffer.from(`\r\n--${boundary}--\r\n`);
    const size = statSync(file).size;
    return new Promise((resolve, reject) => {
      const u = new URL(this.base + url);
      const req = http.request(
        {
          host: u.hostname,
          port: u.port,
          path: u.pathname,
          method: 'POST',
          headers: {
            cookie: this.cookie,
            'x-csrf-token': this.csrf,
            'content-type': `multipart/form-data; boundary=${boundary}`,
            'content-length': head.length + size + tail.length,
          },
        },
        (res) => {
          let body = '';
          res.on('data', (d) => (body += d));
          res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
        },
      );
      req.on('error', reject);
      req.write(head);
      const s = createReadStream(file, { highWaterMark: 1 << 20 });
      s.pipe(req, { end: false });
      s.on('end', () => req.end(tail));
      s.on('error', reject);
    });
  }
}
