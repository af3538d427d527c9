import type { CaseSI } from './types.js';

/**
 * A case as a case file writes it in SI base units: `units: base` first, then the keys of the
 * case file with bare numbers in the internal units (m, N, rev/s, rad, Hz, Pa, Pa·s, m²/N,
 * temperatures in °C, life in hours). The one key that differs from CaseSI: the oil grade is
 * `lubrication.oil`, as a case file names it. Loading it back gives the same CaseSI.
 */
export type CaseFileInBase = { units: 'base' } & Omit<CaseSI, 'lubrication'> & {
    lubrication: Omit<CaseSI['lubrication'], 'oilGrade'> & { oil?: number };
  };

/** The case file, in SI base units, that loads back to `c` (what the JSON output prints as `case`). */
export function caseFileOf(c: CaseSI): CaseFileInBase {
  const { oilGrade, ...lubrication } = c.lubrication;
  return {
    units: 'base',
    ...c,
    lubrication: oilGrade === undefined ? lubrication : { ...lubrication, oil: oilGrade },
  };
}
