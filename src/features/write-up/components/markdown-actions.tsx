import { useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { Notice } from '@/components/ui/notice';
import { markdownExportUrl, useImportMarkdown } from '../api/markdown';
import { UNSAVED_FIRST, type ReplaceActions } from './replace-actions';

// The server refuses more than this (server/routes/articles/articles.router.ts).
const MAX_MARKDOWN = 2_000_000;

/** "Export Markdown" (the server's file of the saved write-up) and, for editors, "Import Markdown". */
export function MarkdownActions({ tutorialId, actions, canImport }: { tutorialId: string; actions: ReplaceActions; canImport: boolean }) {
  const importer = useImportMarkdown(tutorialId);
  const input = useRef<HTMLInputElement>(null);
  const [pending, setPending] = useState<{ name: string; text: string } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [exporting, setExporting] = useState(false);

  const exportFile = async () => {
    setProblem(null);
    setExporting(true);
    // The file is made from what the server has: save first so it matches the screen.
    const saved = await actions.prepare();
    setExporting(false);
    if (!saved) return setProblem('Your latest changes are not saved yet, so the file would miss them. Wait for "Saved" and export again.');
    const a = document.createElement('a');
    a.href = markdownExportUrl(tutorialId);
    a.download = '';
    document.body.append(a);
    a.click();
    a.remove();
  };

  const chosen = async (file: File | undefined) => {
    if (input.current) input.current.value = '';
    if (!file) return;
    setProblem(null);
    if (file.size > MAX_MARKDOWN) return setProblem(`“${file.name}” is larger than the 2 MB a Markdown import may be.`);
    setPending({ name: file.name, text: await file.text() });
  };

  const doImport = async () => {
    if (!pending) return;
    if (!(await actions.prepare())) {
      setPending(null);
      return setProblem(UNSAVED_FIRST);
    }
    try {
      const r = await importer.mutateAsync({ markdown: pending.text, version: actions.baseVersion() });
      actions.replaced(r.doc, r.version);
      setPending(null);
    } catch (e) {
      setPending(null);
      setProblem((e as Error).message);
    }
  };

  return (
    <>
      <Button variant="secondary" size="sm" busy={exporting} onClick={() => void exportFile()}>
        Export Markdown
      </Button>
      {canImport && (
        <>
          <Button variant="secondary" size="sm" onClick={() => input.current?.click()}>
            Import Markdown
          </Button>
          <input
            ref={input}
            type="file"
            accept=".md,.markdown,text/markdown,text/plain"
            className="sr-only"
            tabIndex={-1}
            aria-label="Markdown file to import"
            onChange={(e) => void chosen(e.target.files?.[0])}
          />
        </>
      )}
      {problem && (
        <div className="basis-full">
          <Notice kind="error">{problem}</Notice>
        </div>
      )}
      <ConfirmDialog
        open={pending !== null}
        title={`Replace the write-up with “${pending?.name ?? ''}”?`}
        confirmLabel="Import and replace"
        busy={importer.isPending}
        onConfirm={() => void doImport()}
        onCancel={() => setPending(null)}
      >
        The write-up becomes the content of this Markdown file. The current one stays in the revisions. Steps are read from headings like “### Step 1: Title”,
        tips and cautions from quotes that start with “**Tip:**” or “**Caution:**”.
      </ConfirmDialog>
    </>
  );
}
