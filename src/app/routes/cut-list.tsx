import { useOutletContext } from 'react-router-dom';
import type { RulerPrecision } from '@shared/measure';
import { paths } from '@/config/paths';
import { useRefreshCutList } from '@/features/cut-list/api/get-pieces';
import { CutListWorkspace } from '@/features/cut-list/components/cut-list-workspace';
import { useUpdateTutorial } from '@/features/tutorials/api/tutorial-mutations';
import type { TutorialDto } from '@shared/schemas/tutorial';

/** The Cut list section of a tutorial; the ruler precision belongs to the tutorial, so it is changed here. */
export function CutListRoute() {
  const tutorial = useOutletContext<TutorialDto>();
  const update = useUpdateTutorial();
  const refresh = useRefreshCutList(tutorial.id);
  return (
    <CutListWorkspace
      tutorialId={tutorial.id}
      precision={tutorial.precision}
      defaultUnit={tutorial.defaultUnit}
      footagePath={paths.tutorialSection(tutorial.id, 'footage')}
      precisionBusy={update.isPending}
      precisionError={update.error?.message ?? null}
      // Checks are worked out against the ruler, so they all move with it.
      onPrecision={(precision: RulerPrecision) => update.mutate({ id: tutorial.id, precision }, { onSuccess: () => void refresh() })}
    />
  );
}
