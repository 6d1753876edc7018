import type { Paper } from '@shared/schemas/publish';

/**
 * Query keys of the Publish section. Everything an export shows sits under
 * `publishKeys.tutorial(id)`, so a change that moves the exports (a new video address, a move to
 * published, which puts the public address in them) refreshes all of it with one prefix.
 */
export const publishKeys = {
  all: ['publish'] as const,
  tutorial: (tutorialId: string) => [...publishKeys.all, tutorialId] as const,
  blog: (tutorialId: string) => [...publishKeys.tutorial(tutorialId), 'blog'] as const,
  description: (tutorialId: string) => [...publishKeys.tutorial(tutorialId), 'description'] as const,
  chapters: (tutorialId: string) => [...publishKeys.tutorial(tutorialId), 'chapters'] as const,
  template: (tutorialId: string, paper: Paper) => [...publishKeys.tutorial(tutorialId), 'template', paper] as const,
  published: (tutorialId: string) => [...publishKeys.tutorial(tutorialId), 'published'] as const,
};
