import { validateCase } from '../../src/case/load.js';
import type { CaseSI } from '../../src/case/types.js';

/**
 * A complete case for tests, in an invented scenario: the shaft of a
 * farm irrigation pump's belt-driven jackshaft. Override any part.
 */
export function pumpCase(over: Record<string, unknown> = {}): CaseSI {
  const base: Record<string, unknown> = {
    title: 'Irrigation pump jackshaft (test case)',
    shaft: { diameter: '30 mm', speed: '300 rpm' },
    load: { radial: '1.2 kN', axial: '0 N', shock: 'light' },
    life: { hours: '10000 h', wearAllowance: '0.2 mm' },
    space: { maxLength: '50 mm', maxOuterDiameter: '62 mm' },
    lubrication: { supply: 'grease', inletTemperature: '30 degC' },
    environment: { ambient: '25 degC', contamination: 'normal', startsPerHour: 2 },
  };
  return validateCase({ ...base, ...over }).case;
}

/**
 * An SI case for the journal tests, in an invented scenario: the steady bearing of an
 * irrigation canal lift pump's line shaft, fed with pumped oil. Override any part.
 */
export function lineShaftCase(over: Partial<CaseSI> = {}): CaseSI {
  return {
    title: 'Irrigation canal lift pump, line-shaft steady bearing (invented)',
    shaft: { diameter: 0.06, speed: 1450 / 60 },
    load: { radial: 2500, axial: 0, shock: 'light' },
    life: { hours: 40000, wearAllowance: 0.0002, reliability: 90 },
    space: { maxLength: 0.07, maxOuterDiameter: 0.1 },
    lubrication: { supply: 'oil-feed', inletTemperature: 40 },
    environment: { ambient: 30, contamination: 'normal', startsPerHour: 2 },
    priorities: { cost: 3, friction: 3, maintenance: 3, noise: 3, precision: 3 },
    ...over,
  };
}
