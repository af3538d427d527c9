import type { Finding, FindingValue } from '../../core/finding.js';
import { num } from '../../core/format.js';
import type { KernelWording, Wording } from './types.js';

// The rolling kernel's numbers have always been written with the zeros of the exponent form
// kept (1.000e+6); the words below keep its text exactly.
const fig = (v: FindingValue | undefined): string => num(Number(v), 4, { exponentZeros: 'keep' });
/** A length in m as millimetres, as a table of whole or decimal millimetres gives them. */
const tableMm = (v: FindingValue | undefined): string => num(Number(v) * 1000, 6);
/** A number or name as the kernel holds it (no rounding). */
const raw = (v: FindingValue | undefined): string => String(v);
const list = <T extends FindingValue>(v: FindingValue | undefined): readonly T[] =>
  Array.isArray(v) ? (v as readonly T[]) : [];
const degrees = (rad: FindingValue | undefined): string => fig((Number(rad) * 180) / Math.PI);

/** Why a candidate is ruled out whatever its checks say (the load kernel's reasons). */
const exclusionWording: Record<string, Wording> = {
  'rolling.axial-load-beyond-table': (v) =>
    `${raw(v['kind'])} bearing: f0·Fa/C0 = ${fig(v['key'])} with Fa = ${fig(v['Fa'])} N is beyond the end of the ISO 281 X/Y table (${fig(v['keyMax'])}): the standard does not rate it for this thrust; an angular-contact or tapered roller bearing is the usual answer`,
  'rolling.no-axial-capacity': (v) =>
    `axial load ${Number(v['Fa']).toFixed(0)} N: a ${raw(v['kind'])} bearing${v['form'] ? ` (${raw(v['form'])})` : ''} takes no axial load`,
  'rolling.rib-axial-load-exceeded': (v) =>
    `axial load ${Number(v['Fa']).toFixed(0)} N exceeds what the ribs of the cylindrical roller bearing carry, ${Number(v['FaPerm']).toFixed(0)} N (${raw(v['governing'])} limit governs)`,
  'rolling.contact-angle-outside-table': (v) =>
    `${raw(v['kind'])} bearing: contact angle ${fig(v['contactAngle'])}° is outside the factors of ISO 281 (${fig(v['min'])}°–${fig(v['max'])}°): not rated here`,
  'rolling.load-key-unknown': (v) =>
    `${raw(v['kind'])} bearing: its X/Y table needs f0, which is not known here: not rated for axial load`,
};
const exclusionWords = (f: Finding): string => {
  const w = exclusionWording[f.code];
  if (!w) throw new Error(`no wording for exclusion ${f.code}`);
  return w(f.values);
};

/** How many of the sizes the space rules out are named (the rest are counted). */
const SPACE_EXCLUDED_SHOWN = 4;

/** A size the space rules out: its size and which room it exceeds. */
const sizeOutsideSpace: Wording = (v) => {
  const over = [
    v['tooBig'] ? `D > ${fig(Number(v['maxOuterDiameter']) * 1000)} mm` : '',
    v['tooWide'] ? `B > ${fig(Number(v['maxLength']) * 1000)} mm` : '',
  ];
  return `${raw(v['designation'])} (${tableMm(v['outerDiameter'])}×${tableMm(v['width'])} mm: ${over.filter(Boolean).join(', ')})`;
};

/** A less costly kind passed over, and its first reason. */
const passedOver: Wording = (v) => {
  const why = v['exclusion'] ? exclusionWords(v['exclusion'] as Finding) : `fails ${raw(v['failing'])}`;
  return `${raw(v['kind'])}: ${why}`;
};

/** A candidate that is not suitable: its exclusions, then each failing check with value and limit. */
const notSuitable: Wording = (v) => {
  const values = list<number>(v['values']);
  const limits = list<number>(v['limits']);
  const units = list<string>(v['units']);
  const why = [
    ...list<Finding>(v['exclusions']).map(exclusionWords),
    ...list<string>(v['failing']).map(
      (label, i) => `${label}: ${fig(values[i])} against ${fig(limits[i])} ${units[i]}`,
    ),
  ];
  return `${raw(v['designation'])} not suitable: ${why.join('; ')}`;
};

