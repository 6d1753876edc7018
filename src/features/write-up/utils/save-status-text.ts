import type { SaveStatus } from './autosave';
import { clockTime, whenSaved } from './format';

/** The words the save status shows: "Saving…", "Saved 12:03", "Offline — changes kept on this device", "Not saved: …". */
export function saveStatusText(s: SaveStatus, now: Date = new Date()): string {
  switch (s.kind) {
    case 'idle':
      return 'No changes yet';
    case 'pending':
    case 'saving':
      return 'Saving…';
    case 'saved': {
      // A save from this sitting says only the time; an older one (the version just opened) its day too.
      const today = s.at.toDateString() === now.toDateString();
      return `Saved ${today ? clockTime(s.at) : whenSaved(s.at, now)}`;
    }
    case 'offline':
      return 'Offline — changes kept on this device';
    case 'error':
      return `Not saved: ${s.message}`;
    case 'conflict':
      return 'Not saved: someone saved a newer version';
  }
}
