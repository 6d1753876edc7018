import { useOutletContext, useSearchParams } from 'react-router-dom';
import { AssemblyPanel } from '@/features/assembly/components/assembly-panel';
import { FootageSection } from '@/features/footage/components/footage-section';
import type { TutorialDto } from '@shared/schemas/tutorial';

/** A tutorial's Footage section, inside the tutorial layout (which hands over the tutorial). */
export function FootageRoute() {
  const tutorial = useOutletContext<TutorialDto>();
  // ?t=<ms> opens the player at a time (links from the cut list and the write-up's steps).
  const [params] = useSearchParams();
  const t = Number(params.get('t'));
  return (
    <FootageSection
      tutorialId={tutorial.id}
      canEdit={tutorial.abilities.update}
      startMs={Number.isFinite(t) && t > 0 ? t : undefined}
      aside={(recording, seek) => (
        <AssemblyPanel
          tutorialId={tutorial.id}
          recordingId={recording.id}
          hasTranscript={!!recording.transcript}
          canEdit={tutorial.abilities.update}
          onSeek={seek}
        />
      )}
    />
  );
}
