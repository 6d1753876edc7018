import type { JSONContent } from '@tiptap/core';
import { generateJSON } from '@tiptap/html/server';
import { editorExtensions } from '@shared/editor/extensions';
import { validateDoc } from '@shared/editor/validate-doc';
import { sanitizeHtml } from './sanitize-html';

/**
 * Pasted or imported HTML to a write-up document: sanitised first, then read by the
 * schema's own parse rules (happy-dom, scripts off), then checked by `validateDoc`
 * (unsafe leftovers stripped). Server-only.
 */
export function htmlToDoc(html: string): JSONContent {
  const clean = sanitizeHtml(html);
  const json = generateJSON(clean || '<p></p>', editorExtensions);
  const result = validateDoc(json, { strip: true });
  if (!result.ok) throw new Error(`imported HTML did not fit the write-up schema: ${result.error}`);
  return result.doc;
}
