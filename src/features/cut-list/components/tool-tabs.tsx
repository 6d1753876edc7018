import { useId, useRef, useState, type KeyboardEvent, type ReactNode } from 'react';

/** Tabs on the ARIA pattern: arrow keys move between them, only the open panel is rendered. */
export function ToolTabs({ tabs, label }: { tabs: { key: string; label: string; panel: () => ReactNode }[]; label: string }) {
  const [active, setActive] = useState(tabs[0]!.key);
  const base = useId();
  const refs = useRef<Record<string, HTMLButtonElement | null>>({});
  const onKey = (e: KeyboardEvent) => {
    const i = tabs.findIndex((t) => t.key === active);
    const next = e.key === 'ArrowRight' ? i + 1 : e.key === 'ArrowLeft' ? i - 1 : e.key === 'Home' ? 0 : e.key === 'End' ? tabs.length - 1 : null;
    if (next === null) return;
    e.preventDefault();
    const t = tabs[(next + tabs.length) % tabs.length]!;
    setActive(t.key);
    refs.current[t.key]?.focus();
  };
  const current = tabs.find((t) => t.key === active)!;
  return (
    <div>
      <div role="tablist" aria-label={label} className="flex gap-1 border-b border-line" onKeyDown={onKey}>
        {tabs.map((t) => (
          <button
            key={t.key}
            ref={(el) => {
              refs.current[t.key] = el;
            }}
            type="button"
            role="tab"
            id={`${base}-${t.key}-tab`}
            aria-selected={t.key === active}
            aria-controls={`${base}-${t.key}-panel`}
            tabIndex={t.key === active ? 0 : -1}
            onClick={() => setActive(t.key)}
            className={`-mb-px rounded-t-md border px-3 py-1.5 text-sm ${t.key === active ? 'border-line border-b-white bg-white font-medium text-kraft-dark' : 'border-transparent text-ink hover:text-kraft-dark'}`}
          >
            {t.label}
          </button>
        ))}
      </div>
      <div
        role="tabpanel"
        id={`${base}-${active}-panel`}
        aria-labelledby={`${base}-${active}-tab`}
        className="rounded-b-lg border border-t-0 border-line bg-white p-4"
      >
        {current.panel()}
      </div>
    </div>
  );
}
