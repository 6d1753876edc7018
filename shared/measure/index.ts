/**
 * The measurement engine: exact lengths, reading spoken and written
 * lengths, finding mentions in transcripts, ruler and cut-list checks.
 */
export * from './length';
export { parseLength, readLength } from './parse-length';
export { extractMentions, extractMentionsFromCues, type CueMention, type Mention, type MentionKind, type TextMention } from './mentions';
export { lengthBoundsProblem, readBoundedLength, storedLengthOrNull } from './bounds';
export * from './ruler';
export { displayLength } from './display';
export { GRAINS, PIECE_SHAPES, ROUND_SHAPES, type Grain, type Piece, type PieceShape, type ScoreLine, type TagTop } from './piece';
export * from './checks';
export { expandScoreStep, groupScoreLines } from './score-steps';
