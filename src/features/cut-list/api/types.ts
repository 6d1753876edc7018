import type { CheckCode, CheckSeverity, MentionKind } from '@shared/measure';

/** A length as the API sends it: exact stored form, numbers for drawing, and display texts. */
export type LengthDto = { value: string; inches: number; mm: number; display: string; mmDisplay: string };

export type ScoreLineDto = { axis: 'width' | 'height'; at: LengthDto; tab: boolean };

export type PieceCheck = { code: CheckCode; severity: CheckSeverity; reason: string; field: string | null; nearest: LengthDto | null };

export type Piece = {
  id: string;
  position: number;
  name: string;
  material: string;
  quantity: number;
  shape: 'rect' | 'circle';
  width: LengthDto;
  height: LengthDto;
  scoreLines: ScoreLineDto[];
  matOnId: string | null;
  notes: string;
  saidAtMs: number | null;
  checks: PieceCheck[];
};

export type MaterialKind = 'cardstock' | 'patterned paper' | 'paper' | 'vellum' | 'acetate' | 'other';

export type Material = { id: string; name: string; kind: MaterialKind; sheetWidth: LengthDto; sheetHeight: LengthDto; rotate: boolean };

export type CutList = {
  pieces: Piece[];
  materials: Material[];
  precision: 8 | 16 | 32;
  defaultUnit: 'in' | 'mm' | 'cm';
  abilities: { update: boolean };
};

export type MentionDto = {
  key: string;
  kind: MentionKind;
  text: string;
  approx: boolean;
  corrected: boolean;
  startMs: number;
  endMs: number;
  values: LengthDto[];
  dismissed: boolean;
};

export type Mentions = { recordingId: string | null; mentions: MentionDto[] };

export type PlacementDto = { sheet: number; name: string; x: number; y: number; width: number; height: number; rotated: boolean; shape: 'rect' | 'circle' };

export type MaterialPlan = {
  material: string;
  materialId: string | null;
  sheet: { width: LengthDto; height: LengthDto; label: string };
  rotate: boolean;
  sheets: number;
  areaLowerBound: number;
  waste: number;
  placements: PlacementDto[];
  errors: { name: string; count: number; reason: string }[];
};

export type SheetPlanDto = { kits: number; spares: number; materials: MaterialPlan[] };
