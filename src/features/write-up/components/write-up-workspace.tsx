import type { JSONContent } from '@tiptap/core';
import { EditorContent, useEditorState } from '@tiptap/react';
import { useEffect, useMemo, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useRestoreRevision } from '../api/restore-revision';
import type { ArticleDto } from '@shared/schemas/article';
import { useWriteUpEditor } from '../hooks/use-write-up-editor';
import { insertStillHere } from '../utils/editor-commands';
import { keptLiveListText } from '../utils/live-lists';
import { clockTime } from '../utils/format';
import { withTrailingParagraph } from '../utils/same-doc';
import { ConflictBanner } from './conflict-banner';
import { DraftButton } from './draft-button';
import { EditorToolbar } from './editor-toolbar';
import type { EditorHandlers } from './editor-extensions';
import { KeysHelp } from './keys-help';
import { LinkForm } from './link-form';
import { MarkdownActions } from './markdown-actions';
import { ReadOnlyDoc } from './read-only-doc';
import { UNSAVED_FIRST, type ReplaceActions } from './replace-actions';
import { RevisionsDrawer } from './revisions-drawer';
import { SaveStatusLabel } from './save-status';
import { StillPicker } from './still-picker';
import { WriteUpProvider } from './write-up-context';
import { selectedPassage, stepRefs, type WriteUpReviewHooks } from '../utils/review-hooks';
import './write-up.css';

type Props = { tutorialId: string; article: ArticleDto; canEdit: boolean; meId: string | null; review?: WriteUpReviewHooks };

/**
 * Tells the page about the steps and the selected words as they change (only when they do), and
 * lends it the autosave's flush, so comments beside the write-up can point at what is typed.
 */
function useReviewHooks(editor: ReturnType<typeof useWriteUpEditor>['editor'], review: WriteUpReviewHooks | undefined, flush: () => Promise<boolean>) {
  const last = useRef({ steps: '', passage: '' });
  const hooks = useRef(review);
  hooks.current = review;
  const flushRef = useRef(flush);
  flushRef.current = flush;
  useEffect(() => {
    const lend = hooks.current?.flush;
    if (lend) lend.current = () => flushRef.current();
    const report = () => {
      const h = hooks.current;
      if (!h) return;
      const steps = stepRefs(editor.state.doc);
      const stepsKey = JSON.stringify(steps);
      if (stepsKey !== last.current.steps) {
        last.current.steps = stepsKey;
        h.onSteps?.(steps);
      }
      const passage = selectedPassage(editor.state);
      const passageKey = JSON.stringify(passage);
      if (passageKey !== last.current.passage) {
        last.current.passage = passageKey;
        h.onSelection?.(passage);
      }
    };
    report();
    editor.on('update', report);
    editor.on('selectionUpdate', report);
    return () => {
      editor.off('update', report);
      editor.off('selectionUpdate', report);
      if (lend) lend.current = null;
    };
  }, [editor]);
}

/**
 * The Write-up section at work: toolbar, the editor (Merriweather, a comfortable measure),
 * autosave with its status, the conflict view when someone saved a newer version, revisions,
 * the first draft and Markdown in and out.
 */
