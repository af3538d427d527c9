import type { CaseSI } from '../../case/types.js';
import { allLimitsPass } from '../../core/check.js';
import { finding } from '../../core/finding.js';
import { AISO_CAP, KAPPA_MAX, KAPPA_MIN } from './aiso.js';
import type { CandidateSpec } from './candidates.js';
import { candidateChecks } from './checks.js';
import { contaminationFactor } from './conditions.js';
import type { CandidateFigures, EvalContext } from './context.js';
import type { Notes } from './findings.js';
import type { Lubrication } from './lubrication.js';
import { frictionTerms, type FrictionInput, type FrictionTerms } from './friction.js';
import { regreasingIntervalFrom, type GreaseLifeInput } from './grease.js';
import { lifeExponent, requiredDynamicRating } from './life.js';
import { staticEquivalentLoad } from './load-factors.js';
import { bearingAxialLoad, pointLoads, prepared, type PointLoad, type Prepared } from './point-loads.js';
import { STATIC_SPEED_LIMIT, spectrumLife, type SpectrumBearing, type SpectrumLife } from './spectrum.js';
import { criticalSwingAngle, frictionPower, speedFactor } from './speed.js';
import type { RollingCandidate } from './types.js';

/**
 * One candidate's figures: its loads, lives, lubrication, static safety, speed, friction,
 * grease life and oscillation criterion, then its checks (src/calc/rolling/checks.ts).
 *
 * References (the loads at each point: point-loads.ts)
 * [1] ISO 281:2007: P = X·Fr + Y·Fa with X, Y, e per kind (load-factors.ts), the duty mean P,
 *     L10 = (C/P)^p, a_ISO per operating point and the lives combined over the duty
 *     (spectrum.ts).
 * [2] ISO 76: P0 = X0·Fr + Y0·Fa per kind and s0 = C0/P0.
 * [3] Induced axial force of a single-row tapered roller or angular-contact ball bearing
 *     under radial load, carried by the bearing that locates it (tapered-pair.ts).
 * [4] Speed factor n·dm, friction moment, grease life, swing for full element overlap
 *     (speed.ts, friction.ts, grease.ts).
 */

/**
 * Lives over the duty [1]: each point's a_ISO from its own κ and e_C·Cu/Pi, the point lives
 * combined by the linear damage rule (spectrum.ts), e_C from the column of the bearing's pitch
 * diameter (conditions.ts). Where κ or a_ISO leave the method's range it is said; κ below 0.1
 * informs, it never rules a bearing out.
 */
function lives(spec: CandidateSpec, p: Prepared, ctx: EvalContext, per: PointLoad[], notes: Notes): SpectrumLife {
  const life = spectrumLife(per, spectrumBearing(spec, p, ctx));
  const designation = spec.designation;
  if (life.staticOnly && notes.wants('rolling.static-only', 'once'))
    notes.warn(
      finding('rolling.static-only', {
        speed: ctx.maxSpeed,
        limit: STATIC_SPEED_LIMIT,
        revolutions: life.n * 3600 * Math.max(0, ctx.c.life.hours),
      }),
      'once',
    );
  for (const q of life.points) {
    if (q.static || q.kappa === null) continue;
    // Said once for the first candidate it concerns: across a catalogue of bores the same caution
    // would repeat dozens of times (so it is built only while none is kept).
    if (q.kappaRange === 'above' && notes.wants('rolling.kappa-above-range', 'once'))
      notes.warn(finding('rolling.kappa-above-range', { designation, kappa: q.kappa, kappaMax: KAPPA_MAX }), 'once');
    if (q.kappaRange === 'below' && notes.wants('rolling.kappa-below-range', 'once'))
      notes.warn(finding('rolling.kappa-below-range', { designation, kappa: q.kappa, kappaMin: KAPPA_MIN }), 'once');
    if (q.capped && notes.wants('rolling.aiso-capped', 'once'))
      notes.warn(finding('rolling.aiso-capped', { designation, cap: AISO_CAP }), 'once');
  }
  return life;
}

/** The spectrum life's view of a candidate [1]: its ratings and size, e_C for its pitch diameter, a1; kept while the case's contamination row and a1 stay. */
function spectrumBearing(spec: CandidateSpec, p: Prepared, ctx: EvalContext): SpectrumBearing {
  if (p.bearing === null || p.bearingCont !== ctx.cont || p.bearing.a1 !== ctx.a1) {
    const eC = contaminationFactor(ctx.cont, spec.dm);
    p.bearing = { type: spec.type, C: spec.C, Cu: spec.Cu, dm: spec.dm, eC, a1: ctx.a1 };
    p.bearingCont = ctx.cont;
  }
  return p.bearing;
}

/**
 * The friction kernel's input: one object, refilled for each candidate and point (frictionTerms
 * keeps none of it; every candidate at every point of a sweep asks).
 */
const frictionInput: FrictionInput = {
  kind: 'deep-groove ball',
  form: null,
  arrangement: 'single',
  supply: 'grease',
  nu: 0,
  n: 0,
  dm: 0,
  Fr: 0,
  Fa: 0,
  C0: 0,
};

