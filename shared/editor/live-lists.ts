import { Node } from '@tiptap/core';
import { CUT_LIST_UNITS, type CutListAttrs, type CutListUnits, type SupplyListAttrs } from './types';

declare module '@tiptap/core' {
  interface Commands<ReturnType> {
    cutList: {
      /** Inserts the live cut-list table. */
      insertCutList: (attrs?: Partial<CutListAttrs>) => ReturnType;
    };
    supplyList: {
      /** Inserts the live supplies list. */
      insertSupplyList: (attrs?: Partial<SupplyListAttrs>) => ReturnType;
    };
  }
}

function isUnits(v: unknown): v is CutListUnits {
  return typeof v === 'string' && (CUT_LIST_UNITS as readonly string[]).includes(v);
}

/**
 * The cut list as a live table. The node holds no rows: renderers and the editor's node view
 * read the tutorial's pieces, so edits in the Cut list section show up here.
 */
export const CutList = Node.create({
  name: 'cutList',
  group: 'section',
  atom: true,
  selectable: true,
  draggable: true,
  addAttributes() {
    return {
      units: {
        default: 'both',
        parseHTML: (el: HTMLElement) => {
          const v = el.getAttribute('data-units');
          return isUnits(v) ? v : 'both';
        },
        renderHTML: (attrs: Record<string, unknown>) => ({ 'data-units': isUnits(attrs.units) ? attrs.units : 'both' }),
      },
    };
  },
  parseHTML() {
    return [{ tag: 'div[data-type="cut-list"]' }];
  },
  renderHTML({ HTMLAttributes }) {
    return ['div', { ...HTMLAttributes, 'data-type': 'cut-list' }];
  },
  addCommands() {
    return {
      insertCutList:
        (attrs = {}) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, attrs: { units: isUnits(attrs.units) ? attrs.units : 'both' } }),
    };
  },
});

/** The supplies as a live list, with shop links and the disclosure; it holds no rows either. */
export const SupplyList = Node.create({
  name: 'supplyList',
  group: 'section',
  atom: true,
  selectable: true,
  draggable: true,
  addAttributes() {
    return {
      grouped: {
        default: true,
        parseHTML: (el: HTMLElement) => el.getAttribute('data-grouped') !== 'false',
        renderHTML: (attrs: Record<string, unknown>) => ({ 'data-grouped': attrs.grouped === false ? 'false' : 'true' }),
      },
    };
  },
  parseHTML() {
    return [{ tag: 'div[data-type="supply-list"]' }];
  },
  renderHTML({ HTMLAttributes }) {
    return ['div', { ...HTMLAttributes, 'data-type': 'supply-list' }];
  },
  addCommands() {
    return {
      insertSupplyList:
        (attrs = {}) =>
        ({ commands }) =>
          commands.insertContent({ type: this.name, attrs: { grouped: attrs.grouped !== false } }),
    };
  },
});
