import { useEffect, useRef, useState, type DragEvent as ReactDragEvent, type ReactNode } from 'react';

type Props = {
  /** The words before "choose a file", e.g. "Drop the recording here or". */
  lead: string;
  accept: string;
  inputLabel: string;
  onFile: (file: File) => void;
  children?: ReactNode;
  disabled?: boolean;
  size?: 'lg' | 'sm';
};

const hasFiles = (e: DragEvent | ReactDragEvent) => Array.from(e.dataTransfer?.types ?? []).includes('Files');

/**
 * A dashed drop area with a "choose a file" button over a real file input (so keyboards and
 * tests reach it). While it is on the page, a file dropped beside it is ignored instead of the
 * browser leaving the page to open it, which would also end any upload in progress.
 */
export function FileDrop({ lead, accept, inputLabel, onFile, children, disabled, size = 'lg' }: Props) {
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const depth = useRef(0);

  useEffect(() => {
    const stop = (e: DragEvent) => {
      if (hasFiles(e)) e.preventDefault();
    };
    window.addEventListener('dragover', stop);
    window.addEventListener('drop', stop);
    return () => {
      window.removeEventListener('dragover', stop);
      window.removeEventListener('drop', stop);
    };
  }, []);

  const take = (files: FileList | null) => {
    const f = files?.[0];
    if (f && !disabled) onFile(f);
  };

  return (
    <div
      onDragEnter={(e) => {
        if (!hasFiles(e) || disabled) return;
        depth.current += 1;
        setOver(true);
      }}
      onDragOver={(e) => {
        if (hasFiles(e) && !disabled) e.preventDefault();
      }}
      onDragLeave={() => {
        depth.current = Math.max(0, depth.current - 1);
        if (depth.current === 0) setOver(false);
      }}
      onDrop={(e) => {
        e.preventDefault();
        depth.current = 0;
        setOver(false);
        take(e.dataTransfer.files);
      }}
      className={`rounded-lg border-2 border-dashed text-center transition-colors ${size === 'lg' ? 'px-6 py-12' : 'px-4 py-6'} ${
        over ? 'border-kraft bg-kraft-light' : 'border-kraft/40 bg-white/70'
      } ${disabled ? 'opacity-60' : ''}`}
    >
      <p className={size === 'lg' ? 'font-serif text-lg' : 'text-sm font-medium'}>
        {lead}{' '}
        <button
          type="button"
          disabled={disabled}
          onClick={() => input.current?.click()}
          className="font-medium text-kraft-dark underline decoration-kraft/50 underline-offset-4 hover:decoration-kraft disabled:cursor-not-allowed"
        >
          choose a file
        </button>
      </p>
      {children && <div className={`mx-auto mt-2 max-w-lg text-pencil ${size === 'lg' ? 'text-sm' : 'text-xs'}`}>{children}</div>}
      <input
        ref={input}
        type="file"
        accept={accept}
        aria-label={inputLabel}
        className="sr-only"
        tabIndex={-1}
        disabled={disabled}
        onChange={(e) => {
          take(e.target.files);
          e.target.value = '';
        }}
      />
    </div>
  );
}
