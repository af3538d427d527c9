/**
 * The one number formatter: four significant figures, no trailing zeros, exponent form outside
 * 1e-3 ≤ |x| < 1e6. Calculation sheets, findings and reports all write plain numbers with it;
 * units are added by the reader (src/report/units.ts).
 *
 * `exponentZeros: 'keep'` writes the exponent form with all its digits (1.000e+6, not 1e+6):
 * the rolling kernel's sheet and findings have always been written so, and their text is
 * compared exactly by the tests. The plain form is the same either way.
 */
export function num(x: number, digits = 4, opts: { exponentZeros?: 'trim' | 'keep' } = {}): string {
  if (x === 0 || !Number.isFinite(x)) return String(x);
  const a = Math.abs(x);
  if (a >= 1e-3 && a < 1e6) return String(+x.toPrecision(digits));
  const exp = x.toExponential(digits - 1);
  return opts.exponentZeros === 'keep' ? exp : exp.replace(/\.?0+e/, 'e');
}
