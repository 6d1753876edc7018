// @vitest-environment happy-dom
import { Editor, type NodeViewRenderer } from '@tiptap/core';
import { afterEach, describe, expect, it } from 'vitest';
import { editorExtensions, getEditorSchema, withNodeViews } from './extensions';
import { ARTICLE_NODE_NAMES } from './types';
import { validateDoc } from './validate-doc';

let editor: Editor | undefined;
afterEach(() => editor?.destroy());

function make(content: object = { type: 'doc', content: [{ type: 'paragraph' }] }) {
  editor = new Editor({ extensions: editorExtensions, content });
  return editor;
}

describe('editor schema', () => {
  it('has our nodes and only the marks Markdown and the published page can carry', () => {
    const schema = getEditorSchema();
    for (const name of ARTICLE_NODE_NAMES) expect(schema.nodes[name], name).toBeDefined();
    expect(Object.keys(schema.marks).sort()).toEqual(['bold', 'italic', 'link', 'strike']);
    expect(schema.nodes.codeBlock).toBeUndefined();
  });

  it('keeps steps, live lists and callouts out of lists and quotes', () => {
    const schema = getEditorSchema();
    for (const inner of ['step', 'cutList', 'supplyList', 'tip']) {
      expect(schema.nodes.listItem!.contentMatch.matchType(schema.nodes.paragraph!)!.matchType(schema.nodes[inner]!), inner).toBeNull();
      expect(schema.nodes.blockquote!.contentMatch.matchType(schema.nodes[inner]!), inner).toBeNull();
    }
  });

  it('attaches node views by name only', () => {
    const view = (() => ({ dom: document.createElement('div') })) as unknown as NodeViewRenderer;
    const exts = withNodeViews({ cutList: view });
    expect(exts.map((e) => e.name)).toEqual(editorExtensions.map((e) => e.name));
    expect(exts.find((e) => e.name === 'cutList')).not.toBe(editorExtensions.find((e) => e.name === 'cutList'));
    expect(exts.find((e) => e.name === 'step')).toBe(editorExtensions.find((e) => e.name === 'step'));
  });
});

describe('editor commands (headless editor in happy-dom)', () => {
  it('insertStep adds a step with its title and a paragraph to write in', () => {
    const e = make();
    expect(e.commands.insertStep({ title: 'Fold the flaps', atMs: 5000 })).toBe(true);
    const step = e.getJSON().content!.find((n) => n.type === 'step')!;
    expect(step.attrs).toEqual({ id: expect.stringMatching(/^s[0-9a-f]{12}$/), atMs: 5000, chapterId: null });
    expect(step.content!.map((n) => n.type)).toEqual(['stepTitle', 'paragraph']);
    expect(validateDoc(e.getJSON()).ok).toBe(true);
  });

  it('insertStill refuses an unsafe image address', () => {
    const e = make();
    expect(e.commands.insertStill({ src: 'javascript:alert(1)' })).toBe(false);
    expect(e.commands.insertStill({ src: '/media/stills/a.jpg', alt: 'A' })).toBe(true);
    expect(e.getJSON().content!.some((n) => n.type === 'still')).toBe(true);
  });

  it('inserts the live lists and wraps text in a tip or caution', () => {
    const e = make({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Mind the blade.' }] }] });
    e.commands.setTextSelection(3);
    expect(e.commands.toggleCaution()).toBe(true);
    expect(e.getJSON().content![0]!.type).toBe('caution');
    e.commands.insertCutList({ units: 'mm' });
    e.commands.insertSupplyList();
    const types = e.getJSON().content!.map((n) => n.type);
    expect(types).toContain('cutList');
    expect(types).toContain('supplyList');
    expect(validateDoc(e.getJSON()).ok).toBe(true);
  });

  it('refuses a link with a script address, and keeps an ordinary one', () => {
    const e = make({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'shop link' }] }] });
    e.commands.setTextSelection({ from: 1, to: 5 });
    expect(e.commands.setLink({ href: 'javascript:alert(1)' })).toBe(false);
    expect(e.commands.setLink({ href: 'https://shop.example/kraft' })).toBe(true);
    expect(e.getHTML()).toContain('href="https://shop.example/kraft"');
  });
});
