import { createContext, useContext, type ReactNode } from 'react';

type WriteUpContextValue = { tutorialId: string };

const WriteUpContext = createContext<WriteUpContextValue | null>(null);

/**
 * Hands the tutorial to node views: they render through portals inside EditorContent, so a
 * provider around the editor reaches them (and the read-only previews get their own).
 */
export function WriteUpProvider({ tutorialId, children }: { tutorialId: string; children: ReactNode }) {
  return <WriteUpContext.Provider value={{ tutorialId }}>{children}</WriteUpContext.Provider>;
}

/** The tutorial a node view belongs to. */
export function useWriteUpContext(): WriteUpContextValue {
  const v = useContext(WriteUpContext);
  if (!v) throw new Error('useWriteUpContext outside WriteUpProvider');
  return v;
}
