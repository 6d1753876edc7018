/**
 * Query keys of the Footage section. Everything read about one recording sits under
 * `footageKeys.scope(id)`, so deleting a recording drops all of it with one prefix.
 */
export const footageKeys = {
  all: ['footage'] as const,
  tutorialRecordings: (tutorialId: string) => [...footageKeys.all, 'tutorial', tutorialId, 'recordings'] as const,
  scope: (recordingId: string) => [...footageKeys.all, 'recording', recordingId] as const,
  recording: (recordingId: string) => [...footageKeys.scope(recordingId), 'detail'] as const,
  allCues: (recordingId: string) => [...footageKeys.scope(recordingId), 'cues'] as const,
  cues: (recordingId: string, q = '') => [...footageKeys.allCues(recordingId), q] as const,
  chapters: (recordingId: string) => [...footageKeys.scope(recordingId), 'chapters'] as const,
  chapterSuggestions: (recordingId: string) => [...footageKeys.scope(recordingId), 'chapter-suggestions'] as const,
  stills: (recordingId: string) => [...footageKeys.scope(recordingId), 'stills'] as const,
};
