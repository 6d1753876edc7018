import { useCallback, useMemo, useState } from 'react';
import type { LengthUnit, RulerPrecision } from '@shared/measure';
import { EmptyState } from '@/components/ui/empty-state';
import { Loading } from '@/components/ui/spinner';
import { Notice } from '@/components/ui/notice';
import { usePieces } from '../api/get-pieces';
import { useUnitsMode } from '../hooks/use-units-mode';
import { AddPieceForm, type PiecePrefill } from './add-piece-form';
import { CardBaseHelper } from './card-base-helper';
import { CutListContext, type CutListSettings } from './cut-list-context';
import { CutListHeader } from './cut-list-header';
import { LidHelper } from './lid-helper';
import { MaterialsEditor } from './materials-editor';
import { MentionsPanel } from './mentions-panel';
import { PiecesTable } from './pieces-table';
import { SheetPlanView } from './sheet-plan-view';
import { ToolTabs } from './tool-tabs';
import { WrapHelper } from './wrap-helper';

/**
 * The whole Cut list section: the table with its add form, the transcript's mentions beside it,
 * and the helpers, materials and sheet plan below. The page passes in what belongs to the
 * tutorial itself (its precision and how to change it) and where the Footage section lives.
 */
export function CutListWorkspace(props: {
  tutorialId: string;
  precision: RulerPrecision;
  defaultUnit: LengthUnit;
  onPrecision?: (p: RulerPrecision) => void;
  precisionBusy?: boolean;
  precisionError?: string | null;
  footagePath: string;
}) {
  const q = usePieces(props.tutorialId);
  const [units, setUnits] = useUnitsMode();
  const [prefill, setPrefill] = useState<PiecePrefill | null>(null);
  const onPrefill = useCallback((values: PiecePrefill['values']) => setPrefill({ values, nonce: Date.now() }), []);
  const canEdit = q.data?.abilities.update ?? false;
  const settings = useMemo<CutListSettings>(
    () => ({
      tutorialId: props.tutorialId,
      precision: (q.data?.precision ?? props.precision) as RulerPrecision,
      defaultUnit: q.data?.defaultUnit ?? props.defaultUnit,
      canEdit,
      units,
      footageAt: (ms) => `${props.footagePath}?t=${Math.round(ms)}`,
    }),
    [props.tutorialId, props.precision, props.defaultUnit, props.footagePath, q.data?.precision, q.data?.defaultUnit, canEdit, units],
  );
  if (q.isPending) return <Loading label="Loading the cut list" />;
  if (q.error) return <Notice kind="error">{q.error.message}</Notice>;
  const { pieces, materials } = q.data;

  return (
    <CutListContext.Provider value={settings}>
      <CutListHeader
        count={pieces.length}
        units={units}
        onUnits={setUnits}
        precision={settings.precision}
        onPrecision={canEdit ? props.onPrecision : undefined}
        precisionBusy={props.precisionBusy}
        precisionError={props.precisionError}
      />
      <hr className="score-rule my-4" />
      {!canEdit && (
        <div className="mb-4">
          <Notice>You can read this cut list; only people who can edit the tutorial can change it.</Notice>
        </div>
      )}
      <div className="grid grid-cols-1 gap-6 xl:grid-cols-[minmax(0,1fr)_19rem]">
        <div className="min-w-0 space-y-6">
          {pieces.length === 0 ? (
            <EmptyState title="No pieces yet">
              {canEdit ? (
                <p>
                  Add the first piece with the form below, or make one in a click from the measurements said in the recording (Mentions, at the side). Helpers
                  below work out wrap strips, lids and card bases.
                </p>
              ) : (
                <p>Nobody has added a piece to this cut list yet.</p>
              )}
            </EmptyState>
          ) : (
            <PiecesTable pieces={pieces} materials={materials} />
          )}
          {canEdit && <AddPieceForm pieces={pieces} materials={materials} prefill={prefill} />}
          <ToolTabs
            label="Cut list tools"
            tabs={[
              { key: 'wrap', label: 'Wrap helper', panel: () => <WrapHelper /> },
              { key: 'lid', label: 'Lid helper', panel: () => <LidHelper /> },
              { key: 'card', label: 'Card base helper', panel: () => <CardBaseHelper /> },
              { key: 'materials', label: 'Materials', panel: () => <MaterialsEditor pieces={pieces} /> },
              { key: 'plan', label: 'Sheet plan', panel: () => <SheetPlanView pieceCount={pieces.length} /> },
            ]}
          />
        </div>
        <aside className="min-w-0 xl:sticky xl:top-4 xl:max-h-[calc(100vh-2rem)] xl:self-start xl:overflow-y-auto">
          <MentionsPanel pieces={pieces} footagePath={props.footagePath} onPrefill={onPrefill} />
        </aside>
      </div>
    </CutListContext.Provider>
  );
}
