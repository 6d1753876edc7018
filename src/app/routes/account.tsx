import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { changePasswordSchema } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/components/ui/form-errors';
import { useMe } from '@/features/auth/api/get-me';
import { useChangePassword } from '@/features/auth/api/auth-mutations';

type Form = z.input<typeof changePasswordSchema>;

/** The signed-in person's own account: who they are signed in as, and a new password. */
export function AccountRoute() {
  const me = useMe();
  const change = useChangePassword();
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const { register, handleSubmit, setError, reset, formState } = useForm<Form>({ resolver: zodResolver(changePasswordSchema) });
  const submit = handleSubmit(async (values) => {
    setFormError(null);
    setDone(false);
    try {
      await change.mutateAsync(values);
      reset();
      setDone(true);
    } catch (e) {
      setFormError(applyServerErrors(e, setError));
    }
  });
  return (
    <main className="mx-auto max-w-2xl px-4 py-8 sm:px-6">
      <h1 className="text-2xl">Your account</h1>
      {me.data && (
        <p className="mt-1 text-sm text-pencil">
          Signed in as {me.data.user.name} ({me.data.user.email}).
        </p>
      )}
      <hr className="score-rule my-4" />
      <section aria-labelledby="change-password" className="rounded-lg border border-line bg-white p-4 sm:p-6">
        <h2 id="change-password" className="text-lg">
          Change your password
        </h2>
        <p className="mt-1 text-sm text-pencil">Every other place you are signed in is signed out; this browser stays signed in.</p>
        <form className="mt-4 flex flex-col gap-4" onSubmit={submit} noValidate>
          {formError && <Notice kind="error">{formError}</Notice>}
          {done && <Notice kind="success">Your password is changed. Other browsers and devices will need the new one.</Notice>}
          <TextField
            label="Current password"
            type="password"
            autoComplete="current-password"
            {...register('currentPassword')}
            error={formState.errors.currentPassword?.message}
          />
          <TextField
            label="New password"
            type="password"
            autoComplete="new-password"
            {...register('password')}
            error={formState.errors.password?.message}
            hint="At least 15 characters."
          />
          <div>
            <Button type="submit" busy={change.isPending}>
              Change password
            </Button>
          </div>
        </form>
      </section>
    </main>
  );
}
