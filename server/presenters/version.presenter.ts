import type { VersionsDto } from '@shared/schemas/version';
import type { Tutorial, TutorialVersion } from '../models';

/** The kept versions of a tutorial, with which one readers see and the update's state. */
export function presentVersions(tutorial: Tutorial, rows: TutorialVersion[]): VersionsDto {
  const published = tutorial.state === 'published';
  return {
    versions: rows.map((v) => ({
      id: v.id,
      kind: v.kind,
      createdAt: v.createdAt.toISOString(),
      by: v.createdBy ? { id: v.createdBy.id, name: v.createdBy.name } : null,
      note: v.note,
      live: published && v.id === tutorial.liveVersionId,
    })),
    updateState: published ? (tutorial.updateState ?? null) : null,
    pendingUpdate: published && Boolean(tutorial.updateState),
  };
}
