import { readFile, unlink } from 'node:fs/promises';
import { randomUUID } from 'node:crypto';
import { fileTypeFromBuffer } from 'file-type';
import { Op, type FindAttributeOptions } from 'sequelize';
import { VIDEO_TYPES, type createChapterSchema, type TranscriptImportDto, type updateChapterSchema } from '@shared/schemas/footage';
import { parseUsableTranscript, TranscriptParseError, type ParsedTranscript } from '@shared/transcript/parse';
import { suggestChapters } from '@shared/footage/suggest-chapters';
import { fileKindWords, notAVideoMessage } from '@shared/footage/file-kind';
import type { z } from 'zod';
import { Chapter, Cue, Recording, sequelize, type User } from '../models';
import { fieldError, UnprocessableError, UnsupportedTypeError } from '../lib/errors';
import { containsPattern } from '../lib/like';
import { enqueueRecording } from '../jobs';
import { recordingKey } from '../jobs/process-recording';
import { storage, type ScratchFile, type StoredUpload, type UploadPlace } from './storage';

/** A tutorial's recordings, newest first. */
export function listRecordings(tutorialId: string): Promise<Recording[]> {
  return Recording.findAll({ where: { tutorialId }, order: [['createdAt', 'DESC']] });
}

/** The tutorial's newest recording (the one the cut list's mentions, the draft and exports use), or null. */
export function newestRecording(tutorialId: string, attributes?: FindAttributeOptions): Promise<Recording | null> {
  return Recording.findOne({ where: { tutorialId }, order: [['createdAt', 'DESC']], ...(attributes ? { attributes } : {}) });
}

const removeScratch = (file: ScratchFile) => unlink(file.path).catch(() => {});

/** C0 control codes other than tab, line feed, vertical tab, form feed and carriage return. */
const isControlByte = (code: number) => code <= 0x08 || (code >= 0x0e && code <= 0x1f);

/** True when the file's first 4 KB read as UTF-8 text with no control bytes but tabs and line ends. */
function looksLikeText(head: Buffer): boolean {
  if (head.length === 0) return false;
  // a cut in the middle of a multi-byte character at the end is not a reason to call it binary
  const text = new TextDecoder('utf-8', { fatal: false }).decode(head.subarray(0, 4096));
  const bad = [...text].filter((ch) => ch === '\uFFFD' || isControlByte(ch.charCodeAt(0))).length;
  return bad <= 1;
}

/**
 * Where an upload for a new recording goes, from its first bytes: the kind is read from the file's
 * signature, not its name, and anything but a video is refused with 415 before a byte is stored.
 */
export function recordingUpload(id: string = randomUUID()): { id: string; place: UploadPlace } {
  return {
    id,
    async place(head, originalName) {
      const type = await fileTypeFromBuffer(head).catch(() => undefined);
      const ext = type && VIDEO_TYPES[type.mime];
      if (!type || !ext) {
        const kind = fileKindWords({ mime: type?.mime, ext: type?.ext }) ?? (looksLikeText(head) ? 'text' : null);
        throw new UnsupportedTypeError(notAVideoMessage(originalName, kind));
      }
      return { key: recordingKey(id, `source.${ext}`), contentType: type.mime };
    },
  };
}

/** Keeps a stored upload as a recording of the tutorial and queues its processing. */
export async function addRecording(o: { id: string; tutorialId: string; uploadedBy: User; upload: StoredUpload }): Promise<Recording> {
  const rec = Recording.build({
    id: o.id,
    tutorialId: o.tutorialId,
    uploadedById: o.uploadedBy.id,
    originalName: o.upload.originalName.slice(0, 255),
    mime: o.upload.contentType,
    sizeBytes: o.upload.size,
    sourceKey: o.upload.key,
  });
  try {
    await rec.save();
    await enqueueRecording(rec.id);
  } catch (e) {
    await storage.remove(`recordings/${rec.id}`);
    await Recording.destroy({ where: { id: rec.id } });
    throw e;
  }
  return rec;
}

/** Deletes a recording with its files (chapters, cues and stills go with the row). */
export async function removeRecording(recording: Recording): Promise<void> {
  await recording.destroy();
  await storage.remove(`recordings/${recording.id}`);
}

