import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { reviewState, stateLabel, TRANSITIONS, type Transition, type TutorialState, type TutorialDto } from '@shared/schemas/tutorial';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { supplyChecksQueryOptions } from '@/lib/resources';
import { useChangeState } from '../api/change-state';
import { PublicAddress } from './public-address';

// "is a draft", "needs changes": the state read as part of a sentence.
const STATE_PHRASE: Record<TutorialState, [string, string]> = {
  draft: ['is ', 'a draft'],
  in_review: ['is ', 'in review'],
  needs_changes: ['', 'needs changes'],
  approved: ['is ', 'approved'],
  published: ['is ', 'published'],
};
const NOW: Record<TutorialState, string> = {
  draft: 'is now a draft',
  in_review: 'is now in review',
  needs_changes: 'now needs changes',
  approved: 'is now approved',
  published: 'is now published',
};

const STATE_TEXT: Record<TutorialState, string> = {
  draft: 'Only people in your studio can see it. Send it for review when the write-up is ready.',
  in_review: 'Waiting for a coordinator to approve it or send it back with a note.',
  needs_changes: 'A coordinator sent it back. Make the changes, then send it for review again.',
  approved: 'It can be published now.',
  published: 'Anyone with the address can read it and download the handout and template.',
};

// When this person has no move to make, say who has the next one.
const WAITING: Partial<Record<TutorialState, string>> = {
  draft: 'The maker or a coordinator sends it for review.',
  needs_changes: 'The maker or a coordinator sends it for review again.',
  in_review: 'A coordinator or the studio owner reviews it next.',
  approved: 'A coordinator or the studio owner publishes it.',
};

// A published tutorial's update: what each of its states means, and who moves it next.
const UPDATE_TEXT: Partial<Record<TutorialState, string>> = {
  draft: 'Changes made since publishing wait here as an update. Send it for review when it is ready; readers keep the published version until then.',
  in_review: 'The update waits for a coordinator to approve it or send it back. Readers still see the published version.',
  needs_changes: 'A coordinator sent the update back. Make the changes, then send it for review again.',
  approved: 'The update is approved: publishing it replaces what readers see.',
};
const UPDATE_PHRASE: Partial<Record<TutorialState, string>> = {
  draft: 'The update is a draft.',
  in_review: 'The update is in review.',
  needs_changes: 'The update needs changes.',
  approved: 'The update is approved.',
};
const UPDATE_LABEL: Partial<Record<Transition, string>> = {
  submit: 'Send the update for review',
  approve: 'Approve the update',
  publish: 'Publish the update',
};

const ORDER: Transition[] = ['submit', 'approve', 'publish', 'sendBack', 'unpublish'];

/** A comment still open, as the send-back note lists it. */
export type OpenCommentLine = { id: string; where: string; body: string; author: string };

// The moves that ask for a note first: what the note is for, and the button that sends it.
const NOTE: Partial<Record<Transition, { label: string; placeholder: string; send: string }>> = {
  submit: {
    label: 'A short note for the coordinator',
    placeholder: 'What to look at, e.g. “New lid sizes in step 4; the floral paper is from the new pad.”',
    send: 'Send for review',
  },
  approve: { label: 'Note for the maker (optional)', placeholder: 'e.g. “Lovely photos. Publishing on the 20th.”', send: 'Approve' },
  sendBack: { label: 'Note for the maker', placeholder: 'What should change, e.g. “Add the lid’s score lines to step 4.”', send: 'Send back to the maker' },
};

function consequence(action: Transition, publicUrl: string | null, isUpdate: boolean): string {
  if (isUpdate && action === 'publish') return 'Publishing the update replaces what readers see on the public page and in every export.';
  if (isUpdate && action === 'submit') return 'The studio’s coordinators get an e-mail asking them to review the changes.';
  switch (action) {
    case 'submit':
      return 'The studio’s coordinators get an e-mail asking them to review it.';
    case 'approve':
      return 'Marks it ready to publish; the maker gets an e-mail.';
    case 'sendBack':
      return 'Returns it to the maker as “needs changes”, with your note and the open comments in their e-mail.';
    case 'publish':
      return publicUrl ? `Publishing makes the page and exports public at ${publicUrl}.` : 'Publishing makes the page and exports public.';
    case 'unpublish':
      return 'Takes the public page and its exports down; the tutorial goes back to approved.';
  }
}