export function WriteUpWorkspace({ tutorialId, article, canEdit, meId, review }: Props) {
  const handlers = useRef<EditorHandlers>({});
  const { editor, autosave, status, start } = useWriteUpEditor({ tutorialId, article, canEdit, handlers });
  const [stillOpen, setStillOpen] = useState(false);
  const [linkOpen, setLinkOpen] = useState(false);
  const [revisionsOpen, setRevisionsOpen] = useState(false);
  const [merging, setMerging] = useState(false);
  const [resolving, setResolving] = useState(false);
  const [notice, setNotice] = useState<{ kind: 'info' | 'success' | 'error'; text: string } | null>(() =>
    start.kind === 'restore'
      ? {
          kind: 'info',
          text: `Put back changes this device kept from ${clockTime(new Date(start.draft.editedAt))} that had not reached the server; saving them now.`,
        }
      : null,
  );
  const restore = useRestoreRevision(tutorialId);
  handlers.current = {
    openLink: () => setLinkOpen(true),
    openStillPicker: () => setStillOpen(true),
    keptLiveList: (what) => setNotice({ kind: 'info', text: keptLiveListText(what) }),
    refusedFiles: () =>
      setNotice({ kind: 'error', text: 'Photos cannot be pasted or dropped in from files. Pull a still in the Footage section, then use “+ Still”.' }),
  };
  const empty = useEditorState({ editor, selector: ({ editor: e }) => e.isEmpty });
  useReviewHooks(editor, review, () => autosave.flush());

  const actions: ReplaceActions = useMemo(
    () => ({
      prepare: () => autosave.flush(),
      baseVersion: () => autosave.baseVersion,
      replaced: (doc: JSONContent, version: number) => {
        editor.commands.setContent(withTrailingParagraph(doc), { emitUpdate: false });
        autosave.baseChanged(version);
        setMerging(false);
        setNotice(null);
      },
    }),
    [autosave, editor],
  );

  const conflict = status.kind === 'conflict' ? status.theirs : null;

  const keepMine = async () => {
    setResolving(true);
    await autosave.keepMine();
    setResolving(false);
    setMerging(false);
  };
  const takeTheirs = () => {
    if (!conflict) return;
    editor.chain().setContent(withTrailingParagraph(conflict.doc), { emitUpdate: false }).run();
    autosave.acceptTheirs();
    setMerging(false);
    setNotice({ kind: 'info', text: 'Their version is in the editor now. Ctrl+Z (⌘Z on a Mac) brings yours back.' });
  };
  const restoreRevision = async (revisionId: string): Promise<string | null> => {
    if (!(await actions.prepare())) return UNSAVED_FIRST;
    try {
      const r = await restore.mutateAsync({ revisionId, version: actions.baseVersion() });
      actions.replaced(r.doc, r.version);
      setRevisionsOpen(false);
      setNotice({ kind: 'success', text: 'Revision restored; the write-up you had before is in the revisions too.' });
      return null;
    } catch (e) {
      return (e as Error).message;
    }
  };

  const statusLabel = <SaveStatusLabel status={status} deviceCopyFailed={autosave.deviceCopyFailed} />;

  return (
    <WriteUpProvider tutorialId={tutorialId} onCommentOn={review?.onCommentOn}>
      <div className="space-y-3">
        <div className="flex flex-wrap items-center gap-2">
          <h2 className="mr-auto text-xl">Write-up</h2>
          {canEdit && !empty && <DraftButton tutorialId={tutorialId} actions={actions} />}
          {article.abilities.readRevisions && (
            <Button variant="secondary" size="sm" onClick={() => setRevisionsOpen(true)} aria-expanded={revisionsOpen}>
              Revisions
            </Button>
          )}
          <MarkdownActions tutorialId={tutorialId} actions={actions} canImport={canEdit} />
        </div>

        {!canEdit && <Notice>You can read this write-up; only people who edit the tutorial can change it.</Notice>}
        {notice && (
          <div className="flex items-start gap-2">
            <div className="flex-1">
              <Notice kind={notice.kind}>{notice.text}</Notice>
            </div>
            <Button variant="ghost" size="sm" onClick={() => setNotice(null)}>
              Dismiss
            </Button>
          </div>
        )}
        {conflict && (
          <ConflictBanner
            theirs={conflict}
            meId={meId}
            merging={merging}
            busy={resolving}
            fromDevice={start.kind === 'compare' && conflict.version === article.version}
            onKeepMine={() => void keepMine()}
            onTakeTheirs={takeTheirs}
            onMerge={() => {
              setMerging(true);
              editor.commands.focus();
            }}
            onSaveMerged={() => void keepMine()}
            onBack={() => setMerging(false)}
          />
        )}
        {canEdit && empty && !conflict && (
          <div className="flex flex-wrap items-center gap-3 rounded-lg border border-dashed border-kraft/50 bg-white/60 px-5 py-4">
            <div className="mr-auto">
              <h3 className="text-lg">This write-up is empty</h3>
              <p className="text-sm text-pencil">
                Make a first draft from the footage: one step for each chapter, with the spoken words tidied up and the stills placed. Or just start typing
                below.
              </p>
            </div>
            <DraftButton tutorialId={tutorialId} actions={actions} prominent />
          </div>
        )}

        {canEdit && <EditorToolbar editor={editor} onStill={() => setStillOpen(true)} onLink={() => setLinkOpen(true)} status={statusLabel} />}
        {linkOpen && <LinkForm editor={editor} onClose={() => setLinkOpen(false)} />}

        <div className={conflict ? 'grid grid-cols-2 gap-5' : ''}>
          {conflict && (
            <section key="theirs" aria-label="Their version" className="min-w-0">
              <h3 className="mb-2 font-sans text-sm font-semibold">
                Their version <span className="font-normal text-pencil">(version {conflict.version}, read only)</span>
              </h3>
              <div className="wu-page wu-page-theirs">
                <ReadOnlyDoc key={conflict.version} tutorialId={tutorialId} doc={conflict.doc} label="Their version, read only" />
              </div>
            </section>
          )}
          <section key="mine" aria-label={conflict ? 'Your version' : undefined} className="min-w-0" data-comment-scope>
            {conflict && (
              <h3 className="mb-2 font-sans text-sm font-semibold">
                Your version <span className="font-normal text-pencil">{merging ? '(edit it, then save)' : '(kept on this device)'}</span>
              </h3>
            )}
            <div className={`wu-page ${conflict ? '' : 'mx-auto max-w-[48rem]'}`}>
              <EditorContent editor={editor} />
            </div>
          </section>
        </div>

        {canEdit && (
          <div className="mx-auto max-w-[48rem]">
            <KeysHelp />
          </div>
        )}
      </div>

      {canEdit && (
        <StillPicker
          tutorialId={tutorialId}
          open={stillOpen}
          onClose={() => {
            setStillOpen(false);
            editor.commands.focus();
          }}
          onPick={(still) => {
            setStillOpen(false);
            insertStillHere(editor, still);
          }}
        />
      )}
      <RevisionsDrawer
        tutorialId={tutorialId}
        open={revisionsOpen && article.abilities.readRevisions}
        canRestore={canEdit}
        onClose={() => setRevisionsOpen(false)}
        onRestore={restoreRevision}
      />
    </WriteUpProvider>
  );
}
