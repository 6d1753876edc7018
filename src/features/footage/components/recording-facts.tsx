import type { RecordingDto } from '@shared/schemas/footage';
import { formatBytes, formatClock } from '../utils/format';

/** Name, size and, once probed, picture size, frame rate and length of a recording. */
export function RecordingFacts({ recording: r }: { recording: RecordingDto }) {
  const facts = [
    r.width && r.height ? `${r.width} × ${r.height}` : null,
    r.frameRate ? `${Math.round(r.frameRate * 100) / 100} fps` : null,
    r.durationMs !== null ? formatClock(r.durationMs) : null,
    formatBytes(r.sizeBytes),
    r.hasAudio === false ? 'no sound' : null,
  ].filter(Boolean);
  return (
    <p className="flex min-w-0 flex-wrap items-baseline gap-x-3 gap-y-1 text-sm">
      <span className="truncate font-medium" title={r.originalName}>
        {r.originalName}
      </span>
      <span className="text-pencil tabular-nums">{facts.join(' · ')}</span>
    </p>
  );
}
