import type { SheetLine } from '../../core/check.js';
import { num } from '../../core/format.js';
import { AISO_CAP, AISO_CONSTANTS, KAPPA_MAX, KAPPA_MIN } from './aiso.js';

import type { LoadPoint } from './conditions.js';
import { dynamicEquivalentLoad } from './equivalent-load.js';
import type { EvalContext } from './context.js';
import { frictionTorque } from './speed.js';
import type { RollingCandidate } from './types.js';

/**
 * The calculation sheet of one candidate: each figure with its formula, the formula with the
 * numbers put in, its value and the formula's source. Each line's `substituted` ends in an
 * expression (numbers, or a function of named arguments) whose value is the line's `value`:
 * reports print `substituted = value unit`. The figures are the candidate's own
 * (src/calc/rolling/evaluate.ts); the sheet only writes them out.
 */

/** Largest number of operating points written out term by term on the sheet; more are summed in words. */
const SHEET_TERMS_MAX = 4;

/** A number on the sheet: num with the zeros of the exponent form kept (1.000e+6), as the sheet has always been written. */
const fig = (v: number): string => num(v, 4, { exponentZeros: 'keep' });

/** The life exponent p as written on the sheet: as itself, as 1/p and as an exponent. */
interface ExponentText {
  p: string;
  /** 1/p as a plain fraction: "1/10/3" would read as 1/30. */
  inverse: string;
  /** p as an exponent: "^10/3" would read as (…^10)/3. */
  power: string;
}
const EXPONENT_TEXT: Record<RollingCandidate['type'], ExponentText> = {
  ball: { p: '3', inverse: '1/3', power: '3' },
  roller: { p: '10/3', inverse: '3/10', power: '(10/3)' },
};

/** A point with its dynamic equivalent load Pi = X·Fr + Y·Fa without f_d, N, as evaluate() works it. */
type SheetPoint = LoadPoint & { P: number };

/** The dynamic equivalent load line: one point written out, or the duty mean over several. */
function loadLine(candidate: RollingCandidate, ctx: EvalContext, per: SheetPoint[]): SheetLine {
  const ex = EXPONENT_TEXT[candidate.type];
  if (per.length <= 1) {
    const q = ctx.points[0];
    return {
      label: `Dynamic equivalent load P (${candidate.designation})`,
      formula: 'P = f_d·(X·Fr + Y·Fa)',
      substituted: q
        ? `P = ${ctx.serviceFactor}·(${fig(candidate.X)}·${fig(q.Fr)} N + ${fig(candidate.Y)}·${fig(q.Fa)} N)`
        : 'P = 0',
      value: candidate.equivalentLoad,
      unit: 'N',
      source: 'ISO 281:2007 (X, Y table); service factor common practice',
    };
  }
  const many = per.length > SHEET_TERMS_MAX;
  const byRevolutions = per.some((q) => q.n > 0 && q.t > 0);
  const weight = (q: SheetPoint): string => (byRevolutions ? `${fig(q.n * 60)}·${fig(q.t)}` : fig(q.t));
  const numerator = many
    ? `Σ over ${per.length} points of Pi^${ex.power}·${byRevolutions ? 'ni·ti' : 'ti'}`
    : per.map((q) => `${fig(ctx.serviceFactor * q.P)}^${ex.power}·${weight(q)}`).join(' + ');
  const denominator = many ? (byRevolutions ? 'Σ ni·ti' : 'Σ ti') : per.map(weight).join(' + ');
  return {
    label: `Dynamic equivalent load P (${candidate.designation})`,
    formula: `P = (Σ Pi^p·${byRevolutions ? 'ni·ti / Σ ni·ti' : 'ti / Σ ti'})^(1/p), Pi = f_d·(X·Fr + Y·Fa), p = ${ex.p}, f_d = ${ctx.serviceFactor}${byRevolutions ? ', n in r/min' : ''}`,
    substituted: `P = [(${numerator})/(${denominator})]^(${ex.inverse})`,
    value: candidate.equivalentLoad,
    unit: 'N',
    source: 'ISO 281:2007 (X, Y table; variable load); service factor common practice',
  };
}

