/**
 * data/thrust-pad-tables.json is computed by our own pad solver (scripts/thrust-pad-tables.mjs):
 * these tests re-solve some of it so a solver change without regenerating the file fails here,
 * bound the error of interpolating the file in L/B against direct solves between its rows, and
 * check the runtime path solves its tables where the data folder has no such file. Properties
 * of the program, not published values.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { PAD_MESH, solvePad } from '../../../src/calc/thrust/pad.js';
import {
  clearPadTableCache,
  PAD_TAPERS,
  padAt,
  padTable,
  shippedRows,
  solvePadRows,
} from '../../../src/calc/thrust/pad-table.js';
import { checkPadTables, shippedPadTables } from '../../../src/data/thrust-pad-tables.js';
import { DataError } from '../../../src/core/errors.js';
import { pchipSlopes } from '../../../src/calc/journal/table.js';

/** The cubic Hermite interpolant through (x, y) with slopes d, at v (written out here, independently of pad-table.ts). */
function monotoneCubic(x: Float64Array, y: Float64Array, d: Float64Array, v: number): number {
  let k = 0;
  while (k < x.length - 2 && x[k + 1]! <= v) k++;
  const h = x[k + 1]! - x[k]!;
  const t = (v - x[k]!) / h;
  const h00 = (1 + 2 * t) * (1 - t) ** 2;
  const h10 = t * (1 - t) ** 2;
  const h01 = t * t * (3 - 2 * t);
  const h11 = t * t * (t - 1);
  return h00 * y[k]! + h10 * h * d[k]! + h01 * y[k + 1]! + h11 * h * d[k + 1]!;
}

const QUANTITIES = ['load', 'friction', 'inletFlow', 'sideFlow', 'centreOfPressure'] as const;

describe('shipped thrust pad tables', () => {
  const shipped = shippedPadTables()!;

  it('were solved at the default mesh over the current taper rows, L/B 0.25 to 4', () => {
    expect(shipped.mesh).toEqual(PAD_MESH);
    expect(shipped.tapers).toEqual([...PAD_TAPERS]);
    const lbs = shipped.tables.map((t) => t.widthToLength);
    expect(lbs[0]).toBe(0.25);
    expect(lbs[lbs.length - 1]).toBe(4);
    expect(lbs).toContain(1);
  });

  it('pass the loader check (trusted at run time without it)', () => {
    expect(() => checkPadTables(shipped)).not.toThrow();
  });

  for (const lb of [0.25, 1, 4]) {
    it(`match a fresh solve at L/B = ${lb} (12 significant figures stored)`, () => {
      const file = shipped.tables.find((t) => t.widthToLength === lb)!;
      const fresh = solvePadRows(lb);
      fresh.forEach((r, j) => {
        const s = file.rows[j]!;
        expect(s.taper).toBe(r.taper);
        for (const k of [...QUANTITIES, 'outletFlow', 'peakPressure'] as const)
          expect(Math.abs(s[k] / r[k] - 1), `${k} at K=${r.taper}`).toBeLessThan(1e-9);
      });
    });
  }

  it('interpolate in L/B between their rows within 1e-4 of a direct solve (every taper row)', () => {
    // Midway (in ln L/B) between rows, where the interpolation strays most.
    // Measured worst: W* 1.5e-5, F* 4e-6, Q*_in 8e-6, Q*_side 1.6e-5 (relative), X_cp 1.3e-6.
    const lbs = shipped.tables.map((t) => t.widthToLength);
    for (let i = 0; i < lbs.length - 1; i += 3) {
      const lb = Math.sqrt(lbs[i]! * lbs[i + 1]!);
      const rows = shippedRows(lb)!;
      PAD_TAPERS.forEach((k, j) => {
        const d = solvePad(k, lb);
        const r = rows[j]!;
        for (const q of ['load', 'friction', 'inletFlow', 'sideFlow'] as const)
          expect(Math.abs(r[q] / d[q] - 1), `${q} at L/B=${lb}, K=${k}`).toBeLessThan(1e-4);
        expect(r.centreOfPressure).toBeCloseTo(d.centreOfPressure, 4);
      });
    }
  });

  it('interpolate from a window of tables exactly as over the whole file', () => {
    const x = Float64Array.from(shipped.tables, (t) => Math.log(t.widthToLength));
    for (const lb of [0.26, 0.9, 1.0604, 3.9]) {
      PAD_TAPERS.forEach((_, j) => {
        const y = Float64Array.from(shipped.tables, (t) => Math.log(t.rows[j]!.load));
        const whole = monotoneCubic(x, y, pchipSlopes(x, y), Math.log(lb));
        expect(Math.log(shippedRows(lb)![j]!.load)).toBeCloseTo(whole, 12);
      });
    }
  });

  it('give a table between rows in L/B and K within 0.3 % of a direct solve', () => {
    for (const lb of [0.31, 0.77, 1.0604, 2.6]) {
      const t = padTable(lb);
      for (const k of [0.08, 0.42, 1.2, 2.8, 6.3, 17]) {
        const d = solvePad(k, lb);
        const p = padAt(t, k);
        expect(Math.abs(p.load / d.load - 1)).toBeLessThan(0.003);
        expect(Math.abs(p.friction / d.friction - 1)).toBeLessThan(0.003);
        expect(Math.abs(p.inletFlow / d.inletFlow - 1)).toBeLessThan(0.003);
        expect(p.centreOfPressure).toBeCloseTo(d.centreOfPressure, 3);
      }
    }
  });

  it('are left for a direct solve outside their L/B range', () => {
    expect(shippedRows(0.2)).toBeNull();
    expect(shippedRows(5)).toBeNull();
    clearPadTableCache();
    expect(padTable(0.2).rows[7]!.load).toBe(solvePad(PAD_TAPERS[7]!, 0.2).load);
  });
});

