import { z } from 'zod';

/** Video containers Cardwright takes, by the signature file-type reads (not the name). */
export const VIDEO_TYPES: Record<string, string> = {
  'video/mp4': 'mp4',
  'video/quicktime': 'mov',
  'video/webm': 'webm',
  'video/x-matroska': 'mkv',
  'video/x-m4v': 'm4v',
};
export const VIDEO_EXTENSIONS = ['mp4', 'mov', 'webm', 'mkv', 'm4v'];

const ms = z
  .number()
  .int('Use whole milliseconds')
  .min(0, 'Times start at 0:00')
  .max(24 * 3600_000, 'Keep times under 24 hours');

export const createStillSchema = z.object({ atMs: ms, mode: z.enum(['exact', 'sharpest']).default('exact') });
export type CreateStillInput = z.infer<typeof createStillSchema>;
export const updateStillSchema = z
  .object({ caption: z.string().max(500, 'Keep the caption under 500 characters'), alt: z.string().max(500, 'Keep the alt text under 500 characters') })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');

export const createChapterSchema = z.object({ title: z.string().trim().min(1, 'Name the chapter').max(120), startMs: ms });
export const updateChapterSchema = createChapterSchema.partial().refine((v) => Object.keys(v).length > 0, 'Nothing to change');
export type CreateChapterInput = z.input<typeof createChapterSchema>;
export type UpdateChapterInput = z.input<typeof updateChapterSchema>;

export const cueSearchQuery = z.object({ q: z.string().trim().max(200).optional() });

// Response shapes (DTOs): the server's presenters return them, the client reads them.

export type RecordingStatus = 'uploaded' | 'processing' | 'ready' | 'failed';

/** Sprite sheets of scrub thumbnails: tile i is tile i % perSheet of sheet floor(i / perSheet). */
export type ThumbnailSheetsDto = {
  sheets: string[];
  atMs: number[];
  columns: number;
  rows: number;
  perSheet: number;
  tileWidth: number;
  tileHeight: number;
};

/** A recording as the API sends it; media URLs carry a version so browsers refetch new files. */
export type RecordingDto = {
  id: string;
  tutorialId: string;
  originalName: string;
  sizeBytes: number;
  mime: string;
  status: RecordingStatus;
  progress: number;
  stage: string | null;
  error: string | null;
  durationMs: number | null;
  width: number | null;
  height: number | null;
  frameRate: number | null;
  videoCodec: string | null;
  audioCodec: string | null;
  hasAudio: boolean | null;
  previewUrl: string | null;
  posterUrl: string | null;
  thumbnails: ThumbnailSheetsDto | null;
  transcript: { name: string; format: string | null } | null;
  createdAt: string;
  updatedAt: string;
  /** Only the single-recording read carries the caller's abilities. */
  abilities?: { update: boolean };
};

/** GET /tutorials/:id/recordings. */
export type RecordingsDto = { recordings: RecordingDto[] };

/** POST /recordings/:id/transcript. */
/** `notices`: what the reader skipped or kept with a note, each starting "line N: ". */
export type TranscriptImportDto = { format: string; cueCount: number; name: string; notices: string[] };

export type CueDto = { id: string; position: number; startMs: number; endMs: number; text: string };
export type ChapterDto = { id: string; recordingId: string; title: string; startMs: number };
export type ChapterSuggestionDto = { startMs: number; title: string; phrase: string; cueText: string };

/** A still with its image URL. */
export type StillDto = {
  id: string;
  recordingId: string;
  atMs: number;
  requestedMs: number;
  mode: 'exact' | 'sharpest';
  width: number;
  height: number;
  sharpness: number | null;
  caption: string;
  alt: string;
  url: string;
  createdAt: string;
};

/** GET /recordings/:id/cues. */
export type CuesDto = { cues: CueDto[] };
/** GET /recordings/:id/chapters. */
export type ChaptersDto = { chapters: ChapterDto[] };
/** GET /recordings/:id/chapter-suggestions. */
export type ChapterSuggestionsDto = { suggestions: ChapterSuggestionDto[] };
/** GET /recordings/:id/stills. */
export type StillsDto = { stills: StillDto[] };
