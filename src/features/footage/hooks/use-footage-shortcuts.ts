import { useEffect, useRef } from 'react';

export type FootageShortcuts = {
  toggle: () => void;
  nudge: (deltaMs: number) => void;
  mark?: () => void;
  still?: () => void;
  sharpest?: () => void;
};

/** True when keys typed here are text (a field, a list box, an editable region). */
export function isTyping(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable) return true;
  return target instanceof HTMLInputElement || target instanceof HTMLTextAreaElement || target instanceof HTMLSelectElement;
}

const isPressable = (t: EventTarget | null) => t instanceof HTMLElement && !!t.closest('button, [role="button"], a[href], summary, video');

/**
 * Space, arrows, C (chapter), S and Shift+S for the whole Footage page, except while typing or while a
 * dialog is open. Space is taken from focused buttons too: after clicking "Mark chapter" the
 * button keeps focus, and space would otherwise mark a second chapter instead of pausing.
 */
export function useFootageShortcuts(handlers: FootageShortcuts): void {
  const ref = useRef(handlers);
  ref.current = handlers;
  useEffect(() => {
    const onKeyDown = (e: KeyboardEvent) => {
      if (e.defaultPrevented || e.ctrlKey || e.metaKey || e.altKey || isTyping(e.target)) return;
      if (document.querySelector('dialog[open]')) return;
      const h = ref.current;
      let run: (() => void) | undefined;
      if (e.key === ' ') run = h.toggle;
      else if (e.key === 'ArrowLeft') run = () => h.nudge(-5000);
      else if (e.key === 'ArrowRight') run = () => h.nudge(5000);
      else if (e.key === 'c' || e.key === 'C') run = e.shiftKey ? undefined : h.mark;
      else if (e.key === 's' || e.key === 'S') run = e.shiftKey ? h.sharpest : h.still;
      if (!run) return;
      e.preventDefault();
      if (e.repeat && e.key !== 'ArrowLeft' && e.key !== 'ArrowRight') return;
      run();
    };
    // The button's own space activation happens on keyup; stop it as well.
    const onKeyUp = (e: KeyboardEvent) => {
      if (e.key === ' ' && isPressable(e.target) && !isTyping(e.target) && !document.querySelector('dialog[open]')) e.preventDefault();
    };
    window.addEventListener('keydown', onKeyDown, true);
    window.addEventListener('keyup', onKeyUp, true);
    return () => {
      window.removeEventListener('keydown', onKeyDown, true);
      window.removeEventListener('keyup', onKeyUp, true);
    };
  }, []);
}
