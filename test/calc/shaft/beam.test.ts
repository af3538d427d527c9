// Kind: slope and deflection of a uniform shaft against the closed forms of a simply supported
// beam (Gere & Goodno, Mechanics of Materials, 8th ed. 2013, Appendix G, Table G-2, from memory;
// the overhang by superposition of the end-couple case and a cantilever, worked below), and a
// stepped shaft with loads in both planes, a couple and an overhang against a separate fine-grid
// trapezoidal double integration written here.
import { describe, expect, it } from 'vitest';
import type { ShaftSI, ShaftSegmentSI, ShaftSupportSI } from '../../../src/case/shaft-types.js';
import { shaftBeam } from '../../../src/calc/shaft/beam.js';
import { shaftStatics } from '../../../src/calc/shaft/statics.js';
import type { Beam, PointLoad } from '../../../src/calc/shaft/types.js';

const E = 210e9;
const D = 0.04;
const EI = (E * Math.PI * D ** 4) / 64; // 26 389 N·m²

function shaft(a: number, b: number, segments: ShaftSegmentSI[] = []): ShaftSI {
  const s = (name: string, at: number): ShaftSupportSI => ({ name, at, diameter: D, locates: 'none' });
  return {
    diameter: D,
    modulus: E,
    segments,
    supports: [s('A', a), { ...s('B', b), locates: 'both' }],
    loads: [],
    shock: 'none',
  };
}
function load(at: number, f: Partial<Omit<PointLoad, 'at' | 'label'>>): PointLoad {
  return { at, fx: 0, fy: 0, fz: 0, my: 0, mz: 0, torque: 0, label: 'test', ...f };
}
function bend(s: ShaftSI, loads: PointLoad[]): Beam {
  return shaftBeam(s, loads, shaftStatics(s, loads));
}
function deflectionAt(beam: Beam, x: number): number {
  const p = beam.diagram.find((q) => Math.abs(q.x - x) < 1e-12);
  if (!p) throw new Error(`no station at ${x}`);
  return p.deflectionY;
}

