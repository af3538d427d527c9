import type { SheetLine } from '../../core/check.js';
import { rollingRunning, type FrictionRow } from '../../data/rolling-running.js';
import type { EvalContext } from './context.js';
import { bearingShares, frictionLoad } from './friction.js';
import { greaseLife } from './grease.js';
import { SHEET_TERMS_MAX, fig, pointLabel, shownPoints } from './sheet-load.js';
import type { CandidatePoint, RollingCandidate } from './types.js';

/**
 * The running part of a rolling candidate's calculation sheet (sheet.ts): the friction moment
 * M = M_v + M_l of each operating point (friction.ts), its time means over the duty, and the
 * grease life or regreasing interval (grease.ts). The figures are the candidate's own; the
 * intermediate terms are worked again by the same kernels.
 */

const FRICTION_SOURCE =
  'Palmgren, Ball and Roller Bearing Engineering, 3rd ed., 1959; Harris & Kotzalas, Rolling Bearing Analysis, 5th ed., 2007, chapter on friction (form and factors from memory); factors per kind in data/rolling-running.json';

/** The viscous term of one point: Σ over the bearings of 10⁻⁷·f0·(ν·n)^(2/3)·dm³ (or 160·10⁻⁷·f0·dm³), N·mm → N·m. */
function viscousLine(
  c: RollingCandidate,
  ctx: EvalContext,
  row: FrictionRow,
  q: CandidatePoint,
  at: string,
): SheetLine {
  const supply = ctx.lubrication.supply;
  const f0 = row.f0[supply];
  const count = c.arrangement === 'single' ? 1 : 2;
  const many = count > 1 ? `${count}·` : '';
  const nuMm = Math.max(0, ctx.lubrication.viscosity) * 1e6;
  const rpm = q.n * 60;
  const dmMm = c.pitchDiameter * 1000;
  let substituted: string;
  if (!(q.n > 0)) substituted = 'M_v = 0';
  else if (nuMm * rpm >= 2000)
    substituted = `M_v = ${many}10^-7·${f0}·(${fig(nuMm)}·${fig(rpm)})^(2/3)·${fig(dmMm)}^3/1000`;
  else substituted = `M_v = ${many}160·10^-7·${f0}·${fig(dmMm)}^3/1000`;
  return {
    label: `Friction moment, viscous term M_v${at}`,
    formula: `M_v = 10⁻⁷·f0·(ν·n)^(2/3)·dm³ for ν·n ≥ 2000, 160·10⁻⁷·f0·dm³ below (N·mm; ν mm²/s, n r/min, dm mm; /1000 to N·m)${count > 1 ? ', each bearing of the pair' : ''}; f0 = ${f0} (${supply}, ${c.kind}), ν = ${fig(nuMm)} mm²/s`,
    substituted,
    value: q.frictionViscous,
    unit: 'N*m',
    source: FRICTION_SOURCE,
  };
}

/** The load term of one point: Σ over the bearings of f1·P1·dm (+ k_rib·Fa·dm), N·m. */
function loadLine(c: RollingCandidate, row: FrictionRow, q: CandidatePoint, at: string): SheetLine {
  const dm = fig(c.pitchDiameter);
  // One bearing's C0, as the moment is worked per bearing (a pair's rating is twice it).
  const C0 = c.arrangement === 'single' ? c.staticRating : c.staticRating / 2;
  const terms = bearingShares(c.arrangement, Math.abs(q.Fr), Math.abs(q.Fa)).map((s) => {
    const P0 = Math.max(s.Fr, 0.6 * s.Fr + 0.5 * s.Fa);
    const P1 = frictionLoad(row, s.Fr, s.Fa);
    const f1 = row.y === 0 ? `${row.z}` : `${row.z}·(${fig(P0)} N/${fig(C0)} N)^${row.y}`;
    const rib = row.ribFactor > 0 && s.Fa > 0 ? ` + ${row.ribFactor}·${fig(s.Fa)} N·${dm} m` : '';
    return `${f1}·${fig(P1)} N·${dm} m${rib}`;
  });
  const f1Text =
    row.y === 0 ? `f1 = z = ${row.z}` : `f1 = z·(P0/C0)^y, z = ${row.z}, y = ${row.y}, P0 = max(Fr, 0.6·Fr + 0.5·Fa)`;
  return {
    label: `Friction moment, load term M_l${at}`,
    formula: `M_l = f1·P1·dm${row.ribFactor > 0 ? ' + k_rib·Fa·dm' : ''}, ${f1Text}, P1 = max(k_a·Fa + k_r·Fr, Fr), k_a = ${row.faFactor}, k_r = ${row.frFactor}${row.ribFactor > 0 ? `, k_rib = ${row.ribFactor}` : ''}${terms.length > 1 ? '; summed over the two bearings of the pair, each with its share of the loads' : ''}`,
    substituted: `M_l = ${terms.join(' + ')}`,
    value: q.frictionLoad,
    unit: 'N*m',
    source: FRICTION_SOURCE,
  };
}

