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

const ms = z.number().int('Use whole milliseconds').min(0, 'Times start at 0:00').max(24 * 3600_000, 'Keep times under 24 hours');

export const createStillSchema = z.object({ atMs: ms, mode: z.enum(['exact', 'sharpest']).default('exact') });
export type CreateStillInput = z.infer<typeof createStillSchema>;
export const updateStillSchema = z
  .object({ caption: z.string().max(500, 'Keep the caption under 500 characters'), alt: z.string().max(500, 'Keep the alt text under 500 characters') })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');

export const createChapterSchema = z.object({ title: z.string().trim().min(1, 'Name the chapter').max(120), startMs: ms });
export const updateChapterSchema = createChapterSchema.partial().refine((v) => Object.keys(v).length > 0, 'Nothing to change');

export const cueSearchQuery = z.object({ q: z.string().trim().max(200).optional() });
