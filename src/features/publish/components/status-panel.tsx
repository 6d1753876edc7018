import { useState } from 'react';
import { TRANSITIONS, type Transition, type TutorialState } from '@shared/schemas/tutorial';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { Notice } from '@/components/ui/notice';
import { useChangeState } from '../api/change-state';
import type { PublishTutorial } from '../api/types';
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

const ORDER: Transition[] = ['submit', 'approve', 'publish', 'sendBack', 'unpublish'];

function consequence(action: Transition, publicUrl: string | null): string {
  switch (action) {
    case 'submit':
      return 'The studio’s coordinators get an e-mail asking them to review it.';
    case 'approve':
      return 'Marks it ready to publish; the maker gets an e-mail.';
    case 'sendBack':
      return 'Returns it to the maker as “needs changes”, with your note in their e-mail.';
    case 'publish':
      return publicUrl ? `Publishing makes the page and exports public at ${publicUrl}.` : 'Publishing makes the page and exports public.';
    case 'unpublish':
      return 'Takes the public page and its exports down; the tutorial goes back to approved.';
  }
}

/**
 * Where the tutorial stands in review, and the moves this person may make now (from the
 * server's abilities), each with a line on what it does. Sending back takes an optional note;
 * unpublishing asks first, since it takes a live page down.
 */
export function StatusPanel({ tutorial, publicUrl, onMoved }: { tutorial: PublishTutorial; publicUrl: string | null; onMoved?: (t: PublishTutorial) => unknown }) {
  const move = useChangeState(tutorial.id, onMoved);
  const [noteOpen, setNoteOpen] = useState(false);
  const [note, setNote] = useState('');
  const [confirmUnpublish, setConfirmUnpublish] = useState(false);
  const [done, setDone] = useState<string | null>(null);
  const moves = ORDER.filter((a) => tutorial.abilities[a] && (TRANSITIONS[a].from as readonly TutorialState[]).includes(tutorial.state));

  const run = (action: Transition, withNote?: string) => {
    setDone(null);
    move.mutate(
      { action, note: withNote?.trim() || undefined },
      {
        onSuccess: (t) => {
          setNoteOpen(false);
          setNote('');
          setConfirmUnpublish(false);
          setDone(`Done: the tutorial ${NOW[t.state]}.`);
        },
      },
    );
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

      {tutorial.state === 'published' && publicUrl && (
        <div className="mt-4">
          <PublicAddress url={publicUrl} />
        </div>
      )}

      <hr className="score-rule my-4" />

      {moves.length === 0 ? (
        <p className="text-sm text-pencil">{WAITING[tutorial.state] ?? 'There is no review step for you to take now.'}</p>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3" aria-label="What you can do now">
          {moves.map((a) => (
            <li key={a} className="flex flex-col items-start gap-1.5">
              <Button
                variant={a === 'sendBack' || a === 'unpublish' ? 'danger' : 'primary'}
                busy={move.isPending && move.variables?.action === a}
                disabled={move.isPending}
                aria-expanded={a === 'sendBack' ? noteOpen : undefined}
                onClick={() => {
                  if (a === 'sendBack') setNoteOpen((o) => !o);
                  else if (a === 'unpublish') setConfirmUnpublish(true);
                  else run(a);
                }}
              >
                {TRANSITIONS[a].label}
              </Button>
              <p className="text-xs text-pencil">{consequence(a, publicUrl)}</p>
            </li>
          ))}
        </ul>
      )}

      {noteOpen && (
        <form
          className="mt-4 max-w-xl rounded-md border border-line bg-paper p-3"
          aria-label="Send back"
          onSubmit={(e) => {
            e.preventDefault();
            run('sendBack', note);
          }}
        >
          <label htmlFor="send-back-note" className="text-sm font-medium">
            Note for the maker (optional)
          </label>
          <textarea
            id="send-back-note"
            rows={3}
            maxLength={2000}
            value={note}
            onChange={(e) => setNote(e.target.value)}
            placeholder="What should change, e.g. “Add the lid’s score lines to step 4.”"
            className="mt-1 w-full rounded-md border border-line bg-white px-2 py-1.5 text-sm outline-none focus:border-kraft"
          />
          <div className="mt-2 flex gap-2">
            <Button type="submit" variant="danger" busy={move.isPending}>
              Send back to the maker
            </Button>
            <Button variant="ghost" onClick={() => setNoteOpen(false)}>
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
