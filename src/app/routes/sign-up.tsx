import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { signUpSchema, type SignUpInput } from '@shared/schemas/auth';
import { AuthLayout } from '@/components/layout/auth-layout';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/components/ui/form-errors';
import { paths } from '@/config/paths';
import { useSignUp } from '@/features/auth/api/auth-mutations';
import { useInvitation } from '@/features/auth/api/invitation';

/** Create an account: a studio of one's own, or join the inviting one. */
export function SignUpRoute() {
  const [params] = useSearchParams();
  const invite = params.get('invite') ?? undefined;
  const invitation = useInvitation(invite ?? '');
  const navigate = useNavigate();
  const signUp = useSignUp();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SignUpInput>({
    resolver: zodResolver(signUpSchema),
    values: invite && invitation.data ? { name: '', email: invitation.data.email, password: '', invitationToken: invite } : undefined,
  });
  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const me = await signUp.mutateAsync({ ...values, invitationToken: invite, studioName: invite ? undefined : values.studioName || undefined });
      void navigate(paths.studio(me.studios[0].id), { replace: true });
    } catch (e) {
      setFormError(applyServerErrors(e, setError));
    }
  });
  return (
    <AuthLayout title={invite && invitation.data ? `Join ${invitation.data.studio.name}` : 'Create your account'}>
      <form className="flex flex-col gap-4" onSubmit={submit} noValidate>
        {formError && <Notice kind="error">{formError}</Notice>}
        <TextField label="Your name" autoComplete="name" autoFocus {...register('name')} error={formState.errors.name?.message} />
        <TextField label="E-mail" type="email" autoComplete="email" readOnly={Boolean(invite)} {...register('email')} error={formState.errors.email?.message} />
        <TextField
          label="Password"
          type="password"
          autoComplete="new-password"
          {...register('password')}
          error={formState.errors.password?.message}
          hint="At least 15 characters. A few words in a row are easy to remember and hard to guess."
        />
        {!invite && (
          <TextField
            label="Studio name"
            placeholder="e.g. Willow Street Cards"
            {...register('studioName')}
            hint="Your team’s workspace; you can rename it later."
          />
        )}
        <Button type="submit" busy={signUp.isPending}>
          Create account
        </Button>
        <p className="text-sm">
          Already have an account?{' '}
          <Link className="text-kraft-dark underline" to={paths.signIn()}>
            Sign in
          </Link>
        </p>
      </form>
    </AuthLayout>
  );
}
