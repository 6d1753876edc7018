import { Extension, Node, type Extensions } from '@tiptap/core';
import { Plugin, PluginKey, type EditorState } from '@tiptap/pm/state';
import { Decoration, DecorationSet } from '@tiptap/pm/view';
import { ReactNodeViewRenderer } from '@tiptap/react';
// The module, not the index: the index also pulls in the Markdown parser, which the editor does not use.
import { withNodeViews } from '@shared/editor/extensions';
import { StepIds } from '@shared/editor/step-ids';
import { enterFromStepTitle, insertStepHere, moveStepAtCursor } from '../utils/editor-commands';
import { selectedLiveList, type LiveListName } from '../utils/live-lists';
import { carriesImageFiles, dropUnpastableImages } from '../utils/paste';
import { CalloutView } from './node-views/callout-view';
import { CutListView } from './node-views/cut-list-view';
import { StepView } from './node-views/step-view';
import { StillView } from './node-views/still-view';
import { SupplyListView } from './node-views/supply-list-view';

/** What the page does for keys and pastes the editor cannot handle alone (a ref, so handlers stay current). */
export type EditorHandlers = {
  openLink?: () => void;
  openStillPicker?: () => void;
  /** A paste or drop of image files, which are not uploaded from the editor. */
  refusedFiles?: () => void;
  /** Typing or pasting while a live list is selected: it is kept, and the page says how to remove it. */
  keptLiveList?: (what: LiveListName) => void;
};

/** Our own keys: new step, move step, link and photo. */
// A getter, not the ref itself: configure() deep-copies plain objects, which would freeze the ref.
const WriteUpKeys = Extension.create<{ handlers: () => EditorHandlers }>({
  name: 'writeUpKeys',
  // Ahead of the default keymap, so Enter in a step title is ours.
  priority: 1000,
  addOptions() {
    return { handlers: () => ({}) };
  },
  addKeyboardShortcuts() {
    return {
      Enter: () => enterFromStepTitle(this.editor),
      'Mod-Alt-s': () => insertStepHere(this.editor),
      'Alt-ArrowUp': () => moveStepAtCursor(this.editor, -1),
      'Alt-ArrowDown': () => moveStepAtCursor(this.editor, 1),
      'Mod-k': () => {
        this.options.handlers().openLink?.();
        return true;
      },
      'Mod-Alt-p': () => {
        this.options.handlers().openStillPicker?.();
        return true;
      },
    };
  },
  addProseMirrorPlugins() {
    const handlers = this.options.handlers;
    const refuse = (data: DataTransfer | null) => {
      // Files only (a screenshot, a photo from the desktop): text and HTML pastes go through the schema.
      if (!carriesImageFiles(data) || data?.getData('text/html') || data?.getData('text/plain')) return false;
      handlers().refusedFiles?.();
      return true;
    };
    // A selected live list would be replaced by the first key typed; it goes only by Delete or Backspace.
    const keepLiveList = (state: EditorState) => {
      const what = selectedLiveList(state);
      if (what) handlers().keptLiveList?.(what);
      return what !== null;
    };
    return [
      new Plugin({
        key: new PluginKey('writeUpLiveLists'),
        props: { handleTextInput: (view) => keepLiveList(view.state) },
      }),
      new Plugin({
        key: new PluginKey('writeUpPaste'),
        props: {
          transformPasted: (slice) => dropUnpastableImages(slice),
          handlePaste: (view, event) => keepLiveList(view.state) || refuse(event.clipboardData),
          handleDrop: (_view, event) => refuse((event as DragEvent).dataTransfer),
        },
      }),
    ];
  },
});

/** Grey hints on an empty write-up and on untitled steps (only where the person can type). */
const Placeholders = Extension.create({
  name: 'writeUpPlaceholders',
  addProseMirrorPlugins() {
    const editor = this.editor;
    return [
      new Plugin({
        key: new PluginKey('writeUpPlaceholders'),
        props: {
          decorations: (state) => {
            if (!editor.isEditable) return null;
            const { doc } = state;
            const decos: Decoration[] = [];
            const hint = (from: number, size: number, text: string) =>
              decos.push(Decoration.node(from, from + size, { class: 'wu-empty', 'data-placeholder': text }));
            const first = doc.firstChild;
            if (
              doc.childCount <= 2 &&
              first?.type.name === 'paragraph' &&
              first.content.size === 0 &&
              (doc.childCount === 1 || doc.lastChild!.content.size === 0)
            ) {
              hint(0, first.nodeSize, 'Start writing here, or make a first draft from the footage.');
            }
            doc.forEach((node, offset) => {
              const title = node.type.name === 'step' ? node.firstChild : null;
              if (title && title.content.size === 0) hint(offset + 1, title.nodeSize, 'Name this step');
            });
            return decos.length ? DecorationSet.create(doc, decos) : null;
          },
        },
      }),
    ];
  },
});

/**
 * The shared schema with our React node views, the step made draggable by its handle (a view
 * matter: the schema the server checks is unchanged), and, for the live editor, our keys,
 * paste guard and hints.
 */
export function writeUpExtensions(opts: { handlers?: { current: EditorHandlers } } = {}): Extensions {
  const base = withNodeViews({
    step: ReactNodeViewRenderer(StepView),
    still: ReactNodeViewRenderer(StillView),
    cutList: ReactNodeViewRenderer(CutListView),
    supplyList: ReactNodeViewRenderer(SupplyListView),
    tip: ReactNodeViewRenderer(CalloutView),
    caution: ReactNodeViewRenderer(CalloutView),
  }).map((ext) => (ext.name === 'step' && ext instanceof Node ? ext.extend({ draggable: true }) : ext));
  if (!opts.handlers) return base;
  const ref = opts.handlers;
  // Steps get their ids as they are made or pasted, so comments can point at them.
  return [...base, WriteUpKeys.configure({ handlers: () => ref.current }), Placeholders, StepIds];
}
