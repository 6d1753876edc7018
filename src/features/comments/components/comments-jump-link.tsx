import { useComments } from '../api/get-comments';

/** On a phone the comments sit below the write-up: this link at the top says how many are open and goes there. */
export function CommentsJumpLink({ tutorialId, targetId, className = '' }: { tutorialId: string; targetId: string; className?: string }) {
  const open = useComments(tutorialId).data?.counts.open;
  return (
    <a href={`#${targetId}`} className={`text-sm font-medium text-kraft-dark underline ${className}`}>
      Comments{open !== undefined ? ` (${open} open)` : ''} ↓
    </a>
  );
}
