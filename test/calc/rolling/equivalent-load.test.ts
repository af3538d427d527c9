// Kind: the ISO 281 duty-spectrum mean on a hand-worked spectrum (X, Y and X0, Y0 per kind are
// checked in load-factors.test.ts and test/reference/iso-281-load-factors.test.ts).
import { describe, expect, it } from 'vitest';
import { spectrumMean } from '../../../src/calc/rolling/equivalent-load.js';

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