/** Cautions about the case as a whole: loads, speed, reliability, diameter, oil, supplier data. */
const caseFindings: Record<string, Wording> = {
  'rolling.load-magnitude': () => 'a load was negative or not a number: its magnitude (or 0) is used',
  'rolling.not-turning': () =>
    'the shaft does not turn (mean speed 0): rating lives, viscosity ratio and speed checks do not apply; only static safety is checked',
  'rolling.reliability-held': (v) =>
    `reliability ${raw(v['reliability'])} % is outside the a1 formula's range ${raw(v['min'])}–${raw(v['max'])} % (ISO 281:2007): ${raw(v['used'])} % is used`,
  'rolling.grade-not-in-table': (v) =>
    `ISO VG ${raw(v['grade'])} is not in data/lubricants.json: the grease base oil grade ${raw(v['fallback'])} is used instead`,
  'rolling.diameter-not-positive': (v) =>
    `shaft diameter ${raw(v['diameter'])} m is not a positive number: no bearing can be chosen`,
  'rolling.bore-not-standard': (v) =>
    `shaft diameter ${fig(Number(v['diameter']) * 1000)} mm is not a bore (or needle roller set bore) of the ISO 15, ISO 355 or needle roller tables; nearest: ${list<number>(v['nearest']).map(tableMm).join(' and ')} mm`,
  'rolling.supplier-ratings-incomplete': () =>
    'a supplier bearing needs both a positive dynamic rating C and static rating C0; the supplier values given are not used',
  'rolling.space-excluded': (v) => {
    const sizes = list<Finding>(v['sizes']);
    const shown = sizes.slice(0, SPACE_EXCLUDED_SHOWN);
    const more = sizes.length - shown.length;
    return `${sizes.length} bearing(s) of this bore excluded by the space available: ${shown.map((s) => sizeOutsideSpace(s.values)).join('; ')}${more > 0 ? `; and ${more} more` : ''}`;
  },
  'rolling.supplier-ratio-unusual': (v) =>
    `supplier ratings C0/C = ${fig(v['ratio'])}: unusual for a deep-groove ball bearing, whose C0 is normally below C (common practice); check the datasheet and the bearing type`,
  'rolling.supplier-no-outer-diameter': (v) =>
    `supplier bearing outside diameter not given and no ISO 15 row of its bore: pitch diameter taken as ${raw(v['pitchOverBore'])}·d and the space check on D is left out`,
  'rolling.supplier-no-width': () =>
    'supplier bearing width not given and no ISO 15 row of its bore: the space check on width is left out',
  'rolling.no-candidate': () =>
    'no rolling bearing candidate: none of the bearings of this bore in the tables fits, and no supplier bearing is given',
  'rolling.no-life-target': () => 'no life target (life.hours ≤ 0): the life check is left out',
};

