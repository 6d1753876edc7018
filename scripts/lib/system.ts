import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

/** A Debian package the project needs, and a file that proves it is installed. */
export type DebianNeed = { pkg: string; file: string };

export const PG_BIN = process.env.PG_BIN ?? '/usr/lib/postgresql/15/bin';

export const APP_NEEDS: DebianNeed[] = [
  { pkg: 'postgresql', file: `${PG_BIN}/initdb` },
  { pkg: 'ffmpeg', file: '/usr/bin/ffprobe' },
  { pkg: 'fonts-dejavu-core', file: '/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf' },
];

export const TEST_NEEDS: DebianNeed[] = [...APP_NEEDS, { pkg: 'chromium', file: '/usr/bin/chromium' }, { pkg: 'poppler-utils', file: '/usr/bin/pdftoppm' }];

export const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;

/**
 * Installs the Debian packages that are missing. As root it runs apt-get; otherwise it prints
 * the exact command and exits, because a half-working start is worse than a clear stop.
 */
export function ensureDebianPackages(needs: DebianNeed[]): void {
  const missing = needs.filter((n) => !existsSync(n.file)).map((n) => n.pkg);
  if (missing.length === 0) return;
  const line = `apt-get update && DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends -o DPkg::Lock::Timeout=120 ${missing.join(' ')}`;
  if (!isRoot()) {
    console.error(`Cardwright needs these Debian packages: ${missing.join(', ')}.\nRun as root:\n  ${line}`);
    process.exit(1);
  }
  console.log(`Installing from Debian: ${missing.join(' ')} (a minute or two on a fresh machine)`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const run = (args: string[]) => spawnSync('apt-get', args, { stdio: ['ignore', 'ignore', 'inherit'], env });
  if (run(['update', '-qq']).status !== 0) console.warn('apt-get update failed; trying the install anyway');
  const r = run(['install', '-y', '-qq', '--no-install-recommends', '-o', 'DPkg::Lock::Timeout=120', ...missing]);
  if (r.status !== 0) {
    console.error(`apt-get install failed. Try by hand:\n  ${line}`);
    process.exit(1);
  }
}

/** Runs a command as the postgres user when we are root (initdb refuses root), else as ourselves. */
export function runAsPostgres(cmd: string, args: string[], opts: { quiet?: boolean } = {}): void {
  const [file, argv] = isRoot() ? ['runuser', ['-u', 'postgres', '--', cmd, ...args]] : [cmd, args];
  execFileSync(file, argv, { stdio: opts.quiet ? ['ignore', 'ignore', 'pipe'] : 'inherit' });
}

/** True when the postgres user (or we, when not root) can enter the folder. */
export function postgresCanEnter(dir: string): boolean {
  if (!isRoot()) return true;
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', dir]).status === 0;
}
