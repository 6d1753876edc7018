import { useOutletContext, useSearchParams } from 'react-router-dom';
import { FootageSection } from '@/features/footage/components/footage-section';
import type { Tutorial } from '@/features/tutorials/api/types';

/** A tutorial's Footage section, inside the tutorial layout (which hands over the tutorial). */
export function FootageRoute() {
  const tutorial = useOutletContext<Tutorial>();
  // ?t=<ms> opens the player at a time (links from the cut list and the write-up's steps).
  const [params] = useSearchParams();
  const t = Number(params.get('t'));
  return <FootageSection tutorialId={tutorial.id} canEdit={tutorial.abilities.update} startMs={Number.isFinite(t) && t > 0 ? t : undefined} />;
}