/** L10, L10h and the dynamic rating needed for the life target, where they apply; n mean speed, rev/s. */
function lifeLines(candidate: RollingCandidate, ctx: EvalContext, n: number): SheetLine[] {
  const ex = EXPONENT_TEXT[candidate.type];
  const lines: SheetLine[] = [];
  if (candidate.L10 !== null) {
    lines.push({
      label: 'Basic rating life L10',
      formula: 'L10 = (C/P)^p',
      substituted: `L10 = (${fig(candidate.dynamicRating)} N / ${fig(candidate.equivalentLoad)} N)^${ex.power}`,
      value: candidate.L10,
      unit: '10^6 rev',
      source: 'ISO 281:2007',
    });
  }
  if (candidate.L10h !== null && candidate.L10 !== null) {
    lines.push({
      label: 'Basic rating life L10h',
      formula: 'L10h = 10^6·L10/(60·n)',
      substituted: `L10h = 10^6·${fig(candidate.L10)}/(60·${fig(n * 60)} r/min)`,
      value: candidate.L10h,
      unit: 'h',
      source: 'ISO 281:2007',
    });
  }
  if (candidate.requiredDynamicRating !== null && ctx.c.life.hours > 0) {
    lines.push({
      label: `Basic dynamic rating needed for the life target (${candidate.kind}, p = ${ex.p})`,
      formula: 'C_req = P·(L_req/a1)^(1/p), L_req = 60·n·h/10^6 (n in r/min)',
      substituted: `C_req = ${fig(candidate.equivalentLoad)} N·(60·${fig(n * 60)} r/min·${fig(ctx.c.life.hours)} h/10^6/${fig(candidate.a1)})^(${ex.inverse})`,
      value: candidate.requiredDynamicRating,
      unit: 'N',
      source: 'ISO 281:2007, from L10 = (C/P)^p with a1 (a_ISO taken as 1)',
    });
  }
  return lines;
}

/** ν1 and κ, where the shaft turns; n mean speed, rev/s. */
function viscosityLines(candidate: RollingCandidate, n: number): SheetLine[] {
  if (candidate.ratedViscosity === null || candidate.kappa === null) return [];
  const rpm = n * 60;
  const slow = rpm < 1000;
  return [
    {
      label: 'Rated viscosity ν1',
      formula: slow ? 'ν1 = 45000·n^-0.83·dm^-0.5 (mm²/s, r/min, mm)' : 'ν1 = 4500·n^-0.5·dm^-0.5 (mm²/s, r/min, mm)',
      substituted: `ν1 = ${slow ? '45000' : '4500'}·${fig(rpm)}^${slow ? '-0.83' : '-0.5'}·${fig(candidate.pitchDiameter * 1000)}^-0.5 mm²/s`,
      value: candidate.ratedViscosity,
      unit: 'm^2/s',
      source: 'ISO 281:2007 (from memory)',
    },
    {
      label: 'Viscosity ratio κ',
      formula: 'κ = ν/ν1, ν at the operating temperature',
      substituted: `κ = ν(${fig(candidate.temperature)} °C)/ν1 = ${fig(candidate.viscosity * 1e6)} mm²/s / ${fig(candidate.ratedViscosity * 1e6)} mm²/s`,
      value: candidate.kappa,
      unit: '1',
      source: 'ISO 281:2007',
    },
  ];
}

/** The a_ISO formula of a bearing type, written from its constants (the load exponent 1/3 as a fraction). */
function aIsoFormula(type: RollingCandidate['type']): string {
  const a = AISO_CONSTANTS[type];
  const inner = a.inner === 1 ? '' : `^${a.inner}`;
  const load = type === 'ball' ? '(1/3)' : String(a.load);
  return `a_ISO = 0.1·[1 − (${a.x} − y/κ^z)${inner}·(e_C·Cu/P)^${load}]^${a.outer}`;
}

