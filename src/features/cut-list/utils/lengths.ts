import { displayLength, formatMm, parseStoredLength, readBoundedLength, type Length, type LengthUnit, type RulerPrecision } from '@shared/measure';
import type { LengthDto } from '@shared/schemas/piece';

/** What a length field has read so far from the typed text. */
export type TypedLength = { state: 'empty' } | { state: 'error'; message: string } | { state: 'ok'; length: Length; approx: boolean; preview: string };

/** Which system the cut list shows: the crafter's own inches, millimetres, or both side by side. */
export type UnitsMode = 'in' | 'mm' | 'both';

/**
 * Reads a typed or spoken length the way the server will (same parser, same default unit),
 * so the preview under a field never promises what the save then refuses.
 */
export function readTyped(text: string, defaultUnit: LengthUnit = 'in', precision: RulerPrecision = 16): TypedLength {
  if (text.trim() === '') return { state: 'empty' };
  // The same reading and bounds as the server: "-3 in" is refused in words, never shown as 3 in.
  const r = readBoundedLength(text, { defaultUnit });
  if (!r.ok) return { state: 'error', message: r.message };
  const d = displayLength(r.length, precision);
  return { state: 'ok', length: r.length, approx: r.approx, preview: `→ ${d.primary} · ${d.secondary}` };
}

/** The texts to show for an API length in the chosen units mode; `secondary` goes in a lighter tone. */
export function showLength(dto: LengthDto, mode: UnitsMode, precision: RulerPrecision = 16): { primary: string; secondary: string | null } {
  const l = parseStoredLength(dto.value);
  const d = displayLength(l, precision);
  if (mode === 'both') return { primary: d.primary, secondary: d.secondary };
  if (mode === 'mm') return { primary: formatMm(l), secondary: null };
  // Inches only: a metric length shows its nearest ruler mark ("≈ 1/2 in").
  return { primary: l.unit === 'in' ? d.primary : d.secondary, secondary: null };
}
