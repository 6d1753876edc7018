import { ScrollArea } from '@/components/ui/scroll-area';
import { useState } from 'react';
import { REGISTRATION_STATUS_LABELS, type ClassDto, type RegistrationRowDto } from '@shared/schemas/class';
import { formatMoney } from '@shared/money';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { Notice } from '@/components/ui/notice';
import { EmptyState } from '@/components/ui/empty-state';
import { useCancelRegistration, useCheckIn } from '../api/class-mutations';

const tone: Record<string, string> = {
  confirmed: 'bg-sage-light text-ink',
  awaiting_payment: 'bg-kraft-light text-kraft-dark',
  waitlisted: 'bg-white text-ink border border-line',
  cancelled: 'bg-rosehip-light text-rosehip',
  refunded: 'bg-rosehip-light text-rosehip',
  expired: 'bg-white text-pencil border border-line',
};

/** The roster: who is paid, holding a seat, waiting, or gone; ticks at the door; cancel with a refund. */
export function Roster({ klass, csvHref }: { klass: ClassDto; csvHref: string }) {
  const checkIn = useCheckIn(klass.id);
  const cancel = useCancelRegistration(klass.id);
  const [asking, setAsking] = useState<RegistrationRowDto | null>(null);
  const error = checkIn.error ?? cancel.error;
  const live = klass.registrations.filter((r) => r.status !== 'expired');
  return (
    <section aria-label="Roster" className="rounded-lg border border-line bg-white p-4">
      <div className="mb-3 flex flex-wrap items-center gap-3">
        <h2 className="text-xl">Roster</h2>
        <span className="text-sm text-pencil">
          {klass.seatsTaken} of {klass.seats} seats taken{klass.waitlisted ? ` · ${klass.waitlisted} on the waiting list` : ''}
        </span>
        <a className="ml-auto text-sm text-kraft-dark underline" href={csvHref} download>
          Export CSV
        </a>
      </div>
      {error && <Notice kind="error">{error.message}</Notice>}
      {live.length === 0 ? (
        <EmptyState title="Nobody has registered yet">Share the public page: attendees register there without an account.</EmptyState>
      ) : (
        <ScrollArea label="Roster">
          <table className="w-full min-w-[36rem] text-left text-sm">
            <thead className="text-xs text-pencil">
              <tr>
                <th className="py-2 pr-2">At the door</th>
                <th className="py-2 pr-2">Name</th>
                <th className="py-2 pr-2">E-mail</th>
                <th className="py-2 pr-2">Status</th>
                <th className="py-2" />
              </tr>
            </thead>
            <tbody>
              {live.map((r) => (
                <tr key={r.id} className="border-t border-line" aria-label={r.name}>
                  <td className="py-2 pr-2">
                    <input
                      type="checkbox"
                      className="h-4 w-4 accent-kraft"
                      aria-label={`${r.name} is here`}
                      disabled={r.status !== 'confirmed' || checkIn.isPending}
                      checked={r.checkedIn}
                      onChange={(e) => checkIn.mutate({ registrationId: r.id, checkedIn: e.target.checked })}
                    />
                  </td>
                  <td className="py-2 pr-2 font-medium">{r.name}</td>
                  <td className="py-2 pr-2 break-all">{r.email}</td>
                  <td className="py-2 pr-2">
                    <span className={`rounded-full px-2 py-0.5 text-xs ${tone[r.status]}`}>
                      {REGISTRATION_STATUS_LABELS[r.status]}
                      {r.waitlistPlace ? ` #${r.waitlistPlace}` : ''}
                    </span>
                    {r.status === 'awaiting_payment' && r.offeredAt && <span className="ml-1 text-xs text-pencil">offered</span>}
                  </td>
                  <td className="py-2 text-right">
                    {(r.status === 'confirmed' || r.status === 'awaiting_payment' || r.status === 'waitlisted') && (
                      <Button size="sm" variant="danger" onClick={() => setAsking(r)}>
                        Cancel
                      </Button>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollArea>
      )}
      <ConfirmDialog
        open={asking !== null}
        title={`Cancel ${asking?.name ?? ''}’s registration?`}
        confirmLabel={asking?.paidAt ? `Cancel and refund ${formatMoney(asking.amountCents, asking.currency)}` : 'Cancel registration'}
        danger
        busy={cancel.isPending}
        onCancel={() => setAsking(null)}
        onConfirm={() => asking && cancel.mutate({ registrationId: asking.id, refund: true }, { onSettled: () => setAsking(null) })}
      >
        {asking?.paidAt ? 'The kit fee goes back to their card in full, and they get an e-mail saying so.' : 'They get an e-mail saying so.'} The seat is
        offered to the waiting list.
      </ConfirmDialog>
    </section>
  );
}
