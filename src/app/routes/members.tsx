import { useParams } from 'react-router-dom';
import { ROLES, ROLE_LABELS, type Role } from '@shared/schemas/roles';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useChangeRole, useMembers, useRemoveMember, useWithdrawInvitation } from '@/features/studios/api/members';
import { InviteForm } from '@/features/studios/components/invite-form';

/** Who is in the studio; owners invite, change roles and remove. */
export function MembersRoute() {
  const { studioId = '' } = useParams();
  const members = useMembers(studioId);
  const changeRole = useChangeRole(studioId);
  const remove = useRemoveMember(studioId);
  const withdraw = useWithdrawInvitation(studioId);
  const error = changeRole.error ?? remove.error ?? withdraw.error;
  if (members.isPending)
    return (
      <main className="mx-auto max-w-4xl px-4 sm:px-6 py-8">
        <Loading />
      </main>
    );
  if (members.error)
    return (
      <main className="mx-auto max-w-4xl px-4 sm:px-6 py-8">
        <Notice kind="error">{members.error.message}</Notice>
      </main>
    );
  const { abilities } = members.data;
  return (
    <main className="mx-auto max-w-4xl px-4 sm:px-6 py-8">
      <h1 className="text-2xl">Members</h1>
      <hr className="score-rule my-4" />
      {abilities.manageMembers && (
        <div className="mb-6 rounded-lg border border-line bg-white p-4">
          <InviteForm studioId={studioId} />
        </div>
      )}
      {error && (
        <div className="mb-3">
          <Notice kind="error">{error.message}</Notice>
        </div>
      )}
      <table className="stack-table w-full rounded-lg border border-line bg-white text-sm">
        <thead className="text-left text-pencil">
          <tr>
            <th className="px-4 py-2 font-medium">Name</th>
            {abilities.seeMemberEmails && <th className="px-4 py-2 font-medium">E-mail</th>}
            <th className="px-4 py-2 font-medium">Role</th>
            {abilities.manageMembers && <th className="px-4 py-2" />}
          </tr>
        </thead>
        <tbody>
          {members.data.members.map((m) => (
            <tr key={m.userId} className="border-t border-line">
              <td className="px-4 py-2 font-medium sm:font-normal">{m.name}</td>
              {abilities.seeMemberEmails && (
                <td className="px-4 py-2 break-all text-pencil" data-label="E-mail">
                  {m.email}
                </td>
              )}
              <td className="px-4 py-2" data-label="Role">
                {abilities.manageMembers ? (
                  <select
                    aria-label={`Role of ${m.name}`}
                    className="rounded-md border border-field bg-white px-2 py-1"
                    value={m.role}
                    onChange={(e) => changeRole.mutate({ userId: m.userId, role: e.target.value as Role })}
                  >
                    {ROLES.map((r) => (
                      <option key={r} value={r}>
                        {ROLE_LABELS[r]}
                      </option>
                    ))}
                  </select>
                ) : (
                  ROLE_LABELS[m.role]
                )}
              </td>
              {abilities.manageMembers && (
                <td className="px-4 py-2 text-right">
                  <Button size="sm" variant="ghost" className="text-rosehip" onClick={() => remove.mutate(m.userId)}>
                    Remove
                  </Button>
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
      {abilities.manageMembers && members.data.invitations.length > 0 && (
        <section className="mt-8">
          <h2 className="text-lg">Waiting for an answer</h2>
          <ul className="mt-2 rounded-lg border border-line bg-white text-sm">
            {members.data.invitations.map((i) => (
              <li key={i.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 border-b border-line px-4 py-2 last:border-0">
                <span className="min-w-0 flex-[1_1_12rem] break-all">{i.email}</span>
                <span className="text-pencil">{ROLE_LABELS[i.role]}</span>
                <span className="text-pencil">until {new Date(i.expiresAt).toLocaleDateString()}</span>
                <Button size="sm" variant="ghost" onClick={() => withdraw.mutate(i.id)}>
                  Withdraw
                </Button>
              </li>
            ))}
          </ul>
        </section>
      )}
    </main>
  );
}
