import type { ReactNode } from 'react';

const tone = {
  error: 'border-rosehip/40 bg-rosehip-light text-rosehip',
  success: 'border-sage/40 bg-sage-light text-ink',
  info: 'border-line bg-white text-ink',
};

/** A message box; errors are announced to screen readers. */
export function Notice({ kind = 'info', children }: { kind?: keyof typeof tone; children: ReactNode }) {
  return (
    <div role={kind === 'error' ? 'alert' : 'status'} className={`rounded-md border px-3 py-2 text-sm ${tone[kind]}`}>
      {children}
    </div>
  );
}
