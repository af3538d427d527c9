import type { SheetLine } from '../../core/check.js';
import { AISO_CAP, AISO_CONSTANTS, KAPPA_MAX, KAPPA_MIN, ratedViscosity } from './aiso.js';
import type { EvalContext } from './context.js';
import { EC_GUIDANCE_DM, contaminationFactor } from './conditions.js';
import { staticLoad } from './load-factors.js';
import { EXPONENT_TEXT, SHEET_TERMS_MAX, fig, loadLines, pointLabel, rowsText } from './sheet-load.js';
import { frictionLines, greaseLines } from './sheet-running.js';
import { STATIC_SPEED_LIMIT } from './spectrum.js';
import type { CandidatePoint, RollingCandidate } from './types.js';

/**
 * The calculation sheet of one candidate: each figure with its formula, the formula with the
 * numbers put in, its value and the formula's source. Each line's `substituted` ends in an
 * expression (numbers, or a function of named arguments) whose value is the line's `value`:
 * reports print `substituted = value unit`. The figures are the candidate's own
 * (src/calc/rolling/evaluate.ts, with its points); the sheet only writes them out, in the
 * order: loads (sheet-load.ts), lives, viscosity and a_ISO per point, the lives combined over
 * the duty, static safety and speed, friction and grease (sheet-running.ts).
 */

/** L10, L10h and the dynamic rating needed for the life target, where they apply; n mean speed, rev/s. */
function lifeLines(c: RollingCandidate, ctx: EvalContext, n: number): SheetLine[] {
  const ex = EXPONENT_TEXT[c.type];
  const lines: SheetLine[] = [];
  if (c.staticOnly) {
    lines.push({
      label: 'No rating life claimed: every point turns slower than the static speed limit; static safety s0 governs',
      formula: `n < ${fig(STATIC_SPEED_LIMIT * 60)} r/min at every point with a time share`,
      substituted: `n_max = ${fig(ctx.maxSpeed * 60)} r/min`,
      value: ctx.maxSpeed * 60,
      unit: 'r/min',
      source: 'common practice: a bearing turning slower than about 10 r/min is sized by ISO 76 s0 = C0/P0',
    });
    return lines;
  }
  if (c.L10 !== null)
    lines.push({
      label: `Basic rating life L10 (${c.kind}, p = ${ex.p})`,
      formula: 'L10 = (C/P)^p',
      substituted: `L10 = (${fig(c.dynamicRating)} N / ${fig(c.equivalentLoad)} N)^${ex.power}`,
      value: c.L10,
      unit: '10^6 rev',
      source: 'ISO 281:2007',
    });
  if (c.L10h !== null && c.L10 !== null)
    lines.push({
      label: `Basic rating life L10h (${c.kind})`,
      formula: 'L10h = 10^6·L10/(60·n), n the time-mean speed in r/min',
      substituted: `L10h = 10^6·${fig(c.L10)}/(60·${fig(n * 60)} r/min)`,
      value: c.L10h,
      unit: 'h',
      source: 'ISO 281:2007',
    });
  if (c.requiredDynamicRating !== null && ctx.c.life.hours > 0)
    lines.push({
      label: `Basic dynamic rating needed for the life target (${c.kind}, p = ${ex.p})`,
      formula: 'C_req = P·(L_req/a1)^(1/p), L_req = 60·n·h/10^6 (n in r/min)',
      substituted: `C_req = ${fig(c.equivalentLoad)} N·(60·${fig(n * 60)} r/min·${fig(ctx.c.life.hours)} h/10^6/${fig(c.a1)})^(${ex.inverse})`,
      value: c.requiredDynamicRating,
      unit: 'N',
      source: 'ISO 281:2007, from L10 = (C/P)^p with a1 (a_ISO taken as 1)',
    });
  return lines;
}

/** The a_ISO formula of a bearing type, written from its constants (the load exponent 1/3 as a fraction). */
function aIsoFormula(type: RollingCandidate['type']): string {
  const a = AISO_CONSTANTS[type];
  const inner = a.inner === 1 ? '' : `^${a.inner}`;
  const load = type === 'ball' ? '(1/3)' : String(a.load);
  return `a_ISO = 0.1·[1 − (${a.x} − y/κ^z)${inner}·(e_C·Cu/P)^${load}]^${a.outer}`;
}

