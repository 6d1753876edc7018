import type {
  AssemblyDto,
  AssemblyProposalDto,
  AssemblyState,
  ChapterProposalPayload,
  DraftProposalPayload,
  PieceProposalPayload,
  StillProposalPayload,
  SupplyProposalPayload,
} from '@shared/schemas/assembly';
import { SUPPLY_CATEGORY_LABELS } from '@shared/schemas/supply';
import { formatTimestamp } from '@shared/transcript/timestamp';
import type { TutorialAbilities } from '../policies';
import type { AssemblyItem, AssemblyView } from '../services/assembly';

/** One line a crafter reads for each proposal: what accepting it makes. */
function summary({ row }: AssemblyItem): { summary: string; atMs: number | null } {
  switch (row.kind) {
    case 'chapter': {
      const c = row.payload as ChapterProposalPayload;
      return { summary: `Chapter “${c.title}” at ${formatTimestamp(c.startMs)}`, atMs: c.startMs };
    }
    case 'still': {
      const s = row.payload as StillProposalPayload;
      return { summary: `The sharpest still inside “${s.chapterTitle}”`, atMs: s.chapterStartMs };
    }
    case 'piece': {
      const p = row.payload as PieceProposalPayload;
      const bits = [p.material || 'material to pick', ...(p.quantity > 1 ? [`× ${p.quantity}`] : [])];
      const score = p.scoreLines.length ? `, score at ${p.scoreLines.join(', ')}` : '';
      return { summary: `Piece “${p.name}”, ${bits.join(', ')}: ${p.size}${score}`, atMs: p.saidAtMs };
    }
    case 'supply': {
      const s = row.payload as SupplyProposalPayload;
      const qty = s.quantity ? `, ${s.quantity}` : '';
      const from = s.matched ? ' (as listed before, with its link)' : '';
      return { summary: `${SUPPLY_CATEGORY_LABELS[s.category]}: ${s.name}${qty}${from}`, atMs: s.saidAtMs };
    }
    default: {
      const d = row.payload as DraftProposalPayload;
      return { summary: `First draft of the write-up: ${d.steps.length} ${d.steps.length === 1 ? 'step' : 'steps'}, a still in each`, atMs: null };
    }
  }
}

/** One being made now is still shown as proposed (with "Being made now"). */
const shownState = (s: string): AssemblyState => (s === 'accepted' ? 'accepted' : s === 'dropped' ? 'dropped' : 'proposed');

export function presentProposal(item: AssemblyItem): AssemblyProposalDto {
  const { row, waiting } = item;
  const state = shownState(row.state);
  return { id: row.id, kind: row.kind, state, ...summary(item), payload: row.payload, madeId: row.madeId ?? null, waiting };
}

export function presentAssembly(view: AssemblyView, abilities: TutorialAbilities): AssemblyDto {
  const counts: Record<AssemblyState, number> = { proposed: 0, accepted: 0, dropped: 0 };
  for (const i of view.items) counts[shownState(i.row.state)]++;
  return {
    recordingId: view.recording?.id ?? null,
    processing: view.recording ? view.recording.status !== 'ready' && view.recording.status !== 'failed' : false,
    hasTranscript: view.hasTranscript,
    proposals: view.items.map(presentProposal),
    counts,
    notes: view.notes,
    abilities: { update: abilities.update },
  };
}
