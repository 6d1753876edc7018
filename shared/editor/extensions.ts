import { getSchema, Node, type Extensions, type NodeViewRenderer } from '@tiptap/core';
import type { Schema } from '@tiptap/pm/model';
import { StarterKit } from '@tiptap/starter-kit';
import { Caution, Tip } from './callouts';
import { CutList, SupplyList } from './live-lists';
import { Step, StepTitle } from './step';
import { Still } from './still';
import type { ArticleNodeName } from './types';
import { isSafeLinkHref } from './urls';

/** Heading levels: the title (1), sections (2) and sub-sections (3); step titles are their own node. */
export const HEADING_LEVELS = [1, 2, 3] as const;

/**
 * The top node. Steps, the live lists and callouts are kept out of the `block` group so they
 * cannot end up inside list items or quotes; only the document (and a step, for callouts)
 * lists them.
 */
export const ArticleDocument = Node.create({
  name: 'doc',
  topNode: true,
  content: '(block | section | callout)+',
});

const starterKit = StarterKit.configure({
  document: false,
  // Marks and blocks with no Markdown or published-page equivalent are left out, so every
  // document survives export and import unchanged.
  code: false,
  codeBlock: false,
  underline: false,
  heading: { levels: [...HEADING_LEVELS] },
  link: {
    openOnClick: false,
    autolink: true,
    defaultProtocol: 'https',
    HTMLAttributes: { target: null, rel: 'noopener noreferrer nofollow', class: null },
    isAllowedUri: (url) => isSafeLinkHref(url),
  },
});

/**
 * Every extension of the write-up editor, headless: usable by @tiptap/react's useEditor and by
 * getSchema on the server. Add node views with `withNodeViews`.
 */
export const editorExtensions: Extensions = [ArticleDocument, starterKit, StepTitle, Step, Still, CutList, SupplyList, Tip, Caution];

let schema: Schema | undefined;

/** The ProseMirror schema of the write-up (built once). */
export function getEditorSchema(): Schema {
  schema ??= getSchema(editorExtensions);
  return schema;
}

/**
 * The editor extensions with node views attached to some of our nodes (the client passes
 * React renderers; this folder stays free of React).
 */
export function withNodeViews(views: Partial<Record<ArticleNodeName, NodeViewRenderer>>): Extensions {
  return editorExtensions.map((ext) => {
    const view = views[ext.name as ArticleNodeName];
    return view && ext instanceof Node ? ext.extend({ addNodeView: () => view }) : ext;
  });
}
