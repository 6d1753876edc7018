import { createBrowserRouter, redirect } from 'react-router-dom';
import { queryClient } from '@/lib/query-client';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { paths } from '@/config/paths';
import { SignInRoute } from './routes/sign-in';
import { SignUpRoute } from './routes/sign-up';
import { ResetRequestRoute } from './routes/reset-request';
import { ResetRoute } from './routes/reset';
import { AcceptInviteRoute } from './routes/accept-invite';
import { HomeRedirectRoute, SignedInLayoutRoute } from './routes/signed-in-layout';
import { StudioHomeRoute } from './routes/studio-home';
import { MembersRoute } from './routes/members';
import { OutboxRoute } from './routes/outbox';
import { TutorialLayoutRoute } from './routes/tutorial-layout';
import { NotFoundRoute } from './routes/not-found';

/** Signed-out pages bounce signed-in people home. */
const signedOutOnly = async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  return me ? redirect(paths.home()) : null;
};

/** Data routes: pages compose features; heavy sections load lazily. */
export const router = createBrowserRouter([
  { path: '/sign-in', element: <SignInRoute />, loader: signedOutOnly },
  { path: '/sign-up', element: <SignUpRoute /> },
  { path: '/reset', element: <ResetRequestRoute /> },
  { path: '/reset/:token', element: <ResetRoute /> },
  { path: '/invite/:token', element: <AcceptInviteRoute /> },
  {
    element: <SignedInLayoutRoute />,
    errorElement: <NotFoundRoute />,
    children: [
      { index: true, element: <HomeRedirectRoute /> },
      { path: '/studios/:studioId', element: <StudioHomeRoute /> },
      { path: '/studios/:studioId/members', element: <MembersRoute /> },
      { path: '/outbox', element: <OutboxRoute /> },
      { path: '/outbox/:messageId', element: <OutboxRoute /> },
      {
        path: '/tutorials/:tutorialId',
        element: <TutorialLayoutRoute />,
        children: [
          { index: true, loader: ({ params }) => redirect(paths.tutorialSection(params.tutorialId!, 'footage')) },
          { path: 'footage', lazy: async () => ({ Component: (await import('./routes/footage')).FootageRoute }) },
          { path: 'cut-list', lazy: async () => ({ Component: (await import('./routes/cut-list')).CutListRoute }) },
          { path: 'supplies', lazy: async () => ({ Component: (await import('./routes/supplies')).SuppliesRoute }) },
          { path: 'write-up', lazy: async () => ({ Component: (await import('./routes/write-up')).WriteUpRoute }) },
          { path: 'publish', lazy: async () => ({ Component: (await import('./routes/publish')).PublishRoute }) },
        ],
      },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);
