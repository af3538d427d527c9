// Unit parsing at the boundary (exact unit conversions: NIST SP 811, 2008, Appendix B).
import { describe, expect, it } from 'vitest';
import { parseQuantity } from '../../src/case/quantity.js';

describe('parseQuantity: SI and US customary strings to the internal unit', () => {
  const cases: [string, Parameters<typeof parseQuantity>[1], number][] = [
    ['40 mm', 'length', 0.04],
    ['1.5 in', 'length', 0.0381], // 1 in = 0.0254 m exactly (NIST SP 811)
    ['3.2 kN', 'force', 3200],
    ['720 lbf', 'force', 720 * 4.4482216152605], // 1 lbf = 4.4482216152605 N (NIST SP 811)
    ['1500 rpm', 'speed', 25],
    ['25 rev/s', 'speed', 25],
    ['90 rev/min', 'speed', 1.5],
    ['20000 h', 'time', 20000],
    ['0.25 mm', 'length', 0.00025],
    ['40 degC', 'temperature', 40],
    ['104 degF', 'temperature', 40],
    ['313.15 K', 'temperature', 40],
    ['0.03 Pa*s', 'viscosity', 0.03],
    ['2 MPa', 'pressure', 2e6],
    ['300 psi', 'pressure', 300 * 6894.757293168],
    ['1.75 MPa*m/s', 'pv', 1.75e6],
    ['5e-7 mm^3/(N*m)', 'wearFactor', 5e-16],
    ['60 deg', 'angle', Math.PI / 3],
    ['0.5 Hz', 'frequency', 0.5],
    ['400 ft/min', 'velocity', (400 * 0.3048) / 60],
  ];
  for (const [text, kind, expected] of cases) {
    it(`${text} → ${expected} (${kind})`, () => {
      // Relative 1e-6: js-quantities carries lbf and psi to 7 significant figures
      // (4.448222 N, 6894.76 Pa), 1e-7 from the exact NIST values; far inside any engineering need.
      expect(Math.abs(parseQuantity(text, kind) / expected - 1)).toBeLessThan(1e-6);
    });
  }

  it('kinematic viscosity in cSt becomes dynamic with the stated typical density', () => {
    expect(parseQuantity('68 cSt', 'viscosity')).toBeCloseTo(68e-6 * 870, 10);
  });

  it('plain numbers are taken in the internal unit (temperatures °C) when read as base units', () => {
    expect(parseQuantity(0.04, 'length')).toBe(0.04);
    expect(parseQuantity(40, 'temperature')).toBe(40);
    expect(parseQuantity('120', 'speed', 'base')).toBe(120);
  });

  it('refused bare numbers name the number in the usual unit and in a second one that reads back the same', () => {
    const refusal = (v: unknown, kind: Parameters<typeof parseQuantity>[1]) => {
      try {
        parseQuantity(v, kind, 'refused');
      } catch (e) {
        return (e as Error).message;
      }
      return 'accepted';
    };
    expect(refusal(120, 'speed')).toBe('120 has no unit; write 120 rpm or 2 rev/s');
    expect(refusal('40', 'length')).toBe('"40" has no unit; write 40 mm or 0.04 m');
    expect(refusal(5e-7, 'wearFactor')).toBe('5e-7 has no unit; write 5e-7 mm^3/(N*m) or 5e-16 m^3/(N*m)');
    expect(refusal(2e6, 'force')).toBe('2000000 has no unit; write 2e6 N or 2000 kN');
    expect(refusal(-10, 'temperature')).toBe('-10 has no unit; write -10 degC or 14 degF');
    expect(refusal(0.5, 'frequency')).toBe('0.5 has no unit; write 0.5 Hz or 30 1/min');
    expect(parseQuantity('2e6 N', 'force', 'refused')).toBe(2e6);
    expect(parseQuantity('30 1/min', 'frequency', 'refused')).toBeCloseTo(0.5, 12);
    expect(refusal(Number.POSITIVE_INFINITY, 'force')).toMatch(/^got Infinity; expected a finite number with a unit/);
  });

  it('a unit of the wrong kind names the kind found and the kind expected', () => {
    expect(() => parseQuantity('40 kg', 'length')).toThrow(/"40 kg" is a mass; expected a length/);
    expect(() => parseQuantity('3 mm', 'force')).toThrow(/is a length; expected a force/);
  });

  it('reads subnormal and extreme numbers without tripping the unit library (found by the property tests)', () => {
    expect(parseQuantity('5e-324 kN', 'force')).toBe(5e-324 * 1000); // the smallest subnormal, times 1000 N
    expect(() => parseQuantity('1e400 N', 'force')).toThrow(/not a finite number/);
  });

  it('refuses a unit without a number', () => {
    expect(() => parseQuantity('mm', 'length')).toThrow(/not a quantity this tool can read/);
  });

  it('rejects junk, NaN and infinities', () => {
    expect(() => parseQuantity('forty mm', 'length')).toThrow(/not a quantity/);
    expect(() => parseQuantity(Number.NaN, 'length')).toThrow(/finite/);
    expect(() => parseQuantity(Number.POSITIVE_INFINITY, 'force')).toThrow(/finite/);
    expect(() => parseQuantity(true, 'force')).toThrow(/expected a force/);
  });
});

describe('the common-unit fast path agrees with js-quantities', () => {
  it('every factor equals the library conversion to 1e-6 (the library rounds lbf and psi to 7 figures)', async () => {
    const { COMMON_UNITS, KINDS } = await import('../../src/case/quantity.js');
    const Qty = (await import('js-quantities')).default;
    let n = 0;
    for (const [kind, table] of Object.entries(COMMON_UNITS)) {
      for (const [unit, factor] of Object.entries(table)) {
        const target = KINDS[kind as keyof typeof KINDS].unit;
        let lib: number;
        if (kind === 'viscosity' && (unit === 'cSt' || unit === 'mm^2/s'))
          lib = Qty(`1 ${unit}`).to('m^2/s').scalar * 870;
        else lib = Qty(`1 ${unit}`).to(target).scalar;
        if (kind === 'speed') lib /= 60; // internal rev/s from rpm
        expect(Math.abs(factor / lib - 1), `${kind}: ${unit}`).toBeLessThan(1e-6);
        n++;
      }
    }
    expect(n).toBeGreaterThan(30);
  });
  it('absolute temperatures: 104 degF = 40 degC, 313.15 K = 40 degC, as the library gives', () => {
    expect(parseQuantity('104 degF', 'temperature')).toBeCloseTo(40, 12);
    expect(parseQuantity('313.15 K', 'temperature')).toBeCloseTo(40, 12);
  });
});