/** ν1, κ and a_ISO of the turning points: each of them up to SHEET_TERMS_MAX, else the one with the lowest κ. */
function turningLines(c: RollingCandidate, ctx: EvalContext): SheetLine[] {
  const turning = c.points.flatMap((q, i) => (q.static || q.kappa === null ? [] : [i]));
  if (turning.length <= SHEET_TERMS_MAX) return turning.flatMap((i) => pointLifeLines(c, ctx, i, false));
  const lowest = turning.reduce((lo, i) => (c.points[i]!.kappa! < c.points[lo]!.kappa! ? i : lo), turning[0]!);
  return pointLifeLines(c, ctx, lowest, true);
}

/** ν1, κ, e_C·Cu/Pi, a_ISO and the point's own modified life, for one turning point. */
function pointLifeLines(c: RollingCandidate, ctx: EvalContext, i: number, picked: boolean): SheetLine[] {
  const q = c.points[i]!;
  const at = pointLabel(i, c.points.length, picked ? 'the lowest κ' : '');
  const rpm = q.n * 60;
  const slow = rpm < 1000;
  const nu1 = ratedViscosity(q.n, c.pitchDiameter);
  const lines: SheetLine[] = [];
  if (nu1 === null || q.kappa === null) return lines;
  lines.push(
    {
      label: `Rated viscosity ν1${at}`,
      formula: slow ? 'ν1 = 45000·n^-0.83·dm^-0.5 (mm²/s, r/min, mm)' : 'ν1 = 4500·n^-0.5·dm^-0.5 (mm²/s, r/min, mm)',
      substituted: `ν1 = ${slow ? '45000' : '4500'}·${fig(rpm)}^${slow ? '-0.83' : '-0.5'}·${fig(c.pitchDiameter * 1000)}^-0.5 mm²/s`,
      value: nu1,
      unit: 'm^2/s',
      source: 'ISO 281:2007 (from memory)',
    },
    {
      label: `Viscosity ratio κ${at}`,
      formula: 'κ = ν/ν1, ν at the operating temperature',
      substituted: `κ = ν(${fig(c.temperature)} °C)/ν1 = ${fig(c.viscosity * 1e6)} mm²/s / ${fig(nu1 * 1e6)} mm²/s`,
      value: q.kappa,
      unit: '1',
      source: 'ISO 281:2007',
    },
  );
  if (q.aISO === null) return lines;
  const Pi = ctx.serviceFactor * q.P;
  const eC = contaminationFactor(ctx.cont, c.pitchDiameter);
  const eCCuP = (eC * c.fatigueLimit) / Pi;
  const kappaUsed = Math.min(KAPPA_MAX, Math.max(KAPPA_MIN, q.kappa));
  const args = `a_ISO(κ = ${fig(kappaUsed)}, e_C·Cu/P = ${fig(eCCuP)})`;
  const ex = EXPONENT_TEXT[c.type];
  lines.push(
    {
      label: `Contamination and fatigue-limit term e_C·Cu/P${at}`,
      formula: `e_C·Cu/P, P = f_d·Pi = ${ctx.serviceFactor}·${fig(q.P)} N`,
      substituted: `${fig(eC)}·${fig(c.fatigueLimit)} N/${fig(Pi)} N`,
      value: eCCuP,
      unit: '1',
      source: `ISO 281:2007 (from memory); e_C for "${ctx.cont.level}" at dm ${c.pitchDiameter >= EC_GUIDANCE_DM ? '≥' : '<'} 100 mm (${ctx.cont.source})`,
    },
    {
      label: `Life modification factor a_ISO${at}`,
      formula: `${aIsoFormula(c.type)}, y and z per κ band, κ held to ${KAPPA_MIN}–${KAPPA_MAX}, a_ISO ≤ ${AISO_CAP}`,
      substituted: q.aISO >= AISO_CAP ? `min(${AISO_CAP}, ${args})` : args,
      value: q.aISO,
      unit: '1',
      source: 'ISO 281:2007 (from memory)',
    },
  );
  if (q.L10mh !== null && c.points.length > 1)
    lines.push({
      label: `Modified rating life of the point L10mh${at}`,
      formula: 'L10mh,i = a1·a_ISO,i·(C/Pi)^p·10^6/(60·ni), Pi with f_d, ni in r/min',
      substituted: `L10mh = ${fig(c.a1)}·${fig(q.aISO)}·(${fig(c.dynamicRating)} N/${fig(Pi)} N)^${ex.power}·10^6/(60·${fig(rpm)} r/min)`,
      value: q.L10mh,
      unit: 'h',
      source: 'ISO 281:2007',
    });
  return lines;
}

