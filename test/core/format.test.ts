// Kind: behaviour of the number formatter (worked by hand from its definition; not physics).
import { describe, expect, it } from 'vitest';
import { num } from '../../src/core/format.js';

describe('num', () => {
  it('writes four significant figures without trailing zeros in the plain range', () => {
    expect(num(1234.5)).toBe('1235');
    expect(num(0.0012346)).toBe('0.001235');
    expect(num(40)).toBe('40');
    expect(num(-2.5)).toBe('-2.5');
  });

  it('writes zero and non-finite numbers as themselves', () => {
    expect(num(0)).toBe('0');
    expect(num(-0)).toBe('0');
    expect(num(Number.NaN)).toBe('NaN');
    expect(num(Number.POSITIVE_INFINITY)).toBe('Infinity');
  });

  it('trims the exponent form by default and keeps its digits when asked', () => {
    expect(num(1e6)).toBe('1e+6');
    expect(num(1e6, 4, { exponentZeros: 'keep' })).toBe('1.000e+6');
    expect(num(2.5e-4)).toBe('2.5e-4');
    expect(num(2.5e-4, 4, { exponentZeros: 'keep' })).toBe('2.500e-4');
    expect(num(-9.18637e7, 4, { exponentZeros: 'keep' })).toBe('-9.186e+7');
  });

  it('gives the same plain form with either exponent setting', () => {
    for (const x of [0.001, 0.5, 1, 999.96, 123456.7, 999999])
      expect(num(x, 4, { exponentZeros: 'keep' })).toBe(num(x));
  });
});
