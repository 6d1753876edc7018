import type { JSONContent } from '@tiptap/core';
import { getEditorSchema } from '@shared/editor/extensions';

const isEmptyParagraph = (n: JSONContent | undefined) => n?.type === 'paragraph' && !n.content?.length;

/**
 * The document with one empty paragraph at its end, as the editor keeps it (so there is always a
 * line to type on after a step or a table). Adding it up front means the editor's own trailing
 * paragraph does not count as an edit.
 */
export function withTrailingParagraph(doc: JSONContent): JSONContent {
  const content = doc.content ?? [];
  const last = content[content.length - 1];
  return last?.type === 'paragraph' ? doc : { ...doc, content: [...content, { type: 'paragraph' }] };
}

function withoutTrailingParagraphs(doc: JSONContent): JSONContent {
  const content = [...(doc.content ?? [])];
  while (content.length > 1 && isEmptyParagraph(content[content.length - 1])) content.pop();
  return { ...doc, content };
}

/**
 * True when two write-ups say the same thing: compared as ProseMirror nodes of the shared schema
 * (so attribute defaults and key order do not matter), ignoring empty paragraphs at the end.
 * A document the schema cannot read is never the same as anything.
 */
export function sameDoc(a: JSONContent, b: JSONContent): boolean {
  try {
    const schema = getEditorSchema();
    return schema.nodeFromJSON(withoutTrailingParagraphs(a)).eq(schema.nodeFromJSON(withoutTrailingParagraphs(b)));
  } catch {
    return false;
  }
}

/** True when the document is readable by the shared schema (a stored copy may come from an older build). */
export function fitsSchema(doc: unknown): doc is JSONContent {
  try {
    getEditorSchema().nodeFromJSON(doc).check();
    return true;
  } catch {
    return false;
  }
}
