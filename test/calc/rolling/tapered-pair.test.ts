// Kind: a two-bearing case worked by hand (no published worked example was at hand to cite):
// the induced axial force Fi = 0.5·Fr/Y of a single-row tapered roller bearing and the rules for
// two opposed bearings (as the rolling-bearing textbooks give them, e.g. Harris and Kotzalas,
// Rolling Bearing Analysis, 5th ed., 2006; from memory), then the equivalent loads of both by
// ISO 281:2007 cl. 7.2; and fast-check properties (axial equilibrium of the shaft, each bearing
// carries at least its own induced force).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dynamicLoad, type BearingLoadSpec } from '../../../src/calc/rolling/load-factors.js';
import {
  inducedAxialForce,
  inducedAxialForceFromE,
  opposedAxialLoadsFromInduced,
  opposedPairAxialLoads,
} from '../../../src/calc/rolling/tapered-pair.js';

describe('induced axial force', () => {
  it('Fi = 0.5·Fr/Y: Fr = 8 kN, Y = 1.5 → 2666.7 N; none without radial load', () => {
    expect(inducedAxialForce(8000, 1.5)).toBeCloseTo(8000 / 3, 9);
    expect(inducedAxialForce(0, 1.5)).toBe(0);
    expect(() => inducedAxialForce(1000, 0)).toThrow(RangeError);
  });
  it('angular-contact ball by e·Fr (common practice): 40°, e = 1.14 → 1.14·Fr', () => {
    expect(inducedAxialForceFromE(5000, 1.14)).toBeCloseTo(5700, 9);
  });
});

describe('two opposed tapered roller bearings, worked by hand', () => {
  // A: Fr = 8 kN, B: Fr = 4 kN, both Y = 1.5 (cot α = 3.75, α = 14.93°, e = 1.5·tan α = 0.4).
  // FiA = 0.5·8000/1.5 = 2666.67 N, FiB = 0.5·4000/1.5 = 1333.33 N.
  it('Ka = 1 kN towards B: FiA + Ka = 3666.67 ≥ FiB, so B carries 3666.67 N and A its own 2666.67 N', () => {
    const r = opposedPairAxialLoads({ FrA: 8000, FrB: 4000, YA: 1.5, YB: 1.5, Ka: 1000 });
    expect(r.governing).toBe('B');
    expect(r.FaA).toBeCloseTo(2666.667, 3);
    expect(r.FaB).toBeCloseTo(3666.667, 3);
  });
  it('Ka = 2 kN towards A: FiA + Ka = 666.67 < FiB, so A carries FiB − Ka = 3333.33 N, B its own 1333.33 N', () => {
    const r = opposedPairAxialLoads({ FrA: 8000, FrB: 4000, YA: 1.5, YB: 1.5, Ka: -2000 });
    expect(r.governing).toBe('A');
    expect(r.FaA).toBeCloseTo(3333.333, 3);
    expect(r.FaB).toBeCloseTo(1333.333, 3);
  });
  it('then ISO 281 cl. 7.2: A at Fa/Fr = 0.333 ≤ e → P = Fr = 8000 N; B at 0.917 > e → 0.4·4000 + 1.5·3666.67 = 7100 N', () => {
    const alpha = (Math.atan(0.4 / 1.5) * 180) / Math.PI; // Y = 0.4·cot α = 1.5
    const b: BearingLoadSpec = {
      kind: 'tapered roller',
      form: null,
      arrangement: 'single',
      contactAngle: alpha,
      C0: 100000,
      f0: null,
    };
    const { FaA, FaB } = opposedPairAxialLoads({ FrA: 8000, FrB: 4000, YA: 1.5, YB: 1.5, Ka: 1000 });
    const A = dynamicLoad(b, 8000, FaA);
    const B = dynamicLoad(b, 4000, FaB);
    expect(A.e!).toBeCloseTo(0.4, 12);
    expect(A.P).toBe(8000);
    expect(B.Y).toBeCloseTo(1.5, 12);
    expect(B.P).toBeCloseTo(7100, 6);
  });
  it('no external force and equal bearings: each carries its own induced force', () => {
    const r = opposedAxialLoadsFromInduced({ FiA: 5700, FiB: 5700, Ka: 0 });
    expect([r.FaA, r.FaB]).toEqual([5700, 5700]);
  });
});

describe('properties of the opposed-pair rules', () => {
  it('axial equilibrium FaA + Ka = FaB, each carries at least its own induced force', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e5, noNaN: true }),
        fc.double({ min: 0, max: 1e5, noNaN: true }),
        fc.double({ min: 0.5, max: 3, noNaN: true }),
        fc.double({ min: 0.5, max: 3, noNaN: true }),
        fc.double({ min: -1e5, max: 1e5, noNaN: true }),
        (FrA, FrB, YA, YB, Ka) => {
          const r = opposedPairAxialLoads({ FrA, FrB, YA, YB, Ka });
          const tol = 1e-9 * (1 + Math.abs(Ka) + FrA + FrB);
          expect(Math.abs(r.FaA + Ka - r.FaB)).toBeLessThan(tol);
          expect(r.FaA).toBeGreaterThanOrEqual(inducedAxialForce(FrA, YA) - tol);
          expect(r.FaB).toBeGreaterThanOrEqual(inducedAxialForce(FrB, YB) - tol);
          // the governing bearing is the one that carries more than its own induced force
          const other = r.governing === 'B' ? r.FaA - inducedAxialForce(FrA, YA) : r.FaB - inducedAxialForce(FrB, YB);
          expect(Math.abs(other)).toBeLessThan(tol);
        },
      ),
    );
  });
});
