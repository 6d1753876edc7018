import { inches, millimetres, type Length } from '../measure/length';

/** A stock sheet size the sheet plan and handouts offer. */
export interface SheetSize {
  id: SheetSizeId;
  label: string;
  width: Length;
  height: Length;
  /** Where the size comes from. */
  source: string;
}

export type SheetSizeId = '12x12' | 'letter' | 'legal' | 'tabloid' | 'a3' | 'a4' | 'a5' | 'a6';

// ISO 216 sides are whole millimetres rounded in a way plain halving does not reproduce, so they are stored, not computed.
/** Stock sheet sizes, portrait (width <= height). */
export const SHEET_SIZES: readonly SheetSize[] = [
  { id: '12x12', label: '12 x 12 in', width: inches(12), height: inches(12), source: 'scrapbook paper, common practice' },
  { id: 'letter', label: 'Letter (8.5 x 11 in)', width: inches([17, 2]), height: inches(11), source: 'ANSI/ASME Y14.1' },
  { id: 'legal', label: 'Legal (8.5 x 14 in)', width: inches([17, 2]), height: inches(14), source: 'ANSI/ASME Y14.1' },
  { id: 'tabloid', label: 'Tabloid (11 x 17 in)', width: inches(11), height: inches(17), source: 'ANSI/ASME Y14.1' },
  { id: 'a3', label: 'A3 (297 x 420 mm)', width: millimetres(297), height: millimetres(420), source: 'ISO 216' },
  { id: 'a4', label: 'A4 (210 x 297 mm)', width: millimetres(210), height: millimetres(297), source: 'ISO 216' },
  { id: 'a5', label: 'A5 (148 x 210 mm)', width: millimetres(148), height: millimetres(210), source: 'ISO 216' },
  { id: 'a6', label: 'A6 (105 x 148 mm)', width: millimetres(105), height: millimetres(148), source: 'ISO 216' },
];

/** The sheet size with this id, or undefined. */
export function sheetSize(id: string): SheetSize | undefined {
  return SHEET_SIZES.find((s) => s.id === id.toLowerCase());
}
