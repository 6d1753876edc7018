import { fileKindWords, notAVideoMessage } from '@shared/footage/file-kind';
import { useCallback, useSyncExternalStore } from 'react';
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { VIDEO_EXTENSIONS, type RecordingDto } from '@shared/schemas/footage';
import { ApiError } from '@/lib/api-client';
import { deleteRecording } from '../api/delete-recording';
import { footageKeys } from '../api/keys';
import { UploadCancelled } from '../api/upload-file';
import { uploadRecording } from '../api/upload-recording';

export type UploadState =
  | { phase: 'idle' }
  | { phase: 'uploading'; fileName: string; loaded: number; total: number }
  | { phase: 'paused'; fileName: string; loaded: number; total: number }
  | { phase: 'error'; fileName: string; message: string }
  | { phase: 'cancelled'; fileName: string };

// Kept outside React so an upload carries on (and can still be cancelled) when the person
// switches to another section of the tutorial and comes back.
const states = new Map<string, UploadState>();
const controls = new Map<string, { cancel: () => void; pause: () => void; resume: () => void }>();
const listeners = new Set<() => void>();
const IDLE: UploadState = { phase: 'idle' };

function set(tutorialId: string, s: UploadState) {
  states.set(tutorialId, s);
  listeners.forEach((l) => l());
}
const subscribe = (l: () => void) => {
  listeners.add(l);
  return () => listeners.delete(l);
};

/** Refuses files that are plainly not videos before sending gigabytes the server will refuse. */
export function looksLikeVideo(file: { name: string; type: string }): boolean {
  const ext = file.name.split('.').pop()?.toLowerCase() ?? '';
  return file.type.startsWith('video/') || VIDEO_EXTENSIONS.includes(ext);
}

/** What the person reads when an upload fails, by what went wrong. */
export function uploadErrorMessage(e: unknown, fileName: string): string {
  if (e instanceof ApiError) {
    if (e.status === 0) return e.message;
    if (e.status === 413) return `${e.message}. Trim the recording or export it at a lower bit rate, then upload it again.`;
    if (e.status === 401) return 'Your session has ended; sign in again and upload the file once more.';
    return e.message;
  }
  return `“${fileName}” could not be uploaded; please try again.`;
}

function beginUpload(qc: QueryClient, tutorialId: string, file: File, replaces?: string) {
  if (!looksLikeVideo(file)) {
    set(tutorialId, {
      phase: 'error',
      fileName: file.name,
      message: notAVideoMessage(file.name, fileKindWords({ mime: file.type, ext: file.name.includes('.') ? file.name.split('.').pop() : null })),
    });
    return;
  }
  controls.get(tutorialId)?.cancel();
  set(tutorialId, { phase: 'uploading', fileName: file.name, loaded: 0, total: file.size });
  const up = uploadRecording(tutorialId, file, (p) => {
    if (states.get(tutorialId)?.phase !== 'paused') set(tutorialId, { phase: 'uploading', fileName: file.name, loaded: p.loaded, total: p.total });
  });
  const control = {
    cancel: up.cancel,
    pause: () => {
      const s = states.get(tutorialId);
      if (s?.phase !== 'uploading') return;
      up.pause();
      set(tutorialId, { ...s, phase: 'paused' });
    },
    resume: () => {
      const s = states.get(tutorialId);
      if (s?.phase !== 'paused') return;
      set(tutorialId, { ...s, phase: 'uploading' });
      up.resume();
    },
  };
  controls.set(tutorialId, control);
  up.done
    .then(async (rec: RecordingDto | null) => {
      if (rec)
        qc.setQueryData(footageKeys.tutorialRecordings(tutorialId), (old: { recordings: RecordingDto[] } | undefined) => ({
          recordings: [rec, ...(old?.recordings ?? [])],
        }));
      // A failed recording that this upload replaces has nothing worth keeping.
      if (replaces) {
        await deleteRecording(replaces).catch(() => {});
        qc.removeQueries({ queryKey: footageKeys.scope(replaces) });
      }
      set(tutorialId, IDLE);
      await qc.invalidateQueries({ queryKey: footageKeys.tutorialRecordings(tutorialId) });
    })
    .catch((e: unknown) => {
      if (e instanceof UploadCancelled) set(tutorialId, { phase: 'cancelled', fileName: file.name });
      else set(tutorialId, { phase: 'error', fileName: file.name, message: uploadErrorMessage(e, file.name) });
    })
    .finally(() => {
      if (controls.get(tutorialId) === control) controls.delete(tutorialId);
    });
}

/** The recording upload of one tutorial: its state, and start, cancel and reset. */
export function useRecordingUpload(tutorialId: string) {
  const qc = useQueryClient();
  const state = useSyncExternalStore(subscribe, () => states.get(tutorialId) ?? IDLE);
  return {
    state,
    start: useCallback((file: File, opts: { replaces?: string } = {}) => beginUpload(qc, tutorialId, file, opts.replaces), [qc, tutorialId]),
    cancel: useCallback(() => controls.get(tutorialId)?.cancel(), [tutorialId]),
    pause: useCallback(() => controls.get(tutorialId)?.pause(), [tutorialId]),
    resume: useCallback(() => controls.get(tutorialId)?.resume(), [tutorialId]),
    reset: useCallback(() => set(tutorialId, IDLE), [tutorialId]),
  };
}
