import { z } from 'zod';
import { uuidSchema } from './studio';
import type { PersonDto } from './tutorial';

const STEP_ID = /^[A-Za-z0-9_-]{1,64}$/;

const body = z.string().trim().min(1, 'Write something first').max(5000, 'Keep a comment under 5000 characters');
const stepId = z.string().regex(STEP_ID, 'Not a step of this write-up');
const mentions = z.array(uuidSchema).max(20, 'Mention at most 20 people at once').optional();

/**
 * Where a comment points: a step, a passage of a step (its quoted words), a piece of the cut list
 * or a still. No anchor means the whole tutorial.
 */
export const commentAnchorSchema = z.union(
  [
    z.strictObject({ stepId, quote: z.string().trim().min(1, 'Select the words to comment on').max(500, 'Quote at most 500 characters') }),
    z.strictObject({ stepId }),
    z.strictObject({ pieceId: uuidSchema }),
    z.strictObject({ stillId: uuidSchema }),
  ],
  { error: 'Point the comment at a step ({ stepId }), a passage ({ stepId, quote }), a piece ({ pieceId }) or a still ({ stillId })' },
);
export type CommentAnchor = z.infer<typeof commentAnchorSchema>;

export const createCommentSchema = z.object({
  body,
  anchor: commentAnchorSchema.nullable().optional(),
  /** People picked with "@"; names typed as "@Name" are found too. */
  mentions,
});
export type CreateCommentInput = z.input<typeof createCommentSchema>;

export const replySchema = z.object({ body, mentions });
export type ReplyInput = z.input<typeof replySchema>;

/** Resolve or reopen a thread, or change your own comment's words. */
export const updateCommentSchema = z.union([z.strictObject({ resolved: z.boolean() }), z.strictObject({ body, mentions })], {
  error: 'Send { resolved: true | false } or { body }',
});
export type UpdateCommentInput = z.input<typeof updateCommentSchema>;

// Response shapes (DTOs): the server's presenters return them, the client reads them.

/**
 * Whether the thing a comment points at is still there: `missing` when the step, piece or still
 * was deleted, `changed` when the step is there but the quoted words are not.
 */
export type AnchorStatus = 'whole' | 'present' | 'changed' | 'missing';

export type CommentAnchorDto = {
  kind: 'step' | 'passage' | 'piece' | 'still';
  stepId?: string;
  quote?: string;
  pieceId?: string;
  stillId?: string;
  /** "Step 3: Score the strip", "Piece: Lid", "Still at 1:05", as it reads now or, when gone, as it read. */
  label: string;
  status: Exclude<AnchorStatus, 'whole'>;
};

export type CommentDto = {
  id: string;
  tutorialId: string;
  /** The thread's first comment; null for that comment itself. */
  parentId: string | null;
  author: PersonDto | null;
  body: string;
  anchor: CommentAnchorDto | null;
  /** True when its anchor was deleted: the comment stays, marked as such. */
  orphaned: boolean;
  mentions: PersonDto[];
  resolved: boolean;
  resolvedAt: string | null;
  resolvedBy: PersonDto | null;
  editedAt: string | null;
  createdAt: string;
  replies: CommentDto[];
  abilities: { edit: boolean; resolve: boolean; reply: boolean };
};

/** GET /tutorials/:id/comments: threads oldest first, each with its replies. */
export type CommentsDto = {
  comments: CommentDto[];
  counts: { open: number; resolved: number };
  abilities: { comment: boolean };
};

/** One studio member who can be mentioned. */
export type MentionableDto = PersonDto;
