import { UniqueConstraintError } from 'sequelize';

/** The name of the unique constraint a failed insert or update ran into, if it was one. */
export function violatedConstraint(e: unknown): string | null {
  if (!(e instanceof UniqueConstraintError)) return null;
  const parent = e.parent as { constraint?: string } | undefined;
  return parent?.constraint ?? '';
}

/**
 * Runs `attempt` again when it runs into one of the named unique constraints. Free-name searches
 * ("box", then "box-2") read first and write later, so two requests at the same moment can pick the
 * same name; the loser simply looks again and takes the next one. Other errors pass through, and
 * so does the last attempt's.
 */
export async function retryOnUnique<T>(constraints: readonly string[], attempt: () => Promise<T>, attempts = 8): Promise<T> {
  for (let i = 1; ; i++) {
    try {
      return await attempt();
    } catch (e) {
      const hit = violatedConstraint(e);
      if (hit === null || !constraints.includes(hit) || i >= attempts) throw e;
    }
  }
}
