import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { inviteSchema, type InviteInput } from '@shared/schemas/studio';
import { ROLES, ROLE_LABELS } from '@shared/schemas/roles';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/components/ui/form-errors';
import { useInvite } from '../api/members';

/** Invite someone by e-mail with a role. */
export function InviteForm({ studioId }: { studioId: string }) {
  const invite = useInvite(studioId);
  const [message, setMessage] = useState<{ kind: 'error' | 'success'; text: string } | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<InviteInput>({
    resolver: zodResolver(inviteSchema),
    defaultValues: { email: '', role: 'maker' },
  });
  const submit = handleSubmit(async (v) => {
    setMessage(null);
    try {
      const sent = await invite.mutateAsync(v);
      reset({ email: '', role: v.role });
      setMessage({
        kind: 'success',
        text: sent.resent ? `Invitation sent again to ${sent.email}; the earlier link no longer works.` : `Invitation sent to ${sent.email}.`,
      });
    } catch (e) {
      setMessage({ kind: 'error', text: applyServerErrors(e, setError) });
    }
  });
  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-3" noValidate aria-label="Invite a member">
      <TextField className="min-w-64 flex-1" label="E-mail" type="email" {...register('email')} error={formState.errors.email?.message} />
      <SelectField label="Role" {...register('role')}>
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {ROLE_LABELS[r]}
          </option>
        ))}
      </SelectField>
      <Button type="submit" busy={invite.isPending}>
        Send invitation
      </Button>
      {message && (
        <div className="w-full">
          <Notice kind={message.kind}>{message.text}</Notice>
        </div>
      )}
    </form>
  );
}
