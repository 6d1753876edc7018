import { createContext, useContext, type ReactNode } from 'react';

type WriteUpContextValue = {
  tutorialId: string;
  /** Offers a "Comment" button on each step when the page shows comments beside the write-up. */
  onCommentOn?: (stepId: string) => void;
};

const WriteUpContext = createContext<WriteUpContextValue | null>(null);

/**
 * Hands the tutorial to node views: they render through portals inside EditorContent, so a
 * provider around the editor reaches them (and the read-only previews get their own).
 */
export function WriteUpProvider({ tutorialId, onCommentOn, children }: WriteUpContextValue & { children: ReactNode }) {
  return <WriteUpContext.Provider value={{ tutorialId, onCommentOn }}>{children}</WriteUpContext.Provider>;
}

/** The tutorial a node view belongs to. */
export function useWriteUpContext(): WriteUpContextValue {
  const v = useContext(WriteUpContext);
  if (!v) throw new Error('useWriteUpContext outside WriteUpProvider');
  return v;
}
