import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { signInSchema, type SignInInput } from '@shared/schemas/auth';
import { ROLE_LABELS } from '@shared/schemas/roles';
import { AuthLayout } from '@/components/layout/auth-layout';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/components/ui/form-errors';
import { paths, sameSiteNext } from '@/config/paths';
import { useSignIn } from '@/features/auth/api/auth-mutations';
import { useDemo } from '@/features/auth/api/get-demo';
import { useState } from 'react';

/** Sign in; lists the demo people while the demo studio exists. */
export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const signIn = useSignIn();
  const demo = useDemo();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setValue, setError, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await signIn.mutateAsync(values);
      void navigate(sameSiteNext(params.get('next')), { replace: true });
    } catch (e) {
      setFormError(applyServerErrors(e, setError));
    }
  });

  const aside = demo.data?.present ? (
    <section className="w-full max-w-md rounded-xl border border-dashed border-kraft/50 bg-white/60 p-5 text-sm" aria-labelledby="demo-people">
      <h2 id="demo-people" className="text-base">
        Demo people
      </h2>
      <p className="mt-1 text-pencil">
        Every demo person’s password is <code className="rounded bg-kraft-light px-1">{demo.data.password}</code>. Click one to fill the form.
      </p>
      <ul className="mt-3 grid gap-1">
        {demo.data.people.map((p) => (
          <li key={p.email}>
            <button
              type="button"
              className="flex w-full justify-between rounded-md px-2 py-1 text-left hover:bg-kraft-light"
              onClick={() => {
                setValue('email', p.email);
                setValue('password', demo.data!.password!);
              }}
            >
              <span>
                {p.name} <span className="text-pencil">· {p.email}</span>
              </span>
              <span className="text-pencil">{ROLE_LABELS[p.role]}</span>
            </button>
          </li>
        ))}
      </ul>
    </section>
  ) : null;

  return (
    <AuthLayout title="Sign in" aside={aside}>
      <form className="flex flex-col gap-4" onSubmit={submit} noValidate>
        {formError && <Notice kind="error">{formError}</Notice>}
        <TextField label="E-mail" type="email" autoComplete="email" autoFocus {...register('email')} error={formState.errors.email?.message} />
        <TextField label="Password" type="password" autoComplete="current-password" {...register('password')} error={formState.errors.password?.message} />
        <Button type="submit" busy={signIn.isPending}>
          Sign in
        </Button>
        <div className="flex justify-between text-sm">
          <Link className="text-kraft-dark underline" to={paths.resetRequest()}>
            Forgot your password?
          </Link>
          <Link className="text-kraft-dark underline" to={paths.signUp()}>
            Create an account
          </Link>
        </div>
      </form>
    </AuthLayout>
  );
}
