import type { SheetLine } from '../../core/check.js';
import { num } from '../../core/format.js';
import { loadFactors } from '../../data/rolling-load-factors.js';
import type { EvalContext } from './context.js';
import { needsOpposedPartner } from './point-loads.js';
import { actsAsDoubleRow } from './load-factors.js';
import type { CandidatePoint, RollingCandidate } from './types.js';

/**
 * The dynamic equivalent load part of a rolling candidate's calculation sheet (sheet.ts): per
 * operating point the axial load the bearing carries (with an opposed partner's induced
 * force), the kind's e, X and Y, Pi = X·Fr + Y·Fa, then the duty mean. Every line writes out
 * the candidate's own figures (evaluate.ts, load-factors.ts); the shared sheet helpers live
 * here too.
 */

/** Largest number of operating points written out one by one; with more, one point stands for them and the sums are given. */
export const SHEET_TERMS_MAX = 4;

/**
 * A number on the sheet: five significant figures (exponent zeros kept), so that a figure
 * raised to p = 10/3 still gives the line's value to within 0.05 %.
 */
export const fig = (v: number): string => num(v, 5, { exponentZeros: 'keep' });

/** The life exponent p as written on the sheet: as itself, as 1/p and as an exponent. */
export interface ExponentText {
  p: string;
  /** 1/p as a plain fraction: "1/10/3" would read as 1/30. */
  inverse: string;
  /** p as an exponent: "^10/3" would read as (…^10)/3. */
  power: string;
}
export const EXPONENT_TEXT: Record<RollingCandidate['type'], ExponentText> = {
  ball: { p: '3', inverse: '1/3', power: '3' },
  roller: { p: '10/3', inverse: '3/10', power: '(10/3)' },
};

/** The points written out one by one: all of them up to SHEET_TERMS_MAX, else the one `pick` chooses. */
export function shownPoints(
  points: CandidatePoint[],
  pick: (a: CandidatePoint, b: CandidatePoint) => boolean,
): number[] {
  const all = points.map((_, i) => i);
  if (points.length <= SHEET_TERMS_MAX) return all;
  return [all.reduce((best, i) => (pick(points[i]!, points[best]!) ? i : best), 0)];
}

/** " at point i of N" (nothing for a single point), with why this point when it stands for the others. */
export function pointLabel(i: number, count: number, why = ''): string {
  if (count <= 1) return '';
  return ` at point ${i + 1} of ${count}${why ? `, ${why}` : ''}`;
}

const rad = (deg: number) => (deg * Math.PI) / 180;

/** Where the kind's factors come from (data/rolling-load-factors.json gives each table its source). */
function factorSource(k: RollingCandidate['kind']): string {
  const t = loadFactors();
  switch (k) {
    case 'deep-groove ball':
      return t.radialBall.source;
    case 'angular-contact ball':
      return `${t.angularContactKeyed.source}; ${t.angularContactFixed.source}`;
    case 'self-aligning ball':
      return t.selfAligningBall.source;
    case 'tapered roller':
    case 'spherical roller':
      return t.radialRoller.source;
    default:
      return 'ISO 281:2007 cl. 7.2: P = Fr for a roller bearing with α = 0 (from memory); an axial load within the permissible rib load taken not to shorten raceway life (common practice)';
  }
}

/** Key-dependent factors: the deep-groove ball table, and the angular-contact rows below 20°. */
function keyed(c: RollingCandidate): boolean {
  return (
    c.kind === 'deep-groove ball' ||
    (c.kind === 'angular-contact ball' && c.contactAngle < loadFactors().angularContactFixed.rows[0]!.angle)
  );
}

/** e = k·tan α and Y = k·cot α kinds. */
const closedForm = (c: RollingCandidate) =>
  c.kind === 'self-aligning ball' || c.kind === 'tapered roller' || c.kind === 'spherical roller';

/** Rows whose factors the support takes: single row, a double-row kind, or a pair acting as one double-row bearing. */
export function rowsText(c: Pick<RollingCandidate, 'kind' | 'arrangement'>): string {
  if (!actsAsDoubleRow(c.kind, c.arrangement)) return c.arrangement === 'single' ? 'single row' : c.arrangement;
  return c.arrangement === 'single' ? 'double row' : `double row (${c.arrangement})`;
}

/** The multiplier i of the key i·f0·Fa/C0: 2 for an angular-contact pair acting as one double-row bearing. */
function keyRows(c: RollingCandidate): number {
  return c.kind === 'angular-contact ball' && actsAsDoubleRow(c.kind, c.arrangement) ? 2 : 1;
}

