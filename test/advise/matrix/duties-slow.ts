/**
 * Practice matrix, part 2: slow heavy pins and hinges, kiln and dryer trunnions, agricultural,
 * food, marine, office and slurry duties. Every setting is invented; `why` gives the practice
 * reasoning (common practice).
 */
import type { Duty } from './duty.js';

export const SLOW_DUTIES: Duty[] = [
  {
    id: 'excavator-boom-foot-pin',
    family: 'pin or hinge',
    yaml: `
title: Hatherley civil contractors, 30 t crawler excavator, boom foot pin
shaft:
  diameter: 100 mm
  oscillation: { angle: 50 deg, frequency: 0.25 Hz }
load: { radial: 300 kN, axial: 0 N, shock: heavy }
life: { hours: 8000 h, wearAllowance: 1 mm }
space: { maxLength: 150 mm, maxOuterDiameter: 130 mm }
lubrication: { supply: grease, inletTemperature: 20 degC }
environment: { ambient: 20 degC, contamination: severe, startsPerHour: 60 }
priorities: { cost: 3, friction: 1, maintenance: 3, noise: 1, precision: 1 }
`,
    accept: ['bushing'],
    reject: ['rolling', 'journal'],
    why: 'common practice: excavator pins are hardened steel in greased hardened-steel or bronze bushes: the small swing and the blows would false-brinell rolling elements, and the bush spreads the shock over its area and is cheap to replace.',
  },
  {
    id: 'wet-dock-gate-hinge',
    family: 'pin or hinge',
    yaml: `
title: Port Gellan wet dock, lock gate upper hinge pin
shaft:
  diameter: 180 mm
  oscillation: { angle: 90 deg, frequency: 0.00014 Hz }
load: { radial: 350 kN, axial: 0 N, shock: moderate }
life: { hours: 200000 h, wearAllowance: 2 mm }
space: { maxLength: 300 mm, maxOuterDiameter: 240 mm }
lubrication: { supply: none }
environment: { ambient: 10 degC, contamination: severe, startsPerHour: 0.5, medium: water }
priorities: { cost: 3, friction: 1, maintenance: 5, noise: 1, precision: 1 }
`,
    accept: ['bushing'],
    reject: ['rolling', 'journal'],
    why: 'common practice: lock gate hinges turn a quarter turn a dozen times a day in salt water and silt; they are self-lubricating bronze or composite bushes, never greased in service and never rolling bearings.',
  },
  {
    id: 'sts-crane-rope-sheave',
    family: 'pin or hinge',
    yaml: `
title: Kellet container terminal, ship-to-shore crane, hoist-rope sheave on its pin
shaft: { diameter: 110 mm, speed: 48 rpm }
load: { radial: 80 kN, axial: 0 N, shock: light }
life: { hours: 25000 h, wearAllowance: 0.3 mm }
space: { maxLength: 140 mm, maxOuterDiameter: 200 mm }
lubrication: { supply: grease, inletTemperature: 15 degC }
environment: { ambient: 15 degC, contamination: normal, startsPerHour: 30 }
priorities: { cost: 3, friction: 3, maintenance: 4, noise: 1, precision: 1 }
`,
    accept: ['rolling'],
    reject: ['journal'],
    why: 'common practice: rope sheaves that turn continuously with the hoist run on sealed cylindrical or spherical roller bearings in the hub; low friction keeps rope tension even across the reeving.',
    ambiguous:
      'small or rarely used sheaves run on greased bronze bushes; for a duty crane sheave rolling is the norm.',
  },
  {
    id: 'front-loader-arm-pivot',
    family: 'pin or hinge',
    yaml: `
title: Winterbourne farm, tractor front-loader arm pivot on its mounting frame
shaft:
  diameter: 45 mm
  oscillation: { angle: 60 deg, frequency: 0.1 Hz }
load: { radial: 40 kN, axial: 0 N, shock: heavy }
life: { hours: 3000 h, wearAllowance: 1 mm }
space: { maxLength: 70 mm, maxOuterDiameter: 60 mm }
lubrication: { supply: grease, inletTemperature: 10 degC }
environment: { ambient: 10 degC, contamination: severe, startsPerHour: 40 }
priorities: { cost: 4, friction: 1, maintenance: 3, noise: 1, precision: 1 }
`,
    accept: ['bushing'],
    reject: ['rolling', 'journal'],
    why: 'common practice: loader pivots are greased steel pins in hardened steel or bronze bushes: slow swing under blows in mud, a thin section, a grease nipple on the daily round.',
  },
  {
    id: 'scrap-shear-pivot',
    family: 'pin or hinge',
    yaml: `
title: Medway scrap yard, alligator shear, blade-arm pivot
shaft:
  diameter: 80 mm
  oscillation: { angle: 30 deg, frequency: 0.3 Hz }
load: { radial: 200 kN, axial: 0 N, shock: heavy }
life: { hours: 10000 h, wearAllowance: 1 mm }
space: { maxLength: 120 mm, maxOuterDiameter: 110 mm }
lubrication: { supply: grease, inletTemperature: 15 degC }
environment: { ambient: 15 degC, contamination: severe, startsPerHour: 20 }
priorities: { cost: 3, friction: 1, maintenance: 3, noise: 1, precision: 1 }
`,
    accept: ['bushing'],
    reject: ['rolling', 'journal'],
    why: 'common practice: shear and press pivots take cutting blows on a short swing; a greased bronze or hardened steel bush survives them, rolling elements brinell and fret.',
  },
  {
    id: 'solar-tracker-pivot',
    family: 'pin or hinge',
    yaml: `
title: Fenwick Moor solar farm, single-axis tracker, torque-tube support bearing
shaft:
  diameter: 80 mm
  oscillation: { angle: 100 deg, frequency: 0.0000116 Hz }
load: { radial: 6 kN, axial: 0 N, shock: moderate }
life: { hours: 220000 h, wearAllowance: 1 mm }
space: { maxLength: 60 mm, maxOuterDiameter: 110 mm }
lubrication: { supply: none }
environment: { ambient: 25 degC, contamination: dirty, startsPerHour: 0.05 }
priorities: { cost: 5, friction: 1, maintenance: 5, noise: 1, precision: 1 }
`,
    accept: ['bushing'],
    reject: ['journal'],
    why: 'common practice: tracker rows swing once a day for 25 years in dust and rain with no maintenance; the supports are polymer (UHMW-PE, acetal) bushes, cheap and never greased.',
  },
  {
    id: 'lime-kiln-support-roller',
    family: 'kiln or dryer',
    yaml: `
title: Cragside lime works, rotary kiln, support-roller shaft bearing
shaft: { diameter: 200 mm, speed: 8 rpm }
load: { radial: 350 kN, axial: 0 N, shock: light }
life: { hours: 100000 h, wearAllowance: 0.5 mm }
space: { maxLength: 300 mm, maxOuterDiameter: 400 mm }
lubrication: { supply: oil-bath, oil: ISO VG 680, inletTemperature: 60 degC }
environment: { ambient: 60 degC, contamination: dirty, startsPerHour: 0.01 }
priorities: { cost: 3, friction: 2, maintenance: 4, noise: 1, precision: 1 }
`,
    accept: ['rolling', 'journal'],
    reject: [],
    why: 'common practice: kiln support rollers run either on large spherical roller bearings or on oil-lubricated sleeve bearings fed by a dipper from the housing sump; both are in service.',
    ambiguous:
      'newer kilns use rolling bearings, older ones oil-bath sleeve bearings that run in a mixed film at 8 rpm; practitioners argue either way.',
  },
  {
    id: 'fertiliser-dryer-trunnion',
    family: 'kiln or dryer',
    yaml: `
title: Ellerby fertiliser works, granulator drum dryer, trunnion roller shaft
shaft: { diameter: 160 mm, speed: 25 rpm }
load: { radial: 140 kN, axial: 0 N, shock: light }
life: { hours: 60000 h, wearAllowance: 0.5 mm }
space: { maxLength: 130 mm, maxOuterDiameter: 300 mm }
# the grease's base oil: a heavy-duty grease for slow, hot, heavily loaded bearings
lubrication: { supply: grease, oil: ISO VG 460, inletTemperature: 50 degC }
environment: { ambient: 50 degC, contamination: dirty, startsPerHour: 0.05 }
priorities: { cost: 3, friction: 2, maintenance: 4, noise: 1, precision: 1 }
`,
    accept: ['rolling'],
    reject: ['journal'],
    why: 'common practice: dryer trunnion rollers sit on spherical roller bearings in sealed, greased plummer blocks; they take the heavy load and the misalignment of a hot drum; grease cannot hold an oil film.',
  },
  {
    id: 'combine-straw-walker-crank',
    family: 'agricultural',
    yaml: `
title: Tillbrook combine harvester, straw-walker crankshaft bearing
shaft: { diameter: 40 mm, speed: 200 rpm }
load: { radial: 2.5 kN, axial: 0 N, shock: moderate }
life: { hours: 3000 h, wearAllowance: 0.3 mm }
space: { maxLength: 25 mm, maxOuterDiameter: 80 mm }
lubrication: { supply: none }
environment: { ambient: 30 degC, contamination: severe, startsPerHour: 4 }
priorities: { cost: 4, friction: 2, maintenance: 5, noise: 1, precision: 1 }
`,
    accept: ['rolling'],
    reject: ['journal'],
    why: 'common practice: harvester shafts run on sealed ball bearings greased for life in self-aligning housings; chaff and dust everywhere, no relubrication in the season.',
    ambiguous: 'older machines ran the walker cranks in oil-soaked hardwood bushes, still made as spares.',
  },
  {
    id: 'disc-harrow-gang',
    family: 'agricultural',
    yaml: `
title: Tillbrook 4 m disc harrow, disc gang bearing
shaft: { diameter: 40 mm, speed: 80 rpm }
load: { radial: 6 kN, axial: 2 kN, shock: heavy }
life: { hours: 2000 h, wearAllowance: 0.5 mm }
space: { maxLength: 40 mm, maxOuterDiameter: 90 mm }
lubrication: { supply: grease, inletTemperature: 15 degC }
environment: { ambient: 15 degC, contamination: severe, startsPerHour: 2 }
priorities: { cost: 4, friction: 1, maintenance: 4, noise: 1, precision: 1 }
`,
    accept: ['rolling', 'bushing'],
    reject: ['journal'],
    why: 'common practice: disc gangs run on multi-lip sealed ball or tapered roller bearings in mud and stones; cheaper and older gangs on greased cast-iron or hardwood bushes.',
    ambiguous: 'current machines use sealed rolling bearings; low-cost harrows still use greased bushes.',
  },
  {
    id: 'cheese-vat-agitator-foot',
    family: 'food and packaging',
    yaml: `
title: Dunmore creamery, cheese-vat agitator, bottom guide bush in the curd
shaft: { diameter: 35 mm, speed: 25 rpm }
load: { radial: 600 N, axial: 0 N, shock: light }
# a loose foot guide: the agitator tolerates a millimetre of wear
life: { hours: 20000 h, wearAllowance: 1 mm }
space: { maxLength: 50 mm, maxOuterDiameter: 50 mm }
lubrication: { supply: none }
environment: { ambient: 38 degC, contamination: normal, startsPerHour: 2, medium: water }
priorities: { cost: 3, friction: 1, maintenance: 5, noise: 1, precision: 1 }
`,
    accept: ['bushing'],
    reject: ['rolling', 'journal'],
    why: 'common practice: a guide bearing immersed in food runs on a product-lubricated PTFE or UHMW-PE bush: no lubricant may touch product, it is cleaned in place, and a rolling bearing would trap product.',
  },
  {
    id: 'trawler-stern-tube',
    family: 'marine',
    yaml: `
title: Kestle Cove inshore trawler, stern-tube aft bearing in sea water
shaft: { diameter: 90 mm, speed: 450 rpm }
load: { radial: 12 kN, axial: 0 N, shock: moderate }
life: { hours: 30000 h, wearAllowance: 1 mm }
space: { maxLength: 360 mm, maxOuterDiameter: 130 mm }
lubrication: { supply: none }
environment: { ambient: 12 degC, contamination: severe, startsPerHour: 1, medium: water }
priorities: { cost: 3, friction: 2, maintenance: 5, noise: 2, precision: 1 }
`,
    accept: ['bushing'],
    reject: ['rolling'],
    why: 'common practice: small-craft stern tubes run open to the sea on water-lubricated rubber or polymer bushes about four diameters long; sand passes down the grooves; no oil seal to leak and no rolling bearing in sea water.',
  },
  {
    id: 'desk-shredder-cutter',
    family: 'appliance and office',
    yaml: `
title: Quillon office products, desk shredder, cutter shaft bearing
shaft: { diameter: 12 mm, speed: 30 rpm }
load: { radial: 500 N, axial: 0 N, shock: moderate }
life: { hours: 500 h, wearAllowance: 0.3 mm }
space: { maxLength: 12 mm, maxOuterDiameter: 18 mm }
lubrication: { supply: none }
environment: { ambient: 20 degC, contamination: normal, startsPerHour: 20 }
priorities: { cost: 5, friction: 1, maintenance: 4, noise: 2, precision: 1 }
`,
    accept: ['bushing'],
    reject: ['journal'],
    why: 'common practice: a slow, short-lived appliance shaft runs in a moulded acetal or sintered bronze bush: pennies each, no maintenance, fits a thin plastic wall.',
  },
  {
    id: 'label-printer-platen',
    family: 'appliance and office',
    yaml: `
title: Quillon desk label printer, platen roller bearing
shaft: { diameter: 6 mm, speed: 120 rpm }
load: { radial: 15 N, axial: 0 N, shock: none }
life: { hours: 3000 h, wearAllowance: 0.1 mm }
space: { maxLength: 8 mm, maxOuterDiameter: 10 mm }
lubrication: { supply: none }
environment: { ambient: 20 degC, contamination: clean, startsPerHour: 30 }
priorities: { cost: 5, friction: 2, maintenance: 4, noise: 2, precision: 2 }
`,
    accept: ['bushing'],
    reject: ['journal'],
    why: 'common practice: small office-machine rollers run in moulded plastic or sintered bushes; a few newtons at low speed, no lubrication, cost is everything.',
  },
  {
    id: 'tailings-agitator-steady',
    family: 'slurry',
    yaml: `
title: Carn Dhu tin mine, tailings feed tank agitator, bottom steady bearing in the slurry
shaft: { diameter: 80 mm, speed: 60 rpm }
load: { radial: 3 kN, axial: 0 N, shock: moderate }
life: { hours: 8000 h, wearAllowance: 3 mm }
space: { maxLength: 120 mm, maxOuterDiameter: 110 mm }
lubrication: { supply: none }
environment: { ambient: 20 degC, contamination: severe, startsPerHour: 1, medium: slurry }
priorities: { cost: 3, friction: 1, maintenance: 5, noise: 1, precision: 1 }
`,
    accept: ['bushing'],
    reject: ['rolling', 'journal'],
    why: 'common practice: a steady bearing at the bottom of a slurry tank is a slurry-lubricated polymer, rubber or ceramic-faced bush with a generous wear allowance, renewed at the yearly shutdown; nothing else survives submerged in abrasive pulp.',
  },
];
