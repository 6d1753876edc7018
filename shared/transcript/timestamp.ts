/**
 * Times as people type them in chapter lists and retime boxes. Runs in the browser too: no Node APIs.
 */

// h:mm:ss or m:ss, an optional fraction of up to three digits (comma accepted, as in SRT).
const TIME = /^(\d+):(\d{2})(?::(\d{2}))?(?:[.,](\d{1,3}))?$/;

/** Milliseconds from a fraction of a second written with 1 to 3 digits ("5" is 500 ms, "25" is 250 ms). */
export function fractionToMs(digits: string | undefined): number {
  return digits ? Number(digits.padEnd(3, '0')) : 0;
}

/**
 * Reads "1:05", "01:05.250", "1:02:03" (or "1:02:03,5") into milliseconds; null when it is not a time.
 * In h:mm:ss the minutes and seconds must be below 60; in m:ss the minutes may run past 59 ("75:00").
 */
export function parseTimestamp(s: string): number | null {
  const m = TIME.exec(s.trim());
  if (!m) return null;
  const [, a, b, c, frac] = m;
  const ms = fractionToMs(frac);
  if (c === undefined) {
    const seconds = Number(b);
    if (seconds > 59) return null;
    return (Number(a) * 60 + seconds) * 1000 + ms;
  }
  const minutes = Number(b);
  const seconds = Number(c);
  if (minutes > 59 || seconds > 59) return null;
  return ((Number(a) * 60 + minutes) * 60 + seconds) * 1000 + ms;
}

/**
 * "m:ss" below an hour, "h:mm:ss" from an hour on, rounded down to the second, as chapter lists
 * in video descriptions write them (0:00, 4:05, 1:02:03).
 */
export function formatTimestamp(ms: number): string {
  if (!Number.isFinite(ms) || ms < 0) throw new RangeError(`not a time: ${ms}`);
  const total = Math.floor(ms / 1000);
  const h = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const s = total % 60;
  const ss = String(s).padStart(2, '0');
  return h > 0 ? `${h}:${String(m).padStart(2, '0')}:${ss}` : `${m}:${ss}`;
}
