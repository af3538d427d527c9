import { loadFactors, type LoadFactors } from '../../data/rolling-load-factors.js';
import { bracketOf, entryFactors, factors, prepared, type Factors } from './load-factor-rows.js';
import { interpolatedRange, interpolatedValue, type Interpolated } from './interpolate.js';
import type { Arrangement, KindForm, RollingKind } from './kinds.js';
import { permissibleRibAxialLoad } from './rib-axial-load.js';

export { permissibleRibAxialLoad, type RibAxialLoadInput } from './rib-axial-load.js';

/**
 * Dynamic and static equivalent loads of radial rolling bearings, kind by kind, and the
 * directions in which each kind carries axial load.
 *
 *   P = X·Fr + Y·Fa (ISO 281:2007 cl. 6.2, 7.2),   P0 = max(X0·Fr + Y0·Fa, Fr) (ISO 76:2006)
 *
 * Fr radial load, N; Fa axial load, N (≥ 0, its direction is the caller's concern);
 * X, Y, X0, Y0 dimensionless; e the limit of Fa/Fr where the factors change. The factors are in
 * data/rolling-load-factors.json with their sources (ISO 281:2007 Table 3 for ball bearings,
 * Table 7 for roller bearings, ISO 76:2006 for the static factors; values from memory).
 *
 * Double-row factors apply to the two-row kinds (self-aligning ball, spherical roller) and to a
 * matched pair back-to-back or face-to-face (ISO 281 treats such a pair as one double-row
 * bearing); a pair in tandem takes the single-row factors, with C0 that of the pair.
 */

export interface BearingLoadSpec {
  kind: RollingKind;
  form: KindForm | null;
  arrangement: Arrangement;
  /** Nominal contact angle α, degrees (0 for the radial-contact kinds). */
  contactAngle: number;
  /** Basic static load rating of the whole support (both bearings of a pair), N. */
  C0: number;
  /** ISO 76 factor f0 of a ball kind (for the key f0·Fa/C0); null for roller kinds or unknown. */
  f0: number | null;
  /** Balls per row of one bearing, and ball diameter in m: the key Fa/(i·Z·Dw²) when f0 is not known. */
  Z?: number;
  Dw?: number;
  /** Bore, outside diameter and width of one bearing, m (the permissible rib load of a cylindrical roller bearing). */
  d?: number;
  D?: number;
  B?: number;
}

export interface DynamicLoad {
  /** Dynamic equivalent load, N (for an excluded case indicative only). */
  P: number;
  X: number;
  Y: number;
  /** Limit of Fa/Fr, or null where the kind has none (cylindrical and needle roller). */
  e: number | null;
  /** What the table was entered with (i·f0·Fa/C0, or Fa/(i·Z·Dw²) in N/mm²), or null. */
  key: number | null;
  /** Where the key lies against the table: 'below' uses the first row, 'above' the last. */
  range: 'below' | 'inside' | 'above';
  /** Set when the method stops: the bearing is not rated for this load this way. */
  exclusion: { code: string; values: Record<string, number | string | null> } | null;
}

export type AxialCapacity = 'none' | 'one direction' | 'both directions';

/** The two bearings of a pair face each other and together locate the shaft both ways. */
function opposed(a: Arrangement): boolean {
  return a === 'pair back-to-back' || a === 'pair face-to-face';
}

/** True where the double-row factors apply (see the file comment). */
export function actsAsDoubleRow(kind: RollingKind, arrangement: Arrangement): boolean {
  return kind === 'self-aligning ball' || kind === 'spherical roller' || opposed(arrangement);
}

/**
 * Directions in which a support of this kind, form and arrangement carries axial load
 * (construction of the kinds; common practice): deep-groove ball, self-aligning ball and
 * spherical roller both ways; single-row angular-contact ball and tapered roller, and a
 * tandem pair of them, one way, an opposed pair both ways; cylindrical roller with ribs on one
 * ring none, ribs on both rings one way (both with a loose rib, or as an opposed pair);
 * needle roller none.
 */
export function axialCapacity(kind: RollingKind, form: KindForm | null, arrangement: Arrangement): AxialCapacity {
  switch (kind) {
    case 'deep-groove ball':
    case 'self-aligning ball':
    case 'spherical roller':
      return 'both directions';
    case 'angular-contact ball':
    case 'tapered roller':
      return opposed(arrangement) ? 'both directions' : 'one direction';
    case 'cylindrical roller':
      if (form === 'ribs on both rings and a loose rib') return 'both directions';
      if (form === 'ribs on both rings') return opposed(arrangement) ? 'both directions' : 'one direction';
      return 'none';
    case 'needle roller':
      return 'none';
  }
}