/** Friction: M = M_v + M_l per point (or the heaviest of many), then the time means of M and of the power. */
export function frictionLines(c: RollingCandidate, ctx: EvalContext): SheetLine[] {
  const row = rollingRunning().friction.find((r) => r.kind === c.kind);
  if (!row || c.points.length === 0) return [];
  const shown = shownPoints(c.points, (a, b) => a.P > b.P);
  const lines = shown.flatMap((i) => {
    const at = pointLabel(i, c.points.length, c.points.length > SHEET_TERMS_MAX ? 'the heaviest' : '');
    return [viscousLine(c, ctx, row, c.points[i]!, at), loadLine(c, row, c.points[i]!, at)];
  });
  const M = (q: CandidatePoint) => q.frictionViscous + q.frictionLoad;
  const several = c.points.length > 1;
  const many = c.points.length > SHEET_TERMS_MAX;
  const t = (q: CandidatePoint) => Math.max(0, q.t);
  const sumT = c.points.reduce((s, q) => s + q.t, 0);
  const omega = (q: CandidatePoint) => `2π·${fig(Math.max(0, q.n))} rev/s`;
  let torque: string;
  let power: string;
  if (!several) {
    const q = c.points[0]!;
    torque = `M = ${fig(q.frictionViscous)} N·m + ${fig(q.frictionLoad)} N·m`;
    power = `N_R = ${fig(M(q))} N·m·${omega(q)}`;
  } else if (many) {
    const sm = c.points.reduce((s, q) => s + t(q) * M(q), 0);
    const sw = c.points.reduce((s, q) => s + t(q) * M(q) * 2 * Math.PI * Math.max(0, q.n), 0);
    torque = `M = ${fig(sm)}/${fig(sumT)}`;
    power = `N_R = ${fig(sw)}/${fig(sumT)}`;
  } else {
    const ts = c.points.map((q) => fig(q.t)).join(' + ');
    torque = `M = (${c.points.map((q) => `${fig(q.t)}·${fig(M(q))}`).join(' + ')})/(${ts})`;
    power = `N_R = (${c.points.map((q) => `${fig(q.t)}·${fig(M(q))} N·m·${omega(q)}`).join(' + ')})/(${ts})`;
  }
  lines.push(
    {
      label: several ? 'Friction moment M (time mean over the duty)' : 'Friction moment M',
      formula: several
        ? `M = Σ ti·Mi/Σ ti, Mi = M_v,i + M_l,i${many ? `; the sums over ${c.points.length} points` : ''}`
        : 'M = M_v + M_l',
      substituted: torque,
      value: c.frictionTorque,
      unit: 'N*m',
      source: FRICTION_SOURCE,
    },
    {
      label: several ? 'Friction power N_R (time mean over the duty)' : 'Friction power N_R',
      formula: several
        ? `N_R = Σ ti·Mi·2π·ni/Σ ti (n rev/s)${many ? `; the sums over ${c.points.length} points` : ''}`
        : 'N_R = M·2π·n (n rev/s)',
      substituted: power,
      value: c.frictionPower,
      unit: 'W',
      source: 'mechanics',
    },
  );
  return lines;
}

