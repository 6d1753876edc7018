/**
 * The first load: how much JavaScript the sign-in page and a studio's page download, read from a
 * fresh production build's own manifest (`.vite/manifest.json`): the entry chunk, the page's lazy
 * route chunks, and every chunk they import statically, each counted once and gzipped (level 9, as
 * a server compressing ahead of time would). Target (issue 16): at most 170 KB gzip for each page;
 * before the split the sign-in page took one 747 KB script (222 KB gzip).
 *
 *   npx tsx bench/first-load.bench.ts [--no-build]
 */
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { PROJECT_ROOT } from '../scripts/lib/cluster';

type Chunk = { file: string; src?: string; isEntry?: boolean; isDynamicEntry?: boolean; imports?: string[]; dynamicImports?: string[]; css?: string[] };

const TARGET_KB = 170;
const outDir = path.join(PROJECT_ROOT, 'bench/out/first-load');
/** The route modules a page needs before it can show anything (src/app/router.tsx). */
const PAGES: Record<string, string[]> = {
  'sign-in page (/sign-in)': ['src/app/routes/sign-in.tsx'],
  'studio page (/studios/:id, signed in)': ['src/app/routes/signed-in-layout.tsx', 'src/app/routes/not-found.tsx', 'src/app/routes/studio-home.tsx'],
  'write-up (for comparison: the editor loads only here)': [
    'src/app/routes/signed-in-layout.tsx',
    'src/app/routes/not-found.tsx',
    'src/app/routes/tutorial-layout.tsx',
    'src/app/routes/write-up.tsx',
  ],
};

if (!process.argv.includes('--no-build')) {
  const vite = path.join(PROJECT_ROOT, 'node_modules/vite/bin/vite.js');
  const r = spawnSync(process.execPath, [vite, 'build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'warn'], { cwd: PROJECT_ROOT, stdio: 'inherit' });
  if (r.status !== 0) throw new Error('vite build failed');
}
const manifest = JSON.parse(readFileSync(path.join(outDir, '.vite/manifest.json'), 'utf8')) as Record<string, Chunk>;
const gz = new Map<string, { raw: number; gzip: number }>();
const sizeOf = (file: string) => {
  let s = gz.get(file);
  if (!s) {
    const bytes = readFileSync(path.join(outDir, file));
    s = { raw: bytes.length, gzip: gzipSync(bytes, { level: 9 }).length };
    gz.set(file, s);
  }
  return s;
};

/** The chunk's file and those of its static imports, recursively. */
function closure(key: string, seen = new Set<string>()): Set<string> {
  const chunk = manifest[key];
  if (!chunk) throw new Error(`${key} is not in the build manifest (renamed? update PAGES)`);
  if (seen.has(chunk.file)) return seen;
  seen.add(chunk.file);
  for (const i of chunk.imports ?? []) closure(i, seen);
  return seen;
}

const kb = (n: number) => `${(n / 1024).toFixed(1)} KB`;
let ok = true;
console.log(`JavaScript downloaded before the page shows (gzip level 9; target <= ${TARGET_KB} KB for the first two):`);
for (const [name, routes] of Object.entries(PAGES)) {
  const files = closure('index.html');
  for (const r of routes) closure(r, files);
  const js = [...files].filter((f) => f.endsWith('.js'));
  const raw = js.reduce((a, f) => a + sizeOf(f).raw, 0);
  const gzip = js.reduce((a, f) => a + sizeOf(f).gzip, 0);
  const judged = !name.startsWith('write-up');
  const pass = gzip <= TARGET_KB * 1024;
  if (judged) ok &&= pass;
  console.log(`  ${name.padEnd(56)} ${kb(gzip).padStart(9)} gzip (${kb(raw)} raw, ${js.length} files)${judged ? `  ${pass ? 'OK' : 'TOO BIG'}` : ''}`);
}
const entry = manifest['index.html']!;
console.log(`  entry chunk alone: ${kb(sizeOf(entry.file).gzip)} gzip; lazy route chunks in the build: ${entry.dynamicImports?.length ?? 0}`);
process.exitCode = ok ? 0 : 1;
