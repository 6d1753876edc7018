/** Every client URL is built here, so a route change is one edit. */
export const paths = {
  home: () => '/',
  signIn: (next?: string) => (next ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'),
  signUp: (invite?: string) => (invite ? `/sign-up?invite=${encodeURIComponent(invite)}` : '/sign-up'),
  resetRequest: () => '/reset',
  reset: (token: string) => `/reset/${token}`,
  invite: (token: string) => `/invite/${token}`,
  studio: (studioId: string) => `/studios/${studioId}`,
  members: (studioId: string) => `/studios/${studioId}/members`,
  outbox: () => '/outbox',
  outboxMessage: (id: string) => `/outbox/${id}`,
  tutorial: (id: string) => `/tutorials/${id}`,
  tutorialSection: (id: string, section: TutorialSection) => `/tutorials/${id}/${section}`,
};

export const TUTORIAL_SECTIONS = [
  { key: 'footage', label: 'Footage' },
  { key: 'cut-list', label: 'Cut list' },
  { key: 'supplies', label: 'Supplies' },
  { key: 'write-up', label: 'Write-up' },
  { key: 'publish', label: 'Publish' },
] as const;
export type TutorialSection = (typeof TUTORIAL_SECTIONS)[number]['key'];
