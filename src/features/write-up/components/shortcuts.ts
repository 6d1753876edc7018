/** The write-up's keys, in ProseMirror's notation; the toolbar's tooltips and the help note read them from here. */
export const SHORTCUTS = {
  step: 'Mod-Alt-s',
  still: 'Mod-Alt-p',
  heading: 'Mod-Alt-2',
  bold: 'Mod-b',
  italic: 'Mod-i',
  link: 'Mod-k',
  list: 'Mod-Shift-8',
  numbered: 'Mod-Shift-7',
  moveUp: 'Alt-ArrowUp',
  moveDown: 'Alt-ArrowDown',
  undo: 'Mod-z',
  redo: 'Mod-Shift-z',
} as const;

/** True on Apple keyboards, where Mod is ⌘. */
export const isMac = () => typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform || navigator.userAgent);

/** ProseMirror's key names as aria-keyshortcuts wants them ("Control+Alt+S"). */
export function ariaKeys(combo: string, mac: boolean): string {
  return combo
    .split('-')
    .map((k) => (k === 'Mod' ? (mac ? 'Meta' : 'Control') : k.length === 1 ? k.toUpperCase() : k))
    .join('+');
}
