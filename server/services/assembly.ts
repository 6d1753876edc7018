import { Op } from 'sequelize';
import type {
  AssemblyKind,
  AssemblyPayload,
  AssemblyState,
  ChapterProposalPayload,
  DraftProposalPayload,
  PieceProposalPayload,
  StillProposalPayload,
  SupplyProposalPayload,
} from '@shared/schemas/assembly';
import { ACCEPTING, ASSEMBLY_KINDS } from '@shared/schemas/assembly';
import { formatLength } from '@shared/measure';
import { matchEarlierSupply, suppliesSaid } from '@shared/mentions/supplies-said';
import { AssemblyProposal, Chapter, Cue, PieceRow, type Recording, Still, Supply, Tutorial, type User } from '../models';
import type { DocJson } from '../models/article';
import { ConflictError, InvalidInputError } from '../lib/errors';
import { chapterSuggestions, newestRecording } from './recordings';
import { makePiecesFromMentions, toGoThrough, tutorialMentions } from './cut-list';
import { pullStill, removeStill } from './stills';
import { addSupply } from './supplies';
import { draftFor, getArticle, isEmptyDoc, saveArticle } from './write-up';

/** A proposal as the service hands it to the presenter: the row and why it cannot be accepted yet. */
export type AssemblyItem = { row: AssemblyProposal; waiting: string | null };
export type AssemblyView = { recording: Recording | null; hasTranscript: boolean; items: AssemblyItem[]; notes: string[] };

/** A chapter's times: from its start to the next chapter's start, or the end of the video. */
type Span = { title: string; startMs: number; toMs: number };

const KIND_ORDER = new Map(ASSEMBLY_KINDS.map((k, i) => [k, i]));
const SAME_CHAPTER_MS = 2000;

function spans(chapters: readonly { title: string; startMs: number }[], endMs: number | null): Span[] {
  const sorted = [...chapters].sort((a, b) => a.startMs - b.startMs);
  return sorted.map((c, i) => ({ title: c.title, startMs: c.startMs, toMs: sorted[i + 1]?.startMs ?? endMs ?? Number.MAX_SAFE_INTEGER }));
}

/** The recording and transcript the assembly reads; 409 in words when either is missing. */
async function talkOf(tutorial: Tutorial) {
  const recording = await newestRecording(tutorial.id);
  if (!recording) throw new ConflictError('Upload the recording in Footage first: the assembly reads its transcript');
  const cues = await Cue.findAll({ where: { recordingId: recording.id }, order: [['position', 'ASC']], attributes: ['startMs', 'endMs', 'text'] });
  if (cues.length === 0) throw new ConflictError('Attach the transcript in Footage first: chapters, pieces and supplies are read from the talk');
  return { recording, cues };
}

/** The supplies the studio listed for its other tutorials, newest first: a supply said again is matched to them. */
function earlierSupplies(tutorial: Tutorial) {
  return Supply.findAll({
    include: [{ model: Tutorial, as: 'tutorial', attributes: [], where: { studioId: tutorial.studioId }, required: true }],
    where: { tutorialId: { [Op.ne]: tutorial.id } },
    order: [['updatedAt', 'DESC']],
    limit: 2000,
  });
}

type NewProposal = { kind: AssemblyKind; sourceKey: string; payload: AssemblyPayload };

/**
 * "Assemble the tutorial": proposes, from the talk, the chapters (cue phrases), a still inside each
 * chapter, a finished piece from every size said, the supplies named (matched to the studio's
 * earlier ones) and the first draft. Nothing already made or already proposed (accepted, dropped
 * or waiting) is proposed again, so running it twice adds nothing.
 */
