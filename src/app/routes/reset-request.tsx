import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router-dom';
import { type z } from 'zod';
import { resetRequestSchema } from '@shared/schemas/auth';
import { AuthLayout } from '@/components/layout/auth-layout';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useRequestReset } from '@/features/auth/api/auth-mutations';
import { ApiError } from '@/lib/api-client';

/** Ask for a reset link by e-mail. */
export function ResetRequestRoute() {
  const request = useRequestReset();
  const { register, handleSubmit, formState } = useForm<z.infer<typeof resetRequestSchema>>({ resolver: zodResolver(resetRequestSchema) });
  return (
    <AuthLayout title="Reset your password">
      {request.isSuccess ? (
        <Notice kind="success">{request.data.message} The link works once, for one hour.</Notice>
      ) : (
        <form className="flex flex-col gap-4" onSubmit={handleSubmit((v) => request.mutate(v))} noValidate>
          {request.error && <Notice kind="error">{request.error instanceof ApiError ? request.error.message : 'Please try again.'}</Notice>}
          <p className="text-sm text-pencil">Enter the e-mail of your account and we will send a link to choose a new password.</p>
          <TextField label="E-mail" type="email" autoComplete="email" autoFocus {...register('email')} error={formState.errors.email?.message} />
          <Button type="submit" busy={request.isPending}>
            Send the link
          </Button>
        </form>
      )}
      <p className="mt-4 text-sm">
        <Link className="text-kraft-dark underline" to={paths.signIn()}>
          Back to sign in
        </Link>
      </p>
    </AuthLayout>
  );
}
