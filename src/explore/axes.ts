import { UsageError } from '../core/errors.js';
import { parseQuantity, QuantityError, type Kind } from '../case/quantity.js';

/** A logarithmic axis: `n` values from min to max, equal ratios between neighbours. */
export function logAxis(min: number, max: number, n: number): number[] {
  if (n === 1) return [Math.sqrt(min * max)];
  const a = Math.log(min);
  const step = (Math.log(max) - a) / (n - 1);
  // End points exactly as given (exp(log(x)) need not return x).
  return Array.from({ length: n }, (_, k) => (k === 0 ? min : k === n - 1 ? max : Math.exp(a + step * k)));
}

/**
 * Log-axis ticks between min and max: the decades, and 2 and 5 times them when fewer than
 * three decades are in range (so a narrow range still gets labelled ticks). Each tick is
 * {value, major}: major ticks are decades.
 */
export function logTicks(min: number, max: number): { value: number; major: boolean }[] {
  const lo = Math.floor(Math.log10(min) + 1e-9);
  const hi = Math.ceil(Math.log10(max) - 1e-9);
  const fine = hi - lo < 3;
  const out: { value: number; major: boolean }[] = [];
  for (let e = lo; e <= hi; e++) {
    for (const m of fine ? [1, 2, 5] : [1]) {
      const v = m * 10 ** e;
      if (v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9)) out.push({ value: Number(v.toPrecision(6)), major: m === 1 });
    }
  }
  return out;
}

/**
 * Parse a range option "MIN..MAX", each end a quantity with units as in a case file
 * ("100N..20kN", "10 rpm..5000 rpm"); a bare number is in the internal unit (N, rev/s).
 * Returns SI numbers. Throws UsageError naming the option, the value and what was expected.
 */
export function parseRange(option: string, text: string, kind: Kind, example: string): [number, number] {
  const expected = `expected MIN..MAX with units, e.g. "${example}", with 0 < MIN < MAX`;
  const parts = text.split('..');
  if (parts.length !== 2 || !parts[0]!.trim() || !parts[1]!.trim())
    throw new UsageError(`${option}: got "${text}"; ${expected}`);
  const ends = parts.map((p) => {
    try {
      return parseQuantity(p.trim(), kind);
    } catch (e) {
      if (e instanceof QuantityError) throw new UsageError(`${option}: got "${text}": ${e.message}`);
      throw e;
    }
  }) as [number, number];
  if (!(ends[0] > 0) || !(ends[1] > ends[0])) throw new UsageError(`${option}: got "${text}"; ${expected}`);
  return ends;
}

/** Parse --grid: a whole number of cells per axis, 2 to 200. */
export function parseGrid(text: string | undefined, fallback: number): number {
  if (text === undefined) return fallback;
  const n = Number(text);
  if (!/^\d+$/.test(text.trim()) || !Number.isInteger(n) || n < 2 || n > 200) {
    throw new UsageError(`--grid: got "${text}"; expected a whole number of cells per axis from 2 to 200`);
  }
  return n;
}
