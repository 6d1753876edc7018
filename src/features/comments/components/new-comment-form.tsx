import { useEffect, useId, useRef, useState } from 'react';
import type { MentionableDto } from '@shared/schemas/comment';
import { Button } from '@/components/ui/button';
import { useAddComment } from '../api/comment-mutations';
import {
  anchorFor,
  isOffered,
  passageLabel,
  stepOptionLabel,
  type AboutValue,
  type NamedOption,
  type PassageOption,
  type StepOption,
} from '../utils/anchor-options';
import { mentionsStillIn } from '../utils/mentions';
import { MentionTextarea } from './mention-textarea';

type Props = {
  tutorialId: string;
  steps: StepOption[];
  pieces: NamedOption[];
  stills: NamedOption[];
  passage: PassageOption | null;
  people: MentionableDto[];
  /** A step's "Comment" button or "Comment on the selected words" chose this; `nonce` makes a repeat count. */
  preset: { value: AboutValue; nonce: number } | null;
  /** Saves pending edits of the write-up first, so a passage just typed is on the server. */
  beforeComment?: () => Promise<boolean>;
  onPosted: (id: string) => void;
};

/** Starts a thread: what it is about (the whole tutorial, a step, the selected words, a piece or a still) and the words. */
export function NewCommentForm({ tutorialId, steps, pieces, stills, passage, people, preset, beforeComment, onPosted }: Props) {
  const add = useAddComment(tutorialId);
  const [about, setAbout] = useState<AboutValue>('');
  const [body, setBody] = useState('');
  const [picked, setPicked] = useState<MentionableDto[]>([]);
  const [error, setError] = useState<string | null>(null);
  const aboutId = useId();
  const errorId = useId();
  const bodyRef = useRef<HTMLDivElement>(null);
  const offered = isOffered(about, { steps, pieces, stills, passage });
  const value = offered ? about : '';

  useEffect(() => {
    if (!preset) return;
    setAbout(preset.value);
    // The person asked to comment on something: the words go next.
    bodyRef.current?.querySelector('textarea')?.focus();
  }, [preset]);

  const send = async () => {
    setError(null);
    if (!body.trim()) {
      setError('Write something first.');
      return;
    }
    if (beforeComment && !(await beforeComment())) {
      setError('The write-up could not be saved just now, so the comment was not sent. Try again in a moment.');
      return;
    }
    add.mutate(
      { body, anchor: anchorFor(value, passage), mentions: mentionsStillIn(body, picked) },
      {
        onSuccess: (c) => {
          setBody('');
          setPicked([]);
          setAbout('');
          onPosted(c.id);
        },
        onError: (e) => setError(e.message),
      },
    );
  };

  return (
    <form
      className="space-y-2 rounded-md border border-line bg-white p-3"
      aria-label="New comment"
      onSubmit={(e) => {
        e.preventDefault();
        void send();
      }}
    >
      <div>
        <label htmlFor={aboutId} className="text-sm font-medium">
          About
        </label>
        <select
          id={aboutId}
          value={value}
          onChange={(e) => setAbout(e.target.value)}
          className="mt-1 w-full rounded-md border border-field bg-white px-2 py-1.5 text-sm focus:border-kraft"
        >
          <option value="">The whole tutorial</option>
          {passage && <option value="passage">{passageLabel(passage)}</option>}
          {steps.length > 0 && (
            <optgroup label="Steps">
              {steps.map((s) => (
                <option key={s.id} value={`step:${s.id}`}>
                  {stepOptionLabel(s)}
                </option>
              ))}
            </optgroup>
          )}
          {pieces.length > 0 && (
            <optgroup label="Cut list pieces">
              {pieces.map((p) => (
                <option key={p.id} value={`piece:${p.id}`}>
                  Piece: {p.label}
                </option>
              ))}
            </optgroup>
          )}
          {stills.length > 0 && (
            <optgroup label="Stills">
              {stills.map((s) => (
                <option key={s.id} value={`still:${s.id}`}>
                  {s.label}
                </option>
              ))}
            </optgroup>
          )}
        </select>
        {passage ? (
          value !== 'passage' && (
            <button type="button" className="mt-1 text-left text-xs font-medium text-kraft-dark underline" onClick={() => setAbout('passage')}>
              Comment on the selected words in step {passage.stepNumber}
            </button>
          )
        ) : (
          <p className="mt-0.5 text-xs text-pencil">To comment on a passage, select its words in the write-up.</p>
        )}
      </div>
      <div ref={bodyRef}>
        <MentionTextarea
          label="Comment"
          value={body}
          onChange={setBody}
          onPick={(p) => setPicked((list) => (list.some((x) => x.id === p.id) ? list : [...list, p]))}
          people={people}
          placeholder="What should change, and why?"
          describedBy={error ? errorId : undefined}
          invalid={Boolean(error)}
          onSubmit={() => void send()}
        />
      </div>
      {error && (
        <p id={errorId} role="alert" className="text-sm text-rosehip">
          {error}
        </p>
      )}
      <div className="flex justify-end">
        <Button type="submit" size="sm" busy={add.isPending}>
          Comment
        </Button>
      </div>
    </form>
  );
}
