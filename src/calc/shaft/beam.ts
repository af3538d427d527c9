import type { ShaftSI } from '../../case/shaft-types.js';
import type { Beam, BeamPoint, PointLoad, Statics } from './types.js';

/** Pieces the shaft's length is cut into (at least one per interval between breakpoints). */
const TARGET_PIECES = 300;

/** One piece of the integration: curvature linear in it, so its slope and deflection are exact. */
interface Piece {
  x0: number;
  h: number;
  /** Curvature M/(EI) at its ends, 1/m, in the x–y (v) and x–z (w) planes. */
  ky0: number;
  ky1: number;
  kz0: number;
  kz1: number;
  /** Slope (rad) and deflection (m) at x0 before the support conditions are applied. */
  ty: number;
  vy: number;
  tz: number;
  vz: number;
  /** Shear (N) and moments (N·m) at its two ends. */
  shearY: number;
  shearZ: number;
  mz0: number;
  mz1: number;
  mY0: number;
  mY1: number;
}

/** Deflection and slope of the integrated (unconstrained) curve at s from a piece's start. */
function along(k0: number, k1: number, t0: number, v0: number, h: number, s: number): [number, number] {
  const dk = (k1 - k0) / h;
  return [t0 + k0 * s + (dk * s * s) / 2, v0 + t0 * s + (k0 * s * s) / 2 + (dk * s * s * s) / 6];
}

/** Diameter of the shaft at x (m): the segment holding x (from ≤ x < to), else the shaft's own. */
function diameterAt(shaft: Pick<ShaftSI, 'diameter' | 'segments'>, x: number): number {
  for (const s of shaft.segments) if (x >= s.from && x < s.to) return s.diameter;
  return shaft.diameter;
}

/**
 * Bending of a stepped shaft simply supported at its two supports (Euler–Bernoulli beam, small
 * deflections, shear deformation neglected), in the x–y and x–z planes:
 *
 *   V(x) = Σ_{x_i < x} F_i                              shear, N (forces on the part left of x)
 *   M_z(x) = Σ_{x_i < x} (x − x_i)·fy_i − Σ_{x_i < x} mz_i    N·m,  E·I(x)·v″ = M_z
 *   M_y(x) = Σ_{x_i < x} (x − x_i)·fz_i + Σ_{x_i < x} my_i    N·m,  E·I(x)·w″ = M_y
 *   I(x) = π·d(x)⁴/64
 *
 * the sums running over the loads and the support reactions (sagging positive: M > 0 where the
 * axis curves towards +y, resp. +z); v, w deflections along +y, +z (m), E Young's modulus (Pa),
 * d the diameter of the segment at x (m). The curvature M/(EI) is linear between breakpoints
 * (every load, support and step), so integrating it twice over pieces of a fine grid is exact
 * (a quadratic slope and cubic deflection per piece); the two constants of each plane come from
 * v = w = 0 at both supports. Resultants: moment √(M_y² + M_z²), deflection √(v² + w²), slope
 * √(v′² + w′²). The largest moment lies at a station (the resultant of a linear pair is convex
 * between them); the largest deflection is refined inside the pieces around the largest station.
 * Steps are taken as abrupt (no fillet stiffening), so a stepped shaft bends a little more than
 * it would. Method: double integration of M/(EI) (Gere & Goodno, Mechanics of Materials, 8th ed.
 * 2013, ch. 9, from memory).
 *
 * Stations: the shaft from its leftmost to its rightmost feature (segment ends, supports,
 * loads), every breakpoint included; where the shear or the moment jumps (at a force or a
 * couple) the station appears twice, the value left of it then the value right of it.
 */
