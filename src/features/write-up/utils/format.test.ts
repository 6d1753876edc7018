import { describe, expect, it } from 'vitest';
import { clockTime, keyLabel, timeChipLabel, whenSaved } from './format';

describe('times', () => {
  it('shows a 24-hour clock time', () => {
    expect(clockTime(new Date(2026, 2, 2, 9, 7))).toBe('09:07');
    expect(clockTime(new Date(2026, 2, 2, 23, 59))).toBe('23:59');
  });
  it('names today and yesterday, and the date further back', () => {
    const now = new Date(2026, 2, 2, 18, 0);
    expect(whenSaved(new Date(2026, 2, 2, 12, 3), now)).toBe('today 12:03');
    expect(whenSaved(new Date(2026, 2, 1, 22, 15), now)).toBe('yesterday 22:15');
    expect(whenSaved(new Date(2026, 0, 5, 8, 0), now)).toBe('5 Jan 08:00');
    expect(whenSaved(new Date(2025, 11, 31, 8, 0), now)).toBe('31 Dec 2025 08:00');
  });
  it('writes a step time as chapter lists do, m:ss below an hour and h:mm:ss from an hour (from memory: a common video-platform form)', () => {
    expect(timeChipLabel(192_000)).toBe('▶ 3:12');
    expect(timeChipLabel(3_723_000)).toBe('▶ 1:02:03');
  });
});

describe('keyLabel', () => {
  it('spells keys as the keyboard says them', () => {
    expect(keyLabel('Mod-Alt-s', false)).toBe('Ctrl+Alt+S');
    expect(keyLabel('Mod-b', true)).toBe('⌘B');
    expect(keyLabel('Alt-ArrowUp', false)).toBe('Alt+↑');
  });
});
