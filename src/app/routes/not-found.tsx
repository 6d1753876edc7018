import { Link, useRouteError, isRouteErrorResponse } from 'react-router-dom';
import { paths } from '@/config/paths';

/** Unknown addresses and unexpected errors, in words. */
export function NotFoundRoute() {
  const error = useRouteError();
  const missing = !error || (isRouteErrorResponse(error) && error.status === 404);
  return (
    <main className="mx-auto max-w-xl px-4 sm:px-6 py-24 text-center">
      <h1 className="text-2xl">{missing ? 'This page does not exist' : 'Something went wrong'}</h1>
      <hr className="score-rule my-6" />
      <p className="text-sm text-pencil">{missing ? 'The address may be mistyped, or the page was moved.' : String((error as Error)?.message ?? error)}</p>
      <Link to={paths.home()} className="mt-6 inline-block text-kraft-dark underline">
        Back to your studio
      </Link>
    </main>
  );
}
