import { useState } from 'react';
import type { ClassDto } from '@shared/schemas/class';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useCancelClass, useUpdateClass } from '../api/class-mutations';

/** Seats, spares, what to bring and the class's safety cautions (one a line), and cancelling the class. */
export function ClassSettings({ klass }: { klass: ClassDto }) {
  const update = useUpdateClass(klass.id);
  const cancel = useCancelClass(klass.id);
  const [cautions, setCautions] = useState(klass.cautions.join('\n'));
  const [seats, setSeats] = useState(String(klass.seats));
  const [spares, setSpares] = useState(String(klass.spares));
  const [bring, setBring] = useState(klass.whatToBring);
  const [asking, setAsking] = useState(false);
  const cancelled = klass.status === 'cancelled';
  return (
    <section aria-label="Class settings" className="flex flex-col gap-3 rounded-lg border border-line bg-white p-4">
      <h2 className="text-xl">Details and safety</h2>
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField label="Seats" type="number" min={1} value={seats} onChange={(e) => setSeats(e.target.value)} disabled={cancelled} />
        <TextField label="Spare kits" type="number" min={0} value={spares} onChange={(e) => setSpares(e.target.value)} disabled={cancelled} />
        <TextField label="What to bring" value={bring} onChange={(e) => setBring(e.target.value)} disabled={cancelled} />
      </div>
      <label className="flex flex-col gap-1 text-sm font-medium">
        Safety cautions (one a line; shown on the class page, in the confirmation e-mail and on the handout)
        <textarea
          className="min-h-40 rounded-md border border-line bg-white px-3 py-2 text-sm font-normal"
          value={cautions}
          onChange={(e) => setCautions(e.target.value)}
          disabled={cancelled}
        />
      </label>
      <div className="flex flex-wrap gap-2">
        <Button
          busy={update.isPending}
          disabled={cancelled}
          onClick={() => update.mutate({ seats: Number(seats), spares: Number(spares), whatToBring: bring, cautions: cautions.trim() || null })}
        >
          Save
        </Button>
        {klass.cautionsCustom && (
          <Button variant="secondary" disabled={cancelled} onClick={() => (setCautions(klass.defaultCautions.join('\n')), update.mutate({ cautions: null }))}>
            Use the default cautions
          </Button>
        )}
        <Button variant="danger" className="ml-auto" disabled={cancelled} onClick={() => setAsking(true)}>
          Cancel the class
        </Button>
      </div>
      {update.error && <Notice kind="error">{update.error.message}</Notice>}
      {update.isSuccess && <Notice kind="success">Saved.</Notice>}
      {cancel.error && <Notice kind="error">{cancel.error.message}</Notice>}
      <ConfirmDialog
        open={asking}
        title={`Cancel “${klass.title}”?`}
        confirmLabel="Cancel the class and refund everyone"
        danger
        busy={cancel.isPending}
        onCancel={() => setAsking(false)}
        onConfirm={() => cancel.mutate(undefined, { onSettled: () => setAsking(false) })}
      >
        Everyone who paid gets the kit fee back in full; everyone registered gets an e-mail. This cannot be undone.
      </ConfirmDialog>
    </section>
  );
}
