import type { Transaction } from 'sequelize';

/**
 * Runs `fn` once a change is committed: when its transaction commits (before `commit()` resolves,
 * so before the request that made the change answers), or at once when there is no transaction.
 * For the in-process caches' model hooks, which must not forget a copy before the change is visible.
 */
export function whenCommitted(options: { transaction?: Transaction | null } | undefined, fn: () => void): void {
  if (options?.transaction) options.transaction.afterCommit(fn);
  else fn();
}
