import type { CaseSI } from '../case/types.js';
import { operatingPoints, pointSpeed } from '../calc/duty.js';

/**
 * The reference (governing) point of a case for the map's axes: the largest radial load
 * over its duty, N, and the highest shaft speed over its duty, rev/s (the equivalent
 * rotational speed θ·f/π for an oscillating shaft). For a single-point case these are its
 * load and speed. A map cell at (F, n) is the case with every load scaled by F/F_ref and
 * every speed by n/n_ref: a duty spectrum keeps its shape and shares.
 */
export interface ReferencePoint {
  load: number;
  speed: number;
  /** True when the case has a duty spectrum (more than one point is scaled). */
  spectrum: boolean;
}

export function referencePoint(c: CaseSI): ReferencePoint {
  const pts = operatingPoints(c);
  return {
    load: Math.max(...pts.map((p) => p.radial)),
    speed: Math.max(...pts.map((p) => pointSpeed(c, p))),
    spectrum: (c.duty?.length ?? 0) > 1,
  };
}

/**
 * The case with every load (radial and axial, so the load's direction is kept) scaled by
 * `loadFactor` and every speed by `speedFactor`. An oscillating shaft keeps its swing angle
 * and scales its frequency (its equivalent speed θ·f/π scales with it). Nothing else
 * changes: diameter, space, lubrication, environment, life target, priorities.
 */
export function scaleCase(c: CaseSI, loadFactor: number, speedFactor: number): CaseSI {
  const out: CaseSI = {
    ...c,
    shaft: { ...c.shaft },
    load: { ...c.load, radial: c.load.radial * loadFactor, axial: c.load.axial * loadFactor },
  };
  if (c.shaft.speed !== undefined) out.shaft.speed = c.shaft.speed * speedFactor;
  if (c.shaft.oscillation)
    out.shaft.oscillation = { ...c.shaft.oscillation, frequency: c.shaft.oscillation.frequency * speedFactor };
  if (c.duty) {
    out.duty = c.duty.map((p) => {
      const q = { ...p, radial: p.radial * loadFactor, axial: p.axial * loadFactor };
      if (p.speed !== undefined) q.speed = p.speed * speedFactor;
      return q;
    });
  }
  return out;
}
