import { Fragment } from 'react';

const Kbd = ({ children }: { children: string }) => (
  <kbd className="inline-block min-w-6 rounded border border-line bg-paper px-1.5 py-0.5 text-center font-sans text-xs text-ink shadow-[0_1px_0_var(--palette-line)]">
    {children}
  </kbd>
);

// Each row: key combinations (any one of them), and what they do.
type Row = { combos: string[][]; what: string };

/** The Footage page's keyboard shortcuts; editing keys only for people who may edit. */
export function KeysNote({ canEdit }: { canEdit: boolean }) {
  const rows: Row[] = [
    { combos: [['Space']], what: 'Play or pause' },
    { combos: [['←'], ['→']], what: 'Back or forward 5 seconds' },
    ...(canEdit
      ? [
          { combos: [['C']], what: 'Mark a chapter at the playhead (named from the line said there)' },
          { combos: [['S']], what: 'Pull the still at the playhead' },
          { combos: [['Shift', 'S']], what: 'Pull the sharpest still nearby' },
        ]
      : []),
    { combos: [['Enter'], ['Shift', 'Enter']], what: 'Next or previous match while searching the transcript' },
  ];
  return (
    <aside className="rounded-lg border border-line bg-white/60 p-4" aria-labelledby="keys-title">
      <h2 id="keys-title" className="font-sans text-sm font-semibold">
        Keys
      </h2>
      <dl className="mt-2 grid grid-cols-[auto_1fr] items-center gap-x-4 gap-y-1.5 text-sm">
        {rows.map((r) => (
          <Fragment key={r.what}>
            <dt className="flex items-center gap-1 whitespace-nowrap">
              {r.combos.map((combo, i) => (
                <Fragment key={combo.join('+')}>
                  {i > 0 && <span className="px-0.5 text-xs text-pencil">or</span>}
                  {combo.map((k, j) => (
                    <Fragment key={k}>
                      {j > 0 && <span className="text-xs text-pencil">+</span>}
                      <Kbd>{k}</Kbd>
                    </Fragment>
                  ))}
                </Fragment>
              ))}
            </dt>
            <dd className="text-pencil">{r.what}</dd>
          </Fragment>
        ))}
      </dl>
      <p className="mt-2 text-xs text-pencil">The keys work anywhere on this page except while you type in a field.</p>
    </aside>
  );
}
