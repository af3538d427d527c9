/**
 * Linear interpolation in a table of (x, y) rows sorted by x, as the standards allow
 * for their tabulated factors (ISO 281:2007 and ISO 76 permit linear interpolation
 * between rows). Outside the table nothing is extrapolated: the end value is returned
 * and `range` says which side was left, so the caller can warn or exclude.
 */
export interface Interpolated {
  value: number;
  range: 'below' | 'inside' | 'above';
}

export function interpolate(rows: ReadonlyArray<{ x: number; y: number }>, x: number): Interpolated {
  const first = rows[0];
  const last = rows[rows.length - 1];
  if (!first || !last) throw new Error('interpolate: empty table');
  if (x < first.x) return { value: first.y, range: 'below' };
  if (x > last.x) return { value: last.y, range: 'above' };
  for (let i = 1; i < rows.length; i++) {
    const a = rows[i - 1]!;
    const b = rows[i]!;
    if (x <= b.x) {
      const t = b.x === a.x ? 0 : (x - a.x) / (b.x - a.x);
      return { value: a.y + t * (b.y - a.y), range: 'inside' };
    }
  }
  return { value: last.y, range: 'inside' };
}

/** The value of interpolate(rows, x) without its range (the same arithmetic, no object built). */
export function interpolatedValue(rows: ReadonlyArray<{ x: number; y: number }>, x: number): number {
  const first = rows[0];
  const last = rows[rows.length - 1];
  if (!first || !last) throw new Error('interpolate: empty table');
  if (x < first.x) return first.y;
  if (x > last.x) return last.y;
  for (let i = 1; i < rows.length; i++) {
    const a = rows[i - 1]!;
    const b = rows[i]!;
    if (x <= b.x) {
      const t = b.x === a.x ? 0 : (x - a.x) / (b.x - a.x);
      return a.y + t * (b.y - a.y);
    }
  }
  return last.y;
}

/** The range of interpolate(rows, x) without its value. */
export function interpolatedRange(rows: ReadonlyArray<{ x: number; y: number }>, x: number): Interpolated['range'] {
  const first = rows[0];
  const last = rows[rows.length - 1];
  if (!first || !last) throw new Error('interpolate: empty table');
  return x < first.x ? 'below' : x > last.x ? 'above' : 'inside';
}
