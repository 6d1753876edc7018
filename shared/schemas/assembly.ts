import { z } from 'zod';
import type { SupplyCategory } from './supply';

/** What "Assemble the tutorial" proposes, in the order accepting all makes them. */
export const ASSEMBLY_KINDS = ['chapter', 'still', 'piece', 'supply', 'draft'] as const;
export type AssemblyKind = (typeof ASSEMBLY_KINDS)[number];
export type AssemblyState = 'proposed' | 'accepted' | 'dropped';
/** Stored while one request makes what a proposal proposes; shown as proposed, "being made". */
export const ACCEPTING = 'accepting';

export type ChapterProposalPayload = { title: string; startMs: number };
/** A still inside one chapter: the sharpest frame between its start and the next chapter's. */
export type StillProposalPayload = { chapterTitle: string; chapterStartMs: number };
export type PieceProposalPayload = {
  mentionKey: string;
  name: string;
  material: string;
  quantity: number;
  /** "10 9/16 × 2 1/2 in", "a circle 6 3/8 in across". */
  size: string;
  scoreLines: string[];
  saidAtMs: number;
};
export type SupplyProposalPayload = {
  name: string;
  category: SupplyCategory;
  quantity: string;
  note: string;
  url: string | null;
  sponsored: boolean;
  discountCode: string | null;
  /** The studio's earlier supply it copies (link, code, sponsorship), when the names agree. */
  matched: string | null;
  saidAtMs: number;
};
export type DraftProposalPayload = { steps: string[] };
export type AssemblyPayload = ChapterProposalPayload | StillProposalPayload | PieceProposalPayload | SupplyProposalPayload | DraftProposalPayload;

const ids = z.array(z.uuid()).min(1, 'Choose at least one proposal').max(1000);
/** Accept or drop: the proposals chosen, or every one still proposed when none are named. */
export const assemblyChoiceSchema = z.object({ ids: ids.optional() });
/** Undo: the proposals whose acceptance or dropping is taken back. */
export const assemblyUndoSchema = z.object({ ids });

// Response shapes (DTOs).

export type AssemblyProposalDto = {
  id: string;
  kind: AssemblyKind;
  state: AssemblyState;
  /** One line a crafter reads: what accepting it makes. */
  summary: string;
  /** Where it was said or where it sits in the video, for a link to the footage. */
  atMs: number | null;
  payload: AssemblyPayload;
  /** The record accepting made, when accepted. */
  madeId: string | null;
  /** Why it cannot be accepted yet (the video is still being read, its chapter is not accepted), or null. */
  waiting: string | null;
};

export type AssemblyDto = {
  recordingId: string | null;
  /** The preview is being made; everything but the stills can be accepted meanwhile. */
  processing: boolean;
  hasTranscript: boolean;
  proposals: AssemblyProposalDto[];
  counts: Record<AssemblyState, number>;
  /** What the last run or choice could not do, in words ("2 stills wait for the video"). */
  notes: string[];
  abilities: { update: boolean };
};
