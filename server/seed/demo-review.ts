import type { Role } from '@shared/schemas/roles';
import { Comment, StateChange, type Tutorial, type User } from '../models';

const DAY = 86_400_000;

/**
 * The demo's review trail, so the board, the Publish section's history and the comments have
 * something to show: the published box went through review once; the gatefold card is waiting in
 * review with the maker's note and one open comment of the coordinator's. Added only when the
 * tutorial has no history yet (idempotent), straight into the tables (no mail goes out).
 */
export async function seedDemoReview(made: Record<string, Tutorial>, people: Record<Role, User>): Promise<void> {
  const box = made['round-keepsake-box'];
  const card = made['gatefold-birthday-card'];
  const now = Date.now();
  if (box && !(await StateChange.count({ where: { tutorialId: box.id } }))) {
    const moves = [
      { action: 'submit', from: 'draft', to: 'in_review', by: people.maker, note: 'Lid and wrap sizes checked against the cut list.', at: now - 9 * DAY },
      {
        action: 'approve',
        from: 'in_review',
        to: 'approved',
        by: people.coordinator,
        note: 'Lovely photos; the lid helper explains it well.',
        at: now - 8 * DAY,
      },
      { action: 'publish', from: 'approved', to: 'published', by: people.coordinator, note: '', at: now - 7 * DAY },
    ] as const;
    for (const m of moves) {
      await StateChange.create({
        tutorialId: box.id,
        byId: m.by.id,
        action: m.action,
        fromState: m.from,
        toState: m.to,
        note: m.note,
        createdAt: new Date(m.at),
      });
    }
  }
  if (card && !(await StateChange.count({ where: { tutorialId: card.id } }))) {
    await StateChange.create({
      tutorialId: card.id,
      byId: people.maker.id,
      action: 'submit',
      fromState: 'draft',
      toState: 'in_review',
      note: 'First go at the gatefold; the pocket holds a gift card.',
      createdAt: new Date(now - DAY),
    });
    await Comment.create({
      tutorialId: card.id,
      authorId: people.coordinator.id,
      parentId: null,
      body: 'Could the pocket get a photo of where the glue goes? Readers ask about that most.',
      createdAt: new Date(now - DAY / 2),
    });
  }
}
