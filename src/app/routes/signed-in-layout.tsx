import { Navigate, useNavigate } from 'react-router-dom';
import { AppShell } from '@/components/layout/app-shell';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useSignOut } from '@/features/auth/api/auth-mutations';
import { useMe } from '@/features/auth/api/get-me';

/** Everything behind sign-in shares the shell; signed-out visitors go to the sign-in page. */
export function SignedInLayoutRoute() {
  const me = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();
  if (me.isPending) return <Loading />;
  if (!me.data) return <Navigate to={paths.signIn(location.pathname + location.search)} replace />;
  return <AppShell me={me.data} onSignOut={() => signOut.mutate(undefined, { onSuccess: () => void navigate(paths.signIn()) })} />;
}

/** The home address opens the first studio. */
export function HomeRedirectRoute() {
  const me = useMe();
  const first = me.data?.studios[0];
  if (!first) {
    return (
      <main className="mx-auto max-w-xl px-4 sm:px-6 py-24 text-center">
        <h1 className="text-2xl">You are not in a studio yet</h1>
        <p className="mt-3 text-sm text-pencil">Ask a studio owner to invite you; the link in their e-mail brings you in.</p>
      </main>
    );
  }
  return <Navigate to={paths.studio(first.id)} replace />;
}
