import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zonedIso } from '@shared/classes/when';
import { parseMoney } from '@shared/money';
import type { ClassDto } from '@shared/schemas/class';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useCreateClass } from '../api/class-mutations';

type Form = {
  tutorialId: string;
  title: string;
  date: string;
  time: string;
  timeZone: string;
  durationMinutes: string;
  place: string;
  seats: string;
  fee: string;
  currency: string;
  whatToBring: string;
  deadlineDate: string;
};

const here = () => Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
/** The IANA zones this browser knows, offered as suggestions; the server checks the one typed. */
const TIME_ZONES: readonly string[] = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
const FIELD_OF: Record<string, keyof Form> = { startsAt: 'date', kitFeeCents: 'fee', cancellationDeadline: 'deadlineDate' };

/**
 * Schedules a class from one of the studio's tutorials. Date and time are read in the chosen time
 * zone and sent with their offset; the fee is typed as money and sent in minor units. The server's
 * schema checks everything again and its words go beside the fields.
 */
export function ScheduleClassForm({
  studioId,
  tutorials,
  onCreated,
  initialTutorialId,
}: {
  studioId: string;
  tutorials: { id: string; title: string }[];
  /** Preselected when it is one of `tutorials` (the Publish section links here with it). */
  initialTutorialId?: string | null;
  onCreated: (k: ClassDto) => void;
}) {
  const create = useCreateClass(studioId);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState, watch } = useForm<Form>({
    defaultValues: {
      tutorialId: tutorials.find((t) => t.id === initialTutorialId)?.id ?? tutorials[0]?.id ?? '',
      title: '',
      date: '',
      time: '18:00',
      timeZone: here(),
      durationMinutes: '120',
      place: '',
      seats: '10',
      fee: '0',
      currency: 'USD',
      whatToBring: '',
      deadlineDate: '',
    },
  });
  const currency = watch('currency');
  const submit = handleSubmit(async (v) => {
    setFormError(null);
    const startsAt = zonedIso(v.date, v.time, v.timeZone);
    if (!startsAt) return setError('date', { message: 'Pick the date and the time' });
    const kitFeeCents = parseMoney(v.fee || '0', v.currency.toUpperCase() || 'USD');
    if (kitFeeCents === null) return setError('fee', { message: 'Use an amount like 15 or 15.50' });
    const deadline = v.deadlineDate ? zonedIso(v.deadlineDate, '23:59', v.timeZone) : null;
    try {
      const k = await create.mutateAsync({
        tutorialId: v.tutorialId,
        ...(v.title.trim() ? { title: v.title.trim() } : {}),
        startsAt,
        timeZone: v.timeZone,
        durationMinutes: Number(v.durationMinutes),
        place: v.place,
        seats: Number(v.seats),
        kitFeeCents,
        currency: v.currency.toUpperCase(),
        whatToBring: v.whatToBring,
        cancellationDeadline: deadline,
      });
      onCreated(k);
    } catch (e) {
      if (e instanceof ApiError) {
        for (const i of e.issues) if (i.path) setError(FIELD_OF[i.path] ?? (i.path as keyof Form), { message: i.message });
        setFormError(e.message);
      } else setFormError('Something went wrong; please try again.');
    }
  });
  const err = formState.errors;
  return (
    <form onSubmit={submit} noValidate aria-label="Schedule a class" className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
      <SelectField label="Tutorial" {...register('tutorialId')} className="sm:col-span-2">
        {tutorials.map((t) => (
          <option key={t.id} value={t.id}>
            {t.title}
          </option>
        ))}
      </SelectField>
      <TextField label="Class title" placeholder="The tutorial’s title" {...register('title')} className="sm:col-span-2" />
      <TextField label="Date" type="date" {...register('date')} error={err.date?.message} />
      <TextField label="Time" type="time" {...register('time')} />
      <TextField
        label="Time zone"
        list="class-time-zones"
        autoComplete="off"
        {...register('timeZone')}
        error={err.timeZone?.message}
        hint="Type to pick, e.g. America/Chicago"
      />
      <datalist id="class-time-zones">
        {TIME_ZONES.map((z) => (
          <option key={z} value={z} />
        ))}
      </datalist>
      <TextField label="Length (minutes)" type="number" min={15} step={15} {...register('durationMinutes')} error={err.durationMinutes?.message} />
      <TextField label="Place" placeholder="Address or video-call link" {...register('place')} error={err.place?.message} className="sm:col-span-2" />
      <TextField label="Seats" type="number" min={1} {...register('seats')} error={err.seats?.message} />
      <div className="grid grid-cols-[1fr_5rem] gap-2">
        <TextField label={`Kit fee (${currency || 'USD'})`} inputMode="decimal" {...register('fee')} error={err.fee?.message} hint="0 for a free class" />
        <TextField label="Currency" maxLength={3} {...register('currency')} error={err.currency?.message} />
      </div>
      <TextField label="What to bring" placeholder="A bone folder, scissors" {...register('whatToBring')} className="sm:col-span-2" />
      <TextField label="Cancel until" type="date" {...register('deadlineDate')} error={err.deadlineDate?.message} hint="Refunds until the end of this day" />
      <div className="flex items-end">
        <Button type="submit" busy={create.isPending}>
          Schedule class
        </Button>
      </div>
      {formError && (
        <div className="sm:col-span-2 lg:col-span-4">
          <Notice kind="error">{formError}</Notice>
        </div>
      )}
    </form>
  );
}
