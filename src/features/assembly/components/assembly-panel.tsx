import { useState } from 'react';
import { ASSEMBLY_KINDS, type AssemblyDto, type AssemblyKind, type AssemblyProposalDto } from '@shared/schemas/assembly';
import { formatTimestamp } from '@shared/transcript/timestamp';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useAssemblyAction } from '../api/assembly-mutations';
import { useAssembly } from '../api/get-assembly';

const GROUP_TITLE: Record<AssemblyKind, string> = { chapter: 'Chapters', still: 'Stills', piece: 'Pieces', supply: 'Supplies', draft: 'First draft' };

type Props = {
  tutorialId: string;
  recordingId: string;
  hasTranscript: boolean;
  canEdit: boolean;
  /** Opens the footage at a time (the proposal's place in the video). */
  onSeek?: (ms: number) => void;
};

/**
 * "Assemble the tutorial": once the transcript is attached, one action proposes the whole package
 * (chapters, a still per chapter, pieces, supplies, the first draft). Each proposal is shown as
 * such until it is accepted or dropped, one by one or all at once, and every choice can be undone.
 */
export function AssemblyPanel({ tutorialId, recordingId, hasTranscript, canEdit, onSeek }: Props) {
  const q = useAssembly(tutorialId, recordingId, hasTranscript);
  const act = useAssemblyAction(tutorialId);
  const [lastBatch, setLastBatch] = useState<{ ids: string[]; label: string } | null>(null);
  const [error, setError] = useState<string | null>(null);
  if (!canEdit || !hasTranscript) return null;

  const run = async (action: 'run' | 'accept' | 'drop' | 'undo', ids?: string[], batchLabel?: string) => {
    setError(null);
    const before = new Map((q.data?.proposals ?? []).map((p) => [p.id, p.state]));
    try {
      const after = await act.mutateAsync({ action, ids });
      const changed = after.proposals.filter((p) => before.get(p.id) !== undefined && before.get(p.id) !== p.state).map((p) => p.id);
      setLastBatch(batchLabel && changed.length > 1 ? { ids: changed, label: batchLabel } : action === 'undo' ? null : lastBatch);
    } catch (e) {
      setError(e instanceof Error ? e.message : 'That did not work; try again');
    }
  };

  let body;
  if (q.isPending) body = <Loading label="Reading the proposals" />;
  else if (q.error) body = <Notice kind="error">{q.error.message}</Notice>;
  else if (q.data.proposals.length === 0)
    body = (
      <div className="flex flex-wrap items-center gap-3">
        <Button busy={act.isPending} onClick={() => void run('run')}>
          Assemble the tutorial
        </Button>
        <span className="text-sm text-pencil">Nothing is made until you accept it.</span>
      </div>
    );
  else body = <Proposals data={q.data} busy={act.isPending} onAct={run} onSeek={onSeek} lastBatch={lastBatch} />;

  return (
    <section aria-labelledby="assembly-title" className="rounded-lg border border-kraft/40 bg-white p-4">
      <h2 id="assembly-title" className="text-lg">
        Assemble the tutorial
      </h2>
      <p className="mt-1 mb-3 text-sm text-pencil">
        From the talk: chapters, the sharpest still inside each, a piece for every size said, the supplies named (matched to ones you listed before) and the
        first draft with the stills placed. Accept or drop each proposal, or all at once; every choice can be undone.
      </p>
      {q.data?.processing && (
        <p className="mb-3 text-sm text-ink">The preview is still being made. Stills wait for the video to be read; everything else can be accepted now.</p>
      )}
      {body}
      {error && (
        <p role="alert" className="mt-2 text-sm text-rosehip">
          {error}
        </p>
      )}
    </section>
  );
}

type ActFn = (action: 'run' | 'accept' | 'drop' | 'undo', ids?: string[], batchLabel?: string) => Promise<void>;