/** The point lives combined by the linear damage rule (spectrum.ts), and the effective a_ISO. */
function combinedLines(c: RollingCandidate): SheetLine[] {
  if (c.L10mh === null) return [];
  const pts = c.points.filter((q) => Number.isFinite(q.t) && q.t > 0);
  const lines: SheetLine[] = [];
  const damaging = (q: CandidatePoint) => q.L10mh !== null && q.L10mh > 0;
  const source =
    'ISO 281:2007 modified rating life per point; linear damage rule (Palmgren 1924, Zeitschrift des VDI 68, 339–341; Miner 1945, Journal of Applied Mechanics 12, A159–A164; from memory)';
  if (pts.length <= 1) {
    if (c.aISO !== null && c.L10h !== null)
      lines.push({
        label: 'Modified rating life L10mh',
        formula: 'L10mh = a1·a_ISO·L10h',
        substituted: `L10mh = ${fig(c.a1)}·${fig(c.aISO)}·${fig(c.L10h)} h`,
        value: c.L10mh,
        unit: 'h',
        source: 'ISO 281:2007',
      });
    return lines;
  }
  {
    const sumT = pts.reduce((s, q) => s + q.t, 0);
    const substituted =
      pts.length > SHEET_TERMS_MAX
        ? `L10mh = ${fig(sumT)}/${fig(pts.reduce((s, q) => s + (damaging(q) ? q.t / q.L10mh! : 0), 0))}`
        : `L10mh = (${pts.map((q) => fig(q.t)).join(' + ')})/(${pts
            .filter(damaging)
            .map((q) => `${fig(q.t)}/${fig(q.L10mh!)} h`)
            .join(' + ')})`;
    const statics = pts.some((q) => q.static);
    lines.push({
      label: 'Modified rating life L10mh (point lives combined over the duty)',
      formula: `L10mh = Σ ti / Σ (ti/L10mh,i), the time-weighted harmonic mean of the point lives${statics ? '; a point slower than 10 r/min consumes no life, its time stays in Σ ti' : ''}${pts.length > SHEET_TERMS_MAX ? `; the sums over ${pts.length} points` : ''}`,
      substituted,
      value: c.L10mh,
      unit: 'h',
      source,
    });
  }
  if (c.aISO !== null && c.L10h !== null)
    lines.push({
      label: 'Effective a_ISO over the duty',
      formula: 'a_ISO = L10mh/(a1·L10h)',
      substituted: `a_ISO = ${fig(c.L10mh)} h/(${fig(c.a1)}·${fig(c.L10h)} h)`,
      value: c.aISO,
      unit: '1',
      source: 'ISO 281:2007, L10mh = a1·a_ISO·L10h read backwards',
    });
  return lines;
}