describe('uniform shaft against closed forms', () => {
  it('central load: θ = PL²/(16EI) at both supports, δ = PL³/(48EI) at mid-span', () => {
    const P = 2000;
    const L = 0.6;
    const b = bend(shaft(0, L), [load(0.3, { fy: -P })]);
    const theta = (P * L * L) / (16 * EI);
    const delta = (P * L ** 3) / (48 * EI); // 3.41e-4 m
    expect(b.slopes[0]).toBeCloseTo(theta, 10);
    expect(b.slopes[1]).toBeCloseTo(theta, 10);
    expect(b.maxDeflection / delta).toBeCloseTo(1, 9);
    expect(b.maxDeflectionAt).toBeCloseTo(0.3, 6);
    expect(deflectionAt(b, 0.3)).toBeCloseTo(-delta, 12); // downward under a downward load
    expect(b.maxMoment).toBeCloseTo((P * L) / 4, 9);
  });
  it('off-centre load (a = 0.4, b = 0.2, L = 0.6): θ_A = Pab(L+b)/(6LEI), θ_B = Pab(L+a)/(6LEI), δ_max = Pb(L²−b²)^1.5/(9√3·L·EI)', () => {
    const [P, L, a, bb] = [3000, 0.6, 0.4, 0.2];
    const beam = bend(shaft(0, L), [load(a, { fy: -P })]);
    expect(beam.slopes[0] / ((P * a * bb * (L + bb)) / (6 * L * EI))).toBeCloseTo(1, 9);
    expect(beam.slopes[1] / ((P * a * bb * (L + a)) / (6 * L * EI))).toBeCloseTo(1, 9);
    const dmax = (P * bb * (L * L - bb * bb) ** 1.5) / (9 * Math.sqrt(3) * L * EI);
    expect(beam.maxDeflection / dmax).toBeCloseTo(1, 8);
    expect(beam.maxDeflectionAt).toBeCloseTo(Math.sqrt((L * L - bb * bb) / 3), 4);
    expect(deflectionAt(beam, a)).toBeCloseTo((-P * a * a * bb * bb) / (3 * EI * L), 12);
    expect(beam.maxMoment).toBeCloseTo((P * a * bb) / L, 9);
  });
  it('overhung load (span L = 0.5, overhang a = 0.15): tip Pa²(L+a)/(3EI), θ_A = PaL/(6EI), θ_B = PaL/(3EI)', () => {
    // Superposition: the span carries the end couple Pa at B (θ_B = PaL/(3EI), θ_A = PaL/(6EI));
    // the tip drops θ_B·a plus the cantilever's Pa³/(3EI): Pa²L/(3EI) + Pa³/(3EI) = Pa²(L+a)/(3EI).
    const [P, L, a] = [1200, 0.5, 0.15];
    const beam = bend(shaft(0, L), [load(L + a, { fy: -P })]);
    const tip = (P * a * a * (L + a)) / (3 * EI);
    expect(beam.maxDeflection / tip).toBeCloseTo(1, 9);
    expect(beam.maxDeflectionAt).toBeCloseTo(L + a, 9);
    expect(deflectionAt(beam, L + a)).toBeCloseTo(-tip, 12);
    expect(beam.slopes[0] / ((P * a * L) / (6 * EI))).toBeCloseTo(1, 9);
    expect(beam.slopes[1] / ((P * a * L) / (3 * EI))).toBeCloseTo(1, 9);
    expect(beam.maxMoment).toBeCloseTo(P * a, 9);
    // between the supports the span lifts by ML²/(9√3·EI) at x = L/√3 (M = Pa), above the axis
    const mid = beam.diagram.reduce((m, p) => (p.x < L && p.deflectionY > m.deflectionY ? p : m));
    expect(mid.deflectionY / ((P * a * L * L) / (9 * Math.sqrt(3) * EI))).toBeCloseTo(1, 4);
  });
  it('a couple C at an end support: θ = CL/(6EI) and CL/(3EI), δ_max = CL²/(9√3·EI) at L/√3', () => {
    const [C, L] = [80, 0.5];
    const beam = bend(shaft(0, L), [load(L, { mz: C })]);
    expect(beam.slopes[0] / ((C * L) / (6 * EI))).toBeCloseTo(1, 9);
    expect(beam.slopes[1] / ((C * L) / (3 * EI))).toBeCloseTo(1, 9);
    expect(beam.maxDeflection / ((C * L * L) / (9 * Math.sqrt(3) * EI))).toBeCloseTo(1, 8);
    expect(beam.maxDeflectionAt).toBeCloseTo(L / Math.sqrt(3), 4);
  });
  it('the same load in the x–z plane bends the shaft along z by the same amount', () => {
    const y = bend(shaft(0, 0.6), [load(0.25, { fy: 1500, mz: 30 })]);
    const z = bend(shaft(0, 0.6), [load(0.25, { fz: 1500, my: -30 })]);
    // rotation of the axes by 90° about x: y → z, z → −y (so mz → −my)
    y.diagram.forEach((p, i) => {
      const q = z.diagram[i]!;
      expect(q.x).toBe(p.x);
      expect(q.deflectionZ).toBeCloseTo(p.deflectionY, 14);
      expect(q.momentY).toBeCloseTo(p.momentZ, 9);
      expect(q.shearZ).toBeCloseTo(p.shearY, 9);
    });
    expect(z.slopes[0]).toBeCloseTo(y.slopes[0], 14);
  });
  it('a couple bends the shaft as a close force pair does (away from the pair)', () => {
    const h = 1e-4;
    const F = 2e5; // couple h·F = 20 N·m
    const couple = bend(shaft(0, 0.6), [load(0.2, { my: -h * F, mz: h * F })]);
    const pair = bend(shaft(0, 0.6), [load(0.2 + h / 2, { fy: F, fz: F }), load(0.2 - h / 2, { fy: -F, fz: -F })]);
    expect(pair.slopes[0] / couple.slopes[0]).toBeCloseTo(1, 6);
    expect(pair.slopes[1] / couple.slopes[1]).toBeCloseTo(1, 6);
  });
});

describe('diagram', () => {
  const beam = bend(shaft(0.05, 0.55), [load(0, { fy: -400 }), load(0.3, { fy: -2000, fz: 700, my: 15 })]);
  it('a few hundred stations ordered by x, the breakpoints among them, zero moment at the free ends', () => {
    const xs = beam.diagram.map((p) => p.x);
    expect(xs.length).toBeGreaterThan(200);
    expect(xs.length).toBeLessThan(800);
    for (let i = 1; i < xs.length; i++) expect(xs[i]!).toBeGreaterThanOrEqual(xs[i - 1]!);
    for (const x of [0, 0.05, 0.3, 0.55]) expect(xs).toContain(x);
    expect(beam.diagram[0]!.moment).toBe(0);
    expect(beam.diagram[beam.diagram.length - 1]!.moment).toBe(0);
    expect(deflectionAt(beam, 0.05)).toBeCloseTo(0, 15);
    expect(deflectionAt(beam, 0.55)).toBeCloseTo(0, 15);
  });
  it('the shear jumps by the load at a load, the moment by the couple', () => {
    const at = beam.diagram.filter((p) => p.x === 0.3);
    expect(at).toHaveLength(2);
    expect(at[1]!.shearY - at[0]!.shearY).toBeCloseTo(-2000, 9);
    expect(at[1]!.shearZ - at[0]!.shearZ).toBeCloseTo(700, 9);
    expect(at[1]!.momentY - at[0]!.momentY).toBeCloseTo(15, 9);
  });
});