/**
 * The friction moment at each point [4], Mi from the point's loads without f_d, and its time
 * means over the duty: torque Σ ti·Mi/Σ ti (N·m) and power Σ ti·Mi·2π·ni/Σ ti (W). Each
 * point's moments are written to `moments` where it is given.
 */
function friction(
  spec: CandidateSpec,
  p: Prepared,
  lubrication: Lubrication,
  per: FrictionLoads,
  moments: FrictionTerms[] | null,
): { torque: number; power: number } {
  let sumT = 0;
  let sumM = 0;
  let sumW = 0;
  // One input, the candidate's figures set once and each point's speed and loads in turn.
  const x = frictionInput;
  x.kind = spec.kind;
  x.form = spec.form;
  x.arrangement = spec.arrangement;
  x.supply = lubrication.supply;
  x.nu = lubrication.viscosity;
  x.dm = spec.dm;
  // The moment's load factor is worked per bearing: one bearing's C0 (a pair's is twice it, ISO 76).
  x.C0 = spec.arrangement === 'single' ? spec.C0 : spec.C0 / 2;
  for (let i = 0; i < per.length; i++) {
    const q = per[i]!;
    x.n = q.n;
    x.Fr = q.Fr;
    x.Fa = q.FaBearing;
    const m = frictionTerms(p.friction, x);
    sumT += q.t;
    sumM += q.t * m.total;
    sumW += q.t * frictionPower(m.total, q.n);
    if (moments) moments[i] = m;
  }
  return { torque: sumT > 0 ? sumM / sumT : 0, power: sumT > 0 ? sumW / sumT : 0 };
}

/** A candidate's loads at each point of a context as its friction reads them (N, rev/s, time share). */
export type FrictionLoads = readonly Pick<PointLoad, 'Fr' | 'FaBearing' | 'n' | 't'>[];

/** The loads frictionLoss reads: worked once for a search that asks for the loss on several lubricants. */
export function frictionLoads(spec: CandidateSpec, ctx: EvalContext): FrictionLoads {
  const p = prepared(spec, ctx.tables);
  const t = ctx.tables.load;
  return ctx.points.map((q) => ({
    Fr: q.Fr,
    FaBearing: bearingAxialLoad(t, spec, p, q.Fr, q.Fa),
    n: q.n,
    t: q.t,
  }));
}

/**
 * A candidate's time-mean friction power in a context, W: evaluate's frictionPower, worked
 * without its other figures and notes (an oil bath's search asks for it at several
 * temperatures), on `lubrication` (default the context's); `loads` from frictionLoads of the
 * same candidate and context.
 */
export function frictionLoss(
  spec: CandidateSpec,
  ctx: EvalContext,
  lubrication: Lubrication = ctx.lubrication,
  loads: FrictionLoads = frictionLoads(spec, ctx),
): number {
  return friction(spec, prepared(spec, ctx.tables), lubrication, loads, null).power;
}

/** The grease-life kernel's input: one object, refilled for each candidate (greaseLifeFrom keeps none of it). */
const greaseInput: GreaseLifeInput & { load: { P: number; C: number } } = {
  kind: 'deep-groove ball',
  form: null,
  n: 0,
  d: 0,
  D: 0,
  temperature: 0,
  load: { P: 0, C: 0 },
};

/**
 * Speed, friction and grease [4]: n·dm at the highest speed (mm·r/min); the time means over the
 * duty of the friction moment Σ ti·Mi/Σ ti (N·m) and power Σ ti·Mi·2π·ni/Σ ti (W), Mi from the
 * point's loads without f_d; on grease, the grease life (sealed) or relubrication interval
 * (open) at the highest speed, h.
 */
function running(spec: CandidateSpec, p: Prepared, ctx: EvalContext, per: PointLoad[], P: number, notes: Notes) {
  const ndm = speedFactor(ctx.maxSpeed, spec.dm);
  const moments = new Array<FrictionTerms>(per.length);
  const means = friction(spec, p, ctx.lubrication, per, moments);
  let grease: number | null = null;
  if (ctx.lubrication.supply === 'grease' && ctx.maxSpeed > 0) {
    const input = greaseInput;
    input.kind = spec.kind;
    input.form = spec.form;
    input.n = ctx.maxSpeed;
    input.d = spec.bore;
    input.D = spec.outerDiameter ?? 2 * spec.dm - spec.bore;
    input.temperature = ctx.lubrication.temperature;
    input.load.P = P;
    input.load.C = spec.C;
    const r = regreasingIntervalFrom(ctx.tables.running, input);
    grease = ctx.lubrication.sealed ? r.life.l10Hours : r.hours;
    for (const f of r.life.findings) notes.warn(f, 'once');
  }
  return { ndm, friction: means, moments, grease };
}

/**
 * For an oscillating shaft, the smallest swing for full rolling-element overlap,
 * 720°/(Z·(1 − Dw/dm)) (rad) [4]; a smaller swing is said (false brinelling). Null when the
 * shaft rotates.
 */
