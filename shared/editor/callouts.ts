import { Node } from '@tiptap/core';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    tip: {
      /** Wraps the selected blocks in a tip, or unwraps them. */
      toggleTip: () => ReturnType;
    };
    caution: {
      /** Wraps the selected blocks in a caution, or unwraps them. */
      toggleCaution: () => ReturnType;
    };
  }
}

export const CALLOUT_CONTENT = '(paragraph | bulletList | orderedList)+';

function callout(name: 'tip' | 'caution', command: 'toggleTip' | 'toggleCaution') {
  return Node.create({
    name,
    group: 'callout',
    content: CALLOUT_CONTENT,
    defining: true,
    parseHTML() {
      return [{ tag: `aside[data-type="${name}"]` }];
    },
    renderHTML() {
      // The label ("Tip", "Caution") comes from styles in the editor and from the
      // renderers in output, so it never becomes part of the text.
      return ['aside', { 'data-type': name }, 0];
    },
    addCommands() {
      return {
        [command]:
          () =>
          ({ commands }: { commands: { toggleWrap: (n: string) => boolean } }) =>
            commands.toggleWrap(name),
      };
    },
  });
}

/** A tip: a helpful aside. */
export const Tip = callout('tip', 'toggleTip');

/** A caution: a warning the reader should not miss (a blade, hot glue, a fragile fold). */
export const Caution = callout('caution', 'toggleCaution');