export async function runAssembly(tutorial: Tutorial): Promise<{ added: number; notes: string[] }> {
  const { recording, cues } = await talkOf(tutorial);
  const notes: string[] = [];
  const [chapters, suggested, stills, mentions, supplies, earlier, article, existing] = await Promise.all([
    Chapter.findAll({ where: { recordingId: recording.id }, attributes: ['title', 'startMs'] }),
    chapterSuggestions(recording),
    Still.findAll({ where: { recordingId: recording.id }, attributes: ['atMs'] }),
    tutorialMentions(tutorial),
    Supply.findAll({ where: { tutorialId: tutorial.id }, attributes: ['name'] }),
    earlierSupplies(tutorial),
    getArticle(tutorial),
    AssemblyProposal.findAll({ where: { tutorialId: tutorial.id } }),
  ]);
  const proposedChapters = existing.filter((p) => p.kind === 'chapter' && p.state !== 'dropped').map((p) => p.payload as ChapterProposalPayload);
  const out: NewProposal[] = [];

  for (const s of suggested) out.push({ kind: 'chapter', sourceKey: String(s.startMs), payload: { title: s.title, startMs: s.startMs } });

  // A still per chapter, kept or about to be: the chapters there are, those proposed before and now.
  const all = [...chapters.map((c) => ({ title: c.title, startMs: c.startMs }))];
  for (const c of [...proposedChapters, ...out.map((p) => p.payload as ChapterProposalPayload)])
    if (!all.some((a) => Math.abs(a.startMs - c.startMs) < SAME_CHAPTER_MS)) all.push(c);
  for (const span of spans(all, recording.durationMs)) {
    if (stills.some((s) => s.atMs >= span.startMs && s.atMs < span.toMs)) continue;
    out.push({ kind: 'still', sourceKey: String(span.startMs), payload: { chapterTitle: span.title, chapterStartMs: span.startMs } });
  }

  for (const m of mentions.mentions) {
    if (!m.proposal || !toGoThrough(m)) continue;
    const p = m.proposal;
    const size = p.shape === 'circle' ? `a circle ${formatLength(p.width)} across` : `${formatLength(p.width)} × ${formatLength(p.height)}`;
    const payload: PieceProposalPayload = {
      mentionKey: m.key,
      name: p.name,
      material: p.material,
      quantity: p.quantity,
      size,
      scoreLines: p.scoreLines.map((s) => formatLength(s.at)),
      saidAtMs: m.startMs,
    };
    out.push({ kind: 'piece', sourceKey: m.key, payload });
  }

  const have = new Set(supplies.map((s) => s.name.toLowerCase()));
  for (const said of suppliesSaid(cues)) {
    const match = matchEarlierSupply(said, earlier);
    const name = match?.name ?? said.name;
    if (have.has(name.toLowerCase()) || have.has(said.name.toLowerCase())) continue;
    have.add(name.toLowerCase());
    const payload: SupplyProposalPayload = {
      name,
      category: match?.category ?? said.category,
      quantity: said.quantity || match?.quantity || '',
      note: match?.note || said.caution || '',
      url: match?.url ?? null,
      sponsored: match?.sponsored ?? false,
      discountCode: match?.discountCode ?? null,
      matched: match?.name ?? null,
      saidAtMs: said.saidAtMs,
    };
    out.push({ kind: 'supply', sourceKey: said.name.toLowerCase(), payload });
  }

  if (isEmptyDoc(article.doc)) {
    const steps = spans(all, recording.durationMs).map((s) => s.title);
    out.push({ kind: 'draft', sourceKey: 'draft', payload: { steps } satisfies DraftProposalPayload });
  } else if (!existing.some((p) => p.kind === 'draft')) {
    notes.push('The write-up already has text, so no first draft is proposed; Write-up → First draft makes one if you want it.');
  }

  const known = new Set(existing.map((p) => `${p.kind}\u0000${p.sourceKey}`));
  const fresh = out.filter((p) => !known.has(`${p.kind}\u0000${p.sourceKey}`));
  let position = existing.reduce((n, p) => Math.max(n, p.position + 1), 0);
  // ON CONFLICT DO NOTHING: two runs at once still propose each thing once (the key is unique).
  await AssemblyProposal.bulkCreate(
    fresh.map((p) => ({ ...p, tutorialId: tutorial.id, position: position++ })),
    { ignoreDuplicates: true },
  );
  return { added: fresh.length, notes };
}

/** Why a still proposal cannot be made yet, or null: the video must be read and its chapter kept. */
function stillWaiting(recording: Recording | null, chapters: readonly { startMs: number }[], p: StillProposalPayload): string | null {
  if (!recording || recording.durationMs === null) return 'Waits for the video to be read (a moment after the upload)';
  if (!chapters.some((c) => Math.abs(c.startMs - p.chapterStartMs) < SAME_CHAPTER_MS)) return 'Accept its chapter first';
  return null;
}

/** The tutorial's proposals in the order they are accepted (chapters, stills, pieces, supplies, draft), each with why it must wait. */
export async function loadAssembly(tutorial: Tutorial, notes: string[] = []): Promise<AssemblyView> {
  const recording = await newestRecording(tutorial.id);
  const [rows, chapters, cueCount] = await Promise.all([
    AssemblyProposal.findAll({ where: { tutorialId: tutorial.id } }),
    recording ? Chapter.findAll({ where: { recordingId: recording.id }, attributes: ['startMs'] }) : Promise.resolve([]),
    recording ? Cue.count({ where: { recordingId: recording.id } }) : Promise.resolve(0),
  ]);
  rows.sort((a, b) => KIND_ORDER.get(a.kind)! - KIND_ORDER.get(b.kind)! || a.position - b.position);
  const items = rows.map((row) => ({
    row,
    waiting:
      row.state === ACCEPTING
        ? 'Being made now'
        : row.state === 'proposed' && row.kind === 'still'
          ? stillWaiting(recording, chapters, row.payload as StillProposalPayload)
          : null,
  }));
  return { recording, hasTranscript: cueCount > 0, items, notes };
}

