import { describe, expect, it } from 'vitest';
import { parseLength, serializeLength } from '@shared/measure';
import { supplySheetChecks, unresolvedSheetWarnings } from '@shared/supplies/sheet-checks';
import { planMaterials } from '../services/sheet-plan/plan-materials';
import { DEMO_MATERIALS, DEMO_PIECE_ROWS, DEMO_SUPPLIES } from './demo-pieces';

describe('the demo tutorial passes its own cross-checks', () => {
  it('every supply that counts sheets lists at least what the sheet plan needs for one make', () => {
    // The same plan the server makes for one make: each material's pieces on its stock sheet (12 x 12 in, common practice).
    const jobs = DEMO_MATERIALS.map((m) => ({
      material: m.name,
      materialId: null,
      sheet: { width: m.sheetWidth, height: m.sheetHeight },
      rotate: m.rotate,
      grain: 'none' as const,
      pieces: DEMO_PIECE_ROWS.filter((p) => p.material === m.name).map((p) => ({
        name: p.name,
        width: serializeLength(parseLength(p.width)!),
        height: serializeLength(parseLength(p.height)!),
        qty: p.quantity,
        shape: p.shape,
      })),
    }));
    const plans = planMaterials(jobs, 1, 0).map((m) => ({
      material: m.material,
      sheets: m.sheets,
      sheetLabel: m.sheet.label,
      complete: m.complete && !m.errors.length,
    }));
    const checks = supplySheetChecks(
      DEMO_SUPPLIES.map((s, i) => ({ id: String(i), name: s.name, category: s.category, quantity: s.quantity, acceptedSheetNeed: null })),
      plans,
    );
    // Both papers are checked: kraft cardstock and patterned paper.
    expect(checks.map((c) => [c.material, c.status])).toEqual([
      ['kraft cardstock', 'ok'],
      ['patterned paper', 'ok'],
    ]);
    expect(unresolvedSheetWarnings(checks)).toEqual([]);
  });
});
