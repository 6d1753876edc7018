/**
 * The demo tutorial's cut list and supplies as plain data (no database), so the seed and the tests
 * that draw the demo's pieces (template, sheet plan, cross-checks) read the very same rows.
 */
import { defaultGrain } from '@shared/geometry';
import { parseLength, parseStoredLength, serializeLength, type Piece } from '@shared/measure';
import type { SupplyDto } from '@shared/schemas/supply';

const L = (s: string) => serializeLength(parseLength(s)!);

/**
 * The demo tutorial's cut list, as a maker would build it from the transcript's mentions: two
 * circles, scored wall and rim strips with notched tabs, and a label with a mat on it. The mat is
 * read out as 2 7/8 in wide on a 3 in panel, so the margin check has something real to flag.
 * Exported as plain rows so the template and sheet-plan tests draw the very pieces the demo shows.
 */
export const DEMO_PIECE_ROWS = [
  {
    name: 'Base circle',
    material: 'kraft cardstock',
    quantity: 2,
    shape: 'circle' as const,
    width: '6 3/8',
    height: '6 3/8',
    saidAtMs: 6000,
    notes: 'One for the bottom, one to line the lid',
  },
  {
    name: 'Wall strip',
    material: 'kraft cardstock',
    quantity: 2,
    shape: 'rect' as const,
    width: '10 9/16',
    height: '2 1/2',
    saidAtMs: 14000,
    scoreLines: [{ axis: 'height' as const, at: L('1/2'), tab: true }],
    notes: 'Notch the tab every 1/2 in up to the score line',
  },
  {
    name: 'Lid circle',
    material: 'kraft cardstock',
    quantity: 1,
    shape: 'circle' as const,
    width: '6 7/16',
    height: '6 7/16',
    saidAtMs: 40000,
    notes: 'A little larger than the base so the lid slips over',
  },
  {
    name: 'Lid rim strip',
    material: 'kraft cardstock',
    quantity: 2,
    shape: 'rect' as const,
    width: '10 3/4',
    height: '1',
    saidAtMs: 44000,
    scoreLines: [{ axis: 'height' as const, at: L('1/4'), tab: true }],
    notes: 'Notch the tab like the wall',
  },
  { name: 'Label panel', material: 'kraft cardstock', quantity: 1, shape: 'rect' as const, width: '3', height: '2', saidAtMs: 48000, notes: '' },
  {
    name: 'Label mat',
    material: 'patterned paper',
    quantity: 1,
    shape: 'rect' as const,
    width: '2 7/8',
    height: '1 3/4',
    saidAtMs: 48000,
    notes: 'Grain runs with the print',
  },
];

/** The demo's materials: kraft cardstock and patterned paper, both 12 x 12 in. */
export const DEMO_MATERIALS = [
  { name: 'kraft cardstock', kind: 'cardstock', sheetWidth: L('12'), sheetHeight: L('12'), rotate: true },
  { name: 'patterned paper', kind: 'patterned paper', sheetWidth: L('12'), sheetHeight: L('12'), rotate: false },
];

/** The demo's pieces as the engine sees them (grain as a new piece gets it), for tests. */
export function demoPieces(): Piece[] {
  return DEMO_PIECE_ROWS.map((r, i) => ({
    id: `demo-${i}`,
    name: r.name,
    material: r.material,
    quantity: r.quantity,
    shape: r.shape,
    grain: defaultGrain(r),
    width: parseLength(r.width)!,
    height: parseLength(r.height)!,
    scoreLines: (r.scoreLines ?? []).map((l) => ({ axis: l.axis, at: parseStoredLength(l.at), tab: l.tab })),
    matOn: r.name === 'Label mat' ? 'demo-4' : null,
    notes: r.notes,
  }));
}

/**
 * The demo's supplies. The kraft cardstock's count is the sheet plan's (the cross-check between
 * supplies and the plan passes on the demo's own data).
 */
export const DEMO_SUPPLIES: Omit<SupplyDto, 'id' | 'position' | 'acceptedSheetNeed'>[] = [
  {
    category: 'cardstock',
    name: 'Kraft cardstock, 12 x 12 in',
    quantity: '3 sheets',
    note: 'Medium weight (about 80 lb cover); the sheet plan lays the pieces on three',
    url: 'https://shop.example/kraft-cardstock',
    sponsored: true,
    discountCode: 'JUNIPER10',
  },
  {
    category: 'paper',
    name: 'Patterned paper, 12 x 12 in',
    quantity: '1 sheet',
    note: 'A small, directional print',
    url: 'https://shop.example/botanical-paper',
    sponsored: true,
    discountCode: null,
  },
  { category: 'adhesive', name: 'Strong liquid glue', quantity: '', note: 'A fine nozzle helps on the tabs', url: null, sponsored: false, discountCode: null },
  { category: 'tool', name: 'Paper trimmer with a scoring blade', quantity: '', note: '', url: null, sponsored: false, discountCode: null },
  { category: 'tool', name: 'Craft knife and self-healing mat', quantity: '', note: 'For the notches', url: null, sponsored: false, discountCode: null },
  { category: 'tool', name: 'Circle cutter or compass', quantity: '', note: '', url: null, sponsored: false, discountCode: null },
  { category: 'tool', name: 'Bulldog clips', quantity: '4', note: 'To hold the wall while the glue grabs', url: null, sponsored: false, discountCode: null },
];
