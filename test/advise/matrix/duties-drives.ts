/**
 * Practice matrix, part 1: conveyors, gear reducers, worm drives, pumps and fans. Every setting
 * is invented; `why` gives the practice reasoning (common practice).
 */
import type { Duty } from './duty.js';

export const DRIVE_DUTIES: Duty[] = [
  {
    id: 'quarry-return-idler',
    family: 'conveyor',
    yaml: `
title: Hollin Edge quarry, overland belt conveyor, return idler roll bearing
shaft: { diameter: 20 mm, speed: 480 rpm }
load: { radial: 400 N, axial: 0 N, shock: light }
life: { hours: 40000 h, wearAllowance: 0.3 mm }
space: { maxLength: 20 mm, maxOuterDiameter: 52 mm }
lubrication: { supply: none }
environment: { ambient: 15 degC, contamination: dirty, startsPerHour: 0.5 }
priorities: { cost: 4, friction: 3, maintenance: 5, noise: 2, precision: 1 }
`,
    accept: ['rolling'],
    reject: ['journal'],
    why: 'common practice: conveyor idler rolls run on sealed deep-groove ball bearings greased for life behind labyrinth seals; thousands per conveyor, never relubricated; no oil system exists for a film.',
  },
  {
    id: 'colliery-drive-pulley',
    family: 'conveyor',
    yaml: `
title: Deepcut colliery trunk conveyor, drive pulley shaft, drive-side plummer block
shaft: { diameter: 160 mm, speed: 75 rpm }
load: { radial: 120 kN, axial: 0 N, shock: light }
life: { hours: 60000 h, wearAllowance: 0.3 mm }
space: { maxLength: 120 mm, maxOuterDiameter: 300 mm }
# the grease's base oil
lubrication: { supply: grease, oil: ISO VG 220, inletTemperature: 30 degC }
environment: { ambient: 20 degC, contamination: dirty, startsPerHour: 0.5 }
priorities: { cost: 3, friction: 2, maintenance: 4, noise: 1, precision: 1 }
`,
    accept: ['rolling'],
    reject: ['bushing', 'journal'],
    why: 'common practice: heavy conveyor pulleys sit on spherical roller bearings in greased split plummer blocks, which carry the belt pull, accept shaft deflection and are regreased on the round; a rubbing bush at this load and speed would wear out, and grease cannot hold a film.',
  },
  {
    id: 'biscuit-oven-sprocket',
    family: 'conveyor',
    yaml: `
title: Kettleby biscuit bakery, tunnel-oven band conveyor, return sprocket shaft inside the oven
shaft: { diameter: 40 mm, speed: 8 rpm }
load: { radial: 2.5 kN, axial: 0 N, shock: none }
life: { hours: 30000 h, wearAllowance: 0.5 mm }
space: { maxLength: 60 mm, maxOuterDiameter: 70 mm }
lubrication: { supply: none }
environment: { ambient: 200 degC, contamination: normal, startsPerHour: 0.1 }
priorities: { cost: 3, friction: 2, maintenance: 5, noise: 1, precision: 1 }
`,
    accept: ['bushing'],
    reject: ['journal'],
    why: 'common practice: slow shafts inside a 200 degC oven run in dry solid-lubricated bushes (graphite-plugged bronze, carbon-graphite); grease cooks and oil would drip on food, so no film and no ordinary greased rolling bearing.',
    ambiguous:
      'special high-temperature rolling bearings with a solid-lubricant cage and large clearance are also sold for oven conveyors; the tool models the ordinary greased kind.',
  },
  {
    id: 'poultry-washdown-idler',
    family: 'food and packaging',
    yaml: `
title: Brackenfield poultry plant, wash-down belt conveyor, idler roller
shaft: { diameter: 20 mm, speed: 90 rpm }
load: { radial: 250 N, axial: 0 N, shock: none }
life: { hours: 20000 h, wearAllowance: 0.5 mm }
space: { maxLength: 30 mm, maxOuterDiameter: 40 mm }
lubrication: { supply: none }
environment: { ambient: 5 degC, contamination: normal, startsPerHour: 2, medium: water }
priorities: { cost: 4, friction: 2, maintenance: 5, noise: 2, precision: 1 }
`,
    accept: ['bushing', 'rolling'],
    reject: ['journal'],
    why: 'common practice: a wash-down food conveyor allows no lubricant that can reach product; light slow rollers run in acetal or UHMW-PE bushes that shrug off the hose, or in sealed stainless ball bearings with food-grade grease.',
    ambiguous:
      'plants differ: some standardise on polymer bushes (nothing to grease, nothing to rust), others on sealed stainless ball bearings (lower friction).',
  },
  {
    id: 'cement-reducer-intermediate',
    family: 'gear reducer',
    yaml: `
title: Carrow Mill cement works, raw-mill feed conveyor helical reducer, intermediate shaft
shaft: { diameter: 55 mm, speed: 360 rpm }
# a uniformly fed belt conveyor: a uniform load for the reducer
load: { radial: 9 kN, axial: 3.5 kN, shock: light }
life: { hours: 40000 h, wearAllowance: 0.05 mm }
space: { maxLength: 35 mm, maxOuterDiameter: 120 mm }
lubrication: { supply: oil-bath, oil: ISO VG 220, inletTemperature: 65 degC }
environment: { ambient: 35 degC, contamination: normal, startsPerHour: 2 }
priorities: { cost: 3, friction: 3, maintenance: 4, noise: 2, precision: 3 }
`,
    accept: ['rolling'],
    reject: ['bushing', 'journal'],
    why: 'common practice: helical reducer shafts run on tapered roller (or ball) bearings splashed from the gear oil; they carry the helix thrust, hold the gear mesh position and fit the casing bores; plain bearings are not used in industrial reducers of this size.',
  },
  {
    id: 'clarifier-reducer-input',
    family: 'gear reducer',
    yaml: `
title: Halden water treatment works, clarifier drive helical reducer, input shaft
shaft: { diameter: 30 mm, speed: 1450 rpm }
load: { radial: 1.5 kN, axial: 600 N, shock: light }
life: { hours: 60000 h, wearAllowance: 0.05 mm }
space: { maxLength: 20 mm, maxOuterDiameter: 72 mm }
lubrication: { supply: oil-bath, oil: ISO VG 220, inletTemperature: 55 degC }
environment: { ambient: 20 degC, contamination: normal, startsPerHour: 0.2 }
priorities: { cost: 3, friction: 3, maintenance: 4, noise: 3, precision: 2 }
`,
    accept: ['rolling'],
    reject: ['bushing', 'journal'],
    why: 'common practice: the input shaft of a small helical reducer runs on deep-groove ball bearings in the splash of the gear oil; cheap, compact, long-lived, locating the helix thrust.',
  },
  {
    id: 'stage-lift-worm',
    family: 'worm drive',
    yaml: `
title: Orchard Street theatre, orchestra-pit lift, worm gearbox worm shaft (locating end)
shaft: { diameter: 45 mm, speed: 1450 rpm }
load: { radial: 3 kN, axial: 10 kN, shock: light }
# about two hours a day, 300 days a year, for ten years
life: { hours: 6000 h, wearAllowance: 0.05 mm }
space: { maxLength: 45 mm, maxOuterDiameter: 100 mm }
lubrication: { supply: oil-bath, oil: ISO VG 460, inletTemperature: 55 degC }
environment: { ambient: 20 degC, contamination: clean, startsPerHour: 20 }
priorities: { cost: 3, friction: 3, maintenance: 4, noise: 4, precision: 2 }
`,
    accept: ['rolling'],
    reject: ['bushing', 'journal'],
    why: 'common practice: a worm shaft carries a tooth thrust several times its radial load; it is located by a pair of tapered roller or angular-contact ball bearings in the gear oil; a plain bearing would need a separate thrust face and runs hot at motor speed.',
  },
  {
    id: 'scour-valve-worm',
    family: 'worm drive',
    yaml: `
title: Ashby reservoir, scour-valve actuator, worm shaft
shaft: { diameter: 25 mm, speed: 40 rpm }
load: { radial: 800 N, axial: 5 kN, shock: light }
life: { hours: 500 h, wearAllowance: 0.2 mm }
space: { maxLength: 30 mm, maxOuterDiameter: 52 mm }
lubrication: { supply: grease, inletTemperature: 10 degC }
environment: { ambient: 10 degC, contamination: normal, startsPerHour: 2 }
priorities: { cost: 4, friction: 2, maintenance: 4, noise: 1, precision: 1 }
`,
    accept: ['rolling', 'bushing'],
    reject: ['journal'],
    why: 'common practice: a valve actuator runs a few hundred hours in its life; the worm thrust is taken on a thrust ball or tapered roller bearing, or in cheaper actuators on greased bronze bushes with thrust washers.',
    ambiguous: 'makers differ: rolling thrust bearings for efficiency, greased bronze bush and washer for cost.',
  },
  {
    id: 'chemical-transfer-pump',
    family: 'pump',
    yaml: `
title: Saltcote chemical works, end-suction transfer pump, bearing frame thrust end
shaft: { diameter: 45 mm, speed: 2950 rpm }
load: { radial: 2 kN, axial: 1.8 kN, shock: none }
life: { hours: 40000 h, wearAllowance: 0.05 mm }
space: { maxLength: 50 mm, maxOuterDiameter: 100 mm }
lubrication: { supply: oil-bath, oil: ISO VG 68, inletTemperature: 60 degC }
environment: { ambient: 30 degC, contamination: normal, startsPerHour: 0.5 }
priorities: { cost: 3, friction: 3, maintenance: 4, noise: 3, precision: 2 }
`,
    accept: ['rolling'],
    reject: ['bushing', 'journal'],
    why: 'common practice: process pumps of this size have a bearing frame with a pair of angular-contact ball bearings in an oil sump taking the impeller thrust; sleeve bearings only appear on much larger, faster pumps.',
  },
  {
    id: 'boiler-feed-pump',
    family: 'pump',
    yaml: `
title: Marsden biomass power station, multistage boiler-feed pump, drive-end radial bearing
shaft: { diameter: 100 mm, speed: 4500 rpm }
load: { radial: 7 kN, axial: 0 N, shock: none }
life: { hours: 100000 h, wearAllowance: 0.05 mm }
space: { maxLength: 100 mm, maxOuterDiameter: 170 mm }
lubrication: { supply: oil-feed, oil: ISO VG 32, inletTemperature: 45 degC }
environment: { ambient: 35 degC, contamination: clean, startsPerHour: 0.02 }
priorities: { cost: 2, friction: 3, maintenance: 4, noise: 3, precision: 3 }
`,
    accept: ['journal'],
    reject: ['bushing'],
    why: "common practice: high-energy boiler-feed pumps run on pressure-fed sleeve (oil-film) bearings from the set's lube-oil console: no fatigue life, damping for the long rotor, the thrust on a separate balance drum and thrust bearing.",
  },
  {
    id: 'colliery-sump-pump-guide',
    family: 'pump',
    yaml: `
title: Greyholme colliery dewatering sump, vertical line-shaft pump, column guide bearing in the pumped water
shaft: { diameter: 40 mm, speed: 1470 rpm }
load: { radial: 250 N, axial: 0 N, shock: light }
life: { hours: 20000 h, wearAllowance: 0.5 mm }
space: { maxLength: 80 mm, maxOuterDiameter: 60 mm }
lubrication: { supply: none }
environment: { ambient: 15 degC, contamination: severe, startsPerHour: 1, medium: water }
priorities: { cost: 3, friction: 2, maintenance: 5, noise: 1, precision: 1 }
`,
    accept: ['bushing'],
    reject: ['rolling', 'journal'],
    why: 'common practice: the column guides of a vertical sump pump run in the pumped water on rubber or polymer bushes that the water cools and flushes; a rolling bearing submerged in gritty water fails quickly and there is no oil down the column.',
  },
  {
    id: 'biomass-id-fan',
    family: 'fan',
    yaml: `
title: Thornbury biomass boiler house, induced-draught fan, non-drive-end bearing
shaft: { diameter: 100 mm, speed: 1480 rpm }
load: { radial: 14 kN, axial: 0 N, shock: light }
life: { hours: 60000 h, wearAllowance: 0.05 mm }
space: { maxLength: 60 mm, maxOuterDiameter: 215 mm }
lubrication: { supply: oil-bath, oil: ISO VG 68, inletTemperature: 70 degC }
environment: { ambient: 55 degC, contamination: dirty, startsPerHour: 0.05 }
priorities: { cost: 3, friction: 3, maintenance: 4, noise: 2, precision: 1 }
`,
    accept: ['rolling'],
    reject: ['bushing'],
    why: 'common practice: fan shafts of this size run on spherical roller bearings in oil-bath plummer blocks; they take the ash-induced imbalance and shaft deflection; sleeve bearings are kept for the largest fans.',
  },
  {
    id: 'greenhouse-circulation-fan',
    family: 'fan',
    yaml: `
title: Ledsham nurseries, greenhouse air-circulation fan, motor shaft bearing
shaft: { diameter: 10 mm, speed: 1400 rpm }
load: { radial: 30 N, axial: 0 N, shock: none }
life: { hours: 30000 h, wearAllowance: 0.1 mm }
space: { maxLength: 15 mm, maxOuterDiameter: 26 mm }
lubrication: { supply: none }
environment: { ambient: 35 degC, contamination: normal, startsPerHour: 0.2 }
priorities: { cost: 5, friction: 2, maintenance: 4, noise: 3, precision: 1 }
`,
    accept: ['bushing', 'rolling'],
    reject: ['journal'],
    why: 'common practice: small fan motors run either in oil-impregnated sintered bronze bushes (cheapest, quiet) or in shielded ball bearings (longer life in heat); nothing is ever relubricated.',
    ambiguous:
      'the cheapest fans use sintered bushes, the long-life ones ball bearings; both are sold for the same job.',
  },
];
