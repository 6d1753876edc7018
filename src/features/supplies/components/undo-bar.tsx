import { useEffect, useRef } from 'react';

const UNDO_MS = 8000;

/** "Deleted “x”. Undo" for a few seconds after a delete, then it goes away on its own. */
export function UndoBar({ name, onUndo, onDone }: { name: string; onUndo: () => void; onDone: () => void }) {
  const done = useRef(onDone);
  done.current = onDone;
  useEffect(() => {
    const t = setTimeout(() => done.current(), UNDO_MS);
    return () => clearTimeout(t);
  }, []);
  return (
    <div
      role="status"
      className="fixed bottom-6 left-1/2 z-20 flex -translate-x-1/2 items-center gap-4 rounded-lg bg-ink px-4 py-3 text-sm text-white shadow-lg"
    >
      <span>Deleted “{name}”.</span>
      <button type="button" onClick={onUndo} className="rounded px-2 py-1 font-medium text-kraft-light underline underline-offset-2 hover:bg-white/10">
        Undo
      </button>
    </div>
  );
}