/** The rows chosen, or every proposal in the given state when none are named; 400 for an id not of this tutorial. */
async function chosen(tutorial: Tutorial, ids: string[] | undefined, states: AssemblyState[]): Promise<AssemblyProposal[]> {
  const rows = await AssemblyProposal.findAll({ where: { tutorialId: tutorial.id, ...(ids ? { id: ids } : { state: states }) } });
  if (ids && rows.length !== new Set(ids).size)
    throw new InvalidInputError(
      [{ path: 'ids', message: 'Not a proposal of this tutorial' }],
      'Some of those proposals are not in this tutorial; reload the list',
    );
  return rows.sort((a, b) => KIND_ORDER.get(a.kind)! - KIND_ORDER.get(b.kind)! || a.position - b.position);
}

type Outcome = { state: AssemblyState; madeId?: string | null; undo?: Record<string, unknown> | null } | { wait: string };

/** Makes what one proposal proposes. */
async function acceptOne(tutorial: Tutorial, user: User, p: AssemblyProposal): Promise<Outcome> {
  const recording = await newestRecording(tutorial.id);
  if (p.kind === 'chapter') {
    const c = p.payload as ChapterProposalPayload;
    if (!recording) return { wait: 'The recording is gone' };
    const near = await Chapter.findOne({
      where: { recordingId: recording.id, startMs: { [Op.between]: [c.startMs - SAME_CHAPTER_MS + 1, c.startMs + SAME_CHAPTER_MS - 1] } },
    });
    if (near) return { state: 'accepted', madeId: null };
    const made = await Chapter.create({ recordingId: recording.id, title: c.title, startMs: c.startMs });
    return { state: 'accepted', madeId: made.id };
  }
  if (p.kind === 'still') {
    const s = p.payload as StillProposalPayload;
    const chapters = recording ? await Chapter.findAll({ where: { recordingId: recording.id }, attributes: ['startMs', 'title'] }) : [];
    const waiting = stillWaiting(recording, chapters, s);
    if (waiting || !recording) return { wait: waiting ?? 'The recording is gone' };
    const span = spans(chapters, recording.durationMs).find((x) => Math.abs(x.startMs - s.chapterStartMs) < SAME_CHAPTER_MS)!;
    // The sharpest frame inside the chapter: around its middle, at most 2 s either side, never outside it.
    const length = Math.max(0, Math.min(span.toMs, recording.durationMs!) - span.startMs);
    const mid = span.startMs + Math.floor(length / 2);
    const still = await pullStill(recording, mid, 'sharpest', {
      windowMs: Math.min(2000, Math.floor(length / 2)),
      within: { fromMs: span.startMs, toMs: span.startMs + length },
      alt: span.title,
    });
    return { state: 'accepted', madeId: still.id };
  }
  if (p.kind === 'piece') {
    const x = p.payload as PieceProposalPayload;
    try {
      const made = await makePiecesFromMentions(tutorial, { keys: [x.mentionKey] });
      return { state: 'accepted', madeId: made.made[0]?.id ?? null };
    } catch (e) {
      // Made by hand meanwhile, or no longer said: nothing to make, so it is set aside.
      if (e instanceof ConflictError || e instanceof InvalidInputError) return { state: 'dropped' };
      throw e;
    }
  }
  if (p.kind === 'supply') {
    const x = p.payload as SupplyProposalPayload;
    const dup = await Supply.findOne({ where: { tutorialId: tutorial.id, name: { [Op.iLike]: x.name.replace(/[\\%_]/g, '\\$&') } } });
    if (dup) return { state: 'accepted', madeId: null };
    const made = await addSupply(tutorial, {
      category: x.category,
      name: x.name,
      quantity: x.quantity,
      note: x.note,
      url: x.url ?? undefined,
      sponsored: x.sponsored,
      discountCode: x.discountCode ?? undefined,
    });
    return { state: 'accepted', madeId: made.id };
  }
  // the first draft, from the chapters and stills there are now; the write-up before it is kept for undo
  const before = await getArticle(tutorial);
  const doc = await draftFor(tutorial);
  const saved = await saveArticle({ tutorial, user, doc, version: before.version, note: 'First draft from “Assemble the tutorial”', newRevision: true });
  return { state: 'accepted', madeId: null, undo: { previousDoc: before.doc, versionAfter: saved.version } };
}

