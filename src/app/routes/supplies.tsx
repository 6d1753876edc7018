import { useOutletContext } from 'react-router-dom';
import { SuppliesSection } from '@/features/supplies/components/supplies-section';
import type { TutorialDto } from '@shared/schemas/tutorial';

/** A tutorial's Supplies section, inside the tutorial layout (which hands over the tutorial). */
export function SuppliesRoute() {
  const tutorial = useOutletContext<TutorialDto>();
  return <SuppliesSection tutorialId={tutorial.id} canEdit={tutorial.abilities.update} />;
}