function Proposals({
  data,
  busy,
  onAct,
  onSeek,
  lastBatch,
}: {
  data: AssemblyDto;
  busy: boolean;
  onAct: ActFn;
  onSeek?: (ms: number) => void;
  lastBatch: { ids: string[]; label: string } | null;
}) {
  const { counts } = data;
  // A still waiting only for its chapter goes in with it; one waiting for the video does not.
  const acceptable = data.proposals.filter((p) => p.state === 'proposed' && !p.waiting?.startsWith('Waits for the video')).length;
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-2">
        {counts.proposed > 0 && (
          <>
            <Button busy={busy} disabled={acceptable === 0} onClick={() => void onAct('accept', undefined, 'accepting all')}>
              Accept all ({acceptable})
            </Button>
            <Button variant="secondary" disabled={busy} onClick={() => void onAct('drop', undefined, 'dropping all')}>
              Drop all
            </Button>
          </>
        )}
        {lastBatch && (
          <Button variant="secondary" disabled={busy} onClick={() => void onAct('undo', lastBatch.ids)}>
            Undo {lastBatch.label}
          </Button>
        )}
        <Button variant="ghost" disabled={busy} onClick={() => void onAct('run')} title="Reads the talk again and proposes only what is new">
          Look again
        </Button>
        <span className="text-sm text-pencil" aria-live="polite">
          {counts.proposed} to decide · {counts.accepted} accepted · {counts.dropped} dropped
        </span>
      </div>
      {data.notes.length > 0 && (
        <Notice>
          <ul className="list-disc space-y-0.5 pl-5">
            {data.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </Notice>
      )}
      <ProposalGroups data={data} busy={busy} onAct={onAct} onSeek={onSeek} />
    </div>
  );
}

/** The proposals by kind; once every one is decided they fold away behind one line, to be opened for an undo. */
function ProposalGroups({ data, busy, onAct, onSeek }: { data: AssemblyDto; busy: boolean; onAct: ActFn; onSeek?: (ms: number) => void }) {
  const groups = ASSEMBLY_KINDS.map((kind) => {
    const items = data.proposals.filter((p) => p.kind === kind);
    if (items.length === 0) return null;
    return (
      <div key={kind}>
        <h3 className="text-base">
          {GROUP_TITLE[kind]} <span className="text-sm font-normal text-pencil">({items.length})</span>
        </h3>
        <ul className="mt-1 divide-y divide-line rounded-md border border-line" aria-label={GROUP_TITLE[kind]}>
          {items.map((p) => (
            <ProposalRow key={p.id} p={p} busy={busy} onAct={onAct} onSeek={onSeek} />
          ))}
        </ul>
      </div>
    );
  });
  if (data.counts.proposed > 0) return <>{groups}</>;
  return (
    <details className="rounded-md border border-line px-3 py-2">
      <summary className="cursor-pointer text-sm">Every proposal is decided: show them (to undo one)</summary>
      <div className="mt-3 space-y-4">{groups}</div>
    </details>
  );
}

function ProposalRow({ p, busy, onAct, onSeek }: { p: AssemblyProposalDto; busy: boolean; onAct: ActFn; onSeek?: (ms: number) => void }) {
  const tone = p.state === 'accepted' ? 'bg-sage-light/40' : p.state === 'dropped' ? 'bg-paper text-pencil' : 'bg-white';
  return (
    <li className={`flex flex-wrap items-center gap-x-3 gap-y-1 px-3 py-2 text-sm ${tone}`} aria-label={p.summary}>
      <span className="min-w-0 flex-1">
        {p.atMs !== null && onSeek ? (
          <button
            type="button"
            className="mr-2 font-mono text-xs text-kraft-dark underline decoration-dotted underline-offset-2"
            onClick={() => onSeek(p.atMs!)}
            aria-label={`${formatTimestamp(p.atMs)}: play from there`}
          >
            {formatTimestamp(p.atMs)}
          </button>
        ) : p.atMs !== null ? (
          <span className="mr-2 font-mono text-xs text-pencil">{formatTimestamp(p.atMs)}</span>
        ) : null}
        <span className={p.state === 'dropped' ? 'line-through' : ''}>{p.summary}</span>
        {p.waiting && p.state === 'proposed' && <span className="block text-xs text-pencil">{p.waiting}</span>}
      </span>
      <span className="flex shrink-0 items-center gap-1.5">
        {p.state === 'proposed' ? (
          <>
            <span className="rounded-full border border-kraft/50 px-2 py-0.5 text-xs text-kraft-dark">proposed</span>
            <Button size="sm" disabled={busy || !!p.waiting} onClick={() => void onAct('accept', [p.id])} aria-label={`Accept: ${p.summary}`}>
              Accept
            </Button>
            <Button size="sm" variant="ghost" disabled={busy} onClick={() => void onAct('drop', [p.id])} aria-label={`Drop: ${p.summary}`}>
              Drop
            </Button>
          </>
        ) : (
          <>
            <span className="text-xs">
              {p.state === 'accepted' ? (
                <>
                  <span aria-hidden>✓ </span>accepted
                </>
              ) : (
                'dropped'
              )}
            </span>
            <Button size="sm" variant="ghost" disabled={busy} onClick={() => void onAct('undo', [p.id])} aria-label={`Undo: ${p.summary}`}>
              Undo
            </Button>
          </>
        )}
      </span>
    </li>
  );
}
