/**
 * Query keys of the Write-up section. Everything about one tutorial's write-up sits under
 * `writeUpKeys.tutorial(id)`, so one prefix refreshes all of it. The live lists and the still
 * picker read the shared, resource-keyed entries of src/lib/resources.ts.
 */
export const writeUpKeys = {
  all: ['write-up'] as const,
  tutorial: (tutorialId: string) => [...writeUpKeys.all, 'tutorial', tutorialId] as const,
  article: (tutorialId: string) => [...writeUpKeys.tutorial(tutorialId), 'article'] as const,
  revisions: (tutorialId: string) => [...writeUpKeys.tutorial(tutorialId), 'revisions'] as const,
  revision: (revisionId: string) => [...writeUpKeys.all, 'revision', revisionId] as const,
};
