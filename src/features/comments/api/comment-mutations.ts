import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CommentDto, CreateCommentInput, ReplyInput, UpdateCommentInput } from '@shared/schemas/comment';
import { api } from '@/lib/api-client';
import { commentKeys } from './keys';

/** Starts a thread (400 names the field: an empty body, a passage not in the saved step). */
export const addComment = ({ tutorialId, ...input }: CreateCommentInput & { tutorialId: string }) =>
  api<CommentDto>(`/tutorials/${tutorialId}/comments`, { method: 'POST', body: input });

/** Replies in a comment's thread. */
export const addReply = ({ commentId, ...input }: ReplyInput & { commentId: string }) =>
  api<CommentDto>(`/comments/${commentId}/replies`, { method: 'POST', body: input });

/** Resolves or reopens a thread, or changes a comment's words (its author only). */
export const updateComment = ({ commentId, change }: { commentId: string; change: UpdateCommentInput }) =>
  api<CommentDto>(`/comments/${commentId}`, { method: 'PATCH', body: change });

/** Every comment mutation refetches the tutorial's list (and its counts) when it settles. */
function useCommentMutation<V, R>(tutorialId: string, fn: (v: V) => Promise<R>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: fn, onSettled: () => qc.invalidateQueries({ queryKey: commentKeys.tutorial(tutorialId) }) });
}

export const useAddComment = (tutorialId: string) =>
  useCommentMutation(tutorialId, (input: Omit<CreateCommentInput, never>) => addComment({ tutorialId, ...input }));
export const useAddReply = (tutorialId: string) => useCommentMutation(tutorialId, addReply);
export const useUpdateComment = (tutorialId: string) => useCommentMutation(tutorialId, updateComment);
