// Kind: published-table checks (ISO 281:2007, Table 3, X/Y for single-row deep-groove ball
// bearings; values and table number from memory), the ISO 76 static load (from memory),
// and the ISO 281 duty-spectrum mean on a hand-worked spectrum.
import { describe, expect, it } from 'vitest';
import { rollingFactors } from '../../../src/data/rolling.js';
import {
  cylindricalRollerLoad,
  deepGrooveBallLoad,
  spectrumMean,
  staticEquivalentLoad,
} from '../../../src/calc/rolling/equivalent-load.js';

const table = rollingFactors().xyDeepGrooveBall;

describe('X and Y of a deep-groove ball bearing', () => {
  it('at a table point: Fa/C0 = 0.056 → e = 0.26, Y = 1.71; Fa/Fr = 0.5 > e so X = 0.56', () => {
    const r = deepGrooveBallLoad(2000, 1000, 1000 / 0.056, table);
    expect(r.e).toBeCloseTo(0.26, 12);
    expect(r.X).toBe(0.56);
    expect(r.Y).toBeCloseTo(1.71, 12);
    expect(r.P).toBeCloseTo(0.56 * 2000 + 1.71 * 1000, 9);
    expect(r.range).toBe('inside');
  });
  it('between points: Fa/C0 = 0.07 (half-way 0.056..0.084) → e = 0.27, Y = 1.63', () => {
    const r = deepGrooveBallLoad(2000, 700, 10000, table);
    expect(r.e).toBeCloseTo(0.27, 12);
    expect(r.Y).toBeCloseTo(1.63, 12);
  });
  it('Fa/Fr ≤ e: X = 1, Y = 0, P = Fr', () => {
    const r = deepGrooveBallLoad(5000, 1000, 10000, table); // Fa/C0 = 0.1, e ≈ 0.293; Fa/Fr = 0.2
    expect([r.X, r.Y, r.P]).toEqual([1, 0, 5000]);
  });
  it('pure radial: P = Fr', () => {
    expect(deepGrooveBallLoad(3000, 0, 10000, table).P).toBe(3000);
  });
  it('pure axial: X·0 + Y·Fa', () => {
    const r = deepGrooveBallLoad(0, 1120, 10000, table); // Fa/C0 = 0.112: e, Y interpolated 0.11..0.17
    expect(r.P).toBeCloseTo(r.Y * 1120, 9);
    expect(r.Y).toBeCloseTo(1.45 + (0.002 / 0.06) * (1.31 - 1.45), 9);
  });
  it('beyond the last row (Fa/C0 > 0.56): excluded with a reason, not extrapolated', () => {
    const r = deepGrooveBallLoad(1000, 6000, 10000, table);
    expect(r.range).toBe('above');
    expect(r.exclusion).toMatch(/beyond the ISO 281 X\/Y table/);
    expect(r.Y).toBe(1.0);
    expect(Number.isFinite(r.P)).toBe(true);
  });
  it('below the first row (Fa/C0 < 0.014): the first row is used and flagged', () => {
    const r = deepGrooveBallLoad(100, 100, 10000, table);
    expect(r.range).toBe('below');
    expect(r.Y).toBe(2.3);
    expect(r.exclusion).toBeNull();
  });
});

describe('radial cylindrical roller bearing', () => {
  it('P = Fr with no axial load', () => {
    expect(cylindricalRollerLoad(4000, 0)).toMatchObject({ P: 4000, X: 1, Y: 0, exclusion: null });
  });
  it('any axial load excludes it, with the reason', () => {
    expect(cylindricalRollerLoad(4000, 50).exclusion).toMatch(/takes no axial load/);
  });
});

describe('static equivalent load (ISO 76, from memory): P0 = max(0.6·Fr + 0.5·Fa, Fr)', () => {
  it('light axial load: P0 = Fr', () => {
    expect(staticEquivalentLoad('ball', 1000, 200)).toBe(1000);
  });
  it('heavy axial load: 0.6·1000 + 0.5·2000 = 1600', () => {
    expect(staticEquivalentLoad('ball', 1000, 2000)).toBeCloseTo(1600, 12);
  });
  it('roller: P0 = Fr', () => {
    expect(staticEquivalentLoad('roller', 1000, 0)).toBe(1000);
  });
});

describe('duty-spectrum mean (ISO 281:2007, from memory)', () => {
  it('hand-worked three-point spectrum', () => {
    // Σ P³·n·t = 2000³·5·0.5 + 3000³·2·0.2 + 1000³·10·0.3 = 2.0e10 + 1.08e10 + 0.3e10 = 3.38e10
    // Σ n·t = 2.5 + 0.4 + 3.0 = 5.9 rev/s;  P = (3.38e10/5.9)^(1/3) = (5.7288e9)^(1/3) = 1789.32 N
    const m = spectrumMean(
      [
        { P: 2000, n: 5, t: 0.5 },
        { P: 3000, n: 2, t: 0.2 },
        { P: 1000, n: 10, t: 0.3 },
      ],
      3,
    );
    expect(m.P).toBeCloseTo(1789.3209, 3);
    expect(m.n).toBeCloseTo(5.9, 12);
    expect(m.byRevolutions).toBe(true);
  });
  it('a single point returns its own load and speed', () => {
    const m = spectrumMean([{ P: 2500, n: 12, t: 1 }], 10 / 3);
    expect(m.P).toBeCloseTo(2500, 9);
    expect(m.n).toBe(12);
  });
  it('no rotation: time-weighted load, flagged, finite', () => {
    const m = spectrumMean([{ P: 2000, n: 0, t: 1 }], 3);
    expect(m.P).toBeCloseTo(2000, 9);
    expect(m.n).toBe(0);
    expect(m.byRevolutions).toBe(false);
  });
});
