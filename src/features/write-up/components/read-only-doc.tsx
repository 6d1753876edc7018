import type { JSONContent } from '@tiptap/core';
import { EditorContent, useEditor } from '@tiptap/react';
import { useMemo } from 'react';
import { withTrailingParagraph } from '../utils/same-doc';
import { writeUpExtensions } from './editor-extensions';
import { WriteUpProvider } from './write-up-context';

/** A write-up shown as the editor shows it (same cards, live lists and callouts), but not editable. */
export function ReadOnlyDoc({ tutorialId, doc, label }: { tutorialId: string; doc: JSONContent; label: string }) {
  const extensions = useMemo(() => writeUpExtensions(), []);
  const editor = useEditor(
    {
      extensions,
      content: withTrailingParagraph(doc),
      editable: false,
      immediatelyRender: true,
      editorProps: { attributes: { class: 'wu-prose wu-readonly', 'aria-label': label, role: 'document' } },
    },
    [doc],
  );
  return (
    <WriteUpProvider tutorialId={tutorialId}>
      <EditorContent editor={editor} />
    </WriteUpProvider>
  );
}
