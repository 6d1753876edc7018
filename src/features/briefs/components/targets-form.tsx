import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useSetTarget, useTargets } from '../api/briefs';

/** Each maker's monthly target: coordinators and owners set it, everyone else reads it. */
export function TargetsForm({ studioId }: { studioId: string }) {
  const targets = useTargets(studioId);
  const set = useSetTarget(studioId);
  const [draft, setDraft] = useState<Record<string, string>>({});
  if (targets.isPending) return <Loading label="Loading targets" />;
  if (targets.error) return <Notice kind="error">{targets.error.message}</Notice>;
  const canSet = targets.data.abilities.setTargets;
  return (
    <div>
      <ul className="grid gap-2">
        {targets.data.targets.map((t) => {
          const value = draft[t.userId] ?? (t.perMonth === null ? '' : String(t.perMonth));
          return (
            <li key={t.userId} className="flex flex-wrap items-center gap-2 text-sm">
              <label htmlFor={`target-${t.userId}`} className="min-w-40">
                {t.name}
              </label>
              {canSet ? (
                <form
                  className="flex items-center gap-2"
                  onSubmit={(e) => {
                    e.preventDefault();
                    const n = value.trim() === '' ? null : Number(value);
                    set.mutate({ userId: t.userId, perMonth: n }, { onSuccess: () => setDraft((d) => ({ ...d, [t.userId]: '' + (n ?? '') })) });
                  }}
                >
                  <input
                    id={`target-${t.userId}`}
                    type="number"
                    min={1}
                    max={100}
                    inputMode="numeric"
                    className="w-20 rounded-md border border-field bg-white px-2 py-1"
                    value={value}
                    placeholder="none"
                    onChange={(e) => setDraft((d) => ({ ...d, [t.userId]: e.target.value }))}
                  />
                  <span className="text-pencil">a month</span>
                  <Button size="sm" variant="secondary" type="submit">
                    Save <span className="sr-only">target for {t.name}</span>
                  </Button>
                </form>
              ) : (
                <span id={`target-${t.userId}`}>{t.perMonth === null ? 'no target' : `${t.perMonth} a month`}</span>
              )}
            </li>
          );
        })}
      </ul>
      {set.error && <Notice kind="error">{set.error.message}</Notice>}
      {set.isSuccess && <Notice kind="success">Saved the target.</Notice>}
    </div>
  );
}
