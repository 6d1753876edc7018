import { queryOptions } from '@tanstack/react-query';
import type { CutListDto } from '@shared/schemas/piece';
import type { SuppliesDto, SupplyChecksDto } from '@shared/schemas/supply';
import type { RecordingsDto, StillsDto } from '@shared/schemas/footage';
import { api } from './api-client';

/**
 * Reads that more than one feature shows (a tutorial's pieces, supplies, recordings; a
 * recording's stills), keyed by resource rather than by feature. The Cut list section and the
 * write-up's live table read the same `['tutorials', id, 'pieces']` entry, so an edit in one is
 * what the other shows, with no refetch work-around (docs/decisions: resource-keyed cache).
 * Features own the keys of everything else (`keys.ts` in each feature).
 */
export const resourceKeys = {
  tutorial: (tutorialId: string) => ['tutorials', tutorialId] as const,
  pieces: (tutorialId: string) => [...resourceKeys.tutorial(tutorialId), 'pieces'] as const,
  supplies: (tutorialId: string) => [...resourceKeys.tutorial(tutorialId), 'supplies'] as const,
  /** Under the supplies, so every change to them refreshes the checks too (the cut list refreshes them itself). */
  supplyChecks: (tutorialId: string) => [...resourceKeys.supplies(tutorialId), 'checks'] as const,
  recordings: (tutorialId: string) => [...resourceKeys.tutorial(tutorialId), 'recordings'] as const,
  /** Everything read about one recording sits under this prefix, so deleting it drops all of it. */
  recording: (recordingId: string) => ['recordings', recordingId] as const,
  stills: (recordingId: string) => [...resourceKeys.recording(recordingId), 'stills'] as const,
};

/** The cut list with each piece's checks, the materials, the ruler and the caller's abilities. */
export const getPieces = (tutorialId: string) => api<CutListDto>(`/tutorials/${tutorialId}/pieces`);
export const piecesQueryOptions = (tutorialId: string) => queryOptions({ queryKey: resourceKeys.pieces(tutorialId), queryFn: () => getPieces(tutorialId) });

/** The supplies in list order, the disclosure that goes with them and the caller's abilities. */
export const getSupplies = (tutorialId: string) => api<SuppliesDto>(`/tutorials/${tutorialId}/supplies`);
export const suppliesQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: resourceKeys.supplies(tutorialId), queryFn: () => getSupplies(tutorialId) });

/** The supplies' sheet counts against the sheet plan, and the warnings still open (Supplies and Publish sections). */
export const getSupplyChecks = (tutorialId: string) => api<SupplyChecksDto>(`/tutorials/${tutorialId}/supply-checks`);
export const supplyChecksQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: resourceKeys.supplyChecks(tutorialId), queryFn: () => getSupplyChecks(tutorialId) });

/** A tutorial's recordings, newest first. */
export const getRecordings = (tutorialId: string) => api<RecordingsDto>(`/tutorials/${tutorialId}/recordings`);
export const recordingsQueryOptions = (tutorialId: string) =>
  queryOptions({ queryKey: resourceKeys.recordings(tutorialId), queryFn: () => getRecordings(tutorialId) });

/** A recording's stills in time order. */
export const getStills = (recordingId: string) => api<StillsDto>(`/recordings/${recordingId}/stills`);
export const stillsQueryOptions = (recordingId: string) => queryOptions({ queryKey: resourceKeys.stills(recordingId), queryFn: () => getStills(recordingId) });
