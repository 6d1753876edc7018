import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router-dom';
import { registerSchema, type PublicClassDto, type RegisterInput, type RegistrationCreatedDto } from '@shared/schemas/class';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/components/ui/form-errors';
import { useRegister } from '../api/public-class';

/** Name and e-mail, no account: then the checkout, a confirmed free seat, or the waiting list. */
export function RegisterForm({ k, onCheckout }: { k: PublicClassDto; onCheckout: (url: string) => void }) {
  const reg = useRegister(k.studio.slug, k.id);
  const [done, setDone] = useState<RegistrationCreatedDto | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<RegisterInput>({
    resolver: zodResolver(registerSchema),
    defaultValues: { name: '', email: '' },
  });
  if (k.registration.state === 'closed') return <Notice kind="info">{k.registration.reason}</Notice>;
  if (done)
    return (
      <Notice kind="success">
        {done.message}{' '}
        <Link to={done.registrationUrl} className="underline">
          See your registration
        </Link>
      </Notice>
    );
  const submit = handleSubmit(async (v) => {
    setFormError(null);
    try {
      const r = await reg.mutateAsync(v);
      if (r.checkoutUrl) onCheckout(r.checkoutUrl);
      else setDone(r);
    } catch (e) {
      setFormError(applyServerErrors(e, setError));
    }
  });
  return (
    <form onSubmit={submit} noValidate aria-label="Register" className="flex flex-col gap-3">
      {k.registration.state === 'full' && <Notice kind="info">{k.registration.reason}</Notice>}
      <TextField label="Your name" autoComplete="name" {...register('name')} error={formState.errors.name?.message} />
      <TextField label="E-mail" type="email" autoComplete="email" {...register('email')} error={formState.errors.email?.message} />
      <div>
        <Button type="submit" busy={reg.isPending}>
          {k.registration.state === 'full' ? 'Join the waiting list' : k.kitFeeCents > 0 ? `Register and pay ${k.fee}` : 'Register'}
        </Button>
      </div>
      <p className="text-xs text-pencil">
        No account needed. {k.kitFeeCents > 0 ? 'You pay the kit fee on the payment provider’s page; your seat is held for 30 minutes while you do.' : ''}
      </p>
      {formError && <Notice kind="error">{formError}</Notice>}
    </form>
  );
}
