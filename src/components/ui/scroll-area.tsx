import { useEffect, useRef, useState, type ReactNode } from 'react';

/**
 * A box that scrolls sideways when its content is wider than the screen (a wide table on a
 * tablet), with a visible cue: a fade on the edge that still has more, and a line saying so.
 * While it scrolls it is a labelled region that takes keyboard focus, so arrow keys scroll it.
 */
export function ScrollArea({ label, children, className = '' }: { label: string; children: ReactNode; className?: string }) {
  const ref = useRef<HTMLDivElement>(null);
  const [state, setState] = useState({ overflows: false, atEnd: false });
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const update = () => {
      const overflows = el.scrollWidth > el.clientWidth + 1;
      const atEnd = el.scrollLeft + el.clientWidth >= el.scrollWidth - 1;
      setState((s) => (s.overflows === overflows && s.atEnd === atEnd ? s : { overflows, atEnd }));
    };
    update();
    const ro = new ResizeObserver(update);
    ro.observe(el);
    if (el.firstElementChild) ro.observe(el.firstElementChild);
    el.addEventListener('scroll', update, { passive: true });
    return () => {
      ro.disconnect();
      el.removeEventListener('scroll', update);
    };
  }, []);
  return (
    <div className="relative">
      <div
        ref={ref}
        // relative: absolutely placed bits inside (screen-reader text, popovers) scroll with it instead of widening the page.
        className={`relative overflow-x-auto ${className}`}
        tabIndex={state.overflows ? 0 : undefined}
        role={state.overflows ? 'region' : undefined}
        aria-label={state.overflows ? label : undefined}
      >
        {children}
      </div>
      {state.overflows && !state.atEnd && (
        <div aria-hidden className="pointer-events-none absolute inset-y-0 right-0 w-12 rounded-r-lg bg-gradient-to-l from-ink/15 to-transparent" />
      )}
      {state.overflows && (
        <p className="mt-1 text-right text-xs text-pencil">
          Scroll sideways for more columns <span aria-hidden>→</span>
        </p>
      )}
    </div>
  );
}
