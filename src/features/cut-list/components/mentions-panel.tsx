import { useEffect, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { formatTimestamp } from '@shared/transcript/timestamp';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/spinner';
import { Notice } from '@/components/ui/notice';
import { useDismissMention } from '../api/dismiss-mention';
import { useMentions } from '../api/get-mentions';
import { useDeletePiece } from '../api/piece-mutations';
import { useAddMentionScoreLines, useMakePieces } from '../api/make-pieces';
import type { MadePiecesDto, MentionDto, PieceDto } from '@shared/schemas/piece';
import { makeFromMention, pickFromRange, proposalSummary } from '../utils/mention-piece';
import type { PiecePrefill } from './add-piece-form';
import { useCutList } from './cut-list-context';
import { saveErrorText } from './editable-cell';
import { LengthText } from './length-text';

const KIND_WORD: Record<MentionDto['kind'], string> = { size: 'size', score: 'score lines', length: 'length', diameter: 'diameter', range: 'range' };

/** The transcript's measurements in time order; each one becomes a piece or score lines in a click. */
export function MentionsPanel({ pieces, footagePath, onPrefill }: { pieces: PieceDto[]; footagePath: string; onPrefill: (p: PiecePrefill['values']) => void }) {
  const { tutorialId, canEdit } = useCutList();
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
    const unused = all.filter((m) => m.proposal && !m.dismissed && !m.corrected && m.uses.length === 0).length;
    body = (
      <>
        {canEdit && <MakeAll count={unused} />}
        <div className="mb-2 flex items-center justify-between text-xs text-pencil">
          <span>
            {q.data.toGoThrough} of {all.length} to go through
          </span>
          {dismissed > 0 && (
            <label className="flex items-center gap-1">
              <input type="checkbox" checked={showDismissed} onChange={(e) => setShowDismissed(e.target.checked)} /> show dismissed ({dismissed})
            </label>
          )}
        </div>
        {shown.length === 0 ? (
          <p className="rounded-md border border-line bg-white px-3 py-4 text-center text-sm text-pencil">
            Every mention is dismissed. Tick “show dismissed” to bring one back.
          </p>
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

function MentionItem({ mention: m, pieces, onPrefill }: { mention: MentionDto; pieces: PieceDto[]; onPrefill: (p: PiecePrefill['values']) => void }) {
  const { tutorialId, canEdit, footageAt } = useCutList();
  const navigate = useNavigate();
  const makePieces = useMakePieces(tutorialId);
  const addScore = useAddMentionScoreLines(tutorialId);
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
  const prefill = make?.kind === 'prefill' ? make.piece : null;
  const usedAsPiece = m.uses.filter((u) => u.as === 'piece');
  const usedAsScore = m.uses.filter((u) => u.as === 'score');
  const used = m.uses.length > 0;
  const partOf = Boolean(m.scoreOf) && !used;
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
    if (m.proposal)
      return void run(
        () => makePieces.mutateAsync({ keys: [m.key], again: usedAsPiece.length > 0 }),
        usedAsPiece.length > 0 ? `Another “${m.proposal.name}” added to the cut list.` : `“${m.proposal.name}” added to the cut list.`,
      );
    if (prefill) onPrefill({ ...prefill, mentionKey: m.key });
  };
  const onAddScore = () => {
    const p = pieces.find((x) => x.id === target);
    if (!p) return setError('Choose a piece first');
    void run(() => addScore.mutateAsync({ key: m.key, pieceId: p.id, axis, again: used }).then(() => setChoosing(false)), `Score lines added to “${p.name}”.`);
  };

  return (
    <li
      className={`rounded-md border p-3 text-sm ${m.dismissed ? 'border-dashed border-line bg-white opacity-70' : used ? 'border-line bg-paper' : 'border-line bg-white'}`}
      aria-label={`Mention at ${t}`}
    >
      <div className="flex flex-wrap items-center gap-x-2 gap-y-1 text-xs">
        <button
          type="button"
          className="font-mono text-kraft-dark underline decoration-dotted underline-offset-2 hover:text-ink"
          aria-label={`${t}: open the footage there`}
          onClick={() => navigate(footageAt(m.startMs))}
        >
          {t}
        </button>
        <span className="rounded-full bg-kraft-light px-2 py-0.5 text-kraft-dark">{KIND_WORD[m.kind]}</span>
        {m.approx && <span className="rounded-full border border-kraft/40 px-2 py-0.5 text-kraft-dark">{m.kind === 'range' ? 'not exact' : 'about'}</span>}
        {m.count !== null && m.count > 1 && <span className="rounded-full border border-line px-2 py-0.5 text-ink">× {m.count}</span>}
        {m.corrected && <span className="text-pencil">taken back straight after</span>}
        {m.dismissed && <span className="text-pencil">not a piece</span>}
      </div>
      <blockquote className={`mt-1.5 font-serif text-[13px] italic ${m.corrected ? 'text-pencil line-through' : ''}`}>“{m.text}”</blockquote>
      <div className="mt-1 flex flex-wrap items-baseline gap-x-1">
        {m.every ? (
          <>
            <LengthText value={m.every} prefix="every " />
            {m.values[0] && m.values[0].value !== m.every.value && (
              <span className="inline-flex items-baseline gap-1">
                <span className="text-pencil">from</span>
                <LengthText value={m.values[0]} />
              </span>
            )}
          </>
        ) : (
          m.values.map((v, i) => (
            <span key={i} className="inline-flex items-baseline gap-1">
              {i > 0 && <span className="text-pencil">{m.kind === 'size' ? '×' : m.kind === 'range' ? 'to' : ','}</span>}
              <LengthText value={v} />
            </span>
          ))
        )}
      </div>
      {m.kind === 'range' && <p className="mt-1 text-xs text-pencil">A range, not one length: pick the end you mean to cut.</p>}
      {m.every && <p className="mt-1 text-xs text-pencil">Repeated score lines: added over the whole side of the piece you choose.</p>}
      {m.proposal && !used && !m.dismissed && (
        <p className="mt-1 text-xs text-ink">
          <span className="text-pencil">Makes </span>
          {proposalSummary(m.proposal)}
        </p>
      )}
      {partOf && !m.dismissed && <p className="mt-1 text-xs text-pencil">Said with the size before it: its lines go into that piece.</p>}
      {usedAsPiece.length > 0 && (
        <p className="mt-1 text-xs text-sage">
          <span aria-hidden>✓ </span>In the cut list as {usedAsPiece.map((u) => `“${u.pieceName}”`).join(', ')}
        </p>
      )}
      {usedAsScore.length > 0 && (
        <p className="mt-1 text-xs text-sage">
          <span aria-hidden>✓ </span>Score lines of {usedAsScore.map((u) => `“${u.pieceName}”`).join(', ')}
        </p>
      )}
      {canEdit && (
        <div className="mt-2 flex flex-wrap gap-1.5">
          {!m.dismissed && (m.proposal || prefill) && (
            <Button size="sm" variant={usedAsPiece.length > 0 ? 'secondary' : 'primary'} busy={makePieces.isPending} onClick={makePiece}>
              {usedAsPiece.length > 0 ? 'Make another piece' : 'Make a piece'}
            </Button>
          )}
          {!m.dismissed &&
            m.kind === 'range' &&
            m.values.map((v) => (
              <Button key={v.value} size="sm" variant="secondary" onClick={() => onPrefill({ ...pickFromRange(m, v), mentionKey: m.key })}>
                Use {v.display}
              </Button>
            ))}
          {!m.dismissed && canScore && (
            <Button
              size="sm"
              variant="secondary"
              aria-expanded={choosing}
              disabled={pieces.length === 0}
              title={pieces.length === 0 ? 'Add a piece first' : undefined}
              onClick={() => setChoosing((c) => !c)}
            >
              {used ? 'Add these lines again to…' : 'Add as score line to…'}
            </Button>
          )}
          <Button
            size="sm"
            variant="ghost"
            busy={dismiss.isPending}
            onClick={() => void run(() => dismiss.mutateAsync({ key: m.key, dismissed: !m.dismissed }), '')}
          >
            {m.dismissed ? 'Bring back' : 'Not a piece'}
          </Button>
        </div>
      )}
      {choosing && (
        <div className="mt-2 flex flex-wrap items-center gap-1.5 rounded-md bg-paper p-2">
          <select
            aria-label="Piece to score"
            className="min-w-0 flex-1 rounded border border-field bg-white px-1 py-1 text-sm"
            value={target}
            onChange={(e) => setTarget(e.target.value)}
          >
            <option value="">Choose a piece</option>
            {pieces
              .filter((p) => p.shape === 'rect')
              .map((p) => (
                <option key={p.id} value={p.id}>
                  {p.name}
                </option>
              ))}
          </select>
          <select
            aria-label="Measured on"
            className="rounded border border-field bg-white px-1 py-1 text-sm"
            value={axis}
            onChange={(e) => setAxis(e.target.value as 'width' | 'height')}
          >
            <option value="width">on width</option>
            <option value="height">on length</option>
          </select>
          <Button size="sm" busy={addScore.isPending} onClick={onAddScore}>
            Add
          </Button>
        </div>
      )}
      {error && (
        <p role="alert" className="mt-1 text-xs text-rosehip">
          {error}
        </p>
      )}
      {done && (
        <p role="status" className="mt-1 text-xs text-sage">
          {done}
        </p>
      )}
    </li>
  );
}

/** "Make pieces from all": every size mention still to go through becomes a piece, then the pieces are listed for review and can be taken back. */
function MakeAll({ count }: { count: number }) {
  const { tutorialId } = useCutList();
  const make = useMakePieces(tutorialId);
  const remove = useDeletePiece(tutorialId);
  const [made, setMade] = useState<MadePiecesDto | null>(null);
  const [error, setError] = useState<string | null>(null);
  const go = async () => {
    setError(null);
    try {
      setMade(await make.mutateAsync({}));
    } catch (e) {
      setError(saveErrorText(e));
    }
  };
  const undo = async () => {
    if (!made) return;
    setError(null);
    try {
      for (const p of made.pieces) await remove.mutateAsync(p.id);
      setMade(null);
    } catch (e) {
      setError(saveErrorText(e));
    }
  };
  return (
    <div className="mb-3 rounded-md border border-kraft/40 bg-kraft-light/40 p-3 text-sm">
      {count > 0 ? (
        <>
          <Button size="sm" busy={make.isPending} onClick={() => void go()}>
            Make pieces from all ({count})
          </Button>
          <p className="mt-1 text-xs text-pencil">Every size and diameter not used yet becomes a piece, named from the words said.</p>
        </>
      ) : (
        !made && <p className="text-xs text-pencil">Every size said is in the cut list or set aside.</p>
      )}
      {made && made.pieces.length > 0 && (
        <div role="status" className="mt-2">
          <p className="font-medium">
            {made.pieces.length} {made.pieces.length === 1 ? 'piece' : 'pieces'} added. Check them in the table:
          </p>
          <ul className="mt-1 list-disc space-y-0.5 pl-5 text-xs">
            {made.pieces.map((p) => (
              <li key={p.id}>
                {p.name}
                {p.material ? `, ${p.material}` : ', no material yet'}
                {p.quantity > 1 ? `, × ${p.quantity}` : ''}: {p.shape === 'circle' ? `${p.width.display} across` : `${p.width.display} × ${p.height.display}`}
                {p.scoreLines.length > 0 ? `, ${p.scoreLines.length} score ${p.scoreLines.length === 1 ? 'line' : 'lines'}` : ''}
              </li>
            ))}
          </ul>
          <Button size="sm" variant="ghost" className="mt-1" busy={remove.isPending} onClick={() => void undo()}>
            Undo: take these pieces out
          </Button>
        </div>
      )}
      {error && (
        <p role="alert" className="mt-1 text-xs text-rosehip">
          {error}
        </p>
      )}
    </div>
  );
}
