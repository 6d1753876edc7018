import type { HistoryDto, StateChangeDto } from '@shared/schemas/review';
import type { StateChange } from '../models';

/** One move of the tutorial's history. */
export const presentStateChange = (s: StateChange): StateChangeDto => ({
  id: s.id,
  action: s.action,
  from: s.fromState,
  to: s.toState,
  note: s.note,
  by: s.by ? { id: s.by.id, name: s.by.name } : null,
  at: s.createdAt.toISOString(),
  openComments: s.openComments ?? [],
  update: s.ofUpdate ?? false,
});

/** The history, newest first. */
export const presentHistory = (rows: StateChange[]): HistoryDto => ({ history: rows.map(presentStateChange) });