describe('stepped shaft against a separate fine-grid integration', () => {
  const segments = [
    { from: 0, to: 0.1, diameter: 0.035 },
    { from: 0.1, to: 0.5, diameter: 0.05 },
    { from: 0.5, to: 0.7, diameter: 0.04 },
  ];
  const s = shaft(0.05, 0.6, segments);
  const loads = [
    load(0.3, { fy: -3000 }),
    load(0.45, { fz: 1500, my: 50, mz: -20 }),
    load(0.68, { fy: -800, fz: -300 }),
  ];
  const beam = shaftBeam(s, loads, shaftStatics(s, loads));

  // Separate model: reactions by moments about A written out again, M(x) summed directly,
  // EI from the segment at x, slope and deflection by the trapezoidal rule on 70 000 steps.
  const [a, b] = [0.05, 0.6];
  const rBy = -((0.3 - a) * -3000 + (0.68 - a) * -800 + -20) / (b - a);
  const rAy = 3800 - rBy;
  const rBz = (-((0.45 - a) * 1500 + (0.68 - a) * -300) + 50) / (b - a);
  const rAz = -1200 - rBz;
  const forcesY: [number, number][] = [
    [a, rAy],
    [0.3, -3000],
    [b, rBy],
    [0.68, -800],
  ];
  const forcesZ: [number, number][] = [
    [a, rAz],
    [0.45, 1500],
    [b, rBz],
    [0.68, -300],
  ];
  const mZ = (x: number): number =>
    forcesY.reduce((m, [xi, f]) => (xi < x ? m + (x - xi) * f : m), 0) - (x > 0.45 ? -20 : 0);
  const mY = (x: number): number =>
    forcesZ.reduce((m, [xi, f]) => (xi < x ? m + (x - xi) * f : m), 0) + (x > 0.45 ? 50 : 0);
  const ei = (x: number): number => {
    const d = x < 0.1 ? 0.035 : x < 0.5 ? 0.05 : 0.04;
    return (E * Math.PI * d ** 4) / 64;
  };
  const n = 70000;
  const dx = 0.7 / n;
  const integrate = (m: (x: number) => number): { v: number[]; t: number[] } => {
    const t = [0];
    const v = [0];
    // curvature taken at the mid-point of each step where the moment or EI jumps
    for (let i = 1; i <= n; i++) {
      const x0 = (i - 1) * dx;
      const x1 = i * dx;
      const k0 = m(x0 + 1e-12) / ei(x0 + 1e-12);
      const k1 = m(x1 - 1e-12) / ei(x1 - 1e-12);
      t.push(t[i - 1]! + ((k0 + k1) / 2) * dx);
      v.push(v[i - 1]! + ((t[i - 1]! + t[i]!) / 2) * dx);
    }
    const [ia, ib] = [Math.round(a / dx), Math.round(b / dx)];
    const c2 = -(v[ib]! - v[ia]!) / (b - a);
    const c1 = -v[ia]! - c2 * a;
    return { v: v.map((vi, i) => vi + c1 + c2 * i * dx), t: t.map((ti) => ti + c2) };
  };
  const y = integrate(mZ);
  const z = integrate(mY);

  it('reactions agree with the hand sums', () => {
    const st = shaftStatics(s, loads);
    expect(st.supports[0].y).toBeCloseTo(rAy, 9);
    expect(st.supports[1].z).toBeCloseTo(rBz, 9);
  });
  it('deflections along the shaft and slopes at the supports agree within 0.001 % of the largest', () => {
    const scale = beam.maxDeflection;
    for (const x of [0, 0.1, 0.2, 0.3, 0.45, 0.5, 0.7]) {
      const i = Math.round(x / dx);
      const p = beam.diagram.find((q) => Math.abs(q.x - x) < 1e-12)!;
      expect(Math.abs(p.deflectionY - y.v[i]!) / scale).toBeLessThan(1e-5);
      expect(Math.abs(p.deflectionZ - z.v[i]!) / scale).toBeLessThan(1e-5);
    }
    for (const [k, x] of [
      [0, a],
      [1, b],
    ] as const) {
      const i = Math.round(x / dx);
      expect(beam.slopes[k] / Math.hypot(y.t[i]!, z.t[i]!)).toBeCloseTo(1, 3);
    }
    const fine = Math.max(...y.v.map((v, i) => Math.hypot(v, z.v[i]!)));
    expect(beam.maxDeflection / fine).toBeCloseTo(1, 3);
  });
});
