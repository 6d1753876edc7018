import { useState } from 'react';
import type { TutorialDto } from '@shared/schemas/tutorial';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useSchedulePublish } from '../api/schedule';

const zone = () => Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';

/** "2027-01-20T09:00" in the browser's zone, for a datetime-local input. */
function localValue(iso: string): string {
  const d = new Date(iso);
  const p = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${p(d.getMonth() + 1)}-${p(d.getDate())}T${p(d.getHours())}:${p(d.getMinutes())}`;
}

const inZone = (iso: string, timeZone: string) => new Intl.DateTimeFormat(undefined, { dateStyle: 'full', timeStyle: 'short', timeZone }).format(new Date(iso));

/**
 * Publish later: an approved tutorial can be set to go out at a date and time (in this browser's
 * time zone, shown beside the field); a queue job on the server publishes it then, and the maker
 * and the coordinator get an e-mail. Reschedule or cancel until it goes out.
 */
export function SchedulePanel({ tutorial, onChanged }: { tutorial: TutorialDto; onChanged?: (t: TutorialDto) => unknown }) {
  const tz = zone();
  const { set, cancel } = useSchedulePublish(tutorial.id, onChanged);
  const [value, setValue] = useState(tutorial.publishAt ? localValue(tutorial.publishAt) : '');
  const [error, setError] = useState<string | null>(null);
  const can = tutorial.abilities.schedulePublish;
  if (!can && !tutorial.publishAt) return null;
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    setError(null);
    const d = new Date(value);
    if (!value || Number.isNaN(d.getTime())) return setError('Pick a date and a time');
    set.mutate({ at: d.toISOString(), timeZone: tz });
  };
  const failure = error ?? set.error?.message ?? cancel.error?.message ?? null;
  return (
    <section aria-labelledby="schedule-title" className="rounded-lg border border-line bg-white p-5">
      <h2 id="schedule-title" className="text-lg">
        Publish later
      </h2>
      {tutorial.publishAt ? (
        <p className="mt-1 text-sm" role="status">
          Scheduled to publish on <strong>{inZone(tutorial.publishAt, tutorial.publishTimeZone ?? tz)}</strong> ({tutorial.publishTimeZone ?? tz})
          {tutorial.publishTimeZone && tutorial.publishTimeZone !== tz ? `, which is ${inZone(tutorial.publishAt, tz)} here (${tz})` : ''}. The maker and
          whoever scheduled it get an e-mail when it goes out.
        </p>
      ) : (
        <p className="mt-1 text-sm text-pencil">Pick when it goes out; it publishes itself then, even if nobody has the app open.</p>
      )}
      {can && (
        <form className="mt-3 flex flex-wrap items-end gap-3" onSubmit={submit} aria-label="Schedule publishing" noValidate>
          <div className="flex flex-col gap-1">
            <label htmlFor="publish-at" className="text-sm font-medium">
              Publish at
            </label>
            <input
              id="publish-at"
              type="datetime-local"
              value={value}
              onChange={(e) => setValue(e.target.value)}
              aria-describedby="publish-at-zone"
              aria-invalid={failure ? true : undefined}
              className="rounded-md border border-field bg-white px-3 py-2 text-sm"
            />
            <p id="publish-at-zone" className="text-xs text-pencil">
              Time zone: {tz}
            </p>
          </div>
          <Button type="submit" busy={set.isPending}>
            {tutorial.publishAt ? 'Reschedule' : 'Schedule'}
          </Button>
          {tutorial.publishAt && (
            <Button variant="secondary" busy={cancel.isPending} onClick={() => cancel.mutate(undefined, { onSuccess: () => setValue('') })}>
              Cancel the schedule
            </Button>
          )}
        </form>
      )}
      <div className="mt-3">{failure && <Notice kind="error">{failure}</Notice>}</div>
    </section>
  );
}
