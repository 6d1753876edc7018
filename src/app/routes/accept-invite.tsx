import { Link, useNavigate, useParams } from 'react-router-dom';
import { ROLE_LABELS } from '@shared/schemas/roles';
import { AuthLayout } from '@/components/layout/auth-layout';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { useAcceptInvitation, useInvitation } from '@/features/auth/api/invitation';

/** An invitation link: join with the current account, sign in, or create one. */
export function AcceptInviteRoute() {
  const { token = '' } = useParams();
  const invitation = useInvitation(token);
  const me = useMe();
  const accept = useAcceptInvitation();
  const navigate = useNavigate();
  if (invitation.isPending || me.isPending)
    return (
      <AuthLayout title="Invitation">
        <Loading />
      </AuthLayout>
    );
  if (invitation.error) {
    return (
      <AuthLayout title="Invitation">
        <Notice kind="error">{invitation.error.message}</Notice>
      </AuthLayout>
    );
  }
  const inv = invitation.data;
  const here = paths.invite(token);
  return (
    <AuthLayout title={`Join ${inv.studio.name}`}>
      <p className="text-sm">
        You are invited as <strong>{ROLE_LABELS[inv.role]}</strong> ({inv.email}).
      </p>
      <div className="mt-6 flex flex-col gap-3">
        {accept.error && <Notice kind="error">{accept.error.message}</Notice>}
        {me.data ? (
          <>
            {me.data.user.email !== inv.email && <Notice>You are signed in as {me.data.user.email}; the invitation will be added to that account.</Notice>}
            <Button busy={accept.isPending} onClick={async () => navigate(paths.studio((await accept.mutateAsync(token)).studioId))}>
              Accept and open the studio
            </Button>
          </>
        ) : inv.hasAccount ? (
          <Link className="rounded-md bg-kraft px-4 py-2 text-center text-sm font-medium text-white" to={paths.signIn(here)}>
            Sign in to accept
          </Link>
        ) : (
          <Link className="rounded-md bg-kraft px-4 py-2 text-center text-sm font-medium text-white" to={paths.signUp(token)}>
            Create your account
          </Link>
        )}
      </div>
    </AuthLayout>
  );
}
