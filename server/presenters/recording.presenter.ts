import type { ChapterDto, CueDto, RecordingDto, StillDto } from '@shared/schemas/footage';
import type { Chapter, Cue, Recording, Still } from '../models';
import { recordingMediaBase, stillUrl } from '../lib/media-urls';

const v = (d: Date) => d.getTime().toString(36);

/** The recording as the API shows it; media URLs carry a version so browsers refetch new files. */
export function presentRecording(r: Recording): RecordingDto {
  const base = recordingMediaBase(r.id);
  return {
    id: r.id,
    tutorialId: r.tutorialId,
    originalName: r.originalName,
    sizeBytes: r.sizeBytes,
    mime: r.mime,
    status: r.status,
    progress: r.progress,
    stage: r.stage,
    error: r.error,
    durationMs: r.durationMs,
    width: r.width,
    height: r.height,
    frameRate: r.frameRate,
    videoCodec: r.videoCodec,
    audioCodec: r.audioCodec,
    hasAudio: r.hasAudio,
    previewUrl: r.previewKey ? `${base}/preview.mp4?v=${v(r.updatedAt)}` : null,
    posterUrl: r.posterKey ? `${base}/poster.jpg?v=${v(r.updatedAt)}` : null,
    thumbnails: r.thumbnails
      ? {
          sheets: r.thumbnails.keys.map((k) => `${base}/thumbs/${k.split('/').pop()}`),
          atMs: r.thumbnails.atMs,
          columns: r.thumbnails.columns,
          rows: r.thumbnails.rows,
          perSheet: r.thumbnails.perSheet,
          tileWidth: r.thumbnails.tileWidth,
          tileHeight: r.thumbnails.tileHeight,
        }
      : null,
    transcript: r.transcriptName ? { name: r.transcriptName, format: r.transcriptFormat } : null,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
  };
}

/** A still with its image URL. */
export function presentStill(s: Still): StillDto {
  return {
    id: s.id,
    recordingId: s.recordingId,
    atMs: s.atMs,
    requestedMs: s.requestedMs,
    mode: s.mode,
    width: s.width,
    height: s.height,
    sharpness: s.sharpness,
    caption: s.caption,
    alt: s.alt,
    url: stillUrl(s.id),
    createdAt: s.createdAt.toISOString(),
  };
}

export const presentChapter = (c: Chapter): ChapterDto => ({ id: c.id, recordingId: c.recordingId, title: c.title, startMs: c.startMs });

export const presentCue = (c: Cue): CueDto => ({ id: c.id, position: c.position, startMs: c.startMs, endMs: c.endMs, text: c.text });
