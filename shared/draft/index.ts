/** First drafts of the write-up from chapters, transcript cues and stills. */
export { generateDraft } from './generate-draft';
