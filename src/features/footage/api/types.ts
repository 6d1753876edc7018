export type RecordingStatus = 'uploaded' | 'processing' | 'ready' | 'failed';

/** Sprite sheets of scrub thumbnails: tile i is tile i % perSheet of sheet floor(i / perSheet). */
export type ThumbnailSheets = {
  sheets: string[];
  atMs: number[];
  columns: number;
  rows: number;
  perSheet: number;
  tileWidth: number;
  tileHeight: number;
};

export type Recording = {
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
  thumbnails: ThumbnailSheets | null;
  transcript: { name: string; format: string | null } | null;
  createdAt: string;
  updatedAt: string;
  /** Only the single-recording read carries the caller's abilities. */
  abilities?: { update: boolean };
};

export type Cue = { id: string; position: number; startMs: number; endMs: number; text: string };
export type Chapter = { id: string; recordingId: string; title: string; startMs: number };
export type ChapterSuggestion = { startMs: number; title: string; phrase: string; cueText: string };
export type Still = {
  id: string;
  recordingId: string;
  atMs: number;
  requestedMs: number;
  mode: 'exact' | 'sharpest';
  width: number;
  height: number;
  sharpness: number | null;
  caption: string | null;
  alt: string | null;
  url: string;
  createdAt: string;
};
