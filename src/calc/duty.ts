import type { CaseSI, OperatingPointSI } from '../case/types.js';

/**
 * The operating points of a case: its duty spectrum when given, otherwise the
 * single point of shaft speed and load with share 1. Speeds in rev/s; absent
 * for an oscillating shaft (the oscillation then applies to every point).
 */
export function operatingPoints(c: CaseSI): OperatingPointSI[] {
  if (c.duty && c.duty.length > 0) {
    return c.duty.map((p) => ({ ...p, speed: p.speed ?? c.shaft.speed }));
  }
  const point: OperatingPointSI = { share: 1, radial: c.load.radial, axial: c.load.axial };
  if (c.shaft.speed !== undefined) point.speed = c.shaft.speed;
  return [point];
}

/**
 * Equivalent rotational speed of an oscillating shaft, rev/s:
 *   n_eq = 2·θ·f / (2π) = θ·f/π
 * θ total swing angle (rad), f full cycles per second (Hz). In one full cycle the
 * shaft turns through θ and back, 2θ in all. This is the speed that turns the same
 * angle per second as the oscillation; it is used for rolling-bearing life
 * (common practice, e.g. the oscillating-bearing treatment in bearing
 * handbooks) and for mean sliding speed. Valid when θ is large enough that
 * each rolling element rolls over more than its own contact (see the
 * false-brinelling warning in the rolling check).
 */
export function equivalentRotationalSpeed(osc: { angle: number; frequency: number }): number {
  return (osc.angle * osc.frequency) / Math.PI;
}

/** Speed of a point, rev/s: its own speed, or the oscillation's equivalent rotational speed. */
export function pointSpeed(c: CaseSI, p: OperatingPointSI): number {
  if (p.speed !== undefined) return p.speed;
  if (c.shaft.oscillation) return equivalentRotationalSpeed(c.shaft.oscillation);
  return c.shaft.speed ?? 0;
}
