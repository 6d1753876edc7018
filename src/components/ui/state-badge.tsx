import { STATE_LABELS, type TutorialState } from '@shared/schemas/tutorial';

const tone: Record<TutorialState, string> = {
  draft: 'bg-white text-pencil border-line',
  in_review: 'bg-kraft-light text-kraft-dark border-kraft/30',
  needs_changes: 'bg-rosehip-light text-rosehip border-rosehip/30',
  approved: 'bg-sage-light text-ink border-sage/40',
  published: 'bg-sage text-white border-sage',
};

/** A tutorial's state in words (never colour alone). */
export function StateBadge({ state }: { state: TutorialState }) {
  return <span className={`inline-block rounded-full border px-2 py-0.5 text-xs font-medium ${tone[state]}`}>{STATE_LABELS[state]}</span>;
}
