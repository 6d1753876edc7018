import { formatTimestamp } from '@shared/transcript/timestamp';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const pad = (n: number) => String(n).padStart(2, '0');

/** "12:03": the local time on a 24-hour clock. */
export function clockTime(d: Date): string {
  return `${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** "today 12:03", "yesterday 12:03", "5 Jan 12:03" or "5 Jan 2025 12:03", by local dates. */
export function whenSaved(d: Date, now: Date = new Date()): string {
  const day = (x: Date) => new Date(x.getFullYear(), x.getMonth(), x.getDate()).getTime();
  const days = Math.round((day(now) - day(d)) / 86_400_000);
  if (days === 0) return `today ${clockTime(d)}`;
  if (days === 1) return `yesterday ${clockTime(d)}`;
  const date = `${d.getDate()} ${MONTHS[d.getMonth()]}`;
  return d.getFullYear() === now.getFullYear() ? `${date} ${clockTime(d)}` : `${date} ${d.getFullYear()} ${clockTime(d)}`;
}

/** "▶ 3:12": the step's time in the video, as the chip shows it. */
export function timeChipLabel(atMs: number): string {
  return `▶ ${formatTimestamp(atMs)}`;
}

/** Key names as this person's keyboard says them: "Ctrl" and "Alt", or ⌘ and ⌥ on a Mac. */
export function keyLabel(combo: string, mac: boolean): string {
  return combo
    .split('-')
    .map((k) => {
      if (k === 'Mod') return mac ? '⌘' : 'Ctrl';
      if (k === 'Alt') return mac ? '⌥' : 'Alt';
      if (k === 'Shift') return mac ? '⇧' : 'Shift';
      if (k === 'ArrowUp') return '↑';
      if (k === 'ArrowDown') return '↓';
      return k.length === 1 ? k.toUpperCase() : k;
    })
    .join(mac ? '' : '+');
}