const cot = (deg: number) => 1 / Math.tan((deg * Math.PI) / 180);
const tan = (deg: number) => Math.tan((deg * Math.PI) / 180);
const lerp = (a: number, b: number, t: number) => a + t * (b - a);
/** Apply the factors: below-e pair when Fa ≤ e·Fr (Fa/Fr ≤ e), the above-e pair otherwise. */
function apply(
  f: Factors,
  Fr: number,
  Fa: number,
  key: number | null,
  range: DynamicLoad['range'],
  exclusion: DynamicLoad['exclusion'],
): DynamicLoad {
  const below = Fa <= f.e * Fr;
  const X = below ? f.belowX : f.aboveX;
  const Y = below ? f.belowY : f.aboveY;
  return { P: X * Fr + Y * Fa, X, Y, e: f.e, key, range, exclusion };
}

/**
 * The relative axial load the ball tables are entered with (ISO 281:2007 Table 3):
 * i·f0·Fa/C0 with C0 of the whole support, or, when f0 is not known, Fa/(i·Z·Dw²) in N/mm²
 * (the same numbers for a radial-contact bearing: C0 = f0·i·Z·Dw²·cos α, ISO 76).
 * Radial contact (deep-groove ball): every row shares the axial load, i cancels in f0·Fa/C0.
 * Angular contact: one row carries it, so a pair back-to-back or face-to-face enters with
 * 2·f0·Fa/C0 (the key of one of its bearings), a tandem pair with f0·Fa/C0 (each takes half).
 * Null when neither f0 nor Z and Dw are known.
 */
export function relativeAxialLoad(b: BearingLoadSpec, Fa: number): number | null {
  const pair = b.arrangement !== 'single';
  const rowsSharing = b.kind === 'angular-contact ball' ? (b.arrangement === 'pair tandem' ? 2 : 1) : pair ? 2 : 1;
  if (b.f0 !== null && b.f0 > 0 && b.C0 > 0) {
    const i = b.kind === 'angular-contact ball' && opposed(b.arrangement) ? 2 : 1;
    return (i * b.f0 * Fa) / b.C0;
  }
  if (b.Z !== undefined && b.Z > 0 && b.Dw !== undefined && b.Dw > 0) {
    return Fa / (rowsSharing * b.Z * b.Dw * b.Dw) / 1e6;
  }
  return null;
}

/** e, X, Y of a radial-contact ball bearing at the key, with where the key lies. */
function radialBallFactors(t: LoadFactors, key: number): { f: Factors; range: Interpolated['range'] } {
  const p = prepared(t);
  const e = interpolatedValue(p.radialBallE, key);
  const Y = interpolatedValue(p.radialBallY, key);
  return { f: factors(e, 0, t.radialBall.xAboveE, Y), range: interpolatedRange(p.radialBallE, key) };
}

/**
 * e, X, Y of an angular-contact ball bearing: by the key-dependent rows for 5 to 15°, fixed
 * values for 20 to 45°, linear between tabulated angles (ISO 281:2007 Table 3, which allows
 * linear interpolation for loads and contact angles between its entries; from memory).
 * Null outside 5° … 45°.
 */
export function angularContactFactors(
  t: LoadFactors,
  alpha: number,
  key: number,
  double: boolean,
): { f: Factors; range: DynamicLoad['range'] } | null {
  const p = prepared(t);
  const at = bracketOf(p, alpha);
  if (!at) return null;
  const { lo, hi, s } = at;
  const a = entryFactors(lo, key, double);
  const b = entryFactors(hi, key, double);
  const f = factors(
    lerp(a.e, b.e, s),
    lerp(a.belowY, b.belowY, s),
    lerp(a.aboveX, b.aboveX, s),
    lerp(a.aboveY, b.aboveY, s),
  );
  return { f, range: at.keyed ? interpolatedRange(p.acKeys, key) : 'inside' };
}

/** Factors from the closed forms in α (self-aligning ball; tapered and spherical roller). */
function closedFormFactors(t: LoadFactors, kind: RollingKind, alpha: number, double: boolean): Factors {
  const c = cot(alpha);
  const sa = t.selfAligningBall;
  const r = t.radialRoller;
  if (kind === 'self-aligning ball')
    return factors(sa.eTan * tan(alpha), sa.yBelowECot * c, sa.xAboveE, sa.yAboveECot * c);
  return double
    ? factors(r.eTan * tan(alpha), r.double.yBelowECot * c, r.double.xAboveE, r.double.yAboveECot * c)
    : factors(r.eTan * tan(alpha), 0, r.single.xAboveE, r.single.yAboveECot * c);
}

/**
 * closedFormFactors of a support, kept per support record while its table, kind, angle and rows
 * stay the same: they read no load, and a sweep asks for them at every point (a tapered roller
 * bearing twice, for its opposed partner).
 */
