import { addLengths, formatLength, formatMm, inches, roundForDisplay, scaleLength, toInches, type Length } from '../measure/length';
import { DEFAULT_PRECISION, roundUpToMark, type RulerPrecision } from '../measure/ruler';

export interface LidInput {
  /** Diameter of the base circle the lid goes over. */
  diameter: Length;
  /** Thickness of the base's wall (the strip around it); 0 by default. */
  wall?: Length;
  /** Play each side so the lid slides on; 1/32 in by default (common practice: the lid ends about 1/16 in larger). */
  clearance?: Length;
  precision?: RulerPrecision;
}

export interface LidResult {
  /** Diameter to cut the lid circle, rounded up to the ruler, in inches. */
  lidDiameter: Length;
  /** The exact need before rounding. */
  exact: Length;
  working: string[];
}

/** 1/32 in each side: a lid about 1/16 in larger than the base (common practice for cardstock). */
export const DEFAULT_LID_CLEARANCE: Length = inches([1, 32]);

/**
 * The lid circle that fits over a base: d + 2 x wall + 2 x clearance,
 * rounded up, since a lid too small does not go on at all.
 */
export function lidCircle(input: LidInput): LidResult {
  const precision = input.precision ?? DEFAULT_PRECISION;
  const wall = input.wall ?? inches(0);
  const clearance = input.clearance ?? DEFAULT_LID_CLEARANCE;
  if (toInches(input.diameter).s < 0n || toInches(input.diameter).n === 0n) throw new RangeError('the diameter must be above zero');
  if (toInches(wall).s < 0n || toInches(clearance).s < 0n) throw new RangeError('wall and clearance cannot be negative');
  const twoWalls = scaleLength(wall, 2);
  const twoGaps = scaleLength(clearance, 2);
  const exact = addLengths(addLengths(input.diameter, twoWalls), twoGaps);
  const lid = roundUpToMark(exact, precision);
  const dec = (l: Length) => `${roundForDisplay(toInches(l), 4)} in`;
  const working = [
    `Base diameter = ${formatLength(input.diameter)}${input.diameter.value.d === 1n && input.diameter.unit === 'in' ? '' : ` (${dec(input.diameter)})`}`,
    `The lid wraps the wall on both sides: 2 × ${formatLength(wall)} = ${dec(twoWalls)}`,
    `Clearance on both sides so it slides on: 2 × ${formatLength(clearance)} = ${dec(twoGaps)}`,
    `Need: ${dec(input.diameter)} + ${dec(twoWalls)} + ${dec(twoGaps)} = ${dec(exact)}`,
    `Round up to the next 1/${precision} in mark (a lid too small will not go on): ${formatLength(lid)} (${formatMm(lid)})`,
  ];
  return { lidDiameter: lid, exact, working };
}
