/** First drafts of the write-up from chapters, transcript cues and stills. */
export { cleanSpokenText, spokenSentences, tidySpokenWords, type CleanOptions } from './clean-spoken-text';
export { mentionDisplay, showMeasurements, type MeasurementOptions } from './show-measurements';
export { generateDraft, PAUSE_MS, SENTENCES_PER_PARAGRAPH, type DraftChapter, type DraftCue, type DraftInput, type DraftStill } from './generate-draft';