/**
 * Reads an uploaded transcript (WebVTT, SRT or timed lines) and replaces the recording's cues in
 * one transaction, so a refused file (422 with the line number) keeps the previous transcript.
 */
export async function importTranscript(recording: Recording, file: ScratchFile): Promise<TranscriptImportDto> {
  const bytes = await readFile(file.path);
  await removeScratch(file);
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new UnprocessableError('The transcript is not UTF-8 text; save it as plain text (UTF-8) and upload it again', { line: null });
  }
  let parsed: ParsedTranscript;
  try {
    parsed = parseUsableTranscript(text);
  } catch (e) {
    if (e instanceof TranscriptParseError) throw new UnprocessableError(e.message, { line: e.line });
    throw e;
  }
  const recordingId = recording.id;
  await sequelize.transaction(async (transaction) => {
    await Cue.destroy({ where: { recordingId }, transaction });
    await Cue.bulkCreate(
      parsed.cues.map((c, i) => ({ recordingId, position: i, startMs: c.startMs, endMs: c.endMs, text: c.text, identifier: c.identifier ?? null })),
      { transaction },
    );
    await Recording.update({ transcriptName: file.originalName.slice(0, 255), transcriptFormat: parsed.format }, { where: { id: recordingId }, transaction });
  });
  // what the reader skipped or kept with a note (a title line, a cue the WebVTT parser drops), in words with lines
  return { format: parsed.format, cueCount: parsed.cues.length, name: file.originalName, notices: (parsed.notices ?? []).map((n) => n.message) };
}

/** Removes the transcript and its cues. */
export async function removeTranscript(recording: Recording): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await Cue.destroy({ where: { recordingId: recording.id }, transaction });
    await recording.update({ transcriptName: null, transcriptFormat: null }, { transaction });
  });
}

/** The transcript's cues in order, or those containing `q` (any case). */
export function findCues(recordingId: string, q?: string) {
  const where = q ? { recordingId, text: { [Op.iLike]: containsPattern(q) } } : { recordingId };
  return Cue.findAll({ where, order: [['position', 'ASC']], attributes: ['id', 'position', 'startMs', 'endMs', 'text'] });
}

/** A recording's chapters in time order. */
export function listChapters(recordingId: string): Promise<Chapter[]> {
  return Chapter.findAll({ where: { recordingId }, order: [['startMs', 'ASC']] });
}

/** Chapter titles taken from the talk; one within 2 s of an existing chapter is already taken. */
export async function chapterSuggestions(recording: Recording) {
  const [cues, chapters] = await Promise.all([
    Cue.findAll({ where: { recordingId: recording.id }, order: [['position', 'ASC']], attributes: ['startMs', 'text'] }),
    Chapter.findAll({ where: { recordingId: recording.id }, attributes: ['startMs'] }),
  ]);
  const taken = chapters.map((c) => c.startMs);
  return suggestChapters(cues).filter((s) => !taken.some((t) => Math.abs(t - s.startMs) < 2000));
}

/** 400 when a time lies after the end of the video (a video still being read has no end yet). */
export function checkWithinVideo(recording: Recording, field: string, atMs: number | undefined): void {
  if (atMs !== undefined && recording.durationMs !== null && atMs > recording.durationMs) {
    throw fieldError(field, 'That time is after the end of the video', 'After the end of the video');
  }
}

/** Marks a chapter. */
export async function addChapter(recording: Recording, input: z.output<typeof createChapterSchema>): Promise<Chapter> {
  checkWithinVideo(recording, 'startMs', input.startMs);
  return Chapter.create({ recordingId: recording.id, title: input.title, startMs: input.startMs });
}

/** Renames or retimes a chapter. */
export async function updateChapter(recording: Recording, chapter: Chapter, input: z.output<typeof updateChapterSchema>): Promise<Chapter> {
  checkWithinVideo(recording, 'startMs', input.startMs);
  return chapter.update(input);
}

/** Removes one chapter. */
export async function deleteChapter(chapter: Chapter): Promise<void> {
  await chapter.destroy();
}
