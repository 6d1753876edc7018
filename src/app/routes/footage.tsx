import { useOutletContext } from 'react-router-dom';
import { FootageSection } from '@/features/footage/components/footage-section';
import type { Tutorial } from '@/features/tutorials/api/types';

/** A tutorial's Footage section, inside the tutorial layout (which hands over the tutorial). */
export function FootageRoute() {
  const tutorial = useOutletContext<Tutorial>();
  return <FootageSection tutorialId={tutorial.id} canEdit={tutorial.abilities.update} />;
}