/** Cautions about one candidate, each naming it first. */
const candidateFindings: Record<string, Wording> = {
  'rolling.key-below-table': (v) =>
    `${raw(v['designation'])} (and any other candidate alike): f0·Fa/C0 = ${Number(v['key']).toFixed(4)} is below the first row of the ISO 281 X/Y table; e and Y of that row are used (Y would be somewhat larger): not extrapolated`,
  'rolling.opposed-partner': () =>
    'a single-row angular-contact ball or tapered roller bearing (or a tandem pair) must be located by an opposed bearing at the shaft’s other support: that partner is taken as the same bearing under the same radial load, so this one carries the case’s axial load plus the partner’s induced force 0.5·Fr/Y (ISO 281 practice for two bearings that locate each other); a shaft model with both supports replaces this',
  'rolling.grease-life-cool-held': (v) =>
    `bearing at ${fig(v['temperature'])} °C: the grease-life law is held at its ${fig(v['used'])} °C value (in the cold the grease stiffens, which shortens its life rather than lengthening it)`,
  'rolling.grease-hot': (v) =>
    `bearing at ${fig(v['temperature'])} °C, above ${fig(v['limit'])} °C: mineral-oil greases oxidise fast; a high-temperature grease or oil is needed`,
  'rolling.grease-speed-beyond-limit': (v) =>
    `speed factor n·dm = ${fig(v['ndm'])} mm·r/min is beyond the kind's grease limit ${fig(v['limit'])} mm·r/min: grease life is short and uncertain; oil is the usual answer`,
  'rolling.grease-heavy-load': (v) =>
    `load ratio P/C = ${fig(v['ratio'])} above ${fig(v['threshold'])}: grease life is shortened (one halving per 0.1 of P/C, common practice)`,
  'rolling.kappa-above-range': (v) =>
    `${raw(v['designation'])} (and any other candidate alike): viscosity ratio κ = ${fig(v['kappa'])} > ${raw(v['kappaMax'])} is taken as ${raw(v['kappaMax'])}, as ISO 281:2007 says`,
  'rolling.kappa-below-range': (v) =>
    `${raw(v['designation'])} (and any other candidate alike): viscosity ratio κ = ${fig(v['kappa'])} < ${raw(v['kappaMin'])} is outside the a_ISO method of ISO 281:2007; the method's limiting value (a_ISO at κ = ${raw(v['kappaMin'])}) is taken: a warning, not a failure of the bearing; a thicker oil (or a higher running viscosity) improves it`,
  'rolling.static-only': (v) =>
    `every operating point turns slower than ${fig(Number(v['limit']) * 60)} r/min (the highest is ${fig(Number(v['speed']) * 60)} r/min): the bearing is sized by its static safety s0 = C0/P0 and no rating life is claimed (ISO 281 rates fatigue over revolutions; the limit is common practice)${Number(v['revolutions']) > 1e6 ? `; over the life target it still turns ${fig(Number(v['revolutions']) / 1e6)} million revolutions: compare L10 = (C/P)^p with the supplier` : ''}`,
  'rolling.aiso-capped': (v) =>
    `${raw(v['designation'])} (and any other candidate alike): a_ISO reached its cap of ${raw(v['cap'])} (ISO 281:2007)`,
  'rolling.grease-too-fast': (v) =>
    `${raw(v['designation'])}: the grease interval formula gives no positive interval at ${fig(Number(v['speed']) * 60)} r/min: too fast for grease by this rule; oil is needed`,
  'rolling.swing-too-small': (v) =>
    `${raw(v['designation'])}: swing ${degrees(v['swing'])}° is smaller than ${degrees(v['fullOverlapSwing'])}°, the swing for each of its ${raw(v['elements'])} rolling elements to roll onto its neighbour's track (720°/(Z·(1 − Dw/dm)), estimated geometry): the same track patches carry every cycle; false brinelling and fretting are the risk and the equivalent-speed life is not reliable`,
  'rolling.not-suitable': notSuitable,
  'rolling.kind-chosen': (v) => {
    const over = list<Finding>(v['passedOver']).map((f) => passedOver(f.values));
    const pair = v['arrangement'] !== 'single' ? ` (${raw(v['arrangement'])})` : '';
    return `${raw(v['kind'])}${pair} chosen: the least costly kind (cost class ${raw(v['costClass'])}, common practice) that meets every check, then the kind practice reaches for first, then the smallest; axial load: ${raw(v['axialCapacity'])}${over.length ? `. Passed over: ${over.join('; ')}` : ''}`;
  },
  'rolling.passed-over': passedOver,
};

/**
 * The words of the rolling kernel's findings and assumptions, keyed by code. Values arrive in
 * SI (m, N, rev/s, rad, m²/s, Pa·s, °C); lengths are shown in mm, speeds in r/min, angles in
 * degrees, viscosities in mm²/s, as the kernel has always written them.
 */