/**
 * Accepts proposals: the chosen ones, or all still proposed, in order (chapters before their
 * stills, the draft last, so it places the stills). A still that must wait for the video stays
 * proposed and says so; when accepting all, the draft then waits for the stills too.
 */
export async function acceptProposals(tutorial: Tutorial, user: User, ids?: string[]): Promise<string[]> {
  const rows = (await chosen(tutorial, ids, ['proposed'])).filter((r) => r.state === 'proposed');
  const notes: string[] = [];
  let stillsWaiting = 0;
  for (const row of rows) {
    const stillsPending =
      row.kind === 'draft' && !ids ? await AssemblyProposal.count({ where: { tutorialId: tutorial.id, kind: 'still', state: ['proposed', ACCEPTING] } }) : 0;
    if (row.kind === 'draft' && !ids && (stillsWaiting > 0 || stillsPending > 0)) {
      notes.push('The first draft waits for its stills; accept it once the video is read, or now from its own button.');
      continue;
    }
    // Claim it first, so two choices at once (a double click, two tabs) never make the same thing twice.
    const [claimed] = await AssemblyProposal.update({ state: ACCEPTING }, { where: { id: row.id, state: 'proposed' } });
    if (claimed === 0) continue;
    let outcome: Outcome;
    try {
      outcome = await acceptOne(tutorial, user, row);
    } catch (e) {
      await AssemblyProposal.update({ state: 'proposed' }, { where: { id: row.id } });
      throw e;
    }
    if ('wait' in outcome) {
      await AssemblyProposal.update({ state: 'proposed' }, { where: { id: row.id } });
      if (row.kind === 'still') stillsWaiting++;
      continue;
    }
    if (outcome.state === 'dropped') notes.push(`“${(row.payload as PieceProposalPayload).name}” was already in the cut list, so it was set aside.`);
    await row.update({ state: outcome.state, madeId: outcome.madeId ?? null, undo: outcome.undo ?? null });
  }
  if (stillsWaiting > 0)
    notes.push(
      `${stillsWaiting} ${stillsWaiting === 1 ? 'still waits' : 'stills wait'} for the video to be read; accept ${stillsWaiting === 1 ? 'it' : 'them'} in a moment.`,
    );
  return notes;
}

/** Drops proposals (the chosen ones, or all still proposed): nothing is made, and a later run does not propose them again. */
export async function dropProposals(tutorial: Tutorial, ids?: string[]): Promise<void> {
  for (const row of await chosen(tutorial, ids, ['proposed'])) if (row.state === 'proposed') await row.update({ state: 'dropped' });
}

/** Takes back what accepting made (the chapter, still, piece, supply, or the draft over the write-up), or a drop; the proposal is proposed again. */
export async function undoProposals(tutorial: Tutorial, user: User, ids: string[]): Promise<void> {
  const rows = await chosen(tutorial, ids, []);
  // Undo in the reverse order of accepting: the draft before the stills it placed.
  for (const row of rows.reverse()) {
    if (row.state === 'accepted') await unmake(tutorial, user, row);
    if (row.state !== 'proposed') await row.update({ state: 'proposed', madeId: null, undo: null });
  }
}

async function unmake(tutorial: Tutorial, user: User, row: AssemblyProposal): Promise<void> {
  if (row.kind === 'draft') {
    const undo = row.undo as { previousDoc: DocJson; versionAfter: number } | null;
    const now = await getArticle(tutorial);
    if (!undo) return;
    if (now.version !== undo.versionAfter)
      throw new ConflictError('The write-up was changed after the draft was put in; restore an earlier version from its history instead', { code: 'edited' });
    await saveArticle({ tutorial, user, doc: undo.previousDoc, version: now.version, note: 'Assembled first draft taken back', newRevision: true });
    return;
  }
  if (!row.madeId) return;
  if (row.kind === 'chapter') await Chapter.destroy({ where: { id: row.madeId } });
  if (row.kind === 'piece') await PieceRow.destroy({ where: { id: row.madeId, tutorialId: tutorial.id } });
  if (row.kind === 'supply') await Supply.destroy({ where: { id: row.madeId, tutorialId: tutorial.id } });
  if (row.kind === 'still') {
    const still = await Still.findByPk(row.madeId);
    if (still) await removeStill(still);
  }
}
