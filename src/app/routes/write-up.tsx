import { useOutletContext } from 'react-router-dom';
import { useMe } from '@/features/auth/api/get-me';
import type { Tutorial } from '@/features/tutorials/api/types';
import { WriteUpSection } from '@/features/write-up/components/write-up-section';

/** A tutorial's Write-up section (loaded lazily: the editor is the heaviest part of the client). */
export function WriteUpRoute() {
  const tutorial = useOutletContext<Tutorial>();
  const me = useMe();
  return <WriteUpSection tutorialId={tutorial.id} canEdit={tutorial.abilities.update} meId={me.data?.user.id ?? null} />;
}
