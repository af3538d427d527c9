import { validateCase, type LoadedCase } from '../../src/case/load.js';

/**
 * Invented cases for the explore tests.
 *
 * oilFedLineShaft: a pumping station's line shaft on the station's pumped, filtered oil,
 * with a long life target (50 000 h) and priorities on friction and noise: the journal
 * bearing's home ground at speed; a rubbing bushing at a crawl.
 *
 * pivotNearWearLimit: a sluice-gate actuator pivot (oscillating, dry, dirty) with a fixed
 * 40 mm sintered-bronze bushing whose wear life is set 15 % above the life target: the
 * bushing wins, but by a margin that a 25 % change can erase and a 10 % change cannot.
 */
export function oilFedLineShaft(): LoadedCase {
  return validateCase({
    title: 'Test: pumping-station line shaft on pumped oil (invented)',
    shaft: { diameter: '50 mm', speed: '600 rpm' },
    load: { radial: '2 kN', axial: '0 N', shock: 'none' },
    life: { hours: '50000 h', wearAllowance: '0.5 mm' },
    space: { maxLength: '100 mm', maxOuterDiameter: '100 mm' },
    lubrication: { supply: 'oil-feed', oil: 'ISO VG 68', inletTemperature: '40 degC' },
    environment: { ambient: '25 degC', contamination: 'normal', startsPerHour: 1 },
    priorities: { cost: 4, friction: 4, noise: 5, maintenance: 1, precision: 1 },
  });
}

export function pivot(hours: string): LoadedCase {
  return validateCase({
    title: 'Test: sluice-gate actuator pivot near its wear limit (invented)',
    shaft: { diameter: '40 mm', oscillation: { angle: '60 deg', frequency: '0.5 Hz' } },
    load: { radial: '4 kN', axial: '0 N', shock: 'moderate' },
    life: { hours, wearAllowance: '0.3 mm' },
    space: { maxLength: '60 mm', maxOuterDiameter: '90 mm' },
    lubrication: { supply: 'none' },
    environment: { ambient: '20 degC', contamination: 'dirty', startsPerHour: 2 },
    bushing: { length: '40 mm', material: 'sintered-bronze' },
  });
}
