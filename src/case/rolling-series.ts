import { boundaryDimensions, needleDimensions, taperedDimensions } from '../data/rolling.js';

/**
 * The dimension series a case may name in `rolling.series`: every series of the three tables of
 * boundary dimensions (ISO 15 radial "02", "03" …, ISO 355 tapered "302" …, the needle roller
 * tables "49", "drawn cup" …), sorted as text.
 */
export function rollingSeries(): string[] {
  const rows = [...boundaryDimensions().rows, ...taperedDimensions().rows, ...needleDimensions().rows];
  return [...new Set(rows.map((r) => r.series))].sort();
}
