import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import type { CommentAnchorDto, CommentDto, MentionableDto } from '@shared/schemas/comment';
import { Button } from '@/components/ui/button';
import { useAddReply, useUpdateComment } from '../api/comment-mutations';
import { showAnchor } from '../utils/anchor-dom';
import { mentionsStillIn, splitMentions } from '../utils/mentions';
import { MentionTextarea } from './mention-textarea';

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/** A comment's words with its mentions set apart. */
function Body({ c }: { c: CommentDto }) {
  return (
    <p className="whitespace-pre-wrap break-words text-sm">
      {splitMentions(
        c.body,
        c.mentions.map((m) => m.name),
      ).map((part, i) =>
        part.mention ? (
          <strong key={i} className="font-semibold text-kraft-dark">
            {part.text}
          </strong>
        ) : (
          <span key={i}>{part.text}</span>
        ),
      )}
    </p>
  );
}

function Byline({ c }: { c: CommentDto }) {
  return (
    <p className="text-xs text-pencil">
      <span className="font-medium text-ink">{c.author?.name ?? 'A former member'}</span> · <time dateTime={c.createdAt}>{when(c.createdAt)}</time>
      {c.editedAt && <span> · edited</span>}
    </p>
  );
}

/** What the anchor's state means, in words (not only a colour). */
function anchorNote(a: CommentAnchorDto): string | null {
  if (a.status === 'missing') {
    const what = a.kind === 'piece' ? 'piece' : a.kind === 'still' ? 'still' : 'step';
    return `The ${what} this comment was about has been deleted.`;
  }
  if (a.status === 'changed') return 'The quoted words have changed since.';
  return null;
}

/** The anchor as a button that shows its place in the write-up, or a link to the section that has it. */
function AnchorLine({ anchor, links }: { anchor: CommentAnchorDto; links: { cutList: string; footage: string } }) {
  const [elsewhere, setElsewhere] = useState(false);
  const note = anchorNote(anchor);
  if (anchor.status === 'missing') {
    return (
      <div className="text-xs">
        <p className="font-medium text-pencil line-through decoration-pencil/60">{anchor.label}</p>
        <p className="font-medium text-rosehip">⚠ {note}</p>
      </div>
    );
  }
  const section =
    anchor.kind === 'piece'
      ? { to: links.cutList, label: 'Open the Cut list' }
      : anchor.kind === 'still'
        ? { to: links.footage, label: 'Open the Footage' }
        : null;
  return (
    <div className="text-xs">
      <button
        type="button"
        className="text-left font-medium text-kraft-dark underline decoration-dotted underline-offset-2 hover:decoration-solid"
        onClick={() => setElsewhere(!showAnchor(anchor))}
        title="Show where this comment points"
      >
        {anchor.label}
      </button>
      {anchor.quote && <blockquote className="mt-1 border-l-2 border-kraft/60 pl-2 italic text-ink">“{anchor.quote}”</blockquote>}
      {note && <p className="mt-0.5 text-rosehip">{note}</p>}
      {elsewhere && section && (
        <p className="mt-0.5 text-pencil">
          Not shown in the write-up.{' '}
          <Link className="text-kraft-dark underline" to={section.to}>
            {section.label}
          </Link>
        </p>
      )}
    </div>
  );
}