/** The lines of one point: the partner's induced force, the key, e, and Pi = X·Fr + Y·Fa. */
function pointLines(c: RollingCandidate, ctx: EvalContext, i: number, why: string): SheetLine[] {
  const q = c.points[i]!;
  const caseFa = ctx.points[i]?.Fa ?? q.Fa;
  const at = pointLabel(i, c.points.length, why);
  const sub = c.points.length > 1 ? String(i + 1) : '';
  const lines: SheetLine[] = [];
  if (needsOpposedPartner(c) && q.Fa > caseFa && q.Fr > 0) {
    const ball = c.kind === 'angular-contact ball';
    // The factor the partner's force was worked with, read back from the force: Y above e
    // (tapered roller), or e at a large axial load (angular-contact ball).
    const factor = ball ? (q.Fa - caseFa) / q.Fr : (0.5 * q.Fr) / (q.Fa - caseFa);
    lines.push({
      label: `Axial load on the bearing Fa${at} (the case's, plus the opposed partner's induced force)`,
      formula: `${ball ? 'Fa = Fa,case + e·Fr, e of the table at a large axial load' : 'Fa = Fa,case + 0.5·Fr/Y, Y the factor above e'}: the partner, the same bearing under the same Fr, locates this one and the thrust runs into it`,
      substituted: ball
        ? `Fa${sub} = ${fig(caseFa)} N + ${fig(factor)}·${fig(q.Fr)} N`
        : `Fa${sub} = ${fig(caseFa)} N + 0.5·${fig(q.Fr)} N/${fig(factor)}`,
      value: q.Fa,
      unit: 'N',
      source: ball
        ? 'induced axial force of a single-row angular-contact ball bearing Fi = e·Fr (common practice), and the rules for two bearings that locate each other (Brändlein, Eschmann, Hasbargen, Weigand, Ball and Roller Bearings, 3rd ed., Wiley 1999; from memory)'
        : 'induced axial force of a single-row tapered roller bearing Fi = 0.5·Fr/Y, and the rules for two bearings that locate each other (Brändlein, Eschmann, Hasbargen, Weigand, Ball and Roller Bearings, 3rd ed., Wiley 1999; from memory)',
    });
  }
  const loaded = q.Fa > 0;
  if (keyed(c) && loaded && q.key !== null) {
    const i2 = keyRows(c);
    const f0 = (q.key * c.staticRating) / (i2 * q.Fa);
    lines.push({
      label: `Relative axial load f0·Fa/C0${at} (enters the ${c.kind} X/Y table)`,
      formula: `${i2 > 1 ? 'i·' : ''}f0·Fa/C0, f0 the ISO 76 factor of the bearing, C0 of the whole support${i2 > 1 ? ', i = 2: one row of the pair carries Fa' : ''}`,
      substituted: `${i2 > 1 ? '2·' : ''}${fig(f0)}·${fig(q.Fa)} N/${fig(c.staticRating)} N`,
      value: q.key,
      unit: '1',
      source: factorSource(c.kind),
    });
  }
  if (q.e !== null && (closedForm(c) || loaded)) {
    const t = loadFactors();
    const eTan = c.kind === 'self-aligning ball' ? t.selfAligningBall.eTan : t.radialRoller.eTan;
    const substituted = closedForm(c)
      ? `e = ${eTan}·tan ${fig(c.contactAngle)}° = ${eTan}·${fig(Math.tan(rad(c.contactAngle)))}`
      : c.kind === 'deep-groove ball'
        ? `e(f0·Fa/C0 = ${fig(q.key ?? 0)})`
        : `e(α = ${fig(c.contactAngle)}°, ${rowsText(c)}${keyed(c) ? `, key = ${fig(q.key ?? 0)}` : ''})`;
    lines.push({
      label: `Limit e of Fa/Fr${at} (${c.kind})`,
      formula: closedForm(c)
        ? 'e = 1.5·tan α, α nominal contact angle'
        : c.kind === 'deep-groove ball'
          ? 'e from the table in f0·Fa/C0, linear between rows'
          : `e from the table by contact angle${keyed(c) ? ' and key' : ''}, linear between entries`,
      substituted,
      value: q.e,
      unit: '1',
      source: factorSource(c.kind),
    });
  }
  lines.push(equivalentLine(c, q, at, sub));
  return lines;
}

