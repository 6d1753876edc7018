import type { SaveStatus } from '../utils/autosave';
import { saveStatusText } from '../utils/save-status-text';

const TONE: Record<SaveStatus['kind'], string> = {
  idle: 'text-pencil',
  pending: 'text-pencil',
  saving: 'text-pencil',
  saved: 'text-sage',
  offline: 'text-kraft-dark',
  error: 'text-rosehip',
  conflict: 'text-rosehip',
};

/** Where the write-up stands with the server, announced politely to screen readers. */
export function SaveStatusLabel({ status, deviceCopyFailed }: { status: SaveStatus; deviceCopyFailed?: boolean }) {
  return (
    <span
      role="status"
      aria-live="polite"
      data-save-status={status.kind}
      className={`text-sm ${status.kind === 'error' ? 'max-w-xl' : 'whitespace-nowrap'} ${TONE[status.kind]}`}
    >
      {saveStatusText(status)}
      {deviceCopyFailed && status.kind !== 'saved' && <span className="text-rosehip"> (this device could not keep a copy: storage is full or turned off)</span>}
    </span>
  );
}
