import { useQuery } from '@tanstack/react-query';
import { useEffect, useId, useMemo, useState } from 'react';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { piecesQueryOptions, recordingsQueryOptions, stillsQueryOptions } from '@/lib/resources';
import { useComments } from '../api/get-comments';
import { useMentionable } from '../api/get-mentionable';
import { showAnchor } from '../utils/anchor-dom';
import type { AboutValue, NamedOption, PassageOption, StepOption } from '../utils/anchor-options';
import { CommentThread } from './comment-thread';
import { NewCommentForm } from './new-comment-form';

const clock = (ms: number) => {
  const s = Math.floor(ms / 1000);
  return `${Math.floor(s / 60)}:${String(s % 60).padStart(2, '0')}`;
};

export type CommentsPanelProps = {
  tutorialId: string;
  /** The write-up's steps as they are now (from the editor). */
  steps: StepOption[];
  /** Words selected in one step of the write-up, if any. */
  passage: PassageOption | null;
  /** A step's "Comment" button was pressed (or "comment on the selection"): start a comment about it. */
  preset: { value: AboutValue; nonce: number } | null;
  /** A thread to open (from an e-mail's link). */
  focusCommentId: string | null;
  beforeComment?: () => Promise<boolean>;
  links: { cutList: string; footage: string };
};

/** The tutorial's pieces and the newest recording's stills, for the "About" choice. */
function usePiecesAndStills(tutorialId: string): { pieces: NamedOption[]; stills: NamedOption[] } {
  const pieces = useQuery(piecesQueryOptions(tutorialId));
  const recordings = useQuery(recordingsQueryOptions(tutorialId));
  const newest = recordings.data?.recordings[0]?.id;
  const stills = useQuery({ ...stillsQueryOptions(newest ?? ''), enabled: Boolean(newest) });
  return useMemo(
    () => ({
      pieces: (pieces.data?.pieces ?? []).map((p) => ({ id: p.id, label: p.name || 'Unnamed piece' })),
      stills: (stills.data?.stills ?? []).map((s) => ({ id: s.id, label: `Still at ${clock(s.atMs)}${s.caption ? `: ${s.caption}` : ''}` })),
    }),
    [pieces.data, stills.data],
  );
}

/**
 * Comments beside the write-up: a form to start one (about the whole tutorial, a step, the
 * selected words, a piece or a still), then the threads, open ones first; resolved ones on
 * request. Each anchored comment shows its place when its label is pressed; comments whose
 * place was deleted stay, marked as such.
 */
export function CommentsPanel({ tutorialId, steps, passage, preset, focusCommentId, beforeComment, links }: CommentsPanelProps) {
  const comments = useComments(tutorialId);
  const people = useMentionable(tutorialId).data?.people ?? [];
  const { pieces, stills } = usePiecesAndStills(tutorialId);
  const [showResolved, setShowResolved] = useState(false);
  const [focused, setFocused] = useState<string | null>(focusCommentId);
  const toggleId = useId();
  const data = comments.data;
  const threads = data?.comments ?? [];
  const shown = threads.filter((t) => showResolved || !t.resolved || t.id === focused);

  // Opening a thread from an e-mail: show it even if resolved, bring it and its place into view.
  useEffect(() => {
    if (!focusCommentId || !data) return;
    const t = data.comments.find((c) => c.id === focusCommentId || c.replies.some((r) => r.id === focusCommentId));
    if (!t) return;
    setFocused(t.id);
    requestAnimationFrame(() => {
      const el = document.getElementById(`comment-${t.id}`);
      el?.scrollIntoView({ block: 'nearest' });
      el?.focus({ preventScroll: true });
      if (t.anchor && window.matchMedia?.('(min-width: 1024px)').matches) showAnchor(t.anchor);
    });
    // Once per thread asked for; later refetches leave the view alone.
  }, [focusCommentId, Boolean(data)]); // eslint-disable-line react-hooks/exhaustive-deps

  return (
    <section aria-labelledby="comments-title" className="space-y-3">
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <h2 id="comments-title" className="text-lg">
          Comments
        </h2>
        {data && (
          <p className="text-sm text-pencil" aria-live="polite">
            {data.counts.open} open{data.counts.resolved ? `, ${data.counts.resolved} resolved` : ''}
          </p>
        )}
      </div>

      {comments.isPending && <Loading label="Loading the comments" />}
      {comments.error && <Notice kind="error">The comments could not be loaded: {comments.error.message}</Notice>}

      {data?.abilities.comment ? (
        <NewCommentForm
          tutorialId={tutorialId}
          steps={steps}
          pieces={pieces}
          stills={stills}
          passage={passage}
          people={people}
          preset={preset}
          beforeComment={beforeComment}
          onPosted={(id) => setFocused(id)}
        />
      ) : (
        data && <p className="text-sm text-pencil">You can read the comments; the tutorial’s maker, its coordinators and the studio owner write them.</p>
      )}

      {data && data.counts.resolved > 0 && (
        <div className="flex items-center gap-2 text-sm">
          <input id={toggleId} type="checkbox" checked={showResolved} onChange={(e) => setShowResolved(e.target.checked)} className="h-4 w-4 accent-kraft" />
          <label htmlFor={toggleId}>Show resolved ({data.counts.resolved})</label>
        </div>
      )}

      {data && threads.length === 0 && (
        <p className="rounded-md border border-dashed border-line px-3 py-4 text-sm text-pencil">
          No comments yet.{' '}
          {data.abilities.comment ? 'Choose what a comment is about (or press “Comment” on a step, or select words in the write-up), then write it.' : ''}
        </p>
      )}
      {data && threads.length > 0 && shown.length === 0 && <p className="text-sm text-pencil">Every comment is resolved.</p>}

      <ol className="space-y-3" aria-label="Comment threads">
        {shown.map((t) => (
          <li key={t.id}>
            <CommentThread tutorialId={tutorialId} thread={t} people={people} links={links} focused={t.id === focused} />
          </li>
        ))}
      </ol>
    </section>
  );
}
