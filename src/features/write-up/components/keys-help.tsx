import { Fragment } from 'react';
import { keyLabel } from '../utils/format';
import { isMac, SHORTCUTS } from './shortcuts';

const ROWS: { keys: string[]; what: string }[] = [
  { keys: [SHORTCUTS.step], what: 'New step after the one you are in' },
  { keys: [SHORTCUTS.moveUp, SHORTCUTS.moveDown], what: 'Move the step you are in up or down' },
  { keys: [SHORTCUTS.still], what: 'Put in a still from the footage' },
  { keys: ['Mod-Alt-1', SHORTCUTS.heading, 'Mod-Alt-3'], what: 'Title, section or sub-section heading' },
  { keys: [SHORTCUTS.bold, SHORTCUTS.italic], what: 'Bold, italic' },
  { keys: [SHORTCUTS.link], what: 'Link the selected text' },
  { keys: [SHORTCUTS.list, SHORTCUTS.numbered], what: 'Bulleted or numbered list' },
  { keys: [SHORTCUTS.undo, SHORTCUTS.redo], what: 'Undo, redo' },
];

/** The write-up's keyboard shortcuts, in a small note under the editor. */
export function KeysHelp() {
  const mac = isMac();
  return (
    <details className="rounded-lg border border-line bg-white/60 px-4 py-2 text-sm">
      <summary className="cursor-pointer font-medium">Keyboard shortcuts</summary>
      <dl className="mt-2 grid grid-cols-[auto_1fr] items-center gap-x-4 gap-y-1.5 pb-1">
        {ROWS.map((r) => (
          <Fragment key={r.what}>
            <dt className="flex items-center gap-1 whitespace-nowrap">
              {r.keys.map((k, i) => (
                <Fragment key={k}>
                  {i > 0 && <span className="text-xs text-pencil">or</span>}
                  <kbd className="rounded border border-line bg-paper px-1.5 py-0.5 font-sans text-xs shadow-[0_1px_0_var(--palette-line)]">
                    {keyLabel(k, mac)}
                  </kbd>
                </Fragment>
              ))}
            </dt>
            <dd className="text-pencil">{r.what}</dd>
          </Fragment>
        ))}
      </dl>
      <p className="pb-1 text-xs text-pencil">Drag a step by its handle (⋮⋮) beside the number; photos drag by the picture.</p>
    </details>
  );
}
