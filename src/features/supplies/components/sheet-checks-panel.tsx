import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { SupplySheetCheckDto } from '@shared/schemas/supply';
import { Button } from '@/components/ui/button';
import { supplyChecksQueryOptions } from '@/lib/resources';
import { useUpdateSupply } from '../api/update-supply';

const sheets = (n: number) => `${n} sheet${n === 1 ? '' : 's'}`;

/** One check: its words, the one-click fix with the plan's figure, and accepting the lower count on purpose. */
function CheckRow({ check, tutorialId, canEdit }: { check: SupplySheetCheckDto; tutorialId: string; canEdit: boolean }) {
  const update = useUpdateSupply(tutorialId);
  const [error, setError] = useState<string | null>(null);
  const run = (change: Parameters<typeof update.mutate>[0]) => {
    setError(null);
    update.mutate(change, { onError: (e) => setError(e.message) });
  };
  if (check.status === 'ok')
    return (
      <li className="flex flex-wrap items-baseline gap-x-2 text-sm">
        <span aria-hidden className="text-sage">
          ✓
        </span>
        <span>
          <span className="font-medium">{check.supplyName}</span>: {sheets(check.stated)}; the sheet plan needs {check.needed}.
        </span>
      </li>
    );
  const accepted = check.status === 'accepted';
  return (
    <li className={`rounded-md border px-3 py-2 text-sm ${accepted ? 'border-line bg-white' : 'border-rosehip/40 bg-rosehip-light'}`}>
      <p>
        <strong className={accepted ? 'text-pencil' : 'text-rosehip'}>{accepted ? 'Accepted:' : 'Warning:'}</strong> {check.message}
        {accepted ? '' : '.'}
      </p>
      {canEdit && (
        <div className="mt-1.5 flex flex-wrap gap-2">
          {check.fix && (
            <Button size="sm" busy={update.isPending} onClick={() => run({ id: check.supplyId, quantity: check.fix!.quantity })}>
              Use the plan’s figure: {check.fix.quantity}
            </Button>
          )}
          {accepted ? (
            <Button size="sm" variant="ghost" disabled={update.isPending} onClick={() => run({ id: check.supplyId, acceptedSheetNeed: null })}>
              Warn me again
            </Button>
          ) : (
            <Button size="sm" variant="secondary" disabled={update.isPending} onClick={() => run({ id: check.supplyId, acceptedSheetNeed: check.needed })}>
              Keep {sheets(check.stated)} on purpose
            </Button>
          )}
        </div>
      )}
      {error && (
        <p role="alert" className="mt-1 text-xs text-rosehip">
          {error}
        </p>
      )}
    </li>
  );
}

/**
 * The supplies' sheet counts checked against the sheet plan for one make: a warning for each
 * line that lists fewer sheets than the plan needs, offering the plan's figure in one click, or
 * to keep the lower count on purpose (offcuts, hand-nested circles). The Supplies and Publish
 * sections both show it; nothing shows when no supply counts the sheets of a cut-list material.
 */
export function SheetChecksPanel({
  tutorialId,
  canEdit,
  where,
  className = '',
}: {
  tutorialId: string;
  canEdit: boolean;
  where: 'supplies' | 'publish';
  className?: string;
}) {
  const q = useQuery(supplyChecksQueryOptions(tutorialId));
  if (!q.data || q.data.checks.length === 0) return null;
  const open = q.data.checks.filter((c) => c.status === 'short');
  const title = open.length
    ? `${open.length === 1 ? 'A supply lists' : `${open.length} supplies list`} fewer sheets than the sheet plan`
    : 'Sheets against the sheet plan';
  return (
    <section aria-label="Supplies checked against the sheet plan" className={`rounded-lg border border-line bg-white p-4 ${className}`}>
      <h2 className="text-base">{title}</h2>
      <p className="mt-0.5 text-xs text-pencil">
        Each paper’s sheet count in the supplies, against the sheets the cut list’s sheet plan lays its pieces on for one make.
        {where === 'publish' && open.length > 0 ? ' Publishing asks you to confirm any warning left open.' : ''}
      </p>
      <ul className="mt-3 space-y-2">
        {q.data.checks.map((c) => (
          <CheckRow key={c.supplyId} check={c} tutorialId={tutorialId} canEdit={canEdit && q.data.abilities.update} />
        ))}
      </ul>
    </section>
  );
}
