import pg from 'pg';

/** The SQL statements sent while `fn` runs, in order (Sequelize, the session store and the listeners all go through pg's Client). */
export async function statementsDuring(fn: () => Promise<unknown>): Promise<string[]> {
  const seen: string[] = [];
  const original = pg.Client.prototype.query;
  pg.Client.prototype.query = function (this: pg.Client, ...args: unknown[]) {
    const q = args[0] as string | { text: string };
    seen.push(typeof q === 'string' ? q : q.text);
    return Reflect.apply(original, this, args) as never;
  } as typeof original;
  try {
    await fn();
  } finally {
    pg.Client.prototype.query = original;
  }
  return seen;
}
