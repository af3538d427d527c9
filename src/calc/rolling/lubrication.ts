import type { CaseSI } from '../../case/types.js';
import { assumedFinding, finding } from '../../core/finding.js';
import { lubricants, oilGrade } from '../../data/load.js';
import { kinematicViscosity } from '../lubricant.js';
import { sumpModel } from '../sump.js';
import { finiteOr } from './conditions.js';
import { newNotes, type Notes } from './findings.js';
import type { BearingSupply } from './kinds.js';

/**
 * The lubricant a rolling bearing sees: the supply it runs on, its operating temperature and
 * the kinematic viscosity of the oil (or the grease's base oil) at that temperature.
 *
 * References
 * [1] Viscosity–temperature law of the ISO VG grades: src/calc/lubricant.ts (ASTM D341 /
 *     Walther), grades in data/lubricants.json.
 * [2] Operating temperature from ambient or inlet plus a fixed rise: common practice.
 * [3] Oil bath: the bath temperature of the one sump heat balance (src/calc/sump.ts) for the
 *     bearing's own friction loss, plus a small rise of the bearing over the bath (common
 *     practice; data/lubricants.json → sump.bearingRise).
 */

export type { BearingSupply } from './kinds.js';

export interface Lubrication {
  /** No supply in the case: a sealed bearing greased for life. */
  sealed: boolean;
  supply: BearingSupply;
  /** Operating temperature of the bearing, °C. */
  temperature: number;
  /** Kinematic viscosity of the (base) oil at that temperature, m²/s. */
  viscosity: number;
}

/** Temperature rise of the bearing over the oil inlet with circulating oil, K (common practice). */
const RISE_OVER_INLET = 10;
/** Temperature rise over ambient of a grease- or bath-lubricated bearing in a housing, K (common practice). */
const RISE_OVER_AMBIENT = 20;
/** Base temperature when the case's ambient or inlet temperature is not a number, °C. */
const FALLBACK_BASE_TEMPERATURE = 20;
/** Density converting a fixed dynamic viscosity to kinematic, kg/m³: typical mineral oil (from memory; data/lubricants.json spans 865–900). */
const OIL_DENSITY = 870;

/** Where the oil grade and the bath temperature of a rolling check come from, besides the case. */
export interface OilSystem {
  /** The grade of the case's one oil system when the journal's sweep chose it (the case names none). */
  sharedGrade?: { grade: number; from: 'journal' };
  /** Oil bath: the bath temperature of the sump balance, °C (the values are for a finding). */
  bath?: { temperature: number; values: Record<string, number | string | boolean> };
  /** Each bearing is evaluated at its own bath temperature (bath.ts), which states it: no fixed estimate. */
  bathPerBearing?: boolean;
}

/**
 * The supply, operating temperature T = T_base + ΔT and viscosity ν(T) of the case [1, 2, 3]:
 * T_base the oil inlet temperature with oil feed (ΔT = 10 K), the bath temperature of the sump
 * balance with an oil bath when `system.bath` gives it (ΔT = sump.bearingRise), else the
 * ambient (ΔT = 20 K), °C; ν in m²/s. With no supply the bearing is read as sealed and greased
 * for life. `system.sharedGrade` is the grade of the case's one oil system (no oil named).
 */
export function bearingLubrication(c: CaseSI, notes: Notes, system: OilSystem = {}): Lubrication {
  const sealed = c.lubrication.supply === 'none';
  const supply: BearingSupply = c.lubrication.supply === 'none' ? 'grease' : c.lubrication.supply;
  if (sealed) notes.assume(assumedFinding('lubrication.supply', 'rolling.sealed-for-life'));
  const bath = supply === 'oil-bath' ? system.bath : undefined;
  let temperature: number;
  if (bath) {
    // The bath of the sump balance (bath.ts states it for the bearing shown, once).
    temperature = bath.temperature + sumpModel().bearingRise;
  } else {
    const rise = supply === 'oil-feed' ? RISE_OVER_INLET : RISE_OVER_AMBIENT;
    const base = supply === 'oil-feed' ? c.lubrication.inletTemperature : c.environment.ambient;
    temperature = finiteOr(base, FALLBACK_BASE_TEMPERATURE) + rise;
    if (!system.bathPerBearing)
      notes.assume(
        assumedFinding('rolling.temperature', 'rolling.operating-temperature', {
          temperature,
          rise,
          over: supply === 'oil-feed' ? 'inlet' : 'ambient',
        }),
      );
  }
  const shared = supply !== 'grease' && c.lubrication.oilGrade === undefined ? system.sharedGrade : undefined;
  const cs: CaseSI = shared ? { ...c, lubrication: { ...c.lubrication, oilGrade: shared.grade } } : c;
  if (shared) notes.assume(assumedFinding('lubrication.oilGrade', 'rolling.same-oil', { grade: shared.grade }));
  return { sealed, supply, temperature, viscosity: caseViscosity(cs, supply, temperature, notes) };
}

