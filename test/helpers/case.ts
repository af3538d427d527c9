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
