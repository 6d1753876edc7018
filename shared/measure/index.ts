/**
 * The measurement engine: exact lengths, reading spoken and written
 * lengths, finding mentions in transcripts, ruler and cut-list checks.
 */
export * from './length';
export { parseLength, readLength, type ReadLength } from './parse-length';
export {
  extractMentions,
  extractMentionsFromCues,
  type Cue,
  type CueMention,
  type Mention,
  type MentionKind,
  type ParseOptions,
  type TextMention,
} from './mentions';
export * from './ruler';
export { displayLength, lengthSummary, type LengthDisplay, type LengthSummary } from './display';
export type { Piece, ScoreAxis, ScoreLine } from './piece';
export * from './checks';
