import { useEffect, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { formatTimestamp } from '@shared/transcript/timestamp';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/spinner';
import { Notice } from '@/components/ui/notice';
import { useDismissMention } from '../api/dismiss-mention';
import { useMentions } from '../api/get-mentions';
import { pieceChange, useCreatePiece, useUpdatePiece } from '../api/piece-mutations';
import type { MentionDto, Piece } from '../api/types';
import { makeFromMention, scoreLinesFromMention } from '../utils/mention-piece';
import type { PiecePrefill } from './add-piece-form';
import { useCutList } from './cut-list-context';
import { saveErrorText } from './editable-cell';
import { LengthText } from './length-text';

const KIND_WORD: Record<MentionDto['kind'], string> = { size: 'size', score: 'score lines', length: 'length', diameter: 'diameter' };

/** The transcript's measurements in time order; each one becomes a piece or score lines in a click. */
export function MentionsPanel({ pieces, footagePath, onPrefill }: { pieces: Piece[]; footagePath: string; onPrefill: (p: PiecePrefill['values']) => void }) {
  const { tutorialId } = useCutList();
  const q = useMentions(tutorialId);
  const [showDismissed, setShowDismissed] = useState(false);

  let body;
  if (q.isPending) body = <Loading label="Reading the transcript" />;
  else if (q.error) body = <Notice kind="error">{q.error.message}</Notice>;
  else if (!q.data.recordingId || q.data.mentions.length === 0) {
    body = (
      <div className="rounded-md border border-dashed border-kraft/50 bg-white/60 px-4 py-6 text-center text-sm">
        <p className="font-medium">{q.data.recordingId ? 'No measurements found yet' : 'No transcript yet'}</p>
        <p className="mt-1 text-pencil">
          {q.data.recordingId
            ? 'The recording has no transcript, or nobody says a size in it. Attach a timed transcript in '
            : 'Attach the recording and its timed transcript in '}
          <Link className="text-kraft-dark underline" to={footagePath}>
            Footage
          </Link>
          ; every size, length, diameter and score line spoken will be listed here.
        </p>
      </div>
    );
  } else {
    const all = q.data.mentions;
    const dismissed = all.filter((m) => m.dismissed).length;
    const shown = all.filter((m) => showDismissed || !m.dismissed);
    body = (
      <>
        <div className="mb-2 flex items-center justify-between text-xs text-pencil">
          <span>
            {all.length - dismissed} of {all.length} to go through
          </span>
          {dismissed > 0 && (
            <label className="flex items-center gap-1">
              <input type="checkbox" checked={showDismissed} onChange={(e) => setShowDismissed(e.target.checked)} /> show dismissed ({dismissed})
            </label>
          )}
        </div>
        {shown.length === 0 ? (
          <p className="rounded-md border border-line bg-white px-3 py-4 text-center text-sm text-pencil">Every mention is dismissed. Tick “show dismissed” to bring one back.</p>
        ) : (
          <ol className="space-y-2">
            {shown.map((m) => (
              <MentionItem key={m.key} mention={m} pieces={pieces} onPrefill={onPrefill} />
            ))}
          </ol>
        )}
      </>
    );
  }
  return (
    <section aria-labelledby="mentions-title">
      <h3 id="mentions-title" className="text-base">
        Mentions
      </h3>
      <p className="mb-3 text-xs text-pencil">Measurements said in the recording, in time order.</p>
      {body}
    </section>
  );
}

function MentionItem({ mention: m, pieces, onPrefill }: { mention: MentionDto; pieces: Piece[]; onPrefill: (p: PiecePrefill['values']) => void }) {
  const { tutorialId, canEdit, footageAt } = useCutList();
  const navigate = useNavigate();
  const create = useCreatePiece(tutorialId);
  const update = useUpdatePiece(tutorialId);
  const dismiss = useDismissMention(tutorialId);
  const [choosing, setChoosing] = useState(false);
  const [target, setTarget] = useState('');
  const [axis, setAxis] = useState<'width' | 'height'>('width');
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  useEffect(() => {
    if (!done) return;
    const t = setTimeout(() => setDone(null), 4000);
    return () => clearTimeout(t);
  }, [done]);
  const make = makeFromMention(m);
  const made = pieces.filter((p) => p.saidAtMs === m.startMs);
  const t = formatTimestamp(m.startMs);
  const canScore = m.kind === 'score' || m.kind === 'length';

  const run = async (f: () => Promise<unknown>, said: string) => {
    setError(null);
    setDone(null);
    try {
      await f();
      setDone(said);
    } catch (e) {
      setError(saveErrorText(e));
    }
  };
  const makePiece = () => {
    if (!make) return;
    if (make.kind === 'prefill') return onPrefill(make.piece);
    void run(() => create.mutateAsync(make.piece), 'Added to the cut list.');
  };
  const addScore = () => {
    const p = pieces.find((x) => x.id === target);
    if (!p) return setError('Choose a piece first');
    const lines = [...p.scoreLines.map((s) => ({ axis: s.axis, at: s.at.value, tab: s.tab })), ...scoreLinesFromMention(m, axis)];
    void run(() => update.mutateAsync({ id: p.id, ...pieceChange(p, { scoreLines: lines }) }).then(() => setChoosing(false)), `Score lines added to “${p.name}”.`);
  };

  return (
    <li className={`rounded-md border bg-white p-3 text-sm ${m.dismissed ? 'border-dashed border-line opacity-70' : 'border-line'}`} aria-label={`Mention at ${t}`}>
      <div className="flex flex-wrap items-center gap-x-2 gap-y-1 text-xs">
        <button type="button" className="font-mono text-kraft-dark underline decoration-dotted underline-offset-2 hover:text-ink" aria-label={`${t}: open the footage there`} onClick={() => navigate(footageAt(m.startMs))}>
          {t}
        </button>
        <span className="rounded-full bg-kraft-light px-2 py-0.5 text-kraft-dark">{KIND_WORD[m.kind]}</span>
        {m.approx && <span className="rounded-full border border-kraft/40 px-2 py-0.5 text-kraft-dark">about</span>}
        {m.corrected && <span className="text-pencil">taken back straight after</span>}
        {m.dismissed && <span className="text-pencil">not a piece</span>}
      </div>
      <blockquote className={`mt-1.5 font-serif text-[13px] italic ${m.corrected ? 'text-pencil line-through' : ''}`}>“{m.text}”</blockquote>
      <div className="mt-1 flex flex-wrap items-baseline gap-x-1">
        {m.values.map((v, i) => (
          <span key={i} className="inline-flex items-baseline gap-1">
            {i > 0 && <span className="text-pencil">{m.kind === 'size' ? '×' : ','}</span>}
            <LengthText value={v} />
          </span>
        ))}
      </div>
      {made.length > 0 && (
        <p className="mt-1 text-xs text-sage">
          <span aria-hidden>✓ </span>In the cut list as {made.map((p) => `“${p.name}”`).join(', ')}
        </p>
      )}
      {canEdit && (
        <div className="mt-2 flex flex-wrap gap-1.5">
          {!m.dismissed && make && (
            <Button size="sm" busy={create.isPending} onClick={makePiece}>
              Make a piece
            </Button>
          )}
          {!m.dismissed && canScore && (
            <Button size="sm" variant="secondary" aria-expanded={choosing} disabled={pieces.length === 0} title={pieces.length === 0 ? 'Add a piece first' : undefined} onClick={() => setChoosing((c) => !c)}>
              Add as score line to…
            </Button>
          )}
          <Button size="sm" variant="ghost" busy={dismiss.isPending} onClick={() => void run(() => dismiss.mutateAsync({ key: m.key, dismissed: !m.dismissed }), '')}>
            {m.dismissed ? 'Bring back' : 'Not a piece'}
          </Button>
        </div>
      )}
      {choosing && (
        <div className="mt-2 flex flex-wrap items-center gap-1.5 rounded-md bg-paper p-2">
          <select aria-label="Piece to score" className="min-w-0 flex-1 rounded border border-line bg-white px-1 py-1 text-sm" value={target} onChange={(e) => setTarget(e.target.value)}>
            <option value="">Choose a piece</option>
            {pieces
              .filter((p) => p.shape === 'rect')
              .map((p) => (
                <option key={p.id} value={p.id}>
                  {p.name}
                </option>
              ))}
          </select>
          <select aria-label="Measured on" className="rounded border border-line bg-white px-1 py-1 text-sm" value={axis} onChange={(e) => setAxis(e.target.value as 'width' | 'height')}>
            <option value="width">on width</option>
            <option value="height">on length</option>
          </select>
          <Button size="sm" busy={update.isPending} onClick={addScore}>
            Add
          </Button>
        </div>
      )}
      {error && <p role="alert" className="mt-1 text-xs text-rosehip">{error}</p>}
      {done && <p role="status" className="mt-1 text-xs text-sage">{done}</p>}
    </li>
  );
}