/** What a move did, in words: an update's own moves speak of the update. */
function doneMessage(action: Transition, t: TutorialDto): string {
  const leftover = t.state === 'published' && t.updateState;
  if (action === 'publish' || action === 'unpublish' || !leftover)
    return `Done: the tutorial ${NOW[t.state]}.${action === 'publish' && leftover ? ' Edits made after the approval wait as an update.' : ''}`;
  return `Done: the update is now ${stateLabel(reviewState(t))}.`;
}

/**
 * Where the tutorial stands in review, and the moves this person may make now (from the
 * server's abilities), each with a line on what it does. Sending back takes an optional note;
 * unpublishing asks first, since it takes a live page down.
 */
export function StatusPanel({
  tutorial,
  publicUrl,
  onMoved,
  openComments = [],
}: {
  tutorial: TutorialDto;
  publicUrl: string | null;
  onMoved?: (t: TutorialDto) => unknown;
  /** Listed under the send-back note: they go to the maker with it. */
  openComments?: OpenCommentLine[];
}) {
  const move = useChangeState(tutorial.id, onMoved);
  const [noteFor, setNoteFor] = useState<Transition | null>(null);
  const noteOpen = noteFor !== null;
  const form = noteFor ? NOTE[noteFor] : undefined;
  const [note, setNote] = useState('');
  const [confirmUnpublish, setConfirmUnpublish] = useState(false);
  // The open check warnings publishing asks to confirm (from the checks, or as the server named them).
  const [confirmPublish, setConfirmPublish] = useState<string[] | null>(null);
  const [done, setDone] = useState<string | null>(null);
  // A published tutorial's moves act on its update (if any); unpublishing acts on the tutorial.
  const review = reviewState(tutorial);
  const isUpdate = tutorial.state === 'published' && Boolean(tutorial.updateState);
  const checks = useQuery({ ...supplyChecksQueryOptions(tutorial.id), enabled: review === 'approved' && Boolean(tutorial.abilities.publish) });
  const moves = ORDER.filter(
    (a) => tutorial.abilities[a] && (a === 'unpublish' ? tutorial.state === 'published' : (TRANSITIONS[a].from as readonly TutorialState[]).includes(review)),
  );
  const label = (a: Transition) => (isUpdate && UPDATE_LABEL[a]) || TRANSITIONS[a].label;

  const run = (action: Transition, withNote?: string, confirmWarnings?: boolean) => {
    setDone(null);
    move.mutate(
      { action, note: withNote?.trim() || undefined, confirmWarnings },
      {
        onSuccess: (t) => {
          setNoteFor(null);
          setNote('');
          setConfirmUnpublish(false);
          setConfirmPublish(null);
          setDone(doneMessage(action, t));
        },
        onError: (e) => {
          // Warnings opened since the page loaded: ask about the ones the server named.
          if (e instanceof ApiError && e.status === 409 && e.body.code === 'unconfirmed-warnings' && Array.isArray(e.body.warnings)) {
            move.reset();
            setConfirmPublish(e.body.warnings as string[]);
          }
        },
      },
    );
  };
  const publish = () => {
    const open = checks.data?.unresolved ?? [];
    if (open.length) setConfirmPublish(open);
    else run('publish');
  };

  return (
    <section aria-labelledby="publish-status-title" className="rounded-lg border border-line bg-white p-5">
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <h2 id="publish-status-title" className="text-lg">
          Status
        </h2>
        <p className="text-sm">
          This tutorial {STATE_PHRASE[tutorial.state][0]}
          <strong>{STATE_PHRASE[tutorial.state][1]}</strong>. {STATE_TEXT[tutorial.state]}
        </p>
      </div>
      {isUpdate && (
        <p className="mt-2 rounded-md border border-kraft/40 bg-kraft-light px-3 py-2 text-sm">
          <strong>{UPDATE_PHRASE[review]}</strong> {UPDATE_TEXT[review]}
        </p>
      )}

      {tutorial.state === 'published' && publicUrl && (
        <div className="mt-4">
          <PublicAddress url={publicUrl} />
        </div>
      )}

      <hr className="score-rule my-4" />

      {moves.length === 0 ? (
        <p className="text-sm text-pencil">{WAITING[review] ?? 'There is no review step for you to take now.'}</p>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3" aria-label="What you can do now">
          {moves.map((a) => (
            <li key={a} className="flex flex-col items-start gap-1.5">
              <Button
                variant={a === 'sendBack' || a === 'unpublish' ? 'danger' : 'primary'}
                busy={move.isPending && move.variables?.action === a}
                disabled={move.isPending}
                aria-expanded={NOTE[a] ? noteFor === a : undefined}
                onClick={() => {
                  if (NOTE[a]) setNoteFor((o) => (o === a ? null : a));
                  else if (a === 'unpublish') setConfirmUnpublish(true);
                  else if (a === 'publish') publish();
                  else run(a);
                }}
              >
                {label(a)}
              </Button>
              <p className="text-xs text-pencil">{consequence(a, publicUrl, isUpdate)}</p>
            </li>
          ))}
        </ul>
      )}

      {noteOpen && form && noteFor && (
        <form
          className="mt-4 max-w-xl rounded-md border border-line bg-paper p-3"
          aria-label={label(noteFor)}
          onSubmit={(e) => {
            e.preventDefault();
            run(noteFor, note);
          }}
        >
          <label htmlFor="review-note" className="text-sm font-medium">
            {form.label}
          </label>
          <textarea
            id="review-note"
            rows={3}
            maxLength={2000}
            value={note}
            autoFocus
            onChange={(e) => setNote(e.target.value)}
            placeholder={form.placeholder}
            className="mt-1 w-full rounded-md border border-field bg-white px-2 py-1.5 text-sm focus:border-kraft"
          />
          {noteFor === 'sendBack' && (
            <div className="mt-2 text-sm">
              {openComments.length === 0 ? (
                <p className="text-pencil">No comments are open; say in the note what should change.</p>
              ) : (
                <>
                  <p className="font-medium">
                    {openComments.length} open {openComments.length === 1 ? 'comment goes' : 'comments go'} with the note:
                  </p>
                  <ol className="ml-5 list-decimal text-xs">
                    {openComments.map((c) => (
                      <li key={c.id}>
                        <span className="font-medium">{c.where}:</span> {c.body} <span className="text-pencil">({c.author})</span>
                      </li>
                    ))}
                  </ol>
                </>
              )}
            </div>
          )}
          <div className="mt-2 flex gap-2">
            <Button type="submit" variant={noteFor === 'sendBack' ? 'danger' : 'primary'} busy={move.isPending}>
              {form.send}
            </Button>
            <Button variant="ghost" onClick={() => setNoteFor(null)}>
              Cancel
            </Button>
          </div>
        </form>
      )}

      <div className="mt-3 space-y-2">
        {move.error && <Notice kind="error">{move.error.message}</Notice>}
        {done && !move.error && <Notice kind="success">{done}</Notice>}
      </div>

      <ConfirmDialog
        open={confirmPublish !== null}
        title={`Publish “${tutorial.title}” with ${confirmPublish?.length === 1 ? 'a warning' : `${confirmPublish?.length ?? 0} warnings`} open?`}
        confirmLabel="Publish anyway"
        busy={move.isPending}
        onConfirm={() => run('publish', undefined, true)}
        onCancel={() => setConfirmPublish(null)}
      >
        <p>These checks are not resolved:</p>
        <ul className="mt-2 list-disc space-y-1 pl-5">
          {(confirmPublish ?? []).map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
        <p className="mt-2">Readers will see the supplies as they are. You can fix them from the Supplies section instead, or keep a count on purpose there.</p>
      </ConfirmDialog>

      <ConfirmDialog
        open={confirmUnpublish}
        title={`Unpublish “${tutorial.title}”?`}
        confirmLabel="Unpublish"
        danger
        busy={move.isPending}
        onConfirm={() => run('unpublish')}
        onCancel={() => setConfirmUnpublish(false)}
      >
        Visitors lose the public page and its exports at once; links people saved will show “not here” until you publish again.
      </ConfirmDialog>
    </section>
  );
}
