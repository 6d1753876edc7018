import { describe, expect, it } from 'vitest';
import { createPieceSchema, materialSchema, updateMaterialSchema, updatePieceSchema } from './piece';
import { updateSupplySchema } from './supply';

describe('partial update schemas fill in nothing they were not given', () => {
  it('a piece update keeps out material, quantity and the rest', () => {
    expect(updatePieceSchema.parse({ position: 2 })).toEqual({ position: 2 });
  });
  it('a material update keeps out kind and rotate', () => {
    expect(updateMaterialSchema.parse({ name: 'vellum' })).toEqual({ name: 'vellum' });
  });
  it('a supply update keeps out its defaults', () => {
    expect(updateSupplySchema.parse({ name: 'Glue' })).toEqual({ name: 'Glue' });
  });
  it('creating still gets the defaults', () => {
    expect(createPieceSchema.parse({ name: 'Mat', width: '4', height: '5' })).toMatchObject({
      material: '',
      quantity: 1,
      shape: 'rect',
      scoreLines: [],
      notes: '',
    });
    expect(materialSchema.parse({ name: 'kraft', sheetWidth: '12', sheetHeight: '12' })).toMatchObject({ kind: 'cardstock', rotate: true });
  });
});
