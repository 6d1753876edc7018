import { resourceKeys } from '@/lib/resources';

/**
 * Query keys of the Footage section. A tutorial's recordings and a recording's stills are shared
 * reads keyed by resource (src/lib/resources.ts); everything read about one recording sits under
 * `footageKeys.scope(id)` (the recording's resource key), so deleting it drops all of it.
 */
export const footageKeys = {
  tutorialRecordings: resourceKeys.recordings,
  scope: resourceKeys.recording,
  recording: (recordingId: string) => [...footageKeys.scope(recordingId), 'detail'] as const,
  allCues: (recordingId: string) => [...footageKeys.scope(recordingId), 'cues'] as const,
  cues: (recordingId: string, q = '') => [...footageKeys.allCues(recordingId), q] as const,
  chapters: (recordingId: string) => [...footageKeys.scope(recordingId), 'chapters'] as const,
  chapterSuggestions: (recordingId: string) => [...footageKeys.scope(recordingId), 'chapter-suggestions'] as const,
  stills: resourceKeys.stills,
};