/**
 * Grease: the half-life sum S, the 50 % grease life L50 = 10^(a + b/T − 0.301·S), the 10 % life
 * (a sealed bearing's grease life) and, for an open bearing, the regreasing interval, a share
 * of it. Worked at the highest point speed with the duty-mean P, as evaluate.ts does.
 */
export function greaseLines(c: RollingCandidate, ctx: EvalContext): SheetLine[] {
  if (c.relubricationHours === null) return [];
  const data = rollingRunning();
  const g = data.greaseLife;
  const kindRow = data.greaseKinds.find((k) => k.kind === c.kind);
  const d = c.bore;
  const D = c.outerDiameter ?? 2 * c.pitchDiameter - d;
  const load = { P: c.equivalentLoad, C: c.dynamicRating };
  const r = greaseLife({ kind: c.kind, form: c.form, n: ctx.maxSpeed, d, D, temperature: c.temperature, load });
  if (r.hours === null || r.l10Hours === null || !kindRow) return [];
  const h = r.halvings;
  const S = h.grease + h.speed + h.load + h.kind;
  const loadText = h.load > 0 ? `(${fig(load.P)} N/${fig(load.C)} N − ${g.loadThreshold})/${g.loadStep}` : '0';
  const sealed = ctx.lubrication.sealed;
  const booser = `Booser, E. R. (1974), Grease life forecast for ball bearings, Lubrication Engineering 30(11) 536–541 (L the 50 % life, seen; form and constants from memory, as restated in Khonsari & Booser, Applied Tribology, 2nd ed., Wiley 2008); held at its ${g.coolTemperature} °C value below ${g.coolTemperature} °C, where the grease stiffens (Booser & Khonsari 2010, seen; the bound from memory)`;
  const lines: SheetLine[] = [
    {
      label: `Half-lives subtracted from the grease life S (${c.kind})`,
      formula: `S = S_G + S_N + S_W + S_K; S_N = ${g.speedCoefficient}·(n·dm)/(n·dm)_lim at the highest speed, (n·dm)_lim = ${fig(r.ndmLimit)} mm·r/min (grease, ${c.kind}); S_W = max(0, P/C − ${g.loadThreshold})/${g.loadStep}; S_K = ${h.kind} for the kind`,
      substituted: `S = ${h.grease} + ${g.speedCoefficient}·${fig(r.ndm)}/${fig(r.ndmLimit)} + ${loadText} + ${h.kind}`,
      value: S,
      unit: '1',
      source: `${booser} for S_N; S_W, S_G and S_K common practice, our own (${kindRow.source})`,
    },
    {
      label: 'Grease life L50 (50 % of bearings)',
      formula: `L50 = 10^(${g.intercept} + ${g.temperatureCoefficient}/T − ${g.halvingStep}·S) h, T = max(t, ${g.coolTemperature} °C) + 273.15 K, t = ${fig(c.temperature)} °C`,
      substituted: `L50 = 10^(${g.intercept} + ${g.temperatureCoefficient}/(${fig(r.temperatureUsed)} + 273.15) − ${g.halvingStep}·${fig(S)})`,
      value: r.hours,
      unit: 'h',
      source: booser,
    },
    {
      label: sealed ? 'Grease life L10 (sealed bearing, greased for life)' : 'Grease life L10 (10 % of bearings)',
      formula: `L10 = L50·(ln 0.9/ln 0.5)^(1/β), β = ${g.weibullSlope}`,
      substituted: `L10 = ${fig(r.hours)} h·(ln(0.9)/ln(0.5))^(1/${g.weibullSlope})`,
      value: sealed ? c.relubricationHours : r.l10Hours,
      unit: 'h',
      source: 'two-parameter Weibull distribution of grease lives; slope β common practice, our own choice',
    },
  ];
  if (!sealed)
    lines.push({
      label: 'Regreasing interval (open bearing)',
      formula: `t_r = f·L10, f = ${g.regreaseFraction} of the 10 % grease life`,
      substituted: `t_r = ${g.regreaseFraction}·${fig(r.l10Hours)} h`,
      value: c.relubricationHours,
      unit: 'h',
      source:
        'common practice, our own choice: a fill replaces only part of the aged grease, and the interval must end before the first bearings of the lot run dry',
    });
  return lines;
}
