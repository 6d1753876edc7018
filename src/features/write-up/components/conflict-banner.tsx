import { Button } from '@/components/ui/button';
import type { NewerArticleDto } from '@shared/schemas/article';
import { whenSaved } from '../utils/format';

type Props = {
  theirs: NewerArticleDto;
  /** The signed-in person, to say "you, elsewhere" when the newer save was their own. */
  meId: string | null;
  merging: boolean;
  busy: boolean;
  /** True when this device kept edits across a reload, rather than a save just being refused. */
  fromDevice: boolean;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
  onMerge: () => void;
  onSaveMerged: () => void;
  onBack: () => void;
};

/** Says who saved the newer version and when, and offers the three ways out; nothing is thrown away unasked. */
export function ConflictBanner({ theirs, meId, merging, busy, fromDevice, onKeepMine, onTakeTheirs, onMerge, onSaveMerged, onBack }: Props) {
  const who = theirs.updatedBy ? (theirs.updatedBy.id === meId ? 'You (in another tab or on another device)' : theirs.updatedBy.name) : 'Someone';
  const when = theirs.updatedAt ? whenSaved(new Date(theirs.updatedAt)) : 'recently';
  return (
    <section role="alert" aria-labelledby="conflict-title" className="rounded-lg border border-rosehip/40 bg-rosehip-light px-4 py-3 text-ink">
      <h3 id="conflict-title" className="font-sans text-base font-semibold">
        {fromDevice ? 'Unsaved changes on this device, and a newer version on the server' : 'Someone saved a newer version while you were editing'}
      </h3>
      <p className="mt-1 text-sm">
        <strong>{who}</strong> saved version {theirs.version} {when}.{' '}
        {fromDevice
          ? 'This device kept changes you made to an earlier version and that never reached the server.'
          : 'Your last changes were not saved over it.'}{' '}
        Nothing of yours is lost: your version is on the right, and this device keeps it until you choose.
      </p>
      {merging ? (
        <>
          <p className="mt-2 text-sm">
            Combine by hand: copy what you need from the saved version on the left into yours on the right (select, then copy and paste), then save yours as the
            newest version.
          </p>
          <div className="mt-3 flex flex-wrap gap-2">
            <Button onClick={onSaveMerged} busy={busy}>
              Save the combined version
            </Button>
            <Button variant="secondary" onClick={onBack} disabled={busy}>
              Back to the choices
            </Button>
          </div>
        </>
      ) : (
        <div className="mt-3 flex flex-wrap items-center gap-2">
          <Button onClick={onKeepMine} busy={busy}>
            Keep my version
          </Button>
          <Button variant="secondary" onClick={onTakeTheirs} disabled={busy}>
            Use the saved version
          </Button>
          <Button variant="secondary" onClick={onMerge} disabled={busy}>
            Combine by hand
          </Button>
          <span className="text-xs text-pencil">
            Keep my version saves yours as the newest; the other stays in the revisions. Using the saved version can be undone with Ctrl+Z.
          </span>
        </div>
      )}
    </section>
  );
}
