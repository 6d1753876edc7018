import { compareLengths, expandScoreStep, inchesNumber, type CueMention, type Length } from '../measure';
import { mentionWords } from './context';
import { countFromWords, materialSaid, pieceNameFromWords, type MentionWords } from './piece-words';

type CueLike = { startMs: number; text: string };
type ChapterLike = { title: string; startMs: number };

/** A transcript mention with its stable key (where it was said and what was said). */
export type KeyedMention = CueMention & { key: string };

export type ProposedScoreLine = { axis: 'width' | 'height'; at: Length };

/** The finished piece a size or diameter mention makes, from the words said around it. */
export type PieceProposal = {
  key: string;
  name: string;
  /** False when nobody named the piece and the name is only its time ("Piece said at 0:14"). */
  nameSaid: boolean;
  /** The material said or the tutorial's only one; empty when the crafter must pick. */
  material: string;
  quantity: number;
  shape: 'rect' | 'circle';
  width: Length;
  height: Length;
  scoreLines: ProposedScoreLine[];
  /** The score mention taken into this piece, if one was said next to the size. */
  scoreKey: string | null;
  notes: string;
  saidAtMs: number;
};

/** A score list said this long after a size, or less, belongs to it (unless another size came between). */
const SCORE_NEAR_MS = 20_000;

const pad = (n: number) => String(n).padStart(2, '0');
const clock = (ms: number) => {
  const s = Math.floor(ms / 1000);
  const h = Math.floor(s / 3600);
  return h > 0 ? `${h}:${pad(Math.floor(s / 60) % 60)}:${pad(s % 60)}` : `${Math.floor(s / 60)}:${pad(s % 60)}`;
};

/** Sizes and diameters are whole pieces; a length or a score list is only part of one, a range needs a choice. */
export const makesAPiece = (m: { kind: string; values: readonly unknown[]; corrected?: boolean }) =>
  !m.corrected && ((m.kind === 'size' && m.values.length >= 2) || (m.kind === 'diameter' && m.values.length >= 1));

/**
 * Which side score lines are measured along. Words win ("along the long side" runs parallel to the
 * long side, so it is measured across the short one); else the side the lines fit on; a single
 * line at half the longer side is a fold in half (a card base); else the shorter side, where tabs
 * and rims are scored (common practice).
 */
export function scoreAxis(lines: readonly Length[], width: Length, height: Length, words: string): 'width' | 'height' {
  const longer: 'width' | 'height' = compareLengths(width, height) >= 0 ? 'width' : 'height';
  const shorter: 'width' | 'height' = longer === 'width' ? 'height' : 'width';
  const w = words.toLowerCase();
  if (/\b(?:along|on|parallel to)\s+(?:the\s+)?long(?:er)?\s+(?:side|edge)/.test(w)) return shorter;
  if (/\b(?:along|on|parallel to)\s+(?:the\s+)?short(?:er)?\s+(?:side|edge)/.test(w)) return longer;
  const side = (a: 'width' | 'height') => (a === 'width' ? width : height);
  const fits = (a: 'width' | 'height') => lines.every((l) => compareLengths(l, side(a)) < 0);
  if (fits(longer) && !fits(shorter)) return longer;
  if (fits(shorter) && !fits(longer)) return shorter;
  if (lines.length === 1 && Math.abs(inchesNumber(lines[0]!) * 2 - inchesNumber(side(longer))) < 1e-9) return longer;
  return shorter;
}

/** The score lines of a score mention laid on a piece of that size: a repeat expanded over the side, else each line said. */
function linesOn(score: KeyedMention, width: Length, height: Length, words: string): ProposedScoreLine[] {
  const first = score.values[0];
  if (!first) return [];
  const axis = scoreAxis(score.every ? [first] : score.values, width, height, words);
  const along = axis === 'width' ? width : height;
  const at = score.every ? expandScoreStep(first, score.every, along) : score.values.filter((v) => compareLengths(v, along) < 0);
  return at.map((a) => ({ axis, at: a }));
}

const wordsOf = (w: MentionWords | undefined) => (w ? `${w.before} ${w.said} ${w.after}` : '');

/**
 * A finished piece for every size and diameter mention: named from the noun said around it, its
 * material said nearby or the tutorial's only one (`known`: the tutorial's materials first, then
 * the studio's earlier ones), its count as the quantity, and the score list said next to it (the
 * first score mention after it, before another size, within 20 s) laid on the side it fits.
 * Mentions must be in transcript order, as extractMentionsFromCues gives them.
 */
export function proposePieces(
  cues: readonly CueLike[],
  mentions: readonly KeyedMention[],
  chapters: readonly ChapterLike[],
  known: { tutorial: readonly string[]; studio: readonly string[] },
): Map<string, PieceProposal> {
  const around = mentionWords(cues, mentions, chapters);
  const out = new Map<string, PieceProposal>();
  const materials = [...known.tutorial, ...known.studio.filter((s) => !known.tutorial.some((t) => t.toLowerCase() === s.toLowerCase()))];
  mentions.forEach((m, i) => {
    if (!makesAPiece(m)) return;
    const words = around[i]!;
    const said = pieceNameFromWords(words);
    const circle = m.kind === 'diameter';
    const width = m.values[0]!;
    const height = circle ? width : m.values[1]!;
    let score: KeyedMention | null = null;
    let scoreWords: MentionWords | undefined;
    for (let k = i + 1; k < mentions.length; k++) {
      const n = mentions[k]!;
      if (n.startMs - m.startMs > SCORE_NEAR_MS || makesAPiece(n) || n.kind === 'range') break;
      if (n.kind === 'score' && !n.corrected) {
        score = n;
        scoreWords = around[k];
        break;
      }
    }
    const scoreLines = score && !circle ? linesOn(score, width, height, wordsOf(scoreWords)) : [];
    // The tutorial's single material is the default; the studio's earlier names only match words said.
    const material = materialSaid(words, materials) ?? (known.tutorial.length === 1 ? known.tutorial[0]! : '');
    out.set(m.key, {
      key: m.key,
      name: said ?? `${circle ? 'Circle' : 'Piece'} said at ${clock(m.startMs)}`,
      nameSaid: said !== null,
      material,
      quantity: m.count ?? countFromWords(words) ?? 1,
      shape: circle ? 'circle' : 'rect',
      width,
      height,
      scoreLines,
      scoreKey: scoreLines.length > 0 && score ? score.key : null,
      notes: m.approx ? `Said as “${m.text}”` : '',
      saidAtMs: m.startMs,
    });
  });
  return out;
}