function closedFormFactorsOf(t: LoadFactors, b: BearingLoadSpec, alpha: number, double: boolean): Factors {
  const hit = closedForms.get(b);
  if (hit && hit.t === t && hit.kind === b.kind && Object.is(hit.alpha, alpha) && hit.double === double) return hit.f;
  const f = closedFormFactors(t, b.kind, alpha, double);
  closedForms.set(b, { t, kind: b.kind, alpha, double, f });
  return f;
}
const closedForms = new WeakMap<
  BearingLoadSpec,
  { t: LoadFactors; kind: RollingKind; alpha: number; double: boolean; f: Factors }
>();

/** Nominal contact angles, degrees, for which the closed forms are taken (ISO 281 radial bearings: α ≤ 45°). */
const CLOSED_FORM_ANGLES = { min: 0, max: 45 } as const;

/**
 * Dynamic equivalent load P = X·Fr + Y·Fa of one support (ISO 281:2007 cl. 6.2 and 7.2).
 * Fr, Fa in N (≥ 0); n speed in rev/s, used only for the permissible rib load of a cylindrical
 * roller bearing. The exclusion codes:
 * - rolling.no-axial-capacity: Fa > 0 on a kind/form that carries none;
 * - rolling.axial-load-beyond-table: a deep-groove ball bearing's key above the table's last row
 *   (the standard gives no factors there; the permissible axial load depends on the design);
 * - rolling.load-key-unknown: a ball kind that needs the key, without f0 nor Z and Dw;
 * - rolling.contact-angle-outside-table: α outside what the table or formula covers;
 * - rolling.rib-axial-load-exceeded: Fa above permissibleRibAxialLoad (below).
 * Cylindrical and needle roller bearings: P = Fr; ISO 281 gives no X, Y for α = 0 roller
 * bearings under axial load and leaves it to the maker (from memory); within the permissible
 * rib load the axial load is taken not to shorten raceway fatigue life (common practice).
 */
export function dynamicLoad(b: BearingLoadSpec, Fr: number, Fa: number, n?: number): DynamicLoad {
  return dynamicLoadFrom(loadFactors(), b, Fr, Fa, n);
}

/** An exclusion of dynamicLoad: its code and values. */
const excl = (code: string, values: Record<string, number | string | null>) => ({ code, values });

/** dynamicLoad with the load-factor table given (a sweep reads it once per case, not per point). */
export function dynamicLoadFrom(t: LoadFactors, b: BearingLoadSpec, Fr: number, Fa: number, n?: number): DynamicLoad {
  const alpha = b.contactAngle;
  const double = actsAsDoubleRow(b.kind, b.arrangement);
  switch (b.kind) {
    case 'deep-groove ball': {
      const key = relativeAxialLoad(b, Fa);
      if (key === null) {
        const f = radialBallFactors(t, 0).f;
        return apply(f, Fr, Fa, null, 'inside', Fa > 0 ? excl('rolling.load-key-unknown', { kind: b.kind }) : null);
      }
      const { f, range } = radialBallFactors(t, key);
      if (!(Fa > 0)) return apply(f, Fr, 0, key, 'inside', null);
      const keyMax = t.radialBall.rows[t.radialBall.rows.length - 1]!.key;
      const exclusion =
        range === 'above'
          ? excl('rolling.axial-load-beyond-table', { kind: b.kind, key, keyMax, f0: b.f0, Fa, C0: b.C0 })
          : null;
      return apply(f, Fr, Fa, key, range, exclusion);
    }
    case 'angular-contact ball': {
      const key = relativeAxialLoad(b, Fa);
      const min = t.angularContactKeyed.angles[0]!.angle;
      const max = t.angularContactFixed.rows.at(-1)!.angle;
      const got = angularContactFactors(t, Math.min(max, Math.max(min, alpha)), key ?? 0, double)!;
      let exclusion: DynamicLoad['exclusion'] = null;
      if (!(alpha >= min && alpha <= max))
        exclusion = excl('rolling.contact-angle-outside-table', { kind: b.kind, contactAngle: alpha, min, max });
      else if (key === null && Fa > 0 && alpha < t.angularContactFixed.rows[0]!.angle)
        exclusion = excl('rolling.load-key-unknown', { kind: b.kind });
      return apply(got.f, Fr, Fa, key, Fa > 0 && !exclusion ? got.range : 'inside', exclusion);
    }
    case 'self-aligning ball':
    case 'tapered roller':
    case 'spherical roller': {
      const { min, max } = CLOSED_FORM_ANGLES;
      const inside = alpha > min && alpha <= max;
      const f = closedFormFactorsOf(t, b, inside ? alpha : Math.min(max, Math.max(1, alpha)), double);
      const exclusion = inside
        ? null
        : excl('rolling.contact-angle-outside-table', { kind: b.kind, contactAngle: alpha, min, max });
      return apply(f, Fr, Fa, null, 'inside', exclusion);
    }
    case 'cylindrical roller':
    case 'needle roller': {
      const base: DynamicLoad = { P: Fr, X: 1, Y: 0, e: null, key: null, range: 'inside', exclusion: null };
      if (!(Fa > 0)) return base;
      if (axialCapacity(b.kind, b.form, b.arrangement) === 'none')
        return { ...base, exclusion: excl('rolling.no-axial-capacity', { kind: b.kind, form: b.form, Fa }) };
      const rib = permissibleRibAxialLoad({ d: b.d, D: b.D, B: b.B, n, Fr });
      if (Fa > rib.FaPerm)
        return {
          ...base,
          exclusion: excl('rolling.rib-axial-load-exceeded', {
            Fa,
            FaPerm: rib.FaPerm,
            heatLimit: Number.isFinite(rib.heatLimit) ? rib.heatLimit : null,
            radialLimit: rib.radialLimit,
            governing: rib.governing,
            n: n ?? null,
          }),
        };
      return base;
    }
  }
}

