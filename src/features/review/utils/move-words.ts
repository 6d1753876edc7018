import type { StateChangeDto } from '@shared/schemas/review';
import { STATE_LABELS } from '@shared/schemas/tutorial';

const VERB: Record<string, string> = {
  submit: 'sent it for review',
  approve: 'approved it',
  sendBack: 'sent it back',
  publish: 'published it',
  unpublish: 'unpublished it',
};

// A published tutorial's update goes through the same moves; the history says which it was.
const UPDATE_VERB: Record<string, string> = {
  submit: 'sent the update for review',
  approve: 'approved the update',
  sendBack: 'sent the update back',
  publish: 'published the update',
};

/** What a move in the history says the person did: "approved it", or "approved the update" for an update's move. */
export function moveVerb(m: Pick<StateChangeDto, 'action' | 'from' | 'to' | 'update'>): string {
  return (m.update ? UPDATE_VERB[m.action] : undefined) ?? VERB[m.action] ?? `moved it from ${STATE_LABELS[m.from]} to ${STATE_LABELS[m.to]}`;
}
