import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useNavigate, useParams } from 'react-router-dom';
import { passwordSchema } from '@shared/schemas/auth';
import { z } from 'zod';
import { AuthLayout } from '@/components/layout/auth-layout';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/components/ui/form-errors';
import { paths } from '@/config/paths';
import { useResetPassword } from '@/features/auth/api/auth-mutations';

const formSchema = z.object({ password: passwordSchema });

/** Choose a new password from the e-mailed link. */
export function ResetRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const reset = useResetPassword();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<z.infer<typeof formSchema>>({ resolver: zodResolver(formSchema) });
  const submit = handleSubmit(async ({ password }) => {
    setFormError(null);
    try {
      await reset.mutateAsync({ token, password });
      void navigate(paths.home(), { replace: true });
    } catch (e) {
      setFormError(applyServerErrors(e, setError));
    }
  });
  return (
    <AuthLayout title="Choose a new password">
      <form className="flex flex-col gap-4" onSubmit={submit} noValidate>
        {formError && <Notice kind="error">{formError}</Notice>}
        <TextField
          label="New password"
          type="password"
          autoComplete="new-password"
          autoFocus
          {...register('password')}
          error={formState.errors.password?.message}
          hint="At least 15 characters."
        />
        <Button type="submit" busy={reset.isPending}>
          Save and sign in
        </Button>
      </form>
    </AuthLayout>
  );
}
