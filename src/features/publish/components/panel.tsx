import type { ReactNode } from 'react';

/** One card of the Publish section, with its heading and a line on what it is for. */
export function Panel({
  title,
  intro,
  children,
  id,
  className = '',
}: {
  title: string;
  intro?: ReactNode;
  children: ReactNode;
  id?: string;
  className?: string;
}) {
  const hid = id ? `${id}-title` : undefined;
  return (
    <section aria-labelledby={hid} className={`rounded-lg border border-line bg-white p-5 ${className}`}>
      <h2 id={hid} className="text-lg">
        {title}
      </h2>
      {intro && <p className="mt-1 text-sm text-pencil">{intro}</p>}
      <div className="mt-4">{children}</div>
    </section>
  );
}
