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
