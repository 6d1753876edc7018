import { NodeViewWrapper, type NodeViewProps } from '@tiptap/react';
import { CUT_LIST_UNITS, type CutListUnits, type RenderPiece } from '@shared/editor/types';
import { inchSize, mmSize } from '@shared/editor/render-parts';
import { paths } from '@/config/paths';
import { useLivePieces } from '../../api/get-pieces';
import type { PieceDto } from '@shared/schemas/piece';
import { useWriteUpContext } from '../write-up-context';
import { LiveFrame } from './live-frame';

const UNIT_LABELS: Record<CutListUnits, string> = { both: 'inches and mm', in: 'inches only', mm: 'mm only' };

// The same size words the published page uses (shared/editor/render-parts).
function renderPiece(p: PieceDto): RenderPiece {
  return {
    name: p.name,
    material: p.material,
    quantity: p.quantity,
    shape: p.shape,
    width: p.width.display,
    height: p.height.display,
    widthMm: p.width.mm,
    heightMm: p.height.mm,
    scoreLines: p.scoreLines.map((s) => s.at.display),
    notes: p.notes,
  };
}

/** The cut list as a live, read-only table of the tutorial's pieces. */
export function CutListView({ node, editor, updateAttributes, selected }: NodeViewProps) {
  const { tutorialId } = useWriteUpContext();
  const q = useLivePieces(tutorialId);
  const units = (CUT_LIST_UNITS as readonly string[]).includes(node.attrs.units) ? (node.attrs.units as CutListUnits) : 'both';
  const pieces = q.data?.pieces ?? [];
  const withScores = pieces.some((p) => p.scoreLines.length > 0);
  const withNotes = pieces.some((p) => p.notes?.trim());
  const controls = editor.isEditable ? (
    <label className="flex items-center gap-1 font-sans text-xs text-pencil">
      Sizes
      <select
        value={units}
        onChange={(e) => updateAttributes({ units: e.target.value })}
        className="min-h-6 rounded border border-field bg-white px-1 py-0.5 text-xs text-ink"
      >
        {CUT_LIST_UNITS.map((u) => (
          <option key={u} value={u}>
            {UNIT_LABELS[u]}
          </option>
        ))}
      </select>
    </label>
  ) : null;

  return (
    <NodeViewWrapper className="wu-live-wrap">
      <LiveFrame
        title="Cut list"
        editTo={paths.tutorialSection(tutorialId, 'cut-list')}
        editLabel="Cut list"
        controls={controls}
        selected={selected}
        editable={editor.isEditable}
      >
        {q.isPending ? (
          <p className="wu-live-empty">Loading the pieces …</p>
        ) : q.error ? (
          <p className="wu-live-empty text-rosehip">The pieces could not be loaded: {q.error.message}</p>
        ) : pieces.length === 0 ? (
          <p className="wu-live-empty">No pieces yet. Add them in the Cut list section and they appear here.</p>
        ) : (
          <table className="wu-table stack-table">
            <thead>
              <tr>
                <th scope="col">Piece</th>
                <th scope="col">Material</th>
                <th scope="col" className="text-right">
                  Qty
                </th>
                <th scope="col">Size</th>
                {withScores && <th scope="col">Score lines</th>}
                {withNotes && <th scope="col">Notes</th>}
              </tr>
            </thead>
            <tbody>
              {pieces.map((p) => {
                const rp = renderPiece(p);
                return (
                  <tr key={p.id} data-piece-id={p.id}>
                    <th scope="row">{p.name}</th>
                    <td data-label="Material">{p.material}</td>
                    <td className="text-right tabular-nums" data-label="Qty">
                      {p.quantity}
                    </td>
                    <td data-label="Size">
                      {units !== 'mm' && <span>{inchSize(rp)}</span>}
                      {units === 'both' && <span className="wu-mm"> {mmSize(rp)}</span>}
                      {units === 'mm' && <span>{mmSize(rp)}</span>}
                    </td>
                    {withScores && (
                      <td data-label="Score lines">
                        {p.scoreLines.map((s, i) => (
                          <span key={i}>
                            {i > 0 && ', '}
                            {s.at.display}
                            {s.tab && <span className="wu-mm"> (tab)</span>}
                          </span>
                        ))}
                      </td>
                    )}
                    {withNotes && (
                      <td className="text-pencil" data-label="Notes">
                        {p.notes}
                      </td>
                    )}
                  </tr>
                );
              })}
            </tbody>
          </table>
        )}
        {pieces.length > 0 && q.data && units !== 'mm' && <p className="wu-live-foot">Inch sizes to the nearest 1/{q.data.precision} in.</p>}
      </LiveFrame>
    </NodeViewWrapper>
  );
}
