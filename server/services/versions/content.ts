import { isDeepStrictEqual } from 'node:util';
import type { Transaction } from 'sequelize';
import { DEFAULT_DISCLOSURE } from '@shared/schemas/supply';
import { Article, Chapter, Material, PieceRow, Recording, Still, Supply, type Tutorial } from '../../models';
import type { VersionContent, VersionStill } from '../../models/tutorial-version';
import { storage } from '../storage';
import { EMPTY_DOC } from '../write-up';

/**
 * Runs the reads at once on the pool, or one after the other inside a transaction: a
 * transaction's queries share its one connection, and pg refuses overlapping queries on a client
 * (a deprecation warning now, an error from pg 9).
 */
async function together<T extends readonly (() => Promise<unknown>)[]>(
  transaction: Transaction | undefined,
  reads: T,
): Promise<{ -readonly [K in keyof T]: Awaited<ReturnType<T[K]>> }> {
  if (!transaction) return (await Promise.all(reads.map((read) => read()))) as never;
  const out: unknown[] = [];
  for (const read of reads) out.push(await read());
  return out as never;
}

/**
 * The draft's content in the shape a version keeps: what readers would see if it went out now.
 * Exports of a tutorial that is not published yet are rendered from this too, so a draft and a
 * version always reach the renderers through the same path (and compare like for like).
 */
export async function draftContent(tutorial: Tutorial, transaction?: Transaction): Promise<VersionContent> {
  const t = { transaction };
  const where = { tutorialId: tutorial.id };
  const [article, pieces, materials, supplies, recording] = await together(transaction, [
    () => Article.findByPk(tutorial.id, t),
    () =>
      PieceRow.findAll({
        where,
        order: [
          ['position', 'ASC'],
          ['createdAt', 'ASC'],
        ],
        ...t,
      }),
    () => Material.findAll({ where, order: [['name', 'ASC']], ...t }),
    () =>
      Supply.findAll({
        where,
        order: [
          ['position', 'ASC'],
          ['createdAt', 'ASC'],
        ],
        ...t,
      }),
    () => Recording.findOne({ where, order: [['createdAt', 'DESC']], attributes: ['id'], ...t }),
  ] as const);
  const [chapters, stills] = recording
    ? await together(transaction, [
        () => Chapter.findAll({ where: { recordingId: recording.id }, order: [['startMs', 'ASC']], ...t }),
        () => Still.findAll({ where: { recordingId: recording.id }, order: [['atMs', 'ASC']], ...t }),
      ] as const)
    : [[], []];
  const sponsored = supplies.some((s) => s.sponsored && s.url);
  return {
    format: 1,
    title: tutorial.title,
    videoUrl: tutorial.videoUrl ?? null,
    precision: tutorial.precision,
    disclosure: sponsored ? (tutorial.disclosure ?? DEFAULT_DISCLOSURE) : null,
    doc: article?.doc ?? EMPTY_DOC,
    pieces: pieces.map((p) => ({
      id: p.id,
      name: p.name,
      material: p.material,
      quantity: p.quantity,
      shape: p.shape,
      params: p.params,
      grain: p.grain,
      width: p.width,
      height: p.height,
      scoreLines: p.scoreLines,
      matOnId: p.matOnId ?? null,
      notes: p.notes,
    })),
    materials: materials.map((m) => ({
      id: m.id,
      name: m.name,
      kind: m.kind,
      sheetWidth: m.sheetWidth,
      sheetHeight: m.sheetHeight,
      rotate: m.rotate,
      grain: m.grain,
    })),
    supplies: supplies.map((s) => ({
      id: s.id,
      category: s.category,
      name: s.name,
      quantity: s.quantity,
      note: s.note,
      url: s.url ?? null,
      sponsored: s.sponsored,
      discountCode: s.discountCode ?? null,
    })),
    chapters: chapters.map((c) => ({ id: c.id, title: c.title, startMs: c.startMs })),
    stills: stills.map((s) => ({ id: s.id, atMs: s.atMs, caption: s.caption, alt: s.alt, width: s.width, height: s.height, fileKey: s.fileKey })),
  };
}

/** Where a version keeps its copy of a still: one copy per still, shared by every version (a still's image never changes). */
export const versionStillKey = (tutorialId: string, stillId: string) => `versions/${tutorialId}/stills/${stillId}.jpg`;

/**
 * The content with each still pointing at the version's own copy, made when missing. A still
 * whose image is already gone is left out (the renderers drop a photo they have no file for).
 * Through the storage interface, so it works the same on another store.
 */
export async function withOwnStills(tutorialId: string, content: VersionContent): Promise<VersionContent> {
  const stills: VersionStill[] = [];
  for (const s of content.stills) {
    const key = versionStillKey(tutorialId, s.id);
    if (s.fileKey !== key && !(await storage.exists(key))) {
      if (!(await storage.exists(s.fileKey))) continue;
      await storage.put(key, await storage.read(s.fileKey), 'image/jpeg');
    }
    stills.push({ ...s, fileKey: key });
  }
  return { ...content, stills };
}

/**
 * Whether two contents show readers the same thing. Still files are compared by still, not by
 * where the copy lives; JSONB does not keep key order, which a deep comparison ignores.
 */
export function sameContent(a: VersionContent, b: VersionContent): boolean {
  const plain = (c: VersionContent) => ({ ...c, stills: c.stills.map(({ fileKey: _f, ...s }) => s) });
  return isDeepStrictEqual(JSON.parse(JSON.stringify(plain(a))), JSON.parse(JSON.stringify(plain(b))));
}
