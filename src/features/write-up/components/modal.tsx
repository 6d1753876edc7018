import { useEffect, useRef, type ReactNode } from 'react';

/** A modal panel on the native <dialog> (focus trap, Escape and the backdrop come with it). */
export function Modal({ open, title, onClose, children, wide }: { open: boolean; title: string; onClose: () => void; children: ReactNode; wide?: boolean }) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-label={title}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className={`m-auto w-full ${wide ? 'max-w-4xl' : 'max-w-lg'} max-h-[85vh] rounded-lg border border-line bg-paper p-0 text-ink backdrop:bg-ink/30`}
    >
      {open && (
        <div className="flex max-h-[85vh] flex-col">
          <div className="flex items-center justify-between border-b border-line px-5 py-3">
            <h2 className="text-lg">{title}</h2>
            <button type="button" onClick={onClose} className="rounded px-2 py-1 text-sm text-pencil hover:bg-kraft-light" aria-label="Close">
              Close
            </button>
          </div>
          <div className="overflow-y-auto px-5 py-4">{children}</div>
        </div>
      )}
    </dialog>
  );
}
