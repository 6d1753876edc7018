import type { Editor } from '@tiptap/core';
import { useEditor } from '@tiptap/react';
import { useEffect, useRef, useState, useSyncExternalStore } from 'react';
import { saveArticle } from '../api/save-article';
import type { ArticleDto } from '@shared/schemas/article';
import { writeUpExtensions, type EditorHandlers } from '../components/editor-extensions';
import { Autosave } from '../utils/autosave';
import { clearLocalDraft, planStart, readLocalDraft, type StartPlan, type StorageLike } from '../utils/local-draft';
import { withTrailingParagraph } from '../utils/same-doc';

/** localStorage, or null where it is turned off (some private modes throw on access). */
function deviceStorage(): StorageLike | null {
  try {
    const s = window.localStorage;
    s.getItem('cardwright:probe');
    return s;
  } catch {
    return null;
  }
}

/**
 * The live editor and its autosave for one tutorial's write-up. It starts from the server's
 * version, or from edits this device kept (see planStart): put back and saved when they were
 * made on the current version, or handed to the conflict view when someone saved since.
 */
export function useWriteUpEditor({
  tutorialId,
  article,
  canEdit,
  handlers,
}: {
  tutorialId: string;
  article: ArticleDto;
  canEdit: boolean;
  handlers: { current: EditorHandlers };
}) {
  const [storage] = useState(deviceStorage);
  const [start] = useState<StartPlan>(() => {
    const kept = canEdit ? readLocalDraft(storage, tutorialId) : null;
    const plan = planStart(article, kept);
    if (plan.kind === 'server' && kept) clearLocalDraft(storage, tutorialId);
    return plan;
  });
  const editorRef = useRef<Editor | null>(null);
  const [autosave] = useState(() => {
    const a = new Autosave({
      tutorialId,
      version: start.kind === 'compare' ? start.draft.baseVersion : article.version,
      getDoc: () => editorRef.current!.getJSON(),
      put: (doc, version) => saveArticle(tutorialId, doc, version),
      storage,
      isOnline: () => navigator.onLine,
    });
    if (start.kind === 'compare') {
      a.setStatus({ kind: 'conflict', theirs: { doc: article.doc, version: article.version, updatedBy: article.updatedBy, updatedAt: article.updatedAt } });
    } else if (article.updatedAt) {
      a.setStatus({ kind: 'saved', at: new Date(article.updatedAt) });
    }
    return a;
  });
  const [extensions] = useState(() => writeUpExtensions(canEdit ? { handlers } : {}));
  const editor = useEditor({
    extensions,
    content: withTrailingParagraph(start.kind === 'server' ? article.doc : start.draft.doc),
    editable: canEdit,
    immediatelyRender: true,
    shouldRerenderOnTransaction: false,
    editorProps: { attributes: { class: 'wu-prose', 'aria-label': 'Write-up text', spellcheck: 'true' } },
    onUpdate: () => autosave.changed(),
  });
  editorRef.current = editor;

  useEffect(() => {
    if (!canEdit) return;
    autosave.start();
    // Kept edits are not on the server: count them as unsaved (restore: saved shortly; compare: kept until chosen).
    if (start.kind !== 'server') autosave.changed();
    const online = () => autosave.retry();
    const hide = () => autosave.writeLocalNow();
    const visibility = () => document.visibilityState === 'hidden' && autosave.writeLocalNow();
    const unload = (e: BeforeUnloadEvent) => {
      autosave.writeLocalNow();
      // Only when this device could not keep a copy is leaving a real loss worth a question.
      if (autosave.dirty && autosave.deviceCopyFailed) e.preventDefault();
    };
    window.addEventListener('online', online);
    window.addEventListener('pagehide', hide);
    window.addEventListener('beforeunload', unload);
    document.addEventListener('visibilitychange', visibility);
    return () => {
      window.removeEventListener('online', online);
      window.removeEventListener('pagehide', hide);
      window.removeEventListener('beforeunload', unload);
      document.removeEventListener('visibilitychange', visibility);
      autosave.stop();
    };
  }, [autosave, canEdit, start]);

  const status = useSyncExternalStore(autosave.subscribe, autosave.getStatus);
  return { editor, autosave, status, start };
}
