/**
 * Practice matrix, part 3: turbomachines, machine-tool and high-speed spindles, paper machine,
 * engine, wind and rail. Every setting is invented; `why` gives the practice reasoning (common
 * practice).
 */
import type { Duty } from './duty.js';

export const FAST_DUTIES: Duty[] = [
  {
    id: 'air-separation-gear-pinion',
    family: 'turbomachine',
    yaml: `
title: Northfleet air-separation plant, main air compressor integral gear, high-speed pinion bearing
shaft: { diameter: 90 mm, speed: 12000 rpm }
# the mesh load comes with torque; at rest the bearing holds the pinion's weight
load: { radial: 18 kN, atStart: 500 N, axial: 0 N, shock: none }
life: { hours: 100000 h, wearAllowance: 0.05 mm }
space: { maxLength: 90 mm, maxOuterDiameter: 180 mm }
lubrication: { supply: oil-feed, oil: ISO VG 32, inletTemperature: 45 degC }
environment: { ambient: 30 degC, contamination: clean, startsPerHour: 0.05 }
priorities: { cost: 2, friction: 4, maintenance: 4, noise: 3, precision: 4 }
`,
    accept: ['journal'],
    reject: ['bushing', 'rolling'],
    why: 'common practice: high-speed gear pinions at over 50 m/s surface speed run on pressure-fed oil-film (tilting-pad or lobed) bearings: no fatigue life limit, damping, and rolling elements would be far beyond their speed range at this size.',
  },
  {
    id: 'back-pressure-steam-turbine',
    family: 'turbomachine',
    yaml: `
title: Oakhurst paper mill, back-pressure steam turbine, exhaust-end journal bearing
shaft: { diameter: 120 mm, speed: 7000 rpm }
load: { radial: 12 kN, axial: 0 N, shock: none }
life: { hours: 150000 h, wearAllowance: 0.05 mm }
space: { maxLength: 120 mm, maxOuterDiameter: 220 mm }
lubrication: { supply: oil-feed, oil: ISO VG 32, inletTemperature: 45 degC }
environment: { ambient: 40 degC, contamination: clean, startsPerHour: 0.01 }
priorities: { cost: 2, friction: 3, maintenance: 5, noise: 3, precision: 3 }
`,
    accept: ['journal'],
    reject: ['bushing', 'rolling'],
    why: 'common practice: industrial steam turbines run on pressure-fed babbitted sleeve or tilting-pad bearings from the turbine oil system: decades of running, damping through critical speeds, no fatigue life.',
  },
  {
    id: 'francis-turbine-guide',
    family: 'turbomachine',
    yaml: `
title: Llyn Garw hydro station, vertical Francis turbine, turbine guide bearing
shaft: { diameter: 420 mm, speed: 375 rpm }
load: { radial: 50 kN, axial: 0 N, shock: none }
life: { hours: 200000 h, wearAllowance: 0.05 mm }
space: { maxLength: 300 mm, maxOuterDiameter: 700 mm }
lubrication: { supply: oil-bath, oil: ISO VG 46, inletTemperature: 40 degC }
environment: { ambient: 15 degC, contamination: clean, startsPerHour: 0.05 }
priorities: { cost: 2, friction: 3, maintenance: 5, noise: 2, precision: 2 }
`,
    accept: ['journal'],
    reject: ['bushing'],
    why: 'common practice: guide bearings of vertical hydro units are oil-bath babbitted segment or sleeve bearings, self-pumping from their own reservoir, running for decades; the large shaft makes rolling bearings costly and short-lived at this speed.',
  },
  {
    id: 'gas-recycle-compressor',
    family: 'turbomachine',
    yaml: `
title: Tern Point gas terminal, centrifugal recycle compressor, non-drive-end journal bearing
shaft: { diameter: 75 mm, speed: 11000 rpm }
load: { radial: 5 kN, axial: 0 N, shock: none }
life: { hours: 150000 h, wearAllowance: 0.05 mm }
space: { maxLength: 60 mm, maxOuterDiameter: 150 mm }
lubrication: { supply: oil-feed, oil: ISO VG 32, inletTemperature: 45 degC }
environment: { ambient: 30 degC, contamination: clean, startsPerHour: 0.02 }
priorities: { cost: 2, friction: 3, maintenance: 5, noise: 3, precision: 4 }
`,
    accept: ['journal'],
    reject: ['bushing', 'rolling'],
    why: 'common practice: process centrifugal compressors run on tilting-pad oil-film bearings fed from the lube console: years between overhauls, damping of the rotor, no fatigue life.',
  },
  {
    id: 'two-pole-pumping-motor',
    family: 'heavy rotating',
    yaml: `
title: Stanmore water pumping station, 1.6 MW two-pole induction motor, drive-end bearing
shaft: { diameter: 110 mm, speed: 2980 rpm }
load: { radial: 9 kN, axial: 0 N, shock: none }
life: { hours: 100000 h, wearAllowance: 0.05 mm }
space: { maxLength: 110 mm, maxOuterDiameter: 220 mm }
lubrication: { supply: oil-bath, oil: ISO VG 46, inletTemperature: 50 degC }
environment: { ambient: 30 degC, contamination: clean, startsPerHour: 0.1 }
priorities: { cost: 3, friction: 3, maintenance: 4, noise: 4, precision: 2 }
`,
    accept: ['journal', 'rolling'],
    reject: ['bushing'],
    why: 'common practice: large two-pole motors use ring-oiled sleeve bearings for long unattended life and quiet running; below a few megawatts many are built with oil-lubricated rolling bearings instead.',
    ambiguous: 'at 1.6 MW motor makers offer both; sleeve bearings for life and noise, rolling for cost.',
  },
  {
    id: 'toolroom-lathe-spindle',
    family: 'machine tool',
    yaml: `
title: Greaves and Daughter toolroom, centre lathe headstock spindle, front bearing
shaft: { diameter: 70 mm, speed: 2000 rpm }
load: { radial: 4 kN, axial: 2 kN, shock: light }
life: { hours: 20000 h, wearAllowance: 0.01 mm }
space: { maxLength: 50 mm, maxOuterDiameter: 110 mm }
lubrication: { supply: grease, inletTemperature: 25 degC }
environment: { ambient: 20 degC, contamination: clean, startsPerHour: 10 }
priorities: { cost: 2, friction: 3, maintenance: 4, noise: 3, precision: 5 }
`,
    accept: ['rolling'],
    reject: ['bushing'],
    why: 'common practice: lathe spindles run on preloaded precision rolling bearings (angular-contact ball sets, or a double-row cylindrical roller with a thrust pair), greased for life; stiff at every speed from zero, which a film is not.',
  },
  {
    id: 'surface-grinder-spindle',
    family: 'machine tool',
    yaml: `
title: Greaves and Daughter toolroom, surface grinder wheel spindle
shaft: { diameter: 45 mm, speed: 2900 rpm }
load: { radial: 800 N, axial: 0 N, shock: none }
life: { hours: 30000 h, wearAllowance: 0.01 mm }
space: { maxLength: 80 mm, maxOuterDiameter: 90 mm }
lubrication: { supply: oil-feed, oil: ISO VG 10, inletTemperature: 25 degC }
environment: { ambient: 20 degC, contamination: clean, startsPerHour: 4 }
priorities: { cost: 2, friction: 3, maintenance: 3, noise: 4, precision: 5 }
`,
    accept: ['journal', 'rolling'],
    reject: ['bushing'],
    why: 'common practice: grinder wheel spindles run either on hydrodynamic (often multi-lobe) bearings in light spindle oil, prized for smooth finish and damping, or on preloaded precision angular-contact ball bearings.',
    ambiguous: 'makers split between oil-film and precision rolling spindles for this size.',
  },
  {
    id: 'cnc-router-spindle',
    family: 'high speed',
    yaml: `
title: Ashwell joinery, CNC router 24 000 rpm spindle, front bearing
shaft: { diameter: 25 mm, speed: 24000 rpm }
load: { radial: 300 N, axial: 150 N, shock: light }
life: { hours: 10000 h, wearAllowance: 0.01 mm }
space: { maxLength: 30 mm, maxOuterDiameter: 52 mm }
lubrication: { supply: grease, inletTemperature: 25 degC }
environment: { ambient: 25 degC, contamination: normal, startsPerHour: 10 }
priorities: { cost: 3, friction: 3, maintenance: 4, noise: 3, precision: 5 }
`,
    accept: ['rolling'],
    reject: ['bushing', 'journal'],
    why: 'common practice: router and milling electro-spindles run on preloaded angular-contact ball bearings greased for life; no oil system in a joinery and a rubbing bush cannot take 30 m/s.',
  },
  {
    id: 'paper-dryer-cylinder',
    family: 'paper machine',
    yaml: `
title: Oakhurst paper mill, dryer section, dryer cylinder front-side bearing
shaft: { diameter: 200 mm, speed: 170 rpm }
load: { radial: 110 kN, axial: 0 N, shock: light }
life: { hours: 100000 h, wearAllowance: 0.05 mm }
space: { maxLength: 110 mm, maxOuterDiameter: 360 mm }
lubrication: { supply: oil-feed, oil: ISO VG 220, inletTemperature: 55 degC }
environment: { ambient: 80 degC, contamination: normal, startsPerHour: 0.01 }
priorities: { cost: 3, friction: 3, maintenance: 4, noise: 2, precision: 2 }
`,
    accept: ['rolling'],
    reject: ['bushing'],
    why: "common practice: paper machine dryer cylinders run on spherical roller bearings on the mill's circulating-oil system, which carries the steam heat away; the front side free to float with the cylinder's growth.",
  },
  {
    id: 'gas-engine-generator',
    family: 'heavy rotating',
    yaml: `
title: Penhallow gas-engine power plant, 10 MW four-pole generator, non-drive-end bearing
shaft: { diameter: 240 mm, speed: 1500 rpm }
load: { radial: 45 kN, axial: 0 N, shock: none }
life: { hours: 150000 h, wearAllowance: 0.05 mm }
space: { maxLength: 200 mm, maxOuterDiameter: 420 mm }
lubrication: { supply: oil-feed, oil: ISO VG 46, inletTemperature: 45 degC }
environment: { ambient: 35 degC, contamination: clean, startsPerHour: 0.05 }
priorities: { cost: 2, friction: 3, maintenance: 5, noise: 3, precision: 2 }
`,
    accept: ['journal'],
    reject: ['bushing'],
    why: "common practice: generators of this size run on pressure-fed (or ring-oiled) white-metal sleeve bearings: no fatigue life over decades, damping, and the engine's lube-oil system is next to it.",
  },
  {
    id: 'wind-turbine-main-shaft',
    family: 'heavy rotating',
    yaml: `
title: Cairnfell community wind turbine, 100 kW, main shaft rotor-side bearing
shaft: { diameter: 150 mm, speed: 45 rpm }
# the equivalent of the load spectrum over its life, not the storm peak
load: { radial: 40 kN, axial: 15 kN, shock: light }
life: { hours: 175000 h, wearAllowance: 0.3 mm }
space: { maxLength: 120 mm, maxOuterDiameter: 280 mm }
# the grease's base oil
lubrication: { supply: grease, oil: ISO VG 320, inletTemperature: 20 degC }
environment: { ambient: 10 degC, contamination: normal, startsPerHour: 1 }
priorities: { cost: 3, friction: 2, maintenance: 5, noise: 1, precision: 1 }
`,
    accept: ['rolling'],
    reject: ['journal'],
    why: 'common practice: wind turbine main shafts run on large spherical or tapered roller bearings with automatic greasing: slow, heavy, with rotor thrust, far from any oil system.',
  },
  {
    id: 'metro-axlebox',
    family: 'heavy rotating',
    yaml: `
title: Riverside metro, trailer car axlebox
shaft: { diameter: 130 mm, speed: 700 rpm }
load: { radial: 80 kN, axial: 10 kN, shock: light }
life: { hours: 15000 h, wearAllowance: 0.05 mm }
space: { maxLength: 180 mm, maxOuterDiameter: 240 mm }
lubrication: { supply: grease, inletTemperature: 30 degC }
environment: { ambient: 30 degC, contamination: dirty, startsPerHour: 10 }
priorities: { cost: 3, friction: 3, maintenance: 5, noise: 2, precision: 1 }
`,
    accept: ['rolling'],
    reject: ['bushing', 'journal'],
    why: 'common practice: railway axleboxes are sealed, greased tapered or cylindrical roller units: over a million kilometres (15 000 h at a mean 700 rpm) between overhauls, the flange thrust taken, no oil to top up; plain axleboxes went out with their hot boxes.',
  },
];
