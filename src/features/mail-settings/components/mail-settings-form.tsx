import { useState } from 'react';
import type { MailKind } from '@shared/schemas/mail-settings';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useMailSettings, useUpdateMailSettings } from '../api/mail-settings';

/**
 * One checkbox per kind of e-mail, saved as soon as it is ticked or cleared, with a line saying
 * it was saved (or why not; the box then goes back).
 */
export function MailSettingsForm({ studioId, studioName }: { studioId: string; studioName: string }) {
  const q = useMailSettings(studioId);
  const update = useUpdateMailSettings(studioId);
  const [said, setSaid] = useState<string | null>(null);
  if (q.isPending) return <Loading label="Loading your e-mail settings" />;
  if (q.error) return <Notice kind="error">{q.error.message}</Notice>;
  const toggle = (kind: MailKind, label: string, on: boolean) => {
    setSaid(null);
    update.mutate({ [kind]: on }, { onSuccess: () => setSaid(`Saved: ${label.toLowerCase()} ${on ? 'on' : 'off'}.`) });
  };
  return (
    <form aria-labelledby="mail-kinds-title" onSubmit={(e) => e.preventDefault()} className="rounded-lg border border-line bg-white p-5">
      <fieldset>
        <legend id="mail-kinds-title" className="text-lg font-serif">
          E-mail from {studioName}
        </legend>
        <p className="mt-1 text-sm text-pencil">
          Tick what you want to hear about. Each e-mail links to the place in the app; everything also shows in the app itself.
        </p>
        <ul className="mt-4 space-y-3">
          {q.data.kinds.map((k) => (
            <li key={k.kind} className="flex items-start gap-3">
              <input
                id={`mail-${k.kind}`}
                type="checkbox"
                className="mt-1 h-4 w-4 accent-kraft"
                checked={k.enabled}
                disabled={update.isPending}
                aria-describedby={`mail-${k.kind}-hint`}
                onChange={(e) => toggle(k.kind, k.label, e.target.checked)}
              />
              <div>
                <label htmlFor={`mail-${k.kind}`} className="text-sm font-medium">
                  {k.label}
                </label>
                <p id={`mail-${k.kind}-hint`} className="text-xs text-pencil">
                  {k.hint}
                </p>
              </div>
            </li>
          ))}
        </ul>
      </fieldset>
      <div className="mt-4" aria-live="polite">
        {update.error && <Notice kind="error">Not saved: {update.error.message}</Notice>}
        {said && !update.error && <Notice kind="success">{said}</Notice>}
      </div>
    </form>
  );
}