function swingAngle(spec: CandidateSpec, c: CaseSI, notes: Notes): number | null {
  if (!c.shaft.oscillation) return null;
  const swing = criticalSwingAngle(spec.Z, spec.Dw, spec.dm);
  if (c.shaft.oscillation.angle < swing) {
    notes.warn(
      finding('rolling.swing-too-small', {
        designation: spec.designation,
        swing: c.shaft.oscillation.angle,
        fullOverlapSwing: swing,
        elements: spec.Z,
      }),
    );
  }
  return swing;
}

/** The figures the checks read: one object, refilled for each candidate (the checks keep none of it). */
const figures: CandidateFigures = {
  P: 0,
  L10: null,
  kappa: null,
  L10mh: null,
  s0: null,
  ndm: 0,
  greaseHours: null,
  staticOnly: false,
};

/** The candidate's figures at each point, in the order of the points. */
function pointRecords(per: PointLoad[], life: SpectrumLife, moments: FrictionTerms[]): RollingCandidate['points'] {
  const out: RollingCandidate['points'] = new Array(per.length);
  for (let i = 0; i < per.length; i++) {
    const q = per[i]!;
    const l = life.points[i]!;
    const m = moments[i]!;
    out[i] = {
      Fr: q.Fr,
      Fa: q.FaBearing,
      n: q.n,
      t: q.t,
      X: q.load.X,
      Y: q.load.Y,
      e: q.load.e,
      key: q.load.key,
      P: q.load.P,
      kappa: l.kappa,
      aISO: l.aISO,
      L10mh: l.L10mh,
      static: l.static,
      frictionViscous: m.viscous,
      frictionLoad: m.load,
    };
  }
  return out;
}

/**
 * One candidate, evaluated [1–4]: every figure of RollingCandidate (SI; lives h) and its
 * checks. It is feasible when nothing excludes it and every check that decides passes. Static
 * safety s0 = C0/P0 uses the peak static equivalent load P0 over the points, without f_d [2].
 */
export function evaluate(spec: CandidateSpec, ctx: EvalContext, notes: Notes): RollingCandidate {
  const p = prepared(spec, ctx.tables);
  const loads = pointLoads(spec, p, ctx, notes);
  const life = lives(spec, p, ctx, loads.per, notes);
  // The peak static load and the largest axial load the bearing carries over the points.
  let P0 = 0;
  let axialLoad = 0;
  for (const q of loads.per) {
    P0 = Math.max(P0, staticEquivalentLoad(p.static, q.Fr, q.FaBearing));
    axialLoad = Math.max(axialLoad, q.FaBearing);
  }
  const s0 = P0 > 0 ? spec.C0 / P0 : null;
  const run = running(spec, p, ctx, loads.per, life.P, notes);
  const swing = swingAngle(spec, ctx.c, notes);
  // The lowest κ over the turning points: the point that is lubricated least well.
  let kappa: number | null = null;
  for (const q of life.points)
    if (q.kappa !== null && !q.static) kappa = kappa === null ? q.kappa : Math.min(kappa, q.kappa);
  const fig = figures;
  fig.P = life.P;
  fig.L10 = life.L10;
  fig.kappa = kappa;
  fig.L10mh = life.L10mh;
  fig.s0 = s0;
  fig.ndm = run.ndm;
  fig.greaseHours = run.grease;
  fig.staticOnly = life.staticOnly;
  const checks = candidateChecks(spec, fig, ctx);
  return {
    id: spec.id,
    type: spec.type,
    kind: spec.kind,
    form: spec.form,
    arrangement: spec.arrangement,
    contactAngle: spec.contactAngle,
    axialCapacity: p.axialCapacity,
    series: spec.series,
    designation: spec.designation,
    bore: spec.bore,
    outerDiameter: spec.outerDiameter,
    width: spec.width,
    dynamicRating: spec.C,
    staticRating: spec.C0,
    fatigueLimit: spec.Cu,
    ratingSource: spec.ratingSource,
    pitchDiameter: spec.dm,
    elementDiameter: spec.Dw,
    elementCount: spec.Z,
    X: loads.heaviest.load.X,
    Y: loads.heaviest.load.Y,
    e: loads.heaviest.load.e,
    axialLoad,
    equivalentLoad: life.P,
    staticEquivalentLoad: P0,
    L10: life.L10,
    L10h: life.L10h,
    a1: ctx.a1,
    aISO: life.aISOEquivalent,
    kappa,
    L10mh: life.L10mh,
    s0,
    staticOnly: life.staticOnly,
    ndm: run.ndm,
    frictionTorque: run.friction.torque,
    frictionPower: run.friction.power,
    requiredDynamicRating: life.staticOnly
      ? null
      : requiredDynamicRating(life.P, life.n, ctx.c.life.hours, lifeExponent(spec.type), ctx.a1),
    relubricationHours: run.grease,
    temperature: ctx.lubrication.temperature,
    viscosity: ctx.lubrication.viscosity,
    ratedViscosity: kappa !== null && kappa > 0 ? ctx.lubrication.viscosity / kappa : null,
    criticalSwingAngle: swing,
    points: pointRecords(loads.per, life, run.moments),
    exclusions: loads.exclusions,
    feasible: loads.exclusions.length === 0 && allLimitsPass(checks),
    checks,
  };
}
