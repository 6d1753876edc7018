import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createTutorialSchema, type CreateTutorialInput, type TutorialDto } from '@shared/schemas/tutorial';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/components/ui/form-errors';
import { useCreateTutorial } from '../api/tutorial-mutations';

/** Title and optional due date; the new tutorial opens right away. */
export function CreateTutorialForm({ studioId, onCreated }: { studioId: string; onCreated: (t: TutorialDto) => void }) {
  const create = useCreateTutorial();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<CreateTutorialInput>({
    resolver: zodResolver(createTutorialSchema),
    defaultValues: { studioId, title: '', dueDate: null },
  });
  const submit = handleSubmit(async (v) => {
    setFormError(null);
    try {
      const t = await create.mutateAsync({ ...v, dueDate: v.dueDate || null });
      reset({ studioId, title: '', dueDate: null });
      onCreated(t);
    } catch (e) {
      setFormError(applyServerErrors(e, setError));
    }
  });
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-3" noValidate aria-label="Start a tutorial">
      <TextField
        className="min-w-64 flex-1"
        label="New tutorial"
        placeholder="e.g. Pop-up snowflake card"
        {...register('title')}
        error={formState.errors.title?.message}
      />
      <TextField label="Due" type="date" {...register('dueDate', { setValueAs: (v) => v || null })} error={formState.errors.dueDate?.message} />
      <Button type="submit" busy={create.isPending}>
        Create tutorial
      </Button>
      {formError && (
        <div className="w-full">
          <Notice kind="error">{formError}</Notice>
        </div>
      )}
    </form>
  );
}
