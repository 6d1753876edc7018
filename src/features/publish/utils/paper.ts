import type { Paper } from '@shared/schemas/publish';

export const PAPERS: readonly { key: Paper; label: string; size: string }[] = [
  // ANSI/ASME Y14.1 Letter; ISO 216 A4 (REFERENCES.md "Sheets").
  { key: 'letter', label: 'Letter', size: '8.5 × 11 in' },
  { key: 'a4', label: 'A4', size: '210 × 297 mm' },
];

// Regions where Letter is the everyday office paper (from memory: the Americas that follow the
// US and the Philippines); everywhere else uses ISO A4.
const LETTER_REGIONS = new Set(['US', 'CA', 'MX', 'PH', 'CL', 'CO', 'VE', 'PR', 'GT', 'CR', 'PA', 'DO', 'SV', 'NI', 'BZ']);

/** The paper a first-time visitor most likely has in the printer, from a locale tag like "en-GB". */
export function defaultPaper(locale: string | undefined): Paper {
  if (!locale) return 'letter';
  let region: string | undefined;
  try {
    region = new Intl.Locale(locale).maximize().region;
  } catch {
    return 'letter';
  }
  return region && !LETTER_REGIONS.has(region) ? 'a4' : 'letter';
}

/** A stored value read back as a paper, or null when it is not one. */
export function asPaper(v: unknown): Paper | null {
  return v === 'letter' || v === 'a4' ? v : null;
}
