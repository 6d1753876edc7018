import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useApplyDraft, usePreviewDraft } from '../api/make-draft';
import type { DraftPreviewDto } from '@shared/schemas/article';
import { UNSAVED_FIRST, type ReplaceActions } from './replace-actions';

const stepCount = (p: DraftPreviewDto) => (p.doc.content ?? []).filter((n) => n.type === 'step').length;

/**
 * "Make a first draft": one step per chapter from the footage. When there is a write-up already,
 * it asks first (the current one stays in the revisions); without footage it says where to go.
 */
export function DraftButton({ tutorialId, actions, prominent }: { tutorialId: string; actions: ReplaceActions; prominent?: boolean }) {
  const preview = usePreviewDraft(tutorialId);
  const apply = useApplyDraft(tutorialId);
  const [asking, setAsking] = useState<DraftPreviewDto | null>(null);
  const [problem, setProblem] = useState<{ message: string; footage: boolean } | null>(null);

  const doApply = async () => {
    try {
      const r = await apply.mutateAsync(actions.baseVersion());
      actions.replaced(r.doc, r.version);
      setAsking(null);
    } catch (e) {
      setAsking(null);
      setProblem({ message: (e as Error).message, footage: false });
    }
  };

  const start = async () => {
    setProblem(null);
    if (!(await actions.prepare())) return setProblem({ message: UNSAVED_FIRST, footage: false });
    try {
      const p = await preview.mutateAsync();
      if (p.replaces) setAsking(p);
      else await doApply();
    } catch (e) {
      // 409 here means there is nothing to draft from yet (no recording, or no chapters).
      setProblem({ message: (e as Error).message, footage: e instanceof ApiError && e.status === 409 });
    }
  };

  return (
    <>
      <Button
        variant={prominent ? 'primary' : 'secondary'}
        size={prominent ? 'md' : 'sm'}
        busy={preview.isPending || (apply.isPending && !asking)}
        onClick={() => void start()}
      >
        Make a first draft
      </Button>
      {problem && (
        <div className="basis-full">
          <Notice kind="error">
            {problem.message}
            {problem.footage && !/[.!?]$/.test(problem.message) && '.'}
            {problem.footage && (
              <>
                {' '}
                <Link to={paths.tutorialSection(tutorialId, 'footage')} className="font-medium underline">
                  Go to Footage
                </Link>
              </>
            )}
          </Notice>
        </div>
      )}
      <ConfirmDialog
        open={asking !== null}
        title="Replace the write-up with a first draft?"
        confirmLabel="Replace with the draft"
        busy={apply.isPending}
        onConfirm={() => void doApply()}
        onCancel={() => setAsking(null)}
      >
        This replaces the current write-up; the current one stays in the revisions.
        {asking && ` The draft has ${stepCount(asking)} ${stepCount(asking) === 1 ? 'step' : 'steps'}, one for each chapter.`}
      </ConfirmDialog>
    </>
  );
}
