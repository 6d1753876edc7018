import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm';
import { Notice } from '@/components/ui/notice';
import { useDeleteRecording } from '../api/delete-recording';
import type { RecordingDto } from '@shared/schemas/footage';

/** Deletes the recording after asking, saying what goes with it. */
export function DeleteRecordingButton({ recording, label = 'Delete recording' }: { recording: RecordingDto; label?: string }) {
  const [open, setOpen] = useState(false);
  const del = useDeleteRecording(recording.tutorialId);
  return (
    <>
      <Button variant="danger" size="sm" onClick={() => setOpen(true)}>
        {label}
      </Button>
      {del.error && <Notice kind="error">{del.error.message}</Notice>}
      <ConfirmDialog
        open={open}
        title={`Delete “${recording.originalName}”?`}
        confirmLabel="Delete recording"
        danger
        busy={del.isPending}
        onCancel={() => setOpen(false)}
        onConfirm={() => del.mutate(recording.id, { onSettled: () => setOpen(false) })}
      >
        The video, its transcript, chapters and stills are removed for everyone. The file on your computer is not touched.
      </ConfirmDialog>
    </>
  );
}