/** Pi = X·Fr + Y·Fa of one point, the choice of X and Y said in the formula. */
function equivalentLine(c: RollingCandidate, q: CandidatePoint, at: string, sub: string): SheetLine {
  const alpha = c.contactAngle;
  const cotForm = closedForm(c) && q.Y > 0 && alpha > 0;
  const cot = 1 / Math.tan(rad(alpha));
  const Ytext = cotForm ? `${fig(q.Y / cot)}·${fig(cot)}` : fig(q.Y);
  let why: string;
  if (q.e === null) why = 'α = 0 roller bearing: P = Fr (X = 1, Y = 0)';
  else {
    const ratio = q.Fr > 0 ? q.Fa / q.Fr : Infinity;
    const side = q.Fa <= q.e * q.Fr ? `≤ e = ${fig(q.e)}` : `> e = ${fig(q.e)}`;
    const yForm = cotForm ? `Y = ${fig(q.Y / cot)}·cot α` : `Y = ${fig(q.Y)}`;
    why = `Fa/Fr = ${Number.isFinite(ratio) ? fig(ratio) : '∞'} ${side}: X = ${fig(q.X)}, ${yForm}`;
    if (c.kind === 'angular-contact ball') why += ` (α = ${fig(alpha)}°, ${rowsText(c)})`;
  }
  return {
    label: `Dynamic equivalent load P${sub}${at} (${c.kind}, without f_d)`,
    formula: `P = X·Fr + Y·Fa; ${why}`,
    substituted:
      q.e === null ? `P${sub} = ${fig(q.Fr)} N` : `P${sub} = ${fig(q.X)}·${fig(q.Fr)} N + ${Ytext}·${fig(q.Fa)} N`,
    value: q.P,
    unit: 'N',
    source: factorSource(c.kind),
  };
}

/** The duty mean with f_d, over the points with a time share (as spectrum.ts and equivalent-load.ts form it). */
function meanLine(c: RollingCandidate, ctx: EvalContext): SheetLine {
  const ex = EXPONENT_TEXT[c.type];
  const fd = ctx.serviceFactor;
  const pts = c.points.filter((q) => Number.isFinite(q.t) && q.t > 0);
  const label = `Dynamic equivalent load P (${c.designation}, duty mean with the service factor)`;
  const source = 'ISO 281:2007 (variable load and speed, from memory); service factor f_d common practice';
  if (pts.length <= 1) {
    const P1 = pts[0]?.P ?? c.points[0]?.P ?? 0;
    return {
      label,
      formula: `P = f_d·P1, f_d = ${fd}`,
      substituted: `P = ${fd}·${fig(P1)} N`,
      value: c.equivalentLoad,
      unit: 'N',
      source,
    };
  }
  const byRevolutions = pts.some((q) => q.n > 0);
  const w = (q: CandidatePoint) => (byRevolutions ? Math.max(0, q.n) * 60 * q.t : q.t);
  const wText = (q: CandidatePoint) => (byRevolutions ? `${fig(q.n * 60)}·${fig(q.t)}` : fig(q.t));
  const p = c.type === 'ball' ? 3 : 10 / 3;
  let numerator: string;
  let denominator: string;
  if (pts.length > SHEET_TERMS_MAX) {
    numerator = fig(pts.reduce((s, q) => s + Math.pow(fd * q.P, p) * w(q), 0));
    denominator = fig(pts.reduce((s, q) => s + w(q), 0));
  } else {
    numerator = pts.map((q) => `${fig(fd * q.P)}^${ex.power}·${wText(q)}`).join(' + ');
    denominator = pts.map(wText).join(' + ');
  }
  return {
    label,
    formula: `P = (Σ (f_d·Pi)^p·${byRevolutions ? 'ni·ti / Σ ni·ti' : 'ti / Σ ti'})^(1/p), p = ${ex.p}, f_d = ${fd}${byRevolutions ? ', n in r/min' : ''}${pts.length > SHEET_TERMS_MAX ? `; the sums over ${pts.length} points` : ''}`,
    substituted: `P = [(${numerator})/(${denominator})]^(${ex.inverse})`,
    value: c.equivalentLoad,
    unit: 'N',
    source,
  };
}

/**
 * The load lines of a candidate: each point (or, with more than SHEET_TERMS_MAX, the heaviest)
 * written out by its kind's factors, then the duty mean P with f_d.
 */
export function loadLines(c: RollingCandidate, ctx: EvalContext): SheetLine[] {
  const shown = shownPoints(c.points, (a, b) => a.P > b.P);
  const why = c.points.length > SHEET_TERMS_MAX ? 'the heaviest' : '';
  return [...shown.flatMap((i) => pointLines(c, ctx, i, why)), meanLine(c, ctx)];
}
