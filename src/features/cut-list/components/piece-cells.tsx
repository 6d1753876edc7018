import { useEffect, useRef, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { formatTimestamp } from '@shared/transcript/timestamp';
import type { PieceDto } from '@shared/schemas/piece';
import { useCutList } from './cut-list-context';
import { saveErrorText } from './editable-cell';

/** The piece a mat sits on: a choice of the other pieces, saved as soon as it changes. */
export function MatCell({ piece, pieces, onSave }: { piece: PieceDto; pieces: PieceDto[]; onSave: (matOnId: string | null) => Promise<unknown> }) {
  const { canEdit } = useCutList();
  const [editing, setEditing] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const select = useRef<HTMLSelectElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  const base = pieces.find((p) => p.id === piece.matOnId);
  const shown = base ? <span>on {base.name}</span> : <span className="text-pencil">—</span>;
  useEffect(() => {
    if (editing) select.current?.focus();
  }, [editing]);
  if (!canEdit) return shown;
  if (!editing)
    return (
      <button
        ref={button}
        type="button"
        // The shown words end the name, so speech users can say what they see (WCAG 2.5.3).
        aria-label={`Edit what ${piece.name} sits on: ${base ? `on ${base.name}` : 'nothing'}`}
        onClick={() => {
          setError(null);
          setEditing(true);
        }}
        className="-mx-1 block w-[calc(100%+0.5rem)] rounded px-1 py-0.5 text-left hover:bg-kraft-light/60"
      >
        {shown}
      </button>
    );
  const done = () => {
    setEditing(false);
    requestAnimationFrame(() => button.current?.focus());
  };
  return (
    <div>
      <select
        ref={select}
        aria-label={`${piece.name} sits on`}
        className="w-full rounded border border-field bg-white px-1 py-0.5 text-sm"
        defaultValue={piece.matOnId ?? ''}
        disabled={saving}
        onKeyDown={(e) => e.key === 'Escape' && (e.preventDefault(), done())}
        onBlur={() => !saving && !error && setEditing(false)}
        onChange={async (e) => {
          setSaving(true);
          setError(null);
          try {
            await onSave(e.target.value || null);
            done();
          } catch (err) {
            setError(saveErrorText(err));
          } finally {
            setSaving(false);
          }
        }}
      >
        <option value="">Not a mat</option>
        {pieces
          .filter((p) => p.id !== piece.id)
          .map((p) => (
            <option key={p.id} value={p.id}>
              on {p.name}
            </option>
          ))}
      </select>
      {error && (
        <p role="alert" className="text-xs text-rosehip">
          {error}
        </p>
      )}
    </div>
  );
}

/** The time a piece was said, opening the Footage section there. */
export function SaidAtCell({ piece }: { piece: PieceDto }) {
  const { footageAt } = useCutList();
  const navigate = useNavigate();
  if (piece.saidAtMs === null) return <span className="text-pencil">—</span>;
  const t = formatTimestamp(piece.saidAtMs);
  return (
    <button
      type="button"
      className="font-mono text-xs text-kraft-dark underline decoration-dotted underline-offset-2 hover:text-ink"
      aria-label={`Said at ${t}: open the footage there`}
      onClick={() => navigate(footageAt(piece.saidAtMs!))}
    >
      {t}
    </button>
  );
}
