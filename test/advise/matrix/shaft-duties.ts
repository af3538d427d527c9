/**
 * The practice matrix for whole shafts: shaft duties in invented settings, each with the support
 * arrangement practice accepts and why (common practice). Every dimensioned number carries its
 * unit.
 */
import type { OptionName } from '../../../src/core/options.js';

/** What practice accepts at one support: the option and, for a rolling bearing, its kinds. */
export interface AcceptedSupport {
  option: OptionName;
  /** Rolling kinds practice accepts there (only for option 'rolling'). */
  kinds?: readonly string[];
}

export interface ShaftDuty {
  id: string;
  /** The shaft case, YAML as a user writes it. */
  yaml: string;
  /** Per support, in the order of `shaft.supports`. */
  supports: [AcceptedSupport, AcceptedSupport];
  /** The arrangement summary code practice accepts. */
  summary: 'shaft.arrangement-locating-floating' | 'shaft.arrangement-cross-located';
  /** A reason code the arrangement must give (what makes the arrangement practice's). */
  reason?: string;
  /** The practice reasoning (common practice). */
  why: string;
}

export const SHAFT_DUTIES: ShaftDuty[] = [
  {
    id: 'poultry-fan-jackshaft',
    yaml: `
title: Broiler house extract fan, belt-driven jackshaft (invented)
shaft:
  speed: 1100 rpm
  diameter: 35 mm
  supports:
    - { name: pulley side, at: 0 mm, locates: true }
    - { name: fan side, at: 350 mm }
  loads:
    - { at: -90 mm, belt: { pitchDiameter: 160 mm, torque: 45 N*m, pullFactor: 2, direction: 270 deg } }
    - { at: 470 mm, weight: { mass: 18 kg } }
life: { hours: 40000 h }
space: { maxLength: 30 mm, maxOuterDiameter: 90 mm }
lubrication: { supply: grease }
environment: { ambient: 25 degC, contamination: dirty }
`,
    supports: [
      { option: 'rolling', kinds: ['deep-groove ball', 'spherical roller', 'self-aligning ball'] },
      { option: 'rolling', kinds: ['deep-groove ball', 'spherical roller', 'self-aligning ball'] },
    ],
    summary: 'shaft.arrangement-locating-floating',
    reason: 'shaft.floats-in-housing',
    why: 'common practice: a light belt-driven fan shaft runs on a locating deep-groove ball bearing and a floating one whose outer ring slides in its housing (or on self-aligning ball or spherical roller plummer blocks where the frame is not line-bored), greased for years.',
  },
  {
    id: 'feed-mill-reducer-shaft',
    yaml: `
title: Feed-mill reducer, intermediate shaft (invented)
shaft:
  speed: 300 rpm
  diameter: 55 mm
  supports:
    - { name: wheel side, at: 0 mm, locates: one-direction }
    - { name: pinion side, at: 240 mm, locates: one-direction }
  loads:
    - { at: 60 mm, gear: { pitchDiameter: 320 mm, torque: -500 N*m, pressureAngle: 20 deg, helixAngle: 12 deg, mesh: 0 deg } }
    - { at: 170 mm, gear: { pitchDiameter: 90 mm, torque: 500 N*m, pressureAngle: 20 deg, helixAngle: 15 deg, mesh: 180 deg } }
load: { shock: moderate }
life: { hours: 30000 h }
space: { maxLength: 50 mm, maxOuterDiameter: 130 mm }
lubrication: { supply: oil-bath, oil: ISO VG 220 }
`,
    supports: [
      { option: 'rolling', kinds: ['tapered roller', 'angular-contact ball'] },
      { option: 'rolling', kinds: ['tapered roller', 'angular-contact ball'] },
    ],
    summary: 'shaft.arrangement-cross-located',
    reason: 'shaft.induced-axial',
    why: 'common practice: a short helical reducer shaft with thrust either way on a mirrored pair of tapered roller bearings, cross-located and set by shims to a small axial play, running in the gear oil.',
  },
  {
    id: 'quarry-tail-pulley-shaft',
    yaml: `
title: Sand quarry stacker conveyor, tail pulley shaft (invented)
shaft:
  speed: 80 rpm
  diameter: 90 mm
  supports:
    - { name: left bearing, at: 0 mm, locates: true }
    - { name: right bearing, at: 1600 mm }
  loads:
    - { at: 300 mm, force: { y: 0 N, z: -25 kN } }
    - { at: 1300 mm, force: { y: 0 N, z: -25 kN } }
life: { hours: 50000 h }
space: { maxLength: 100 mm, maxOuterDiameter: 200 mm }
lubrication: { supply: grease }
environment: { ambient: 15 degC, contamination: dirty }
`,
    supports: [
      { option: 'rolling', kinds: ['spherical roller', 'self-aligning ball'] },
      { option: 'rolling', kinds: ['spherical roller', 'self-aligning ball'] },
    ],
    summary: 'shaft.arrangement-locating-floating',
    reason: 'shaft.self-aligning',
    why: 'common practice: a long pulley shaft bends under the belt pull (here about 25 arc min at the bearings) and the plummer blocks sit on separate steelwork: spherical roller bearings, one located, one free to slide in its housing.',
  },
  {
    id: 'tipper-body-pivot',
    yaml: `
title: Farm tipping trailer, body rear pivot shaft (invented)
shaft:
  oscillation: { angle: 50 deg, frequency: 0.005 Hz }
  diameter: 50 mm
  supports:
    - { name: left lug, at: 0 mm, locates: true }
    - { name: right lug, at: 500 mm }
  loads:
    - { at: 250 mm, force: { y: -24 kN, z: 0 N }, axial: 1 kN }
load: { shock: heavy }
life: { hours: 5000 h, wearAllowance: 0.5 mm }
space: { maxLength: 75 mm, maxOuterDiameter: 75 mm }
lubrication: { supply: grease }
environment: { ambient: 15 degC, contamination: dirty }
`,
    supports: [{ option: 'bushing' }, { option: 'bushing' }],
    summary: 'shaft.arrangement-locating-floating',
    reason: 'shaft.locating-thrust-face',
    why: 'common practice: a slow, heavily loaded pivot that swings a few times an hour in the dirt runs on greased steel or bronze bushes, one with a thrust washer against the lug taking the side load; rolling bearings would brinell and a film never forms.',
  },
  {
    id: 'process-pump-shaft',
    yaml: `
title: Dairy cleaning-in-place pump, bearing-frame shaft (invented)
shaft:
  speed: 2900 rpm
  diameter: 40 mm
  supports:
    - { name: pump end, at: 0 mm }
    - { name: drive end, at: 160 mm, locates: true }
  loads:
    - { at: -150 mm, force: { y: 900 N, z: 0 N }, axial: 1.6 kN }
life: { hours: 40000 h }
space: { maxLength: 30 mm, maxOuterDiameter: 100 mm }
lubrication: { supply: oil-bath, oil: ISO VG 68 }
environment: { ambient: 30 degC, contamination: clean }
`,
    supports: [
      { option: 'rolling', kinds: ['cylindrical roller', 'deep-groove ball'] },
      { option: 'rolling', kinds: ['angular-contact ball', 'deep-groove ball'] },
    ],
    summary: 'shaft.arrangement-locating-floating',
    why: 'common practice: an overhung pump impeller on an oil-bath bearing frame: a floating cylindrical roller (or deep-groove ball) bearing at the pump end, a locating angular-contact pair (or a deep-groove ball bearing on a light pump) at the drive end taking the hydraulic thrust both ways.',
  },
  {
    id: 'label-roller-shaft',
    yaml: `
title: Bottle labeller, pressure roller shaft (invented)
shaft:
  speed: 150 rpm
  diameter: 25 mm
  supports:
    - { name: frame side, at: 0 mm, locates: one-direction }
    - { name: outboard side, at: 150 mm, locates: one-direction }
  loads:
    - { at: 75 mm, force: { y: -500 N, z: 0 N }, axial: 40 N }
life: { hours: 30000 h }
space: { maxLength: 20 mm, maxOuterDiameter: 62 mm }
lubrication: { supply: grease }
environment: { ambient: 20 degC, contamination: normal }
`,
    supports: [
      { option: 'rolling', kinds: ['deep-groove ball'] },
      { option: 'rolling', kinds: ['deep-groove ball'] },
    ],
    summary: 'shaft.arrangement-cross-located',
    reason: 'shaft.cross-located-kind',
    why: 'common practice: a short, lightly loaded roller shaft is cross-located on two sealed deep-groove ball bearings, each held against a shoulder on one side, with a little end play; nothing dearer is needed.',
  },
];