/**
 * Static equivalent load P0 = max(X0·Fr + Y0·Fa, Fr) of one support (ISO 76:2006; factors from
 * memory): radial-contact ball X0 = 0.6, Y0 = 0.5; angular-contact ball X0 = 0.5 single row
 * (and tandem), 1 double row (opposed pair), Y0 by contact angle from the table, linear between
 * angles and held at its ends; self-aligning ball X0 = 1, Y0 = 0.44·cot α; tapered and
 * spherical roller single row X0 = 0.5, Y0 = 0.22·cot α, double row X0 = 1, Y0 = 0.44·cot α;
 * cylindrical and needle roller P0 = Fr. Fr, Fa in N. An α outside 0 < α ≤ 45° is held to
 * 1° … 45° (indicative only: dynamicLoad excludes such a bearing).
 */
export function staticLoad(b: BearingLoadSpec, Fr: number, Fa: number): { P0: number; X0: number; Y0: number } {
  return staticLoadFrom(loadFactors(), b, Fr, Fa);
}

/** staticLoad with the load-factor table given (a sweep reads it once per case, not per point). */
export function staticLoadFrom(
  t: LoadFactors,
  b: BearingLoadSpec,
  Fr: number,
  Fa: number,
): { P0: number; X0: number; Y0: number } {
  const f = staticFactorsFrom(t, b);
  return { P0: staticEquivalentLoad(f, Fr, Fa), X0: f.X0, Y0: f.Y0 };
}

/** A support's static factors X0, Y0 (see staticLoad); `radial`: the kind takes P0 = Fr. */
export interface StaticFactors {
  X0: number;
  Y0: number;
  radial: boolean;
}

/**
 * The static factors X0, Y0 of staticLoad, which depend on the support alone (kind,
 * arrangement, contact angle), not on its loads: a sweep works them once per bearing.
 */
export function staticFactorsFrom(t: LoadFactors, b: BearingLoadSpec): StaticFactors {
  const s = t.static;
  const double = actsAsDoubleRow(b.kind, b.arrangement);
  const alpha = Math.min(45, Math.max(1, b.contactAngle));
  let X0 = 1;
  let Y0 = 0;
  switch (b.kind) {
    case 'deep-groove ball':
      X0 = s.radialBall.X0;
      Y0 = s.radialBall.Y0;
      break;
    case 'angular-contact ball': {
      X0 = double ? s.angularContactX0.double : s.angularContactX0.single;
      const p = prepared(t);
      Y0 = interpolatedValue(double ? p.staticDoubleY0 : p.staticSingleY0, b.contactAngle);
      break;
    }
    case 'self-aligning ball':
      X0 = s.selfAligningBall.X0;
      Y0 = s.selfAligningBall.y0Cot * cot(alpha);
      break;
    case 'tapered roller':
    case 'spherical roller': {
      const r = double ? s.radialRoller.double : s.radialRoller.single;
      X0 = r.X0;
      Y0 = r.y0Cot * cot(alpha);
      break;
    }
    case 'cylindrical roller':
    case 'needle roller':
      return { X0: 1, Y0: 0, radial: true };
  }
  return { X0, Y0, radial: false };
}

/** P0 of a support from its static factors, N: max(X0·Fr + Y0·Fa, Fr), or Fr where the kind takes P0 = Fr (Fr, Fa in N). */
export function staticEquivalentLoad(f: StaticFactors, Fr: number, Fa: number): number {
  return f.radial ? Fr : Math.max(f.X0 * Fr + f.Y0 * Fa, Fr);
}
