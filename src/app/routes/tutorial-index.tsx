import { Navigate, useOutletContext, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { TutorialDto } from '@shared/schemas/tutorial';

/** A tutorial's own address opens its first section. */
export function TutorialIndexRoute() {
  const { tutorialId = '' } = useParams();
  useOutletContext<TutorialDto>();
  return <Navigate to={paths.tutorialSection(tutorialId, 'footage')} replace />;
}
