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
  mailSettings: (studioId: string) => `/studios/${studioId}/mail-settings`,
  account: () => '/account',
  outbox: () => '/outbox',
  outboxMessage: (id: string) => `/outbox/${id}`,
  /** Served by the server itself (not a client route): every caught message, this computer only. */
  devMailbox: () => '/dev/mail',
  tutorial: (id: string) => `/tutorials/${id}`,
  classes: (studioId: string) => `/studios/${studioId}/classes`,
  board: (studioId: string) => `/studios/${studioId}/board`,
  briefs: (studioId: string) => `/studios/${studioId}/briefs`,
  /** One brief on the studio's Briefs page (its card is the target of the fragment). */
  brief: (studioId: string, briefId: string) => `/studios/${studioId}/briefs#brief-${briefId}`,
  scheduleClassFrom: (studioId: string, tutorialId: string) => `/studios/${studioId}/classes?tutorial=${encodeURIComponent(tutorialId)}`,
  klass: (id: string) => `/classes/${id}`,
  publicClass: (studioSlug: string, id: string) => `/c/${studioSlug}/${id}`,
  kitsPdf: (id: string, paper: 'letter' | 'a4') => `/api/classes/${id}/kits.pdf?paper=${paper}`,
  classHandoutPdf: (id: string, paper: 'letter' | 'a4') => `/api/classes/${id}/handout.pdf?paper=${paper}`,
  rosterCsv: (id: string) => `/api/classes/${id}/roster.csv`,
  tutorialSection: (id: string, section: TutorialSection) => `/tutorials/${id}/${section}`,
  /** The Publish section's comparison of the draft with what readers see (or what was sent back). */
  whatChanged: (id: string) => `/tutorials/${id}/publish#what-changed`,
};

export const TUTORIAL_SECTIONS = [
  { key: 'footage', label: 'Footage' },
  { key: 'cut-list', label: 'Cut list' },
  { key: 'supplies', label: 'Supplies' },
  { key: 'write-up', label: 'Write-up' },
  { key: 'publish', label: 'Publish' },
] as const;
export type TutorialSection = (typeof TUTORIAL_SECTIONS)[number]['key'];

/**
 * Where sign-in goes next: the `?next=` path when it stays on this site, home otherwise. A link
 * someone else made ("https://elsewhere", "//elsewhere", "/\elsewhere", "javascript:") must not
 * carry a person off the site, nor strand them on the form.
 */
export function sameSiteNext(next: string | null, origin: string = window.location.origin): string {
  if (!next || !next.startsWith('/')) return paths.home();
  let url: URL;
  try {
    url = new URL(next, origin);
  } catch {
    return paths.home();
  }
  return url.origin === origin ? `${url.pathname}${url.search}${url.hash}` : paths.home();
}
