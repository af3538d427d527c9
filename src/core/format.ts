/**
 * The one number formatter: four significant figures, no trailing zeros, exponent form outside
 * 1e-3 ≤ |x| < 1e6. Calculation sheets, findings and reports all write plain numbers with it;
 * units are added by the reader (src/report/units.ts).
 */
export function num(x: number, digits = 4): string {
  if (x === 0 || !Number.isFinite(x)) return String(x);
  const a = Math.abs(x);
  if (a >= 1e-3 && a < 1e6) return String(+x.toPrecision(digits));
  return x.toExponential(digits - 1).replace(/\.?0+e/, 'e');
}