/** A box for a reply or for new words, with the "@" picker. */
function TextForm(props: {
  label: string;
  fieldLabel: string;
  initial?: string;
  people: MentionableDto[];
  submitLabel: string;
  busy: boolean;
  error: string | null;
  onSubmit: (body: string, mentions: string[]) => void;
  onCancel: () => void;
}) {
  const [body, setBody] = useState(props.initial ?? '');
  const [picked, setPicked] = useState<MentionableDto[]>([]);
  const errorId = useId();
  const submit = () => props.onSubmit(body, mentionsStillIn(body, [...picked, ...props.people.filter((p) => (props.initial ?? '').includes(`@${p.name}`))]));
  return (
    <form
      className="mt-2 space-y-2"
      aria-label={props.label}
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
      onKeyDown={(e) => {
        if (e.key === 'Escape') props.onCancel();
      }}
    >
      <MentionTextarea
        label={props.fieldLabel}
        value={body}
        onChange={setBody}
        onPick={(p) => setPicked((l) => [...l, p])}
        people={props.people}
        rows={2}
        autoFocus
        describedBy={props.error ? errorId : undefined}
        invalid={Boolean(props.error)}
        onSubmit={submit}
      />
      {props.error && (
        <p id={errorId} role="alert" className="text-sm text-rosehip">
          {props.error}
        </p>
      )}
      <div className="flex gap-2">
        <Button type="submit" size="sm" busy={props.busy}>
          {props.submitLabel}
        </Button>
        <Button size="sm" variant="ghost" onClick={props.onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** One comment's own words, with editing for its author. */
function CommentBody({ tutorialId, c, people }: { tutorialId: string; c: CommentDto; people: MentionableDto[] }) {
  const update = useUpdateComment(tutorialId);
  const [editing, setEditing] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <div>
      <Byline c={c} />
      {editing ? (
        <TextForm
          label="Change your comment"
          fieldLabel="Your comment"
          initial={c.body}
          people={people}
          submitLabel="Save"
          busy={update.isPending}
          error={error}
          onCancel={() => setEditing(false)}
          onSubmit={(body, mentions) =>
            update.mutate({ commentId: c.id, change: { body, mentions } }, { onSuccess: () => setEditing(false), onError: (e) => setError(e.message) })
          }
        />
      ) : (
        <>
          <Body c={c} />
          {c.abilities.edit && (
            <button type="button" className="text-xs text-pencil underline hover:text-ink" onClick={() => setEditing(true)}>
              Edit
              <span className="sr-only"> your comment</span>
            </button>
          )}
        </>
      )}
    </div>
  );
}

/**
 * A thread: where it points (a click shows the place), the first comment, its replies, and
 * reply, resolve or reopen for those who may.
 */
export function CommentThread({
  tutorialId,
  thread,
  people,
  links,
  focused,
}: {
  tutorialId: string;
  thread: CommentDto;
  people: MentionableDto[];
  links: { cutList: string; footage: string };
  focused: boolean;
}) {
  const reply = useAddReply(tutorialId);
  const update = useUpdateComment(tutorialId);
  const [replying, setReplying] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const headingId = useId();
  const t = thread;
  const tone = t.orphaned ? 'border-rosehip/40' : t.resolved ? 'border-line bg-paper' : 'border-line bg-white';
  return (
    <article
      id={`comment-${t.id}`}
      aria-labelledby={headingId}
      tabIndex={-1}
      className={`rounded-md border p-3 ${tone} ${focused ? 'ring-2 ring-kraft' : ''}`}
      data-resolved={t.resolved || undefined}
    >
      <h3 id={headingId} className="sr-only">
        Comment by {t.author?.name ?? 'a former member'} on {t.anchor ? t.anchor.label : 'the whole tutorial'}
        {t.resolved ? ' (resolved)' : ''}
      </h3>
      <div className="mb-1.5 flex items-start gap-2">
        <div className="min-w-0 flex-1">
          {t.anchor ? <AnchorLine anchor={t.anchor} links={links} /> : <p className="text-xs text-pencil">The whole tutorial</p>}
        </div>
        {t.resolved && <span className="shrink-0 rounded-full bg-sage-light px-2 py-0.5 text-xs font-medium text-ink">✓ Resolved</span>}
      </div>
      <CommentBody tutorialId={tutorialId} c={t} people={people} />
      {t.replies.length > 0 && (
        <ol className="mt-2 space-y-2 border-l-2 border-line pl-3" aria-label="Replies">
          {t.replies.map((r) => (
            <li key={r.id}>
              <CommentBody tutorialId={tutorialId} c={r} people={people} />
            </li>
          ))}
        </ol>
      )}
      {t.resolved && t.resolvedBy && (
        <p className="mt-2 text-xs text-pencil">
          Resolved by {t.resolvedBy.name}
          {t.resolvedAt ? ` on ${when(t.resolvedAt)}` : ''}.
        </p>
      )}
      {replying ? (
        <TextForm
          label="Reply"
          fieldLabel="Your reply"
          people={people}
          submitLabel="Reply"
          busy={reply.isPending}
          error={error}
          onCancel={() => setReplying(false)}
          onSubmit={(body, mentions) =>
            reply.mutate(
              { commentId: t.id, body, mentions },
              {
                onSuccess: () => {
                  setReplying(false);
                  setError(null);
                },
                onError: (e) => setError(e.message),
              },
            )
          }
        />
      ) : (
        (t.abilities.reply || t.abilities.resolve) && (
          <div className="mt-2 flex flex-wrap gap-2">
            {t.abilities.reply && (
              <Button size="sm" variant="secondary" onClick={() => setReplying(true)}>
                Reply
              </Button>
            )}
            {t.abilities.resolve && (
              <Button size="sm" variant="ghost" busy={update.isPending} onClick={() => update.mutate({ commentId: t.id, change: { resolved: !t.resolved } })}>
                {t.resolved ? 'Reopen' : 'Resolve'}
              </Button>
            )}
          </div>
        )
      )}
      {update.error && (
        <p role="alert" className="mt-1 text-sm text-rosehip">
          {update.error.message}
        </p>
      )}
    </article>
  );
}
