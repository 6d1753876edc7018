import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TranscriptImportDto } from '@shared/schemas/footage';
import { footageKeys } from './keys';
import { uploadFile } from './upload-file';

/** `notices`: what the reader skipped or kept with a note, each starting "line N: ". */
export type TranscriptUploaded = TranscriptImportDto;

/** Sends a transcript file (.vtt, .srt, .txt); a 422 names the line that could not be read. */
export const uploadTranscript = ({ recordingId, file }: { recordingId: string; file: File }) =>
  uploadFile<TranscriptUploaded>(`/recordings/${recordingId}/transcript`, file).done;

export function useUploadTranscript(recordingId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadTranscript({ recordingId, file }),
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: footageKeys.recording(recordingId) }),
        qc.invalidateQueries({ queryKey: footageKeys.allCues(recordingId) }),
        qc.invalidateQueries({ queryKey: footageKeys.chapterSuggestions(recordingId) }),
      ]),
  });
}
