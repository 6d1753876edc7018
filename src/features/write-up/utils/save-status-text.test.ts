import { describe, expect, it } from 'vitest';
import { saveStatusText } from './save-status-text';

describe('saveStatusText', () => {
  const now = new Date(2026, 2, 2, 18, 0);
  it('gives the time of a save made today, and the day of an older one', () => {
    expect(saveStatusText({ kind: 'saved', at: new Date(2026, 2, 2, 12, 3) }, now)).toBe('Saved 12:03');
    expect(saveStatusText({ kind: 'saved', at: new Date(2026, 2, 1, 9, 30) }, now)).toBe('Saved yesterday 09:30');
    expect(saveStatusText({ kind: 'saved', at: new Date(2026, 0, 5, 8, 0) }, now)).toBe('Saved 5 Jan 08:00');
  });
  it('says what is happening in words, never by colour alone', () => {
    expect(saveStatusText({ kind: 'pending' }, now)).toBe('Saving…');
    expect(saveStatusText({ kind: 'offline' }, now)).toBe('Offline — changes kept on this device');
    expect(saveStatusText({ kind: 'error', message: 'doc: /content/0: unknown node type "blink"' }, now)).toBe(
      'Not saved: doc: /content/0: unknown node type "blink"',
    );
    expect(saveStatusText({ kind: 'conflict', theirs: { doc: { type: 'doc' }, version: 2, updatedBy: null, updatedAt: null } }, now)).toBe(
      'Not saved: someone saved a newer version',
    );
  });
});