export function shaftBeam(
  shaft: Pick<ShaftSI, 'diameter' | 'segments' | 'modulus' | 'supports'>,
  loads: readonly PointLoad[],
  statics: Statics,
): Beam {
  const [sa, sb] = shaft.supports;
  const all: { at: number; fy: number; fz: number; my: number; mz: number }[] = [
    ...loads,
    { at: sa.at, fy: statics.supports[0].y, fz: statics.supports[0].z, my: 0, mz: 0 },
    { at: sb.at, fy: statics.supports[1].y, fz: statics.supports[1].z, my: 0, mz: 0 },
  ].sort((p, q) => p.at - q.at);
  const marks = new Set<number>([sa.at, sb.at, ...loads.map((l) => l.at)]);
  for (const s of shaft.segments) marks.add(s.from).add(s.to);
  const breaks = [...marks].sort((p, q) => p - q);
  const x0 = breaks[0]!;
  const step = (breaks[breaks.length - 1]! - x0) / TARGET_PIECES;

  const pieces: Piece[] = [];
  let next = 0; // first of `all` not yet summed
  let sFy = 0,
    sFyX = 0,
    sMz = 0,
    sFz = 0,
    sFzX = 0,
    sMy = 0;
  let ty = 0,
    vy = 0,
    tz = 0,
    vz = 0;
  for (let b = 0; b + 1 < breaks.length; b++) {
    const left = breaks[b]!;
    const right = breaks[b + 1]!;
    while (next < all.length && all[next]!.at <= left) {
      const l = all[next++]!;
      sFy += l.fy;
      sFyX += l.fy * l.at;
      sMz += l.mz;
      sFz += l.fz;
      sFzX += l.fz * l.at;
      sMy += l.my;
    }
    const d = diameterAt(shaft, (left + right) / 2);
    const ei = (shaft.modulus * Math.PI * d ** 4) / 64;
    const n = Math.max(1, Math.ceil((right - left) / step - 1e-9));
    const h = (right - left) / n;
    for (let k = 0; k < n; k++) {
      const xa = left + k * h;
      const xb = k === n - 1 ? right : left + (k + 1) * h;
      const mz0 = xa * sFy - sFyX - sMz;
      const mz1 = xb * sFy - sFyX - sMz;
      const mY0 = xa * sFz - sFzX + sMy;
      const mY1 = xb * sFz - sFzX + sMy;
      const p: Piece = {
        x0: xa,
        h: xb - xa,
        ky0: mz0 / ei,
        ky1: mz1 / ei,
        kz0: mY0 / ei,
        kz1: mY1 / ei,
        ty,
        vy,
        tz,
        vz,
        shearY: sFy,
        shearZ: sFz,
        mz0,
        mz1,
        mY0,
        mY1,
      };
      pieces.push(p);
      [ty, vy] = along(p.ky0, p.ky1, ty, vy, p.h, p.h);
      [tz, vz] = along(p.kz0, p.kz1, tz, vz, p.h, p.h);
    }
  }

  // Unconstrained slope and deflection at x, then the constants from v = w = 0 at both supports.
  const raw = (x: number): { ty: number; vy: number; tz: number; vz: number } => {
    let lo = 0;
    let hi = pieces.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (x <= pieces[mid]!.x0 + pieces[mid]!.h) hi = mid;
      else lo = mid + 1;
    }
    const p = pieces[lo]!;
    const s = Math.min(Math.max(x - p.x0, 0), p.h);
    const [ay, by] = along(p.ky0, p.ky1, p.ty, p.vy, p.h, s);
    const [az, bz] = along(p.kz0, p.kz1, p.tz, p.vz, p.h, s);
    return { ty: ay, vy: by, tz: az, vz: bz };
  };
  const ra = raw(sa.at);
  const rb = raw(sb.at);
  const span = sb.at - sa.at;
  const c2y = -(rb.vy - ra.vy) / span;
  const c2z = -(rb.vz - ra.vz) / span;
  const c1y = -ra.vy - c2y * sa.at;
  const c1z = -ra.vz - c2z * sa.at;
  const deflection = (x: number): { y: number; z: number } => {
    const r = raw(x);
    return { y: r.vy + c1y + c2y * x, z: r.vz + c1z + c2z * x };
  };
  const slope = (x: number): number => {
    const r = raw(x);
    return Math.hypot(r.ty + c2y, r.tz + c2z);
  };

  const diagram: BeamPoint[] = [];
  const station = (x: number, shearY: number, shearZ: number, momentZ: number, momentY: number): void => {
    const dy = deflection(x);
    const prev = diagram[diagram.length - 1];
    if (
      prev &&
      prev.x === x &&
      prev.shearY === shearY &&
      prev.shearZ === shearZ &&
      prev.momentZ === momentZ &&
      prev.momentY === momentY
    )
      return;
    diagram.push({
      x,
      shearY,
      shearZ,
      momentZ,
      momentY,
      moment: Math.hypot(momentY, momentZ),
      deflectionY: dy.y,
      deflectionZ: dy.z,
      deflection: Math.hypot(dy.y, dy.z),
    });
  };
  // The free ends carry no shear or moment: start and end there with zeros.
  station(x0, 0, 0, 0, 0);
  for (const p of pieces) {
    station(p.x0, p.shearY, p.shearZ, p.mz0, p.mY0);
    station(p.x0 + p.h, p.shearY, p.shearZ, p.mz1, p.mY1);
  }
  const last = pieces[pieces.length - 1]!;
  station(last.x0 + last.h, 0, 0, 0, 0);

  let maxMoment = 0,
    maxMomentAt = x0;
  let best = 0,
    maxDeflection = 0,
    maxDeflectionAt = x0;
  diagram.forEach((p, i) => {
    if (p.moment > maxMoment) [maxMoment, maxMomentAt] = [p.moment, p.x];
    if (p.deflection > maxDeflection) [maxDeflection, maxDeflectionAt, best] = [p.deflection, p.x, i];
  });
  // Refine the largest deflection between the stations either side of the largest one.
  const lo = diagram[Math.max(0, best - 1)]!.x;
  const hi = diagram[Math.min(diagram.length - 1, best + 1)]!.x;
  const size = (x: number): number => {
    const d = deflection(x);
    return Math.hypot(d.y, d.z);
  };
  const brackets: [number, number][] = [
    [lo, maxDeflectionAt],
    [maxDeflectionAt, hi],
  ];
  for (const [u, w] of brackets) {
    const [x, value] = goldenMax(size, u, w);
    if (value > maxDeflection) [maxDeflection, maxDeflectionAt] = [value, x];
  }
  return { maxDeflection, maxDeflectionAt, maxMoment, maxMomentAt, diagram, slopes: [slope(sa.at), slope(sb.at)] };
}

/** Largest value of f on [a, b] by golden-section search (f unimodal there), with its place. */
function goldenMax(f: (x: number) => number, a: number, b: number): [number, number] {
  const g = (Math.sqrt(5) - 1) / 2;
  let lo = a,
    hi = b;
  let c = hi - g * (hi - lo),
    d = lo + g * (hi - lo);
  let fc = f(c),
    fd = f(d);
  for (let k = 0; k < 40 && hi - lo > 1e-12; k++) {
    if (fc > fd) {
      hi = d;
      d = c;
      fd = fc;
      c = hi - g * (hi - lo);
      fc = f(c);
    } else {
      lo = c;
      c = d;
      fc = fd;
      d = lo + g * (hi - lo);
      fd = f(d);
    }
  }
  const x = (lo + hi) / 2;
  return [x, f(x)];
}
