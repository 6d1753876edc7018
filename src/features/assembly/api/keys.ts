/**
 * Query keys of the assembly ("Assemble the tutorial"). Its read is keyed by tutorial, the
 * recording it reads and whether that has a transcript, so attaching one shows the button at once.
 */
export const assemblyKeys = {
  all: ['assembly'] as const,
  tutorial: (tutorialId: string) => [...assemblyKeys.all, tutorialId] as const,
  detail: (tutorialId: string, recordingId: string, hasTranscript: boolean) => [...assemblyKeys.tutorial(tutorialId), recordingId, hasTranscript] as const,
};
