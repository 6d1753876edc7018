import { NodeViewContent, NodeViewWrapper, useEditorState, type NodeViewProps } from '@tiptap/react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { timeChipLabel } from '../../utils/format';
import { moveStep, stepsOf } from '../../utils/step-moves';
import { useWriteUpContext } from '../write-up-context';

/**
 * A step as a numbered card: number (its place among the steps), drag handle, the title and body
 * (editable content), a chip with its time in the video, and buttons to move it.
 */
export function StepView({ node, editor, getPos }: NodeViewProps) {
  const { tutorialId, onCommentOn } = useWriteUpContext();
  const stepId = typeof node.attrs.id === 'string' ? (node.attrs.id as string) : null;
  // Re-read on every change: a step inserted or moved elsewhere renumbers this one.
  const place = useEditorState({
    editor,
    selector: ({ editor: e }) => {
      const pos = getPos();
      const steps = stepsOf(e.state.doc);
      const i = typeof pos === 'number' ? steps.findIndex((s) => s.pos === pos) : -1;
      return { number: i + 1, count: steps.length };
    },
  });
  const number = place.number || null;
  const editable = editor.isEditable;
  const atMs = typeof node.attrs.atMs === 'number' ? (node.attrs.atMs as number) : null;
  const title = node.firstChild?.textContent.trim() || (number ? `Step ${number}` : 'this step');

  const move = (dir: -1 | 1) => {
    const pos = getPos();
    if (typeof pos !== 'number') return;
    const moved = moveStep(editor.state, pos, dir);
    if (!moved) return;
    editor.view.dispatch(moved.tr);
    // The card is drawn anew at its new place: give the same button the focus again.
    requestAnimationFrame(() => {
      const dom = editor.view.nodeDOM(moved.pos) as HTMLElement | null;
      const again = dom?.querySelector<HTMLButtonElement>(`[data-move="${dir}"]`);
      (again && !again.disabled ? again : dom?.querySelector<HTMLButtonElement>('[data-move]'))?.focus();
    });
  };

  return (
    <NodeViewWrapper as="section" className="wu-step" data-step-id={stepId ?? undefined} aria-label={number ? `Step ${number}: ${title}` : title}>
      <div className="wu-step-rail" contentEditable={false}>
        <span className="wu-step-number" aria-hidden>
          {number ?? '·'}
        </span>
        {editable && (
          <span className="wu-drag" data-drag-handle draggable="true" title="Drag to move this step" aria-hidden>
            ⋮⋮
          </span>
        )}
      </div>
      <div className="wu-step-main">
        <div className="wu-step-bar" contentEditable={false}>
          <span className="wu-step-label">Step {number ?? ''}</span>
          {atMs !== null && (
            <Link className="wu-chip" to={`${paths.tutorialSection(tutorialId, 'footage')}?t=${atMs}`} title="Watch this step in the Footage section">
              {timeChipLabel(atMs)}
            </Link>
          )}
          {onCommentOn && stepId && (
            <button type="button" className="wu-step-comment" onClick={() => onCommentOn(stepId)} aria-label={`Comment on step ${number ?? ''}`}>
              Comment
            </button>
          )}
          {editable && (
            <span className="wu-step-moves">
              <button
                type="button"
                data-move="-1"
                disabled={place.number <= 1}
                onClick={() => move(-1)}
                aria-label={`Move step ${number} up`}
                title="Move up (Alt+↑)"
              >
                ↑
              </button>
              <button
                type="button"
                data-move="1"
                disabled={place.number === 0 || place.number >= place.count}
                onClick={() => move(1)}
                aria-label={`Move step ${number} down`}
                title="Move down (Alt+↓)"
              >
                ↓
              </button>
            </span>
          )}
        </div>
        <NodeViewContent className="wu-step-content" />
      </div>
    </NodeViewWrapper>
  );
}
