import { useEffect, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { useRevision } from '../api/get-revision';
import { useRevisions } from '../api/get-revisions';
import { whenSaved } from '../utils/format';
import { ReadOnlyDoc } from './read-only-doc';

type Props = {
  tutorialId: string;
  open: boolean;
  canRestore: boolean;
  onClose: () => void;
  /** Restores (saving pending edits first); resolves to an error message or null. */
  onRestore: (revisionId: string) => Promise<string | null>;
};

/** The write-up's revisions: who saved what when, a read-only preview, and a restore that is itself a new revision. */
export function RevisionsDrawer({ tutorialId, open, canRestore, onClose, onRestore }: Props) {
  const list = useRevisions(tutorialId, { enabled: open });
  const [chosen, setChosen] = useState<string | null>(null);
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const detail = useRevision(chosen);
  const panel = useRef<HTMLElement>(null);
  useEffect(() => {
    if (open) panel.current?.focus();
    else setChosen(null);
  }, [open]);
  if (!open) return null;
  const revisions = list.data?.revisions ?? [];
  const picked = revisions.find((r) => r.id === chosen);

  const restore = async () => {
    if (!chosen) return;
    setBusy(true);
    const message = await onRestore(chosen);
    setBusy(false);
    setAsking(false);
    setError(message);
    if (!message) setChosen(null);
  };

  return (
    <aside
      ref={panel}
      tabIndex={-1}
      aria-label="Revisions"
      onKeyDown={(e) => e.key === 'Escape' && !asking && onClose()}
      className="fixed inset-y-0 right-0 z-40 flex w-[min(44rem,100vw)] flex-col border-l border-line bg-paper shadow-xl outline-none"
    >
      <div className="flex items-center justify-between border-b border-line px-5 py-3">
        <h2 className="text-lg">Revisions</h2>
        <Button variant="ghost" size="sm" onClick={onClose}>
          Close
        </Button>
      </div>
      <div className="grid min-h-0 flex-1 grid-cols-[15rem_1fr]">
        <div className="overflow-y-auto border-r border-line">
          {list.isPending ? (
            <div className="px-4">
              <Loading label="Loading the revisions" />
            </div>
          ) : list.error ? (
            <div className="p-4">
              <Notice kind="error">{list.error.message}</Notice>
            </div>
          ) : revisions.length === 0 ? (
            <p className="p-4 text-sm text-pencil">No revisions yet. Each editing session is kept here once the write-up is saved.</p>
          ) : (
            <ul aria-label="Revisions, newest first">
              {revisions.map((r, i) => (
                <li key={r.id}>
                  <button
                    type="button"
                    onClick={() => setChosen(r.id)}
                    aria-current={r.id === chosen || undefined}
                    className={`w-full border-b border-line px-4 py-2.5 text-left text-sm hover:bg-kraft-light/60 ${r.id === chosen ? 'bg-kraft-light' : ''}`}
                  >
                    <span className="block font-medium">
                      {whenSaved(new Date(r.savedAt))}
                      {i === 0 && <span className="ml-2 rounded bg-sage-light px-1.5 py-0.5 text-xs text-ink">current</span>}
                    </span>
                    <span className="block text-xs text-pencil">
                      {r.author?.name ?? 'Someone'} · version {r.version}
                    </span>
                    {r.note && <span className="mt-0.5 block text-xs text-ink">{r.note}</span>}
                  </button>
                </li>
              ))}
            </ul>
          )}
        </div>
        <div className="min-h-0 overflow-y-auto p-4">
          {!chosen ? (
            <p className="text-sm text-pencil">Choose a revision to read it as it was.</p>
          ) : detail.isPending ? (
            <Loading label="Opening the revision" />
          ) : detail.error ? (
            <Notice kind="error">{detail.error.message}</Notice>
          ) : (
            <div className="space-y-3">
              <div className="flex flex-wrap items-center gap-2">
                <p className="text-sm">
                  Version {detail.data.version}
                  {picked && ` · ${picked.author?.name ?? 'Someone'} · ${whenSaved(new Date(picked.savedAt))}`}
                </p>
                {canRestore && (
                  <Button size="sm" className="ml-auto" onClick={() => setAsking(true)}>
                    Restore this revision
                  </Button>
                )}
              </div>
              {error && <Notice kind="error">{error}</Notice>}
              <div className="rounded-lg border border-line bg-white px-5 py-4">
                <ReadOnlyDoc tutorialId={tutorialId} doc={detail.data.doc} label={`Revision ${detail.data.version}, read only`} />
              </div>
            </div>
          )}
        </div>
      </div>
      <ConfirmDialog
        open={asking}
        title="Restore this revision?"
        confirmLabel="Restore"
        busy={busy}
        onConfirm={() => void restore()}
        onCancel={() => setAsking(false)}
      >
        The write-up becomes this revision's text again, saved as a new revision. The current write-up stays in the list, so you can come back to it.
      </ConfirmDialog>
    </aside>
  );
}
