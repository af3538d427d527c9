import type { CaseSI } from '../../case/types.js';
import { finding, type Finding } from '../../core/finding.js';
import { AISO_CAP, KAPPA_MAX, KAPPA_MIN, aIso, ratedViscosity } from './aiso.js';
import type { CandidateSpec } from './candidates.js';
import { candidateChecks } from './checks.js';
import { EC_GUIDANCE_DM, type LoadPoint } from './conditions.js';
import {
  dynamicEquivalentLoad,
  spectrumMean,
  staticEquivalentLoad,
  type DynamicLoadResult,
} from './equivalent-load.js';
import type { Notes } from './findings.js';
import { basicRatingLife, lifeExponent, lifeHours, requiredDynamicRating } from './life.js';
import { criticalSwingAngle, frictionPower, frictionTorque, relubricationInterval, speedFactor } from './speed.js';
import type { RollingCandidate } from './types.js';
import type { EvalContext } from './context.js';

/**
 * One candidate's figures: its loads, lives, lubrication, static safety, speed, friction,
 * grease interval and oscillation criterion, then its checks (src/calc/rolling/checks.ts).
 *
 * References
 * [1] ISO 281:2007: P = X·Fr + Y·Fa, the duty mean P, L10 = (C/P)^p, L10h, κ = ν/ν1, a_ISO,
 *     L10mh = a1·a_ISO·L10h (the kernels in equivalent-load.ts, life.ts, aiso.ts).
 * [2] ISO 76: P0 and s0 = C0/P0.
 * [3] Speed factor n·dm, friction M = μ·P·d/2, grease interval t_f, swing for full element
 *     overlap (speed.ts; common practice and a bearing-maker technical guide).
 */

/** A point's dynamic equivalent load without f_d (P, for friction) and with it (Pf, for life), N. */
type PointLoad = DynamicLoadResult & { Pf: number } & LoadPoint;

/**
 * Dynamic equivalent load at each point [1], Pi = X·Fr + Y·Fa, and with the service factor
 * Pf,i = f_d·Pi; the duty mean P = (Σ Pf,i^p·ni·ti / Σ ni·ti)^(1/p) and mean speed n, rev/s.
 * A point the method cannot rate excludes the bearing (its reason kept once).
 */
function pointLoads(
  spec: CandidateSpec,
  ctx: EvalContext,
  notes: Notes,
): { per: PointLoad[]; exclusions: Finding[]; heaviest: PointLoad; P: number; n: number } {
  const table = ctx.f.xyDeepGrooveBall;
  const exclusions: Finding[] = [];
  // Reasons are told apart as they read (the load kernel's own sentence), as they always were.
  const excludedFor = new Set<string>();
  const per = ctx.points.map((q): PointLoad => {
    const r = dynamicEquivalentLoad(spec.type, q.Fr, q.Fa, spec.C0, table);
    if (r.exclusion && !excludedFor.has(r.exclusion)) {
      excludedFor.add(r.exclusion);
      exclusions.push(
        spec.type === 'ball'
          ? finding('rolling.axial-beyond-table', { faC0: r.faC0, lastRow: table.rows[table.rows.length - 1]!.faC0 })
          : finding('rolling.roller-axial-load', { axial: q.Fa }),
      );
    }
    if (r.range === 'below' && r.faC0 !== null && r.faC0 > 0 && r.Y > 0) {
      notes.warn(
        finding('rolling.fa-c0-below-table', {
          designation: spec.designation,
          faC0: r.faC0,
          firstRow: table.rows[0]!.faC0,
        }),
        `${spec.designation} ${r.faC0.toFixed(4)}`,
      );
    }
    return { ...r, Pf: ctx.serviceFactor * r.P, n: q.n, t: q.t, Fr: q.Fr, Fa: q.Fa };
  });
  const heaviest = per.reduce((a, b) => (b.Pf > a.Pf ? b : a), per[0]!);
  const mean = spectrumMean(
    per.map((q) => ({ P: q.Pf, n: q.n, t: q.t })),
    lifeExponent(spec.type),
  );
  return { per, exclusions, heaviest, P: mean.P, n: mean.n };
}

/**
 * Lives and lubrication [1]: L10 (10⁶ rev), L10h (h) at the mean speed n (rev/s), rated
 * viscosity ν1 and κ = ν/ν1, a_ISO(κ, e_C·Cu/P) and L10mh = a1·a_ISO·L10h (h). Where κ or
 * a_ISO leave the method's range, it is said.
 */