/** e_C·Cu/P and a_ISO, where a_ISO applies. */
function aIsoLines(candidate: RollingCandidate, ctx: EvalContext): SheetLine[] {
  if (candidate.aISO === null) return [];
  const eCCuP = (ctx.cont.eC * candidate.fatigueLimit) / candidate.equivalentLoad;
  const kappaUsed = Math.min(KAPPA_MAX, Math.max(KAPPA_MIN, candidate.kappa ?? 0));
  const args = `a_ISO(κ = ${fig(kappaUsed)}, e_C·Cu/P = ${fig(eCCuP)})`;
  return [
    {
      label: 'Contamination and fatigue-limit term e_C·Cu/P',
      formula: 'e_C·Cu/P',
      substituted: `${fig(ctx.cont.eC)}·${fig(candidate.fatigueLimit)} N/${fig(candidate.equivalentLoad)} N`,
      value: eCCuP,
      unit: '1',
      source: `ISO 281:2007 (from memory); e_C for "${ctx.cont.level}" (${ctx.cont.source})`,
    },
    {
      label: 'Life modification factor a_ISO',
      formula: `${aIsoFormula(candidate.type)}, y and z per κ band, κ held to ${KAPPA_MIN}–${KAPPA_MAX}, a_ISO ≤ ${AISO_CAP}`,
      substituted: candidate.aISO >= AISO_CAP ? `min(${AISO_CAP}, ${args})` : args,
      value: candidate.aISO,
      unit: '1',
      source: 'ISO 281:2007 (from memory)',
    },
  ];
}

/** a1, L10mh, s0 and n·dm. */
function ratingLines(candidate: RollingCandidate, ctx: EvalContext): SheetLine[] {
  const lines: SheetLine[] = [
    {
      label: 'Reliability factor a1',
      formula: 'a1 = 0.95·[ln(100/R)/ln(100/90)]^(2/3) + 0.05, R in %',
      substituted: `a1 = 0.95·[ln(100/${fig(ctx.reliabilityUsed)})/ln(100/90)]^(2/3) + 0.05`,
      value: candidate.a1,
      unit: '1',
      source: 'ISO 281:2007',
    },
  ];
  if (candidate.L10mh !== null && candidate.L10h !== null && candidate.aISO !== null) {
    lines.push({
      label: 'Modified rating life L10mh',
      formula: 'L10mh = a1·a_ISO·L10h',
      substituted: `L10mh = ${fig(candidate.a1)}·${fig(candidate.aISO)}·${fig(candidate.L10h)} h`,
      value: candidate.L10mh,
      unit: 'h',
      source: 'ISO 281:2007',
    });
  }
  if (candidate.s0 !== null) {
    lines.push({
      label: 'Static safety s0',
      formula: candidate.type === 'ball' ? 's0 = C0/P0, P0 = max(0.6·Fr + 0.5·Fa, Fr)' : 's0 = C0/P0, P0 = Fr',
      substituted: `s0 = ${fig(candidate.staticRating)} N / ${fig(candidate.staticEquivalentLoad)} N`,
      value: candidate.s0,
      unit: '1',
      source: 'ISO 76 (from memory)',
    });
  }
  lines.push({
    label: 'Speed factor n·dm',
    formula: 'n·dm (highest point speed, r/min × mm)',
    substituted: `${fig(ctx.maxSpeed * 60)} r/min × ${fig(candidate.pitchDiameter * 1000)} mm`,
    value: candidate.ndm,
    unit: 'mm*r/min',
    source: 'common practice',
  });
  return lines;
}

