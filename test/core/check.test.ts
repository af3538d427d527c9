import { describe, expect, it } from 'vitest';
import { makeCheck } from '../../src/core/check.js';

describe('makeCheck margins', () => {
  it('a temperature margin is the share of the allowed rise above the reference left', () => {
    // 100 °C against ≤ 120 °C from a 40 °C inlet: (120 − 100)/(120 − 40) = 0.25.
    const k = makeCheck('t', 'T', 100, 120, 'degC', 'max', 'test', 40);
    expect(k.pass).toBe(true);
    expect(k.margin).toBeCloseTo(0.25, 12);
  });

  it('a reference above the limit measures from absolute zero, so a failing check never shows a positive margin', () => {
    // Guards: thrust pads at 132 °C against ≤ 121.1 °C from a 122.4 °C bath printed FAIL with +896 %.
    const k = makeCheck('t', 'T', 132, 121.1, 'degC', 'max', 'test', 122.4);
    expect(k.pass).toBe(false);
    expect(k.margin).toBeLessThan(0);
    expect(k.margin).toBeCloseTo((121.1 - 132) / (121.1 + 273.15), 12);
  });

  it('every check has a margin whose sign agrees with pass', () => {
    for (const [v, lim, ref] of [
      [50, 80, 20],
      [90, 80, 20],
      [90, 80, 85],
      [70, 80, 85],
    ] as const) {
      const k = makeCheck('t', 'T', v, lim, 'degC', 'max', 'test', ref);
      expect(k.margin >= 0, `${v} vs ${lim} from ${ref}`).toBe(k.pass);
    }
  });
});