describe('a data folder without thrust-pad-tables.json', () => {
  const before = process.env.SHAFTWISE_DATA_DIR;
  afterEach(() => {
    if (before === undefined) delete process.env.SHAFTWISE_DATA_DIR;
    else process.env.SHAFTWISE_DATA_DIR = before;
    clearPadTableCache();
  });

  it('reads a copy of the file there, checked: a row without a figure is named', () => {
    const dir = mkdtempSync(join(tmpdir(), 'shaftwise-pad-data-'));
    try {
      const t = JSON.parse(readFileSync(new URL('../../../data/thrust-pad-tables.json', import.meta.url), 'utf8'));
      delete t.tables[2].rows[4].friction;
      writeFileSync(join(dir, 'thrust-pad-tables.json'), JSON.stringify(t));
      process.env.SHAFTWISE_DATA_DIR = dir;
      expect(() => shippedPadTables()).toThrow(DataError);
      expect(() => shippedPadTables()).toThrow(
        /tables\[2\]\.rows\[4\]\.friction: got undefined; expected a finite number/,
      );
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('has its pad tables solved on first use, and the shipped ones come back with data/', () => {
    const dir = mkdtempSync(join(tmpdir(), 'shaftwise-pad-data-'));
    try {
      const lb = 0.9131;
      const shippedLoad = padTable(lb).rows[5]!.load;
      process.env.SHAFTWISE_DATA_DIR = dir;
      expect(shippedPadTables()).toBeNull();
      const solved = padTable(lb);
      expect(solved.rows[5]!.load).toBe(solvePad(PAD_TAPERS[5]!, lb).load);
      expect(solved.rows[5]!.iterations).toBeGreaterThan(0);
      delete process.env.SHAFTWISE_DATA_DIR;
      expect(padTable(lb).rows[5]!.load).toBe(shippedLoad);
      expect(padTable(lb).rows[5]!.iterations).toBe(0);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