/** Friction torque and power: M = μ·Pi·d/2 per point (Pi without f_d), time means over the duty. */
function frictionLines(candidate: RollingCandidate, ctx: EvalContext, per: SheetPoint[]): SheetLine[] {
  const mu = ctx.f.friction.find((q) => q.type === candidate.type)!.mu;
  const sumT = per.reduce((acc, q) => acc + Math.max(0, q.t), 0);
  const pBar = sumT > 0 ? per.reduce((acc, q) => acc + Math.max(0, q.t) * Math.max(0, q.P), 0) / sumT : 0;
  const Mi = (q: SheetPoint): number => frictionTorque(mu, q.P, candidate.bore);
  const term = (q: SheetPoint): string => `${fig(Mi(q))} N·m·2π·${fig(Math.max(0, q.n))} rev/s`;
  const several = per.length > 1;
  let power: string;
  if (!several) power = per[0] ? `N_R = ${term(per[0])}` : 'N_R = 0';
  else if (per.length > SHEET_TERMS_MAX) power = `N_R = (Σ over ${per.length} points of ti·Mi·2π·ni)/(Σ ti)`;
  else
    power = `N_R = (${per.map((q) => `${fig(q.t)}·${term(q)}`).join(' + ')})/(${per.map((q) => fig(q.t)).join(' + ')})`;
  return [
    {
      label: several ? 'Friction torque M (time mean over the duty)' : 'Friction torque M',
      formula: several
        ? 'M = μ·P̄·d/2, P̄ = Σ ti·Pi/Σ ti, Pi = X·Fr + Y·Fa (without f_d)'
        : 'M = μ·P·d/2, P = X·Fr + Y·Fa (without f_d)',
      substituted: `M = ${mu}·${fig(pBar)} N·${fig(candidate.bore)} m/2`,
      value: candidate.frictionTorque,
      unit: 'N*m',
      source: 'common practice (from memory)',
    },
    {
      label: several ? 'Friction power N_R (time mean over the duty)' : 'Friction power N_R',
      formula: several ? 'N_R = Σ ti·Mi·2π·ni/Σ ti, Mi = μ·Pi·d/2' : 'N_R = M·2π·n',
      substituted: power,
      value: candidate.frictionPower,
      unit: 'W',
      source: 'mechanics',
    },
  ];
}

/** The grease interval (grease life of a sealed bearing), on grease. */
function greaseLines(candidate: RollingCandidate, ctx: EvalContext): SheetLine[] {
  if (candidate.relubricationHours === null) return [];
  const kf = ctx.f.relubrication.find((q) => q.type === candidate.type)!.kf;
  const rpm = ctx.maxSpeed * 60;
  const dMm = candidate.bore * 1000;
  const hot = candidate.temperature > 70 ? `·0.5^((${fig(candidate.temperature)} − 70)/15)` : '';
  const core = `${kf}·[14·10^6/(${fig(rpm)}·√${fig(dMm)}) − 4·${fig(dMm)}]${hot}`;
  return [
    {
      label: ctx.lubrication.sealed ? 'Grease life (sealed bearing)' : 'Grease relubrication interval',
      formula:
        't_f = k_f·[14·10^6/(n·√d) − 4·d]·0.5^((T − 70)/15 if T > 70), n highest speed in r/min, d bore in mm, T in °C; no positive interval gives 0',
      substituted: `t_f = ${candidate.relubricationHours === 0 ? `max(0, ${core})` : core}`,
      value: candidate.relubricationHours,
      unit: 'h',
      source: "a rolling-bearing maker's general technical guide on grease relubrication (seen; not named here)",
    },
  ];
}

/**
 * The calculation sheet of `candidate` in its case context `ctx`, `n` the duty's mean speed (rev/s): load,
 * lives, viscosity, a_ISO, ratings and safety, friction, grease, in that order.
 */
export function rollingSheet(candidate: RollingCandidate, ctx: EvalContext, n: number): SheetLine[] {
  const per = ctx.points.map((q) => ({
    ...q,
    P: dynamicEquivalentLoad(candidate.type, q.Fr, q.Fa, candidate.staticRating, ctx.f.xyDeepGrooveBall).P,
  }));
  return [
    loadLine(candidate, ctx, per),
    ...lifeLines(candidate, ctx, n),
    ...viscosityLines(candidate, n),
    ...aIsoLines(candidate, ctx),
    ...ratingLines(candidate, ctx),
    ...frictionLines(candidate, ctx, per),
    ...greaseLines(candidate, ctx),
  ];
}
