import { NodeSelection, type EditorState } from '@tiptap/pm/state';

/** The live lists' names as the write-up's toolbar gives them. */
export const LIVE_LIST_NAMES = { cutList: 'cut list', supplyList: 'supplies' } as const;
export type LiveListName = (typeof LIVE_LIST_NAMES)[keyof typeof LIVE_LIST_NAMES];

/** The live list the selection holds as a whole (clicked, or reached with the arrow keys), or null. */
export function selectedLiveList(state: EditorState): LiveListName | null {
  const sel = state.selection;
  if (!(sel instanceof NodeSelection)) return null;
  const name = sel.node.type.name;
  return name === 'cutList' || name === 'supplyList' ? LIVE_LIST_NAMES[name] : null;
}

/** What the page says when typing would have replaced a selected live list. */
export function keptLiveListText(what: LiveListName): string {
  const it = what === 'cut list' ? 'The cut list is a live list' : 'The supplies are a live list';
  return `${it} (it follows its section), so typing does not replace it. To remove it, select it and press Delete; to write next to it, click the line before or after it.`;
}
