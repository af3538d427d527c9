/**
 * The advisor's scenario matrix: invented duties across the regimes, each with the option
 * practice would choose and why (common practice). Units as a user writes them.
 */
export interface Scenario {
  id: string;
  expected: 'bushing' | 'rolling' | 'journal';
  why: string;
  case: Record<string, unknown>;
}

const base = {
  life: { hours: '20000 h', wearAllowance: '0.3 mm' },
  environment: { ambient: '25 degC', contamination: 'normal', startsPerHour: 1 },
};

export const SCENARIOS: Scenario[] = [
  {
    id: 'dirty-oscillating-pivot',
    expected: 'bushing',
    why: 'slow oscillation under dirt and no lubricant: bushings tolerate dirt and oscillation; rolling elements fret and dent; no film can form',
    case: {
      ...base,
      title: 'Vineyard harvester, picking-head pivot',
      shaft: { diameter: '30 mm', oscillation: { angle: '40 deg', frequency: '0.5 Hz' } },
      load: { radial: '2 kN', shock: 'moderate' },
      life: { hours: '5000 h', wearAllowance: '0.5 mm' },
      space: { maxLength: '40 mm', maxOuterDiameter: '45 mm' },
      lubrication: { supply: 'none' },
      environment: { ambient: '30 degC', contamination: 'severe', startsPerHour: 30 },
    },
  },
  {
    id: 'fast-light-grease-motor',
    expected: 'rolling',
    why: 'a light load at motor speed on grease: the rolling bearing is the simple, long-lived choice; a rubbing bushing overheats; grease cannot feed a film',
    case: {
      ...base,
      title: 'Ventilation fan motor, drive end',
      shaft: { diameter: '25 mm', speed: '2900 rpm' },
      load: { radial: '400 N', shock: 'none' },
      space: { maxLength: '30 mm', maxOuterDiameter: '70 mm' },
      lubrication: { supply: 'grease' },
    },
  },
  {
    id: 'long-life-high-speed-pumped-oil',
    expected: 'journal',
    why: 'high speed, heavy load, a long life and pumped filtered oil: the full film lasts longest with the lowest friction',
    case: {
      ...base,
      title: 'Hydro-station feed pump, line shaft',
      shaft: { diameter: '80 mm', speed: '3000 rpm' },
      load: { radial: '12 kN', shock: 'none' },
      life: { hours: '100000 h', wearAllowance: '0.1 mm' },
      space: { maxLength: '90 mm', maxOuterDiameter: '150 mm' },
      lubrication: { supply: 'oil-feed', oil: 'ISO VG 32', inletTemperature: '45 degC' },
      environment: { ambient: '30 degC', contamination: 'clean', startsPerHour: 0.1 },
      priorities: { cost: 2, friction: 4, maintenance: 2, noise: 4, precision: 3 },
    },
  },
  {
    id: 'high-speed-no-lubricant',
    expected: 'rolling',
    why: 'high speed with no lubricant supply: a sealed greased-for-life bearing runs; a rubbing bushing exceeds its PV; no film without oil',
    case: {
      ...base,
      title: 'Bottle-labeller idler pulley',
      shaft: { diameter: '20 mm', speed: '3000 rpm' },
      load: { radial: '300 N', shock: 'light' },
      // A sealed bearing's grease life at 3000 rpm on a 20 mm bore is about 10 000 h: the target sits inside it.
      life: { hours: '8000 h', wearAllowance: '0.2 mm' },
      space: { maxLength: '25 mm', maxOuterDiameter: '60 mm' },
      lubrication: { supply: 'none' },
    },
  },
  {
    id: 'tight-axial-space',
    expected: 'rolling',
    why: 'only a short axial length is available: a rolling bearing carries the load in the least axial space',
    case: {
      ...base,
      title: 'Conveyor snub pulley, narrow frame',
      shaft: { diameter: '40 mm', speed: '250 rpm' },
      load: { radial: '4 kN', shock: 'light' },
      space: { maxLength: '18 mm', maxOuterDiameter: '90 mm' },
      lubrication: { supply: 'grease' },
    },
  },
  {
    id: 'tight-radial-space',
    expected: 'bushing',
    why: 'the housing bore leaves a few millimetres of wall: only a bushing is thin enough',
    case: {
      ...base,
      title: 'Seed-drill metering roller, thin-wall hub',
      shaft: { diameter: '25 mm', speed: '40 rpm' },
      load: { radial: '500 N', shock: 'light' },
      life: { hours: '2000 h', wearAllowance: '0.3 mm' },
      space: { maxLength: '35 mm', maxOuterDiameter: '29 mm' },
      lubrication: { supply: 'none' },
      environment: { ambient: '20 degC', contamination: 'clean', startsPerHour: 2 },
    },
  },
  {
    id: 'heavy-shock',
    expected: 'bushing',
    why: 'slow rotation under heavy shock: a bushing spreads the blow over its area where rolling contacts brinell',
    case: {
      ...base,
      title: 'Quarry jaw-crusher toggle seat',
      shaft: { diameter: '60 mm', speed: '20 rpm' },
      load: { radial: '8 kN', shock: 'heavy' },
      life: { hours: '8000 h', wearAllowance: '0.5 mm' },
      space: { maxLength: '80 mm', maxOuterDiameter: '110 mm' },
      lubrication: { supply: 'grease' },
      environment: { ambient: '25 degC', contamination: 'normal', startsPerHour: 4 },
    },
  },
  {
    id: 'cost-above-all',
    expected: 'bushing',
    why: 'a modest duty where cost is what matters: the bushing is the cheapest support that does the job',
    case: {
      ...base,
      title: 'Garden-cart wheel axle',
      shaft: { diameter: '20 mm', speed: '60 rpm' },
      load: { radial: '400 N', shock: 'light' },
      life: { hours: '2000 h', wearAllowance: '0.5 mm' },
      space: { maxLength: '30 mm', maxOuterDiameter: '50 mm' },
      lubrication: { supply: 'none' },
      priorities: { cost: 5, friction: 1, maintenance: 3, noise: 1, precision: 1 },
    },
  },
  {
    id: 'quiet-running-above-all',
    expected: 'journal',
    why: 'quiet running matters most and oil is at hand: the oil film damps vibration and runs quietest',
    case: {
      ...base,
      title: 'Recording-studio chiller, circulating-fan shaft',
      shaft: { diameter: '50 mm', speed: '1800 rpm' },
      load: { radial: '3 kN', shock: 'none' },
      life: { hours: '40000 h', wearAllowance: '0.1 mm' },
      space: { maxLength: '60 mm', maxOuterDiameter: '100 mm' },
      lubrication: { supply: 'oil-feed', oil: 'ISO VG 46', inletTemperature: '40 degC' },
      environment: { ambient: '25 degC', contamination: 'clean', startsPerHour: 0.5 },
      // A fan shaft: no precision to speak of; quiet running is the requirement.
      priorities: { cost: 2, friction: 3, maintenance: 2, noise: 5, precision: 1 },
    },
  },
  {
    id: 'frequent-starts-under-load',
    expected: 'rolling',
    why: 'many starts an hour under load: a journal rubs at every start; a rolling bearing starts with low friction',
    case: {
      ...base,
      title: 'Packaging-line indexing conveyor head shaft',
      shaft: { diameter: '45 mm', speed: '600 rpm' },
      load: { radial: '5 kN', shock: 'light' },
      life: { hours: '30000 h', wearAllowance: '0.2 mm' },
      space: { maxLength: '50 mm', maxOuterDiameter: '100 mm' },
      lubrication: { supply: 'oil-bath', oil: 'ISO VG 68', inletTemperature: '40 degC' },
      environment: { ambient: '25 degC', contamination: 'normal', startsPerHour: 120 },
    },
  },
];
