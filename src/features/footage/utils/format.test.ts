import { describe, expect, it } from 'vitest';
import { formatBytes, formatClock, percentOf } from './format';

describe('formatBytes', () => {
  // Binary multiples (IEC 80000-13: 1 MiB = 2^20 bytes, 1 GiB = 2^30), labelled MB and GB as the
  // server's upload-limit message labels them.
  it('shows small files in kilobytes (2^10 bytes), never as 0.0 MB', () => {
    expect(formatBytes(300)).toBe('1 KB');
    expect(formatBytes(40 * 1024)).toBe('40 KB');
  });
  it('shows megabytes with a decimal below 10 MB and whole above', () => {
    expect(formatBytes(2 ** 20 / 2)).toBe('0.5 MB');
    expect(formatBytes(3.25 * 2 ** 20)).toBe('3.3 MB');
    expect(formatBytes(120 * 2 ** 20)).toBe('120 MB');
  });
  it('switches to gigabytes at 2^30 bytes', () => {
    expect(formatBytes(2 ** 30 - 1)).toBe('1024 MB');
    expect(formatBytes(2 ** 30)).toBe('1.0 GB');
    expect(formatBytes(8 * 2 ** 30)).toBe('8.0 GB');
  });
});

describe('formatClock and percentOf', () => {
  it('reads unknown times as 0:00 rather than throwing', () => {
    expect(formatClock(null)).toBe('0:00');
    expect(formatClock(Number.NaN)).toBe('0:00');
    expect(formatClock(65_400)).toBe('1:05');
  });
  it('clamps percent to 0-100 and rounds down, so 100 % means all bytes sent', () => {
    expect(percentOf(999, 1000)).toBe(99);
    expect(percentOf(1001, 1000)).toBe(100);
    expect(percentOf(5, 0)).toBe(0);
  });
});