/**
 * Kinematic viscosity of the case's lubricant at tC (°C), m²/s: a fixed dynamic viscosity μ
 * (Pa·s) as ν = μ/ρ; else the named grade, the grease base oil (grease supply) or the default
 * grade of data/lubricants.json, by the grade's viscosity–temperature law [1]. A grade not in
 * the table falls back to the grease base oil's, and says so.
 */
function caseViscosity(c: CaseSI, supply: BearingSupply, tC: number, notes: Notes): number {
  return viscosityAt(caseOil(c, supply, notes), tC);
}

/** A fixed kinematic viscosity (m²/s), or the grade whose law gives it at each temperature. */
type CaseOil = number | { nu40: number; nu100: number };

/** The kinematic viscosity of a case's oil at tC (°C), m²/s. */
function viscosityAt(oil: CaseOil, tC: number): number {
  return typeof oil === 'number' ? oil : kinematicViscosity(oil, tC) * 1e-6;
}

/** The case's lubricant as caseViscosity reads it, with what it assumes and cautions. */
function caseOil(c: CaseSI, supply: BearingSupply, notes: Notes): CaseOil {
  const mu = c.lubrication.viscosity;
  if (mu !== undefined && mu > 0) {
    const nu = mu / OIL_DENSITY;
    notes.assume(
      assumedFinding('lubrication.viscosity', 'rolling.fixed-viscosity', {
        dynamicViscosity: mu,
        kinematicViscosity: nu,
        density: OIL_DENSITY,
      }),
    );
    return nu;
  }
  const lub = lubricants();
  let grade = c.lubrication.oilGrade;
  if (grade !== undefined && supply === 'grease')
    notes.assume(assumedFinding('lubrication.oilGrade', 'rolling.grade-as-base-oil', { grade }));
  if (grade === undefined && supply === 'grease') {
    grade = lub.greaseBaseOil.grade;
    notes.assume(
      assumedFinding('lubrication.oilGrade', 'rolling.grease-base-oil', { grade, source: lub.greaseBaseOil.source }),
    );
  } else if (grade === undefined) {
    grade = lub.defaultGrade.grade;
    notes.assume(assumedFinding('lubrication.oilGrade', 'rolling.default-grade', { grade }));
  }
  let oil: { nu40: number; nu100: number } | undefined = oilGrade(grade);
  if (!oil) {
    notes.warn(finding('rolling.grade-not-in-table', { grade, fallback: lub.greaseBaseOil.grade }));
    oil = oilGrade(lub.greaseBaseOil.grade) ?? lub.grades[0]!;
  }
  return oil;
}

/**
 * The lubrication of a bearing in an oil bath at any bath temperature T (°C): what
 * bearingLubrication(c, notes, { ...system, bath: { temperature: T, values: {} } }) gives, its
 * notes left out, with the oil and the bearing's rise over the bath read once (the bath's
 * search tries several temperatures for every candidate).
 */
export function bathLubrication(c: CaseSI, system: OilSystem): (bathTemperature: number) => Lubrication {
  if (c.lubrication.supply !== 'oil-bath')
    return (t) => bearingLubrication(c, newNotes(), { ...system, bath: { temperature: t, values: {} } });
  const rise = sumpModel().bearingRise;
  const shared = c.lubrication.oilGrade === undefined ? system.sharedGrade : undefined;
  const cs: CaseSI = shared ? { ...c, lubrication: { ...c.lubrication, oilGrade: shared.grade } } : c;
  const oil = caseOil(cs, 'oil-bath', newNotes());
  return (t) => {
    const temperature = t + rise;
    return { sealed: false, supply: 'oil-bath', temperature, viscosity: viscosityAt(oil, temperature) };
  };
}

/**
 * One oil per case: when the case supplies oil (bath or feed) but names no oil and no viscosity,
 * the journal's design sweep picks the grade, and a rolling bearing on the same oil system runs
 * on that grade too. Returns the option for checkRolling: the journal's grade (asked for only
 * in that case, so the journal runs first exactly when its grade is needed), else nothing.
 */
export function journalOil(
  c: CaseSI,
  journalGrade: () => number | null,
): { sharedGrade?: { grade: number; from: 'journal' } } {
  const lub = c.lubrication;
  if (lub.oilGrade !== undefined || lub.viscosity !== undefined) return {};
  if (lub.supply !== 'oil-bath' && lub.supply !== 'oil-feed') return {};
  const grade = journalGrade();
  return grade === null ? {} : { sharedGrade: { grade, from: 'journal' } };
}
