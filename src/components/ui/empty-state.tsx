import type { ReactNode } from 'react';

/** What an empty list says: what is missing and what to do next. */
export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-kraft/50 bg-white/60 px-6 py-10 text-center">
      <h3 className="text-lg">{title}</h3>
      {children && <div className="mx-auto mt-2 max-w-md text-sm text-pencil">{children}</div>}
      {action && <div className="mt-4">{action}</div>}
    </div>
  );
}
