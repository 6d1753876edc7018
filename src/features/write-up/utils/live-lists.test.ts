import { getEditorSchema } from '@shared/editor';
import { EditorState, NodeSelection, TextSelection } from '@tiptap/pm/state';
import { describe, expect, it } from 'vitest';
import { keptLiveListText, selectedLiveList } from './live-lists';

const schema = getEditorSchema();
const doc = schema.nodeFromJSON({
  type: 'doc',
  content: [
    { type: 'paragraph', content: [{ type: 'text', text: 'What you need' }] },
    { type: 'supplyList', attrs: { grouped: true } },
    { type: 'cutList', attrs: { units: 'both' } },
    { type: 'paragraph' },
  ],
});

describe('selectedLiveList', () => {
  it('names the live list the selection holds, and nothing for text', () => {
    expect(selectedLiveList(EditorState.create({ doc, selection: NodeSelection.create(doc, 15) }))).toBe('supplies');
    expect(selectedLiveList(EditorState.create({ doc, selection: NodeSelection.create(doc, 16) }))).toBe('cut list');
    expect(selectedLiveList(EditorState.create({ doc, selection: TextSelection.create(doc, 3) }))).toBeNull();
  });
  it('says what it is and how to remove it', () => {
    expect(keptLiveListText('cut list')).toMatch(/^The cut list is a live list .* press Delete/);
  });
});
