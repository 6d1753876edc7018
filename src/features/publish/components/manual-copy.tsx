import { useEffect, useRef } from 'react';

/** Shown when the browser refused the clipboard: the text, selected, with how to copy it by hand. */
export function ManualCopy({ label, text, reason, rows = 6 }: { label: string; text: string; reason?: string; rows?: number }) {
  const area = useRef<HTMLTextAreaElement>(null);
  useEffect(() => {
    area.current?.focus();
    area.current?.select();
  }, [text]);
  return (
    <div className="mt-2">
      <p className="text-xs text-rosehip" role="alert">
        The browser did not allow copying{reason ? ` (${reason.replace(/[.\s]+$/, '')})` : ''}. The text is selected below: press Ctrl+C (⌘C on a Mac) to copy
        it.
      </p>
      <textarea
        ref={area}
        readOnly
        aria-label={label}
        value={text}
        rows={rows}
        onFocus={(e) => e.currentTarget.select()}
        className="mt-1 w-full rounded-md border border-field bg-paper px-2 py-1 font-mono text-xs"
      />
    </div>
  );
}