/** P0 at the point where it is largest, and s0 = C0/P0 [ISO 76]. */
function staticLines(c: RollingCandidate): SheetLine[] {
  if (c.s0 === null || c.points.length === 0) return [];
  const spec = {
    kind: c.kind,
    form: c.form,
    arrangement: c.arrangement,
    contactAngle: c.contactAngle,
    C0: c.staticRating,
    f0: null,
  };
  const per = c.points.map((q) => ({ q, ...staticLoad(spec, q.Fr, q.Fa) }));
  const top = per.reduce((a, b) => (b.P0 > a.P0 ? b : a), per[0]!);
  const i = per.indexOf(top);
  const at = pointLabel(i, c.points.length, 'the largest');
  const combined = top.X0 * top.q.Fr + top.Y0 * top.q.Fa;
  const alpha = c.contactAngle;
  const cotForm = c.kind !== 'deep-groove ball' && c.kind !== 'angular-contact ball' && top.Y0 > 0 && alpha > 0;
  const cot = 1 / Math.tan((alpha * Math.PI) / 180);
  const Y0text = cotForm ? `${fig(top.Y0 / cot)}·${fig(cot)}` : fig(top.Y0);
  const roller0 = c.kind === 'cylindrical roller' || c.kind === 'needle roller';
  return [
    {
      label: `Static equivalent load P0${c.points.length > 1 ? ' (largest over the points)' : ''}${at}`,
      formula: roller0
        ? 'P0 = Fr (α = 0 roller bearing)'
        : `P0 = X0·Fr + Y0·Fa, not less than Fr${combined < top.q.Fr ? ' (here Fr governs)' : ''}; X0 = ${fig(top.X0)}, Y0 = ${cotForm ? `${fig(top.Y0 / cot)}·cot α` : fig(top.Y0)} (${c.kind}, ${rowsText(c)}${alpha > 0 ? `, α = ${fig(alpha)}°` : ''})`,
      substituted:
        roller0 || combined < top.q.Fr
          ? `P0 = ${fig(top.q.Fr)} N`
          : `P0 = ${fig(top.X0)}·${fig(top.q.Fr)} N + ${Y0text}·${fig(top.q.Fa)} N`,
      value: c.staticEquivalentLoad,
      unit: 'N',
      source: 'ISO 76:2006 (factors from memory, data/rolling-load-factors.json)',
    },
    {
      label: c.staticOnly ? 'Static safety s0 (governs: no rating life claimed)' : 'Static safety s0',
      formula: 's0 = C0/P0',
      substituted: `s0 = ${fig(c.staticRating)} N / ${fig(c.staticEquivalentLoad)} N`,
      value: c.s0,
      unit: '1',
      source: 'ISO 76:2006',
    },
  ];
}

/** a1 and n·dm. */
function reliabilityLine(c: RollingCandidate, ctx: EvalContext): SheetLine {
  return {
    label: 'Reliability factor a1',
    formula: 'a1 = 0.95·[ln(100/R)/ln(100/90)]^(2/3) + 0.05, R in %',
    substituted: `a1 = 0.95·[ln(100/${fig(ctx.reliabilityUsed)})/ln(100/90)]^(2/3) + 0.05`,
    value: c.a1,
    unit: '1',
    source: 'ISO 281:2007',
  };
}

function speedLine(c: RollingCandidate, ctx: EvalContext): SheetLine {
  return {
    label: 'Speed factor n·dm',
    formula: 'n·dm (highest point speed, r/min × mm)',
    substituted: `${fig(ctx.maxSpeed * 60)} r/min × ${fig(c.pitchDiameter * 1000)} mm`,
    value: c.ndm,
    unit: 'mm*r/min',
    source: 'common practice',
  };
}

/**
 * The calculation sheet of `candidate` in its case context `ctx`, `n` the duty's mean speed
 * (rev/s): loads, lives, reliability, viscosity and a_ISO per point, the combined modified
 * life, static safety, speed, friction, grease, in that order.
 */
export function rollingSheet(candidate: RollingCandidate, ctx: EvalContext, n: number): SheetLine[] {
  const lifeClaimed = !candidate.staticOnly;
  return [
    ...loadLines(candidate, ctx),
    ...lifeLines(candidate, ctx, n),
    ...(lifeClaimed ? [reliabilityLine(candidate, ctx)] : []),
    ...(lifeClaimed ? turningLines(candidate, ctx) : []),
    ...(lifeClaimed ? combinedLines(candidate) : []),
    ...staticLines(candidate),
    speedLine(candidate, ctx),
    ...frictionLines(candidate, ctx),
    ...greaseLines(candidate, ctx),
  ];
}
