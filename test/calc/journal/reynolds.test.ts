/**
 * Properties of the mesh and the finite-difference Reynolds solver (not published values:
 * those are in test/reference/). Sources of the expectations are named per test.
 */
import { describe, expect, it } from 'vitest';
import { makeMesh } from '../../../src/calc/journal/mesh.js';
import { performance, solveReynolds } from '../../../src/calc/journal/reynolds.js';
import { DEFAULT_MESH } from '../../../src/calc/journal/table.js';

describe('mesh', () => {
  it('spans 0..2π and 0..1 with trapezoid weights summing to 2π and 1, clustered towards θ = π', () => {
    const m = makeMesh(96, 12, 0.5);
    expect(m.theta[0]).toBe(0);
    expect(m.theta[96]).toBeCloseTo(2 * Math.PI, 14);
    expect(m.wTheta.reduce((a, b) => a + b, 0)).toBeCloseTo(2 * Math.PI, 12);
    expect(m.wZeta.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    // Spacing ratio at θ = π to θ = 0 is (1 − a)/(1 + a) = 1/3 for a = 0.5 (mesh.ts).
    const d0 = m.theta[1]! - m.theta[0]!;
    const dPi = m.theta[49]! - m.theta[48]!;
    expect(dPi / d0).toBeCloseTo(1 / 3, 2);
  });
  it('rejects meshes it cannot solve on', () => {
    expect(() => makeMesh(4, 12)).toThrow(/nTheta/);
    expect(() => makeMesh(96, 1)).toThrow(/nZeta/);
    expect(() => makeMesh(96, 12, 1)).toThrow(/stretch/);
  });
});

describe('Reynolds solver', () => {
  const mesh = makeMesh(DEFAULT_MESH.nTheta, DEFAULT_MESH.nZeta, DEFAULT_MESH.stretch);

  it('keeps p ≥ 0 (Swift–Stieber, Raimondi & Boyd 1958) and zero on the inlet line and the ends', () => {
    const sol = solveReynolds(0.7, 0.8, mesh);
    const stride = mesh.nZeta + 1;
    for (const v of sol.p) expect(v).toBeGreaterThanOrEqual(0);
    for (let j = 0; j <= mesh.nZeta; j++) {
      expect(sol.p[j]).toBe(0);
      expect(sol.p[mesh.nTheta * stride + j]).toBe(0);
    }
    for (let i = 0; i <= mesh.nTheta; i++) expect(sol.p[i * stride + mesh.nZeta]).toBe(0);
  });

  it('puts the pressure hump in the converging film (0 < θ_peak < 180°) and ends it past the minimum film', () => {
    // Hydrodynamic wedge: pressure builds where h decreases in the direction of motion
    // (Hamrock, Schmid & Jacobson 2004, from memory).
    for (const eps of [0.2, 0.6, 0.95]) {
      const p = performance(solveReynolds(eps, 1, mesh));
      expect(p.peakAngleDeg).toBeGreaterThan(90);
      expect(p.peakAngleDeg).toBeLessThan(180);
      expect(p.filmEndDeg).toBeGreaterThan(180);
    }
  });

  it('converges under mesh refinement: successive differences in S shrink (grid-convergence study)', () => {
    const s = [
      [48, 6],
      [96, 12],
      [192, 24],
    ].map(([a, b]) => performance(solveReynolds(0.8, 1, makeMesh(a!, b!, 0.5))).sommerfeld);
    const d1 = Math.abs(s[1]! - s[0]!);
    const d2 = Math.abs(s[2]! - s[1]!);
    expect(d2).toBeLessThan(d1 / 2); // at least first order; second order gives about /4
  });

  it('S falls and φ falls monotonically with ε (Raimondi & Boyd 1958 trend)', () => {
    let prevS = Infinity;
    let prevPhi = Infinity;
    for (const eps of [0.05, 0.2, 0.4, 0.6, 0.8, 0.9, 0.97]) {
      const p = performance(solveReynolds(eps, 0.5, mesh));
      expect(p.sommerfeld).toBeLessThan(prevS);
      expect(p.attitudeDeg).toBeLessThan(prevPhi);
      prevS = p.sommerfeld;
      prevPhi = p.attitudeDeg;
    }
  });

  it('fails loudly instead of returning an unconverged field', () => {
    expect(() => solveReynolds(0.5, 1, mesh, { maxIter: 3 })).toThrow(/did not converge/);
    expect(() => solveReynolds(1, 1, mesh)).toThrow(/eccentricity/);
    expect(() => solveReynolds(0.5, 0, mesh)).toThrow(/L\/D/);
  });
});
