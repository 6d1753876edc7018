import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createBriefSchema, type CreateBriefInput } from '@shared/schemas/brief';
import type { PersonDto } from '@shared/schemas/tutorial';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/components/ui/form-errors';
import { useCreateBrief } from '../api/briefs';

type Values = { title: string; makerId: string; dueDate: string; features: string; notes: string };

/** A coordinator's new brief: what to make, for whom, by when, and what to feature (one product a line). */
export function BriefForm({ studioId, makers }: { studioId: string; makers: PersonDto[] }) {
  const create = useCreateBrief(studioId);
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<Values>({
    // The same schema as the server; features arrive as the lines of the text box.
    resolver: zodResolver(createBriefSchema as never),
    defaultValues: { title: '', makerId: '', dueDate: '', features: '', notes: '' },
  });
  const submit = handleSubmit(async (v) => {
    setFormError(null);
    setDone(null);
    try {
      const b = await create.mutateAsync(v as unknown as CreateBriefInput);
      reset({ title: '', makerId: '', dueDate: '', features: '', notes: '' });
      setDone(`Sent “${b.title}” to ${b.maker.name}; they get an e-mail.`);
    } catch (e) {
      setFormError(applyServerErrors(e, setError));
    }
  });
  const e = formState.errors;
  return (
    <form onSubmit={submit} noValidate aria-label="New brief" className="grid gap-3 sm:grid-cols-2">
      <TextField
        className="sm:col-span-2"
        label="What to make"
        placeholder="e.g. Easel card with the spring florals"
        {...register('title')}
        error={e.title?.message}
      />
      <SelectField label="Maker" {...register('makerId')} error={e.makerId?.message}>
        <option value="">Pick a maker</option>
        {makers.map((m) => (
          <option key={m.id} value={m.id}>
            {m.name}
          </option>
        ))}
      </SelectField>
      <TextField label="Due" type="date" {...register('dueDate')} error={e.dueDate?.message} />
      <div className="flex flex-col gap-1 sm:col-span-2">
        <label htmlFor="brief-features" className="text-sm font-medium">
          Products or papers to feature
        </label>
        <textarea
          id="brief-features"
          rows={3}
          aria-describedby="brief-features-hint"
          className="rounded-md border border-field bg-white px-3 py-2 text-sm"
          {...register('features')}
        />
        <p id="brief-features-hint" className="text-xs text-pencil">
          One a line, e.g. “Spring Florals 6x6 paper pad”.
        </p>
      </div>
      <div className="flex flex-col gap-1 sm:col-span-2">
        <label htmlFor="brief-notes" className="text-sm font-medium">
          Notes
        </label>
        <textarea id="brief-notes" rows={2} className="rounded-md border border-field bg-white px-3 py-2 text-sm" {...register('notes')} />
      </div>
      <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
        <Button type="submit" busy={create.isPending}>
          Send the brief
        </Button>
        {formError && <Notice kind="error">{formError}</Notice>}
        {done && <Notice kind="success">{done}</Notice>}
      </div>
    </form>
  );
}
