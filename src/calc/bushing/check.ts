import { assumedFinding, finding, type AssumedFinding, type Finding } from '../../core/finding.js';
import type { BushingMaterial, CaseSI } from '../../case/types.js';
import { operatingPoints } from '../duty.js';
import { bushingFactors, bushingMaterials, type BushingMaterialRow } from '../../data/bushing.js';
import { sizeThrustFace, washerThickness } from '../thrust/rubbing.js';
import { oscillatingSlidingSpeed, rotatingSlidingSpeed } from './formulas.js';
import { checkMaterial, LENGTH_STEP, type Setting } from './material.js';
import { bushingSheet } from './sheet.js';
import type { BushingMaterialResult, BushingResult, DutyPoint } from './types.js';

/**
 * Axial load below this (N) needs no thrust face: a location against a shoulder takes it. It keeps
 * a vanishing load from giving a face whose wear rate rounds to zero (an infinite life).
 */
export const MIN_AXIAL = 1;

/** Margins closer than this are equal: a tie, broken by the stated rule, never by list order. */
export const MARGIN_TIE = 1e-9;

/**
 * The common length every material is checked at: the longest (so the longest wear life) within
 * the axial space less the thrust washer and within L/D ≤ 2, in whole millimetres rounded down;
 * the case's bushing.length when given. Whole millimetres and L/D ≤ 2 common practice. Where
 * not one millimetre is left, 1 mm (the axial-space check then fails).
 */
export function commonLength(c: CaseSI, washer: number, lOverDMax: number): number {
  const room = Math.min(c.space.maxLength - washer, lOverDMax * c.shaft.diameter);
  const whole = Math.floor(room / LENGTH_STEP + 1e-9) * LENGTH_STEP;
  // No whole millimetre left: the bushing is taken 1 mm long and the axial-space check fails.
  return whole > 0 ? whole : LENGTH_STEP;
}

/** Checks of the fit in the space: they gate feasibility but say nothing of the material. */
const SPACE_CHECKS = new Set(['radial-space', 'axial-space']);

/**
 * The margin a material is chosen by: the governing margin over its own limits (pressure, speed,
 * PV, wear life, thrust face, lubricant need, medium), leaving out the fit in the space, which
 * every material at the common length shares or which only measures its wall thickness.
 */
export function materialMargin(m: BushingMaterialResult): number {
  // governingMargin over the checks less the space checks, without building that list (a map
  // compares materials at every cell): the first smallest margin of a limit check.
  let margin: number | undefined;
  for (const k of m.checks)
    if (!k.advisory && !SPACE_CHECKS.has(k.id) && (margin === undefined || k.margin < margin)) margin = k.margin;
  return margin ?? Infinity;
}

/**
 * The better of two materials: the larger materialMargin; margins within MARGIN_TIE are a tie,
 * broken by the lower time-mean friction power, then the longer typical wear life, then the id
 * in alphabetical order (stated in the finding), so list order never decides.
 */
export function better(a: BushingMaterialResult, b: BushingMaterialResult): BushingMaterialResult {
  const ma = materialMargin(a);
  const mb = materialMargin(b);
  if (Math.abs(ma - mb) > MARGIN_TIE) return mb > ma ? b : a;
  if (a.meanFrictionPower !== b.meanFrictionPower) return b.meanFrictionPower < a.meanFrictionPower ? b : a;
  if (a.lifeHours !== b.lifeHours) return b.lifeHours > a.lifeHours ? b : a;
  return b.id < a.id ? b : a;
}

/**
 * Check every bushing material class (or the one the case names) for the duty, all at one
 * common length. Method: mean pressure, PV and sliding speed against the material's limits;
 * Archard wear at the most loaded line with motion and environment multipliers, summed over the
 * duty points; the shortest length meeting pressure, PV and the wear life (reported); a flange
 * or thrust washer for the axial load (src/calc/thrust/rubbing.ts); the lubricant the material
 * needs and its resistance in the service medium; a heat-balance temperature. See ./formulas.ts
 * for each equation and its source. `sheet: false` skips the calculation sheet's text (sweeps
 * evaluate thousands of points); `materials` replaces the shipped table (tests).
 */
