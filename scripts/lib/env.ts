import { databaseUrl } from './cluster';

/** Ports and URLs for one running copy (development app or tests), set before server code loads. */
export function appEnv(kind: 'dev' | 'test', port: number): Record<string, string> {
  const db = kind === 'dev' ? 'cardwright' : 'cardwright_test';
  return {
    DATABASE_URL: process.env.DATABASE_URL ?? databaseUrl(db),
    PORT: String(port),
    // Each app port gets its own fake SMTP port, so a second copy (a check on another port) can run beside the first.
    SMTP_PORT: process.env.SMTP_PORT ?? String(port - 3000 + 2525),
    PAYMENTS_PORT: process.env.PAYMENTS_PORT ?? String(port - 3000 + 12111),
    PUBLIC_URL: process.env.PUBLIC_URL ?? `http://127.0.0.1:${port}`,
    NODE_ENV: kind === 'dev' ? (process.env.NODE_ENV ?? 'development') : 'test',
  };
}
