import { CATEGORY_LABELS } from '@shared/editor/render-parts';
import { SUPPLY_CATEGORIES, SUPPLY_CATEGORY_LABELS } from '@shared/schemas/supply';

type Ordered = { id: string; position: number; category: string };

/**
 * Supplies under their category, categories in the shared order and, inside each, in list order,
 * with the write-up's own headings ("Tools", "Adhesives"), so the table reads like what goes out.
 */
export function groupByCategory<T extends Ordered>(supplies: readonly T[]): { category: string; label: string; items: T[] }[] {
  const rank = (c: string) => {
    const i = (SUPPLY_CATEGORIES as readonly string[]).indexOf(c);
    return i < 0 ? SUPPLY_CATEGORIES.length : i;
  };
  const groups = new Map<string, T[]>();
  for (const s of supplies) groups.set(s.category, [...(groups.get(s.category) ?? []), s]);
  return [...groups.entries()]
    .sort(([a], [b]) => rank(a) - rank(b) || a.localeCompare(b))
    .map(([category, items]) => ({
      category,
      label: CATEGORY_LABELS[category] ?? SUPPLY_CATEGORY_LABELS[category as keyof typeof SUPPLY_CATEGORY_LABELS] ?? category,
      items,
    }));
}

/**
 * The list after moving one supply a place up (-1) or down (+1). With `withinCategory` it trades
 * places with the nearest supply of the same category, which is what "up" means in the grouped
 * table. Null when it cannot move further.
 */
export function moveSupply<T extends Ordered>(supplies: readonly T[], id: string, step: -1 | 1, withinCategory = false): T[] | null {
  const from = supplies.findIndex((s) => s.id === id);
  if (from < 0) return null;
  let to = from + step;
  if (withinCategory) while (to >= 0 && to < supplies.length && supplies[to]!.category !== supplies[from]!.category) to += step;
  if (to < 0 || to >= supplies.length) return null;
  const next = [...supplies];
  [next[from], next[to]] = [next[to]!, next[from]!];
  return next;
}

/**
 * The position each supply must be given so the stored order is the list's order (0, 1, 2 …),
 * only for those whose stored position differs. Renumbering also mends positions left with
 * gaps by deletions or doubled by older data.
 */
export function positionChanges(ordered: readonly Ordered[]): { id: string; position: number }[] {
  return ordered.flatMap((s, i) => (s.position === i ? [] : [{ id: s.id, position: i }]));
}

/** Whether a supply can move up or down from where it is. */
export function canMove(supplies: readonly Ordered[], id: string, step: -1 | 1, withinCategory = false): boolean {
  return moveSupply(supplies, id, step, withinCategory) !== null;
}
