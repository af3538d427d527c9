import type { CaseSI } from '../case/types.js';
import { evaluateDesign, type Candidate } from '../calc/journal/design.js';
import type { JournalResult } from '../calc/journal/index.js';
import type { Fluid } from '../calc/journal/operating-point.js';
import { journalCriteria } from '../data/journal-criteria.js';
import { oilGrade } from '../data/load.js';

/**
 * The chosen journal design at other speeds: minimum film thickness and film temperatures
 * against shaft speed at the governing load, each sample a full evaluation by the journal
 * kernel (design.ts evaluateDesign: load matching on the Reynolds tables and the thermal
 * balance), for the note's speed charts. Plain SI numbers: rev/s, m, °C.
 */

/** Samples: geometric from SPEED_RANGE.low to SPEED_RANGE.high times the operating speed. */
export const SPEED_RANGE = { low: 0.2, high: 3, samples: 21 } as const;

/** One speed and what the kernel found there. */
export interface JournalSpeedSample {
  /** Shaft speed, rev/s. */
  speed: number;
  /** Minimum film thickness h0, m. */
  minFilmThickness: number;
  /** Effective and maximum (outlet) film temperature, °C. */
  effectiveTemperature: number;
  maxTemperature: number;
  /** No equilibrium below the ceiling of the balance: the temperatures are lower bounds. */
  thermalRunaway: boolean;
}

export interface JournalSpeedCurves {
  /** Factors on the operating speed of the first and the last sample. */
  lowFactor: number;
  highFactor: number;
  /** The samples, increasing in speed; a speed the kernel cannot evaluate is left out, never invented. */
  samples: JournalSpeedSample[];
  /** Allowable maximum film temperature, °C, and its source (data/journal-criteria.json). */
  maxTemperatureLimit: number;
  maxTemperatureSource: string;
}

/** The lubricant of the chosen design, as the check reports it (its grade, or the case's fixed viscosity). */
function designFluid(c: CaseSI, grade: number | null): Fluid | null {
  const crit = journalCriteria();
  if (c.lubrication.viscosity !== undefined)
    return {
      kind: 'fixed',
      viscosity: c.lubrication.viscosity,
      density: crit.fixedDensity,
      specificHeat: crit.fixedSpecificHeat,
    };
  const row = grade === null ? undefined : oilGrade(grade);
  return row ? { kind: 'oil', oil: row } : null;
}

/**
 * Film and temperatures of result `j`'s design against speed, at its governing point's load
 * and the case's inlet temperature; null when the governing point has no film or the design
 * has no lubricant to evaluate (no rotation, no supply).
 */
export function journalSpeedCurves(c: CaseSI, j: JournalResult): JournalSpeedCurves | null {
  const gov = j.points[j.governingPoint];
  const fluid = designFluid(c, j.oilGrade);
  if (!gov || !gov.film || !fluid) return null;
  const crit = journalCriteria();
  const candidate: Candidate = { length: j.length, radialClearance: j.radialClearance, fluid, oil: j.oil };
  const low = SPEED_RANGE.low * gov.speed;
  const high = SPEED_RANGE.high * gov.speed;
  const n = SPEED_RANGE.samples;
  const samples = [...Array(n).keys()].flatMap((i): JournalSpeedSample[] => {
    const speed = low * (high / low) ** (i / (n - 1));
    try {
      const point = [{ share: 1, load: gov.load, speed }];
      const e = evaluateDesign(c.shaft.diameter, candidate, point, c.lubrication.inletTemperature, gov.load, crit);
      const r = e.governing.result;
      return [
        {
          speed,
          minFilmThickness: r.minFilmThickness,
          effectiveTemperature: r.effectiveTemperature,
          maxTemperature: r.maxTemperature,
          thermalRunaway: r.thermalRunaway,
        },
      ];
    } catch {
      return [];
    }
  });
  return {
    lowFactor: SPEED_RANGE.low,
    highFactor: SPEED_RANGE.high,
    samples,
    maxTemperatureLimit: crit.maxTemperature,
    maxTemperatureSource: crit.sources['maxTemperature'] ?? 'journal criteria',
  };
}