export const rollingWording: KernelWording = {
  findings: {
    ...exclusionWording,
    'rolling.size-outside-space': sizeOutsideSpace,
    ...caseFindings,
    ...candidateFindings,
  },
  assumptions: {
    'rolling.equivalent-speed': (v) => ({
      value: `equivalent rotational speed ${fig(Number(v['speed']) * 60)} r/min`,
      reason:
        'for life, an oscillating shaft is taken as rotating at n = θ·f/π, the speed that turns the same angle per second (common practice)',
    }),
    'rolling.service-factor': (v) => ({
      value: `service factor f_d = ${raw(v['serviceFactor'])}`,
      reason: `dynamic equivalent load multiplied by f_d for shock level "${raw(v['shock'])}" (${raw(v['source'])}); static safety uses the peak operating point without f_d, its limit already graded by shock`,
    }),
    'rolling.sealed-for-life': () => ({
      value: 'sealed-for-life grease',
      reason:
        'a rolling bearing needs at least grease; with no supply a sealed, greased-for-life bearing is the practical reading, and its grease life is checked against the life target (common practice)',
    }),
    'rolling.operating-temperature': (v) => ({
      value: `${fig(v['temperature'])} °C`,
      reason:
        v['over'] === 'inlet'
          ? `operating temperature of the bearing taken as oil inlet + ${raw(v['rise'])} K (common practice for circulating oil)`
          : `operating temperature of the bearing taken as ambient + ${raw(v['rise'])} K (common practice for a grease- or bath-lubricated bearing in a housing)`,
    }),
    'rolling.bath-temperature': (v) => ({
      value: `${fig(v['bearingTemperature'])} °C`,
      reason: `operating temperature of the bearing: the oil bath at ${fig(v['temperature'])} °C, from one sump heat balance T_bath = T_amb + P/(h·A) = ${fig(v['ambient'])} °C + ${fig(v['loss'])} W / (${fig(v['heatTransfer'])} W/(m²·K) · ${fig(v['area'])} m²) with this bearing's own friction loss, plus ${raw(v['rise'])} K over the bath (common practice); housing taken as a cylinder ${raw(v['diameterFactor'])} × the radial room across and ${raw(v['lengthFactor'])} × the axial room long, ${fig(Number(v['dissipatingShare']) * 100)} % of its surface giving heat to still air (our assumption); h: ${raw(v['source'])}${v['runaway'] === true ? '. The loss outruns the housing: no balance below this bound, cooling is needed' : ''}`,
    }),
    'rolling.same-oil': (v) => ({
      value: `ISO VG ${raw(v['grade'])}`,
      reason: `the same oil as the journal bearing, VG ${raw(v['grade'])}: one oil system per case, and the case names no oil, so the grade the journal's design sweep chose is taken`,
    }),
    'rolling.fixed-viscosity': (v) => ({
      value: `ν = ${fig(Number(v['kinematicViscosity']) * 1e6)} mm²/s`,
      reason: `the fixed dynamic viscosity ${raw(v['dynamicViscosity'])} Pa·s is taken at the operating temperature and converted with a density of ${raw(v['density'])} kg/m³ (typical mineral oil, from memory)`,
    }),
    'rolling.grade-as-base-oil': (v) => ({
      value: `ISO VG ${raw(v['grade'])}`,
      reason: 'with grease supply the named oil grade is taken as the grease base oil',
    }),
    'rolling.grease-base-oil': (v) => ({
      value: `ISO VG ${raw(v['grade'])}`,
      reason: `grease base oil (${raw(v['source'])})`,
    }),
    'rolling.default-grade': (v) => ({
      value: `ISO VG ${raw(v['grade'])}`,
      reason: `no oil grade given: ISO VG ${raw(v['grade'])}, a common general-machinery grade (common practice)`,
    }),
    'rolling.contamination': (v) => ({
      value: `e_C = ${raw(v['eC'])} (dm < ${fig(Number(v['guidanceBelow']) * 1000)} mm), ${raw(v['eCLarge'])} (larger)`,
      reason: `"${raw(v['level'])}" read as ISO 281 "${raw(v['isoLevel'])}" (e_C ${raw(v['low'])}–${raw(v['high'])} for dm < ${fig(Number(v['guidanceBelow']) * 1000)} mm, ${raw(v['lowLarge'])}–${raw(v['highLarge'])} from it on); the middle of the range is taken (${raw(v['source'])})`,
    }),
    'rolling.contamination-sealed': (v) => ({
      value: `e_C = ${raw(v['eC'])} (dm < ${fig(Number(v['guidanceBelow']) * 1000)} mm), ${raw(v['eCLarge'])} (larger)`,
      reason: `a sealed bearing greased for life is read at ISO 281 "${raw(v['isoLevel'])}", whose typical conditions are sealed bearings greased for life: the seals keep the "${raw(v['surroundings'])}" surroundings out of the grease, so the surroundings do not set the level (an open bearing takes them); e_C ${raw(v['low'])}–${raw(v['high'])} for dm < ${fig(Number(v['guidanceBelow']) * 1000)} mm, ${raw(v['lowLarge'])}–${raw(v['highLarge'])} from it on, the middle taken (${raw(v['source'])})`,
    }),
    'rolling.life-criterion': () => ({
      value: 'L10mh = a1·a_ISO·L10h ≥ life target',
      reason:
        'a candidate meets the life target on the modified rating life of ISO 281:2007, which counts lubrication and contamination; the required dynamic rating is the basic rating with a1 only (a_ISO = 1)',
    }),
    'rolling.supplier-type': (v) => ({
      value: raw(v['type']),
      reason: 'the supplier bearing has no type given: a deep-groove ball bearing is taken',
    }),
    'rolling.supplier-dimensions': (v) => ({
      value: `${fig(Number(v['outerDiameter']) * 1000)} × ${fig(Number(v['width']) * 1000)} mm`,
      reason: `supplier bearing dimensions not given: taken from the table's "${raw(v['row'])}" of the same kind and bore`,
    }),
    'rolling.estimated-ratings': () => ({
      value: 'C and C0 estimated from boundary dimensions',
      reason:
        "internal geometry estimated per kind from d, D and B (fractions and their sources in data/rolling-ratings.json, kept at or below the ratings of published internal geometries); C by ISO 281:2007, C0 by ISO 76 from that geometry; a supplier's rating replaces the estimate",
    }),
    'rolling.supplier-kind': (v) => ({
      value: raw(v['kind']),
      reason: 'the supplier bearing has no kind given: the kind of its type (or a deep-groove ball bearing) is taken',
    }),
    'rolling.supplier-form': (v) => ({
      value: raw(v['form']),
      reason: `the supplier ${raw(v['kind'])} bearing has no form given: the form that claims least is taken`,
    }),
    'rolling.supplier-contact-angle': (v) => ({
      value: `${fig(v['contactAngle'])}°`,
      reason: `the supplier ${raw(v['kind'])} bearing has no contact angle given: the usual angle of the kind is taken (data/rolling-ratings.json, from memory)`,
    }),
    'rolling.estimated-fatigue-limit': () => ({
      value: 'Cu = C0/22 (ball), C0/8.2 (roller); above dm = 100 mm × (100/dm)^0.5 (ball), × (100/dm)^0.3 (roller)',
      reason: 'no supplier fatigue load limit; the approximation of ISO 281:2007 Annex B is taken (from memory)',
    }),
    'rolling.load-bound': (v) => ({
      value: `${fig(v['load'])} N`,
      reason: `no candidate to read X and Y from: the upper bound of P over the deep-groove ball X/Y table is given (X = ${raw(v['xBelowE'])} when Fa/Fr ≤ ${raw(v['eMin'])}, else the larger of Fr and ${raw(v['xAboveE'])}·Fr + ${Number(v['yMax']).toFixed(2)}·Fa)`,
    }),
  },
};
