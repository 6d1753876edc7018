/** A quiet loading line for whole sections. */
export function Loading({ label = 'Loading' }: { label?: string }) {
  return (
    <div className="flex items-center gap-2 py-6 text-sm text-pencil" role="status">
      <span className="h-4 w-4 animate-spin rounded-full border-2 border-kraft border-t-transparent" aria-hidden />
      {label} …
    </div>
  );
}
