/**
 * The cached dimensionless table and its interpolation, against direct solves of the same
 * finite-difference model (not published values; see test/reference/ for those).
 * Interpolation: Fritsch & Carlson (1980) monotone cubic.
 */
import { describe, expect, it } from 'vitest';
import { makeMesh } from '../../../src/calc/journal/mesh.js';
import { performance, solveReynolds } from '../../../src/calc/journal/reynolds.js';
import {
  DEFAULT_MESH,
  TABLE_ECCENTRICITIES,
  eccentricityFromSommerfeld,
  pchipSlopes,
  pointAtEccentricity,
  sommerfeldAt,
  tableFor,
} from '../../../src/calc/journal/table.js';

const mesh = makeMesh(DEFAULT_MESH.nTheta, DEFAULT_MESH.nZeta, DEFAULT_MESH.stretch);

describe('dimensionless table', () => {
  it('interpolates S, φ, Q, Qs/Q, P/pmax within 0.3 % of direct solves midway between rows (L/D 0.5, 1)', () => {
    // Measured worst 0.22 % (P/pmax near ε = 0.97, bench/journal.mjs); 0.3 % leaves room.
    for (const ld of [0.5, 1]) {
      const t = tableFor(ld);
      for (let k = 0; k + 1 < TABLE_ECCENTRICITIES.length; k += 3) {
        const eps = (TABLE_ECCENTRICITIES[k]! + TABLE_ECCENTRICITIES[k + 1]!) / 2;
        const d = performance(solveReynolds(eps, ld, mesh));
        const p = pointAtEccentricity(t, eps);
        for (const key of [
          'sommerfeld',
          'attitudeDeg',
          'frictionVariable',
          'flowVariable',
          'sideFlowRatio',
          'pressureRatio',
        ] as const)
          expect(Math.abs(p[key] / d[key] - 1)).toBeLessThan(3e-3);
      }
    }
  });

  it('inverts S → ε as the inverse of ε → S (load-matching round trip), in and out of the table', () => {
    const t = tableFor(0.75);
    for (const eps of [0.001, 0.005, 0.02, 0.33, 0.71, 0.9, 0.965, 0.985, 0.995]) {
      const s = sommerfeldAt(t, eps);
      expect(eccentricityFromSommerfeld(t, s)).toBeCloseTo(eps, 9);
    }
  });

  it('is continuous at both ends of the table, and flags extrapolation beyond ε = 0.98', () => {
    const t = tableFor(1);
    const e0 = TABLE_ECCENTRICITIES[0]!;
    const e1 = TABLE_ECCENTRICITIES[TABLE_ECCENTRICITIES.length - 1]!;
    expect(sommerfeldAt(t, e0 * (1 - 1e-9)) / sommerfeldAt(t, e0)).toBeCloseTo(1, 6);
    expect(sommerfeldAt(t, e1 + 1e-9) / sommerfeldAt(t, e1)).toBeCloseTo(1, 4);
    expect(pointAtEccentricity(t, 0.97).extrapolated).toBe(false);
    expect(pointAtEccentricity(t, 0.99).extrapolated).toBe(true);
  });

  it('caches per quantised L/D', () => {
    expect(tableFor(0.8)).toBe(tableFor(0.8000001));
  });

  it('monotone cubic slopes keep monotone data monotone (Fritsch & Carlson 1980)', () => {
    const x = [0, 1, 2, 3, 4];
    const y = [0, 0.1, 5, 5.1, 9];
    const d = pchipSlopes(x, y);
    for (const v of d) expect(v).toBeGreaterThanOrEqual(0);
  });

  it('rejects S ≤ 0', () => {
    const t = tableFor(1);
    expect(() => eccentricityFromSommerfeld(t, 0)).toThrow(/Sommerfeld/);
  });
});
