import { Link } from 'react-router-dom';
import { reviewState, stateLabel, type TutorialDto } from '@shared/schemas/tutorial';

/**
 * Says plainly, above every section of a published tutorial's workspace, that readers see the
 * published version and that edits here become an update reviewed before it goes out (DESIGN.md T4).
 */
export function LiveNotice({ tutorial, comparePath }: { tutorial: TutorialDto; comparePath: string }) {
  if (tutorial.state !== 'published') return null;
  if (!tutorial.updateState)
    return (
      <p className="mt-3 rounded-md border border-sage/50 bg-sage-light px-3 py-2 text-sm">
        <strong>This tutorial is live.</strong> Readers see the published version. Changes you make here become an update, reviewed before readers see it.
      </p>
    );
  return (
    <p className="mt-3 rounded-md border border-kraft/40 bg-kraft-light px-3 py-2 text-sm" role="status">
      <strong>Update pending ({stateLabel(reviewState(tutorial))}).</strong> Readers still see the published version; the changes go out once the update is
      approved and published.{' '}
      <Link className="font-medium text-kraft-dark underline" to={comparePath}>
        See what changed
      </Link>
    </p>
  );
}
