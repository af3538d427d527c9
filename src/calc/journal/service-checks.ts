import type { CaseSI } from '../../case/types.js';
import { makeCheck, type CheckRecord } from '../../core/check.js';

/**
 * The checks of what a hydrodynamic film needs from the machine rather than from the
 * bearing's geometry: continuous rotation in one direction and a supply of oil. Each is a
 * yes/no figure held as a number (1 = met, 0 = not) against the limit 1, so it fails
 * with margin −1 and names its reason in `source` (common practice).
 */
export function serviceChecks(c: CaseSI): CheckRecord[] {
  const checks: CheckRecord[] = [];
  if (c.shaft.oscillation && !c.shaft.speed)
    checks.push(
      makeCheck(
        'motion',
        'Continuous rotation in one direction (needed to sustain a hydrodynamic film); 0 = oscillating',
        0,
        1,
        '1',
        'min',
        'common practice: a hydrodynamic journal bearing needs continuous unidirectional sliding; reversal passes through zero speed',
      ),
    );
  const supply = c.lubrication.supply;
  if (supply === 'none')
    checks.push(
      makeCheck(
        'supply',
        'Lubricant supply able to keep a full hydrodynamic film (1 = oil bath or oil feed; 0 = none)',
        0,
        1,
        '1',
        'min',
        'common practice: a hydrodynamic journal bearing needs a continuous oil supply',
      ),
    );
  if (supply === 'grease')
    checks.push(
      makeCheck(
        'supply',
        'Lubricant supply able to keep a full hydrodynamic film (1 = oil bath or oil feed; 0 = grease)',
        0,
        1,
        '1',
        'min',
        'common practice: grease does not feed a full hydrodynamic film; its base oil bleeds slowly and the bearing runs in mixed lubrication',
      ),
    );
  return checks;
}

/**
 * The edge film of a journal tilted in its bore, where the case states a misalignment
 * (shaft.misalignment; absent: aligned, no check):
 *   h_edge = h0 − θ·L/2 ≥ h_allow
 * h0 the minimum film thickness of the aligned solution at the governing point, m; θ the slope
 * of the shaft against the bearing axis, rad; L the bearing length, m; h_allow the allowable
 * film (Trumpler 1966, from memory; design.ts), m. Model: a rigid tilt of the journal about
 * the bearing's mid-length, taken in the plane of the minimum film (the worst edge), the film
 * pressure's own response to the tilt neglected: a conservative first estimate, valid while
 * θ·L/2 is small against the radial clearance.
 */
export function edgeFilmCheck(c: CaseSI, h0: number, length: number, allowable: number): CheckRecord[] {
  const theta = c.shaft.misalignment;
  if (theta === undefined) return [];
  return [
    makeCheck(
      'edge-film',
      'Film at the bearing edge with the shaft tilted, h0 − θ·L/2, against the allowable minimum film',
      h0 - (theta * length) / 2,
      allowable,
      'm',
      'min',
      'model: rigid tilt of the journal in the bore about mid-length, worst edge at the minimum film; allowable film Trumpler (1966, from memory)',
    ),
  ];
}
