import { createBrowserRouter, redirect } from 'react-router-dom';
import { queryClient } from '@/lib/query-client';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { paths } from '@/config/paths';
import { Loading } from '@/components/ui/spinner';

/** Shown while the first page's loader or lazy code arrives (React Router asks for one). */
const HydrateFallback = () => (
  <main className="mx-auto max-w-7xl px-4 sm:px-6 py-8">
    <Loading />
  </main>
);

/** Signed-out pages bounce signed-in people home. */
const signedOutOnly = async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  return me ? redirect(paths.home()) : null;
};

/**
 * Data routes: pages compose features. Every page is its own chunk, loaded when it is first opened,
 * so the first load carries React, the router and the query client, and only that page's code
 * (bench/first-load.bench.ts holds the sign-in and studio pages under 170 KB of gzip JS).
 */
export const router = createBrowserRouter([
  { path: '/sign-in', lazy: async () => ({ Component: (await import('./routes/sign-in')).SignInRoute }), loader: signedOutOnly, HydrateFallback },
  { path: '/sign-up', lazy: async () => ({ Component: (await import('./routes/sign-up')).SignUpRoute }), HydrateFallback },
  { path: '/reset', lazy: async () => ({ Component: (await import('./routes/reset-request')).ResetRequestRoute }), HydrateFallback },
  { path: '/reset/:token', lazy: async () => ({ Component: (await import('./routes/reset')).ResetRoute }), HydrateFallback },
  { path: '/invite/:token', lazy: async () => ({ Component: (await import('./routes/accept-invite')).AcceptInviteRoute }), HydrateFallback },
  // Public class pages: no account needed.
  { path: '/c/:studioSlug/:classId', lazy: async () => ({ Component: (await import('./routes/public-class')).PublicClassRoute }), HydrateFallback },
  {
    path: '/c/:studioSlug/:classId/r/:registrationId',
    lazy: async () => ({ Component: (await import('./routes/public-class')).RegistrationRoute }),
    HydrateFallback,
  },
  {
    lazy: async () => {
      const { SignedInLayoutRoute } = await import('./routes/signed-in-layout');
      const { NotFoundRoute } = await import('./routes/not-found');
      return { Component: SignedInLayoutRoute, ErrorBoundary: NotFoundRoute };
    },
    HydrateFallback,
    children: [
      { index: true, lazy: async () => ({ Component: (await import('./routes/signed-in-layout')).HomeRedirectRoute }) },
      { path: '/studios/:studioId', lazy: async () => ({ Component: (await import('./routes/studio-home')).StudioHomeRoute }) },
      { path: '/studios/:studioId/members', lazy: async () => ({ Component: (await import('./routes/members')).MembersRoute }) },
      { path: '/studios/:studioId/mail-settings', lazy: async () => ({ Component: (await import('./routes/mail-settings')).MailSettingsRoute }) },
      { path: '/studios/:studioId/classes', lazy: async () => ({ Component: (await import('./routes/classes')).ClassesRoute }) },
      { path: '/studios/:studioId/board', lazy: async () => ({ Component: (await import('./routes/board')).BoardRoute }) },
      { path: '/studios/:studioId/briefs', lazy: async () => ({ Component: (await import('./routes/briefs')).BriefsRoute }) },
      { path: '/classes/:classId', lazy: async () => ({ Component: (await import('./routes/class')).ClassRoute }) },
      { path: '/account', lazy: async () => ({ Component: (await import('./routes/account')).AccountRoute }) },
      { path: '/outbox', lazy: async () => ({ Component: (await import('./routes/outbox')).OutboxRoute }) },
      { path: '/outbox/:messageId', lazy: async () => ({ Component: (await import('./routes/outbox')).OutboxRoute }) },
      {
        path: '/tutorials/:tutorialId',
        lazy: async () => ({ Component: (await import('./routes/tutorial-layout')).TutorialLayoutRoute }),
        children: [
          { index: true, lazy: async () => ({ Component: (await import('./routes/tutorial-index')).TutorialIndexRoute }) },
          { path: 'footage', lazy: async () => ({ Component: (await import('./routes/footage')).FootageRoute }) },
          { path: 'cut-list', lazy: async () => ({ Component: (await import('./routes/cut-list')).CutListRoute }) },
          { path: 'supplies', lazy: async () => ({ Component: (await import('./routes/supplies')).SuppliesRoute }) },
          { path: 'write-up', lazy: async () => ({ Component: (await import('./routes/write-up')).WriteUpRoute }) },
          { path: 'publish', lazy: async () => ({ Component: (await import('./routes/publish')).PublishRoute }) },
        ],
      },
      { path: '*', lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }) },
    ],
  },
]);