function lives(spec: CandidateSpec, ctx: EvalContext, P: number, n: number, notes: Notes) {
  const L10 = basicRatingLife(spec.C, P, lifeExponent(spec.type));
  const L10h = L10 !== null ? lifeHours(L10, n) : null;
  const nu1 = ratedViscosity(n, spec.dm);
  const kappa = nu1 !== null ? ctx.lubrication.viscosity / nu1 : null;
  let aISO: number | null = null;
  if (kappa !== null && P > 0) {
    const a = aIso(spec.type, kappa, (ctx.cont.eC * spec.Cu) / P);
    aISO = a.aISO;
    const designation = spec.designation;
    if (a.kappaRange === 'above')
      notes.warn(finding('rolling.kappa-above-range', { designation, kappa, kappaMax: KAPPA_MAX }));
    if (a.kappaRange === 'below')
      notes.warn(finding('rolling.kappa-below-range', { designation, kappa, kappaMin: KAPPA_MIN }));
    if (a.capped) notes.warn(finding('rolling.aiso-capped', { designation, cap: AISO_CAP }));
  }
  if (spec.dm >= EC_GUIDANCE_DM)
    notes.warn(
      finding('rolling.pitch-diameter-large', {
        designation: spec.designation,
        pitchDiameter: spec.dm,
        guidanceBelow: EC_GUIDANCE_DM,
      }),
    );
  const L10mh = L10h !== null && aISO !== null ? ctx.a1 * aISO * L10h : null;
  return { L10, L10h, nu1, kappa, aISO, L10mh };
}

/**
 * Speed, friction and grease [3]: n·dm at the highest speed (mm·r/min); the time means over the
 * duty of the friction torque Σ ti·Mi/Σ ti (N·m) and power Σ ti·Mi·2π·ni/Σ ti (W), with
 * Mi = μ·Pi·d/2 and Pi without f_d; on grease, the interval t_f (h) at the highest speed.
 */
function running(spec: CandidateSpec, ctx: EvalContext, per: PointLoad[], notes: Notes) {
  const ndm = speedFactor(ctx.maxSpeed, spec.dm);
  const mu = ctx.f.friction.find((q) => q.type === spec.type)!.mu;
  let sumT = 0;
  let sumM = 0;
  let sumW = 0;
  for (const q of per) {
    const M = frictionTorque(mu, q.P, spec.bore);
    sumT += q.t;
    sumM += q.t * M;
    sumW += q.t * frictionPower(M, q.n);
  }
  const torque = sumT > 0 ? sumM / sumT : 0;
  const power = sumT > 0 ? sumW / sumT : 0;
  let relub: number | null = null;
  if (ctx.lubrication.supply === 'grease') {
    const kf = ctx.f.relubrication.find((q) => q.type === spec.type)!.kf;
    relub = relubricationInterval(ctx.maxSpeed, spec.bore, kf, ctx.lubrication.temperature);
    if (relub === 0)
      notes.warn(finding('rolling.grease-too-fast', { designation: spec.designation, speed: ctx.maxSpeed }));
  }
  return { ndm, torque, power, relub };
}

/**
 * For an oscillating shaft, the smallest swing for full rolling-element overlap,
 * 720°/(Z·(1 − Dw/dm)) (rad) [3]; a smaller swing is said (false brinelling). Null when the
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

/**
 * One candidate, evaluated [1–3]: every figure of RollingCandidate (SI; lives h) and its
 * checks. It is feasible when nothing excludes it and every check passes. Static safety
 * s0 = C0/P0 uses the peak static equivalent load P0 over the points, without f_d [2].
 */
export function evaluate(spec: CandidateSpec, ctx: EvalContext, notes: Notes): RollingCandidate {
  const loads = pointLoads(spec, ctx, notes);
  const life = lives(spec, ctx, loads.P, loads.n, notes);
  const P0 = ctx.points.reduce((m, q) => Math.max(m, staticEquivalentLoad(spec.type, q.Fr, q.Fa)), 0);
  const s0 = P0 > 0 ? spec.C0 / P0 : null;
  const run = running(spec, ctx, loads.per, notes);
  const swing = swingAngle(spec, ctx.c, notes);
  const checks = candidateChecks(
    spec,
    {
      P: loads.P,
      L10: life.L10,
      kappa: life.kappa,
      L10mh: life.L10mh,
      s0,
      ndm: run.ndm,
      relubricationHours: run.relub,
    },
    ctx,
  );
  return {
    id: spec.id,
    type: spec.type,
    kind: spec.kind,
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
    X: loads.heaviest.X,
    Y: loads.heaviest.Y,
    equivalentLoad: loads.P,
    staticEquivalentLoad: P0,
    L10: life.L10,
    L10h: life.L10h,
    a1: ctx.a1,
    aISO: life.aISO,
    kappa: life.kappa,
    L10mh: life.L10mh,
    s0,
    ndm: run.ndm,
    frictionTorque: run.torque,
    frictionPower: run.power,
    requiredDynamicRating: requiredDynamicRating(loads.P, loads.n, ctx.c.life.hours, lifeExponent(spec.type), ctx.a1),
    relubricationHours: run.relub,
    temperature: ctx.lubrication.temperature,
    viscosity: ctx.lubrication.viscosity,
    ratedViscosity: life.nu1,
    criticalSwingAngle: swing,
    exclusions: loads.exclusions,
    feasible: loads.exclusions.length === 0 && checks.every((k) => k.pass),
    checks,
  };
}
