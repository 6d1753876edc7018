import { useState } from 'react';
import { REGISTRATION_STATUS_LABELS } from '@shared/schemas/class';
import { momentIn } from '@shared/classes/when';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useCancelOwn, useCheckout, useRegistration } from '../api/public-class';
import { ClassFacts } from './class-facts';

/** The attendee's own page (the link in their e-mail): status, pay, cancel, the handout and calendar file. */
export function RegistrationView({
  id,
  token,
  returned,
  onCheckout,
}: {
  id: string;
  token: string;
  returned: string | null;
  onCheckout: (url: string) => void;
}) {
  const q = useRegistration(id, token);
  const pay = useCheckout(id, token);
  const cancel = useCancelOwn(id, token);
  const [asking, setAsking] = useState(false);
  if (q.isPending) return <Loading label="Loading your registration" />;
  if (q.error) return <Notice kind="error">{q.error.message}</Notice>;
  const r = q.data;
  return (
    <div className="flex flex-col gap-4">
      <h1 className="text-2xl">{r.class.title}</h1>
      <p className="text-sm text-pencil">
        {r.name} · {r.email} · <span className="font-medium text-ink">{REGISTRATION_STATUS_LABELS[r.status]}</span>
      </p>
      {returned === 'cancelled' && r.status === 'awaiting_payment' && (
        <Notice kind="info">The payment was not finished; your seat is still held for now.</Notice>
      )}
      <Notice kind={r.status === 'confirmed' ? 'success' : r.status === 'cancelled' || r.status === 'expired' ? 'error' : 'info'}>
        {r.message}
        {r.status === 'waitlisted' && r.waitlistPlace ? ` You are number ${r.waitlistPlace}.` : ''}
        {r.status === 'awaiting_payment' && r.holdExpiresAt ? ` It is held until ${momentIn(r.holdExpiresAt, r.class.timeZone)}.` : ''}
      </Notice>
      <div className="flex flex-wrap gap-2">
        {r.canPay && (
          <Button
            busy={pay.isPending}
            onClick={() => pay.mutate(undefined, { onSuccess: (x) => (x.checkoutUrl ? onCheckout(x.checkoutUrl) : void q.refetch()) })}
          >
            Pay {r.fee}
          </Button>
        )}
        {r.handoutUrl && (
          <a className="rounded-md border border-line bg-white px-4 py-2 text-sm hover:border-kraft" href={r.handoutUrl} download>
            Handout (PDF)
          </a>
        )}
        {r.calendarUrl && (
          <a className="rounded-md border border-line bg-white px-4 py-2 text-sm hover:border-kraft" href={r.calendarUrl} download>
            Add to calendar (.ics)
          </a>
        )}
        {r.canCancel && (
          <Button variant="danger" onClick={() => setAsking(true)}>
            Cancel my registration
          </Button>
        )}
      </div>
      {r.cancelNote && <p className="text-sm text-pencil">{r.cancelNote}</p>}
      {(pay.error ?? cancel.error) && <Notice kind="error">{(pay.error ?? cancel.error)!.message}</Notice>}
      <ClassFacts k={r.class} />
      <ConfirmDialog
        open={asking}
        title="Cancel your registration?"
        confirmLabel="Cancel my registration"
        danger
        busy={cancel.isPending}
        onCancel={() => setAsking(false)}
        onConfirm={() => cancel.mutate(undefined, { onSettled: () => setAsking(false) })}
      >
        {r.status === 'confirmed' && r.amountCents > 0 ? `The kit fee of ${r.fee} goes back to your card.` : 'Your place goes to the next person.'}
      </ConfirmDialog>
    </div>
  );
}