export function checkBushing(
  c: CaseSI,
  opts: { sheet?: boolean; materials?: BushingMaterialRow[] } = {},
): BushingResult {
  const factors = bushingFactors();
  const assumed: AssumedFinding[] = [];
  const warnings: Finding[] = [];
  const D = c.shaft.diameter;
  const osc = c.shaft.oscillation;
  const points: DutyPoint[] = operatingPoints(c).map((p) => ({
    share: p.share,
    F: p.radial,
    V: osc ? oscillatingSlidingSpeed(D, osc.angle, osc.frequency) : rotatingSlidingSpeed(D, p.speed ?? 0),
    Fa: p.axial,
    ...(osc ? {} : { n: p.speed ?? 0 }),
  }));
  if (points.some((p) => p.V === 0)) warnings.push(finding('bushing.zero-speed'));

  const motionKey = osc ? 'oscillating' : 'rotating';
  const fm = factors.motion.find((m) => m.key === motionKey)!;
  const fe = factors.environment.find((m) => m.key === c.environment.contamination)!;
  assumed.push(
    assumedFinding('bushing.motionFactor', 'bushing.motion-factor', {
      factor: fm.value,
      note: fm.note,
      source: fm.source,
    }),
    assumedFinding('bushing.environmentFactor', 'bushing.environment-factor', {
      contamination: c.environment.contamination,
      factor: fe.value,
      note: fe.note,
      source: fe.source,
    }),
    assumedFinding('bushing.heat', 'bushing.heat-model', {
      referenceAmbient: factors.heat.referenceAmbient,
      note: factors.heat.note,
      source: factors.heat.source,
    }),
  );
  if (c.environment.medium === undefined) assumed.push(assumedFinding('environment.medium', 'bushing.medium-default'));
  if (c.lubrication.supply !== 'none')
    warnings.push(finding('bushing.boundary-conservative', { supply: c.lubrication.supply }));

  // Axial load: a flange or thrust washer at the locating end, its thickness taken from the axial space.
  const axial = points.some((p) => p.Fa >= MIN_AXIAL);
  const thrust = axial ? { face: sizeThrustFace(D, c.space.maxOuterDiameter), thickness: washerThickness(D) } : null;
  if (thrust)
    assumed.push(
      assumedFinding('bushing.thrustFace', 'bushing.thrust-face', {
        inner: thrust.face.inner,
        outer: thrust.face.outer,
        thickness: thrust.thickness,
      }),
    );
  const setting: Setting = {
    length: c.bushing?.length ?? commonLength(c, thrust?.thickness ?? 0, factors.lengthToDiameter.max),
    lengthChosen: c.bushing?.length !== undefined ? 'case' : 'common',
    thrust,
    medium: c.environment.medium ?? 'dry',
  };

  const all = opts.materials ?? bushingMaterials();
  const named = c.bushing?.material;
  const candidates: (BushingMaterial | BushingMaterialRow)[] =
    named === undefined ? all : typeof named === 'string' ? all.filter((m) => m.id === named) : [named];

  // A class built longer than the general L/D cap (a water-lubricated stern tube bush) is checked at
  // the longest length its own practice allows in the space; every other class at the common length.
  const settingOf = (m: BushingMaterial | BushingMaterialRow): Setting =>
    setting.lengthChosen === 'common' && 'maxLengthToDiameter' in m && m.maxLengthToDiameter !== undefined
      ? { ...setting, length: commonLength(c, thrust?.thickness ?? 0, m.maxLengthToDiameter) }
      : setting;
  const materials = candidates.map((m) => checkMaterial(c, m, points, fm.value, fe.value, factors, settingOf(m)));
  const feasible = materials.filter((m) => m.feasible);
  let best: BushingMaterialResult | undefined;
  let bestReason: Finding;
  if (feasible.length) {
    best = feasible.reduce(better);
    const margin = materialMargin(best);
    const tied = feasible.filter((m) => m !== best && Math.abs(materialMargin(m) - margin) <= MARGIN_TIE);
    bestReason = finding('bushing.best', {
      material: best.name,
      length: best.length,
      margin,
      passing: feasible.length,
      tiedWith: tied.map((m) => m.name),
    });
  } else {
    bestReason = noneFeasible(materials);
    warnings.push(bestReason);
  }
  // The material shown when none is feasible: the nearest miss, by the same rule.
  const shown = best ?? (materials.length ? materials.reduce(better) : undefined);
  return {
    option: 'bushing',
    materials,
    length: setting.length,
    best: best?.id ?? null,
    shown: shown?.id ?? null,
    bestReason,
    feasible: best !== undefined,
    assumed,
    warnings,
    sheet: shown && opts.sheet !== false ? bushingSheet(c, shown, points, factors.heat.referenceAmbient) : [],
  };
}

/** No material passes: each failing limit check's label and the number of materials it fails for. */
function noneFeasible(ms: BushingMaterialResult[]): Finding {
  const count = new Map<string, number>();
  for (const m of ms)
    for (const k of m.checks) if (!k.pass && !k.advisory) count.set(k.label, (count.get(k.label) ?? 0) + 1);
  return finding('bushing.none-feasible', {
    failing: [...count.keys()],
    failingCount: [...count.values()],
    materials: ms.length,
  });
}
