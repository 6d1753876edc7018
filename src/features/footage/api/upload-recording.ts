import type { Recording } from './types';
import { uploadFile, type UploadProgress } from './upload-file';

/** Sends a recording (201 Recording; 415 not a video; 413 too large). */
export const uploadRecording = (tutorialId: string, file: File, onProgress?: (p: UploadProgress) => void) =>
  uploadFile<Recording>(`/tutorials/${tutorialId}/recordings`, file, { onProgress });
