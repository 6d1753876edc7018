import { describe, expect, it } from 'vitest';
import { formatBytes } from './format-bytes';

// SI prefixes (BIPM, The International System of Units, 9th ed.): kilo = 10^3, mega = 10^6, giga = 10^9.
describe('formatBytes', () => {
  it('shows bytes under a kilobyte as they are', () => {
    expect(formatBytes(0)).toBe('0 B');
    expect(formatBytes(999)).toBe('999 B');
  });
  it('uses decimal prefixes (SI: 1 kB = 1000 B)', () => {
    expect(formatBytes(1000)).toBe('1 KB');
    expect(formatBytes(1500)).toBe('1.5 KB');
    expect(formatBytes(14_200)).toBe('14 KB');
    expect(formatBytes(3_240_000)).toBe('3.2 MB');
    expect(formatBytes(2_000_000_000)).toBe('2 GB');
  });
  it('moves up a prefix instead of printing 1000 KB', () => {
    expect(formatBytes(999_700)).toBe('1 MB');
  });
  it('gives nothing for a count that is not one', () => {
    expect(formatBytes(Number.NaN)).toBe('');
    expect(formatBytes(-1)).toBe('');
  });
});
