/**
 * Query keys of the Write-up section. Everything about one tutorial's write-up sits under
 * `writeUpKeys.tutorial(id)`, so one prefix refreshes all of it; the live lists have their own
 * keys here, since a feature does not reach into another feature's cache.
 */
export const writeUpKeys = {
  all: ['write-up'] as const,
  tutorial: (tutorialId: string) => [...writeUpKeys.all, 'tutorial', tutorialId] as const,
  article: (tutorialId: string) => [...writeUpKeys.tutorial(tutorialId), 'article'] as const,
  revisions: (tutorialId: string) => [...writeUpKeys.tutorial(tutorialId), 'revisions'] as const,
  revision: (revisionId: string) => [...writeUpKeys.all, 'revision', revisionId] as const,
  pieces: (tutorialId: string) => [...writeUpKeys.tutorial(tutorialId), 'pieces'] as const,
  supplies: (tutorialId: string) => [...writeUpKeys.tutorial(tutorialId), 'supplies'] as const,
  recordings: (tutorialId: string) => [...writeUpKeys.tutorial(tutorialId), 'recordings'] as const,
  stills: (recordingId: string) => [...writeUpKeys.all, 'recording', recordingId, 'stills'] as const,
};
