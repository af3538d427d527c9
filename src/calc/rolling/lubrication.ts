import type { CaseSI } from '../../case/types.js';
import { lubricants, oilGrade } from '../../data/load.js';
import { kinematicViscosity } from '../lubricant.js';
import { finiteOr } from './conditions.js';
import { fmt, type Notes } from './findings.js';

/**
 * The lubricant a rolling bearing sees: the supply it runs on, its operating temperature and
 * the kinematic viscosity of the oil (or the grease's base oil) at that temperature.
 *
 * References
 * [1] Viscosity–temperature law of the ISO VG grades: src/calc/lubricant.ts (ASTM D341 /
 *     Walther), grades in data/lubricants.json.
 * [2] Operating temperature from ambient or inlet plus a fixed rise: common practice.
 */

/** The supply a bearing runs on ("none" is read as sealed-for-life grease). */
export type BearingSupply = 'grease' | 'oil-bath' | 'oil-feed';

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

/**
 * The supply, operating temperature T = T_base + ΔT and viscosity ν(T) of the case [1, 2]:
 * T_base the oil inlet temperature with oil feed (ΔT = 10 K), else the ambient (ΔT = 20 K),
 * °C; ν in m²/s. With no supply the bearing is read as sealed and greased for life.
 */
export function bearingLubrication(c: CaseSI, notes: Notes): Lubrication {
  const sealed = c.lubrication.supply === 'none';
  const supply: BearingSupply = c.lubrication.supply === 'none' ? 'grease' : c.lubrication.supply;
  if (sealed) {
    notes.assume({
      field: 'lubrication.supply',
      value: 'sealed-for-life grease',
      reason:
        'a rolling bearing needs at least grease; with no supply a sealed, greased-for-life bearing is the practical reading, and its grease life is checked against the life target (common practice)',
    });
  }
  const rise = supply === 'oil-feed' ? RISE_OVER_INLET : RISE_OVER_AMBIENT;
  const base = supply === 'oil-feed' ? c.lubrication.inletTemperature : c.environment.ambient;
  const temperature = finiteOr(base, FALLBACK_BASE_TEMPERATURE) + rise;
  notes.assume({
    field: 'rolling.temperature',
    value: `${fmt(temperature)} °C`,
    reason:
      supply === 'oil-feed'
        ? `operating temperature of the bearing taken as oil inlet + ${rise} K (common practice for circulating oil)`
        : `operating temperature of the bearing taken as ambient + ${rise} K (common practice for a grease- or bath-lubricated bearing in a housing)`,
  });
  return { sealed, supply, temperature, viscosity: caseViscosity(c, supply, temperature, notes) };
}

/**
 * Kinematic viscosity of the case's lubricant at tC (°C), m²/s: a fixed dynamic viscosity μ
 * (Pa·s) as ν = μ/ρ; else the named grade, the grease base oil (grease supply) or the default
 * grade of data/lubricants.json, by the grade's viscosity–temperature law [1]. A grade not in
 * the table falls back to the grease base oil's, and says so.
 */
function caseViscosity(c: CaseSI, supply: BearingSupply, tC: number, notes: Notes): number {
  const mu = c.lubrication.viscosity;
  if (mu !== undefined && mu > 0) {
    const nu = mu / OIL_DENSITY;
    notes.assume({
      field: 'lubrication.viscosity',
      value: `ν = ${fmt(nu * 1e6)} mm²/s`,
      reason: `the fixed dynamic viscosity ${mu} Pa·s is taken at the operating temperature and converted with a density of ${OIL_DENSITY} kg/m³ (typical mineral oil, from memory)`,
    });
    return nu;
  }
  const lub = lubricants();
  let grade = c.lubrication.oilGrade;
  if (grade !== undefined && supply === 'grease') {
    notes.assume({
      field: 'lubrication.oilGrade',
      value: `ISO VG ${grade}`,
      reason: 'with grease supply the named oil grade is taken as the grease base oil',
    });
  }
  if (grade === undefined) {
    grade = supply === 'grease' ? lub.greaseBaseOil.grade : lub.defaultGrade.grade;
    notes.assume({
      field: 'lubrication.oilGrade',
      value: `ISO VG ${grade}`,
      reason:
        supply === 'grease'
          ? `grease base oil (${lub.greaseBaseOil.source})`
          : `no oil grade given: ISO VG ${lub.defaultGrade.grade}, a common general-machinery grade (common practice)`,
    });
  }
  let oil = oilGrade(grade);
  if (!oil) {
    notes.warn(
      `ISO VG ${grade} is not in data/lubricants.json: the grease base oil grade ${lub.greaseBaseOil.grade} is used instead`,
    );
    oil = oilGrade(lub.greaseBaseOil.grade) ?? lub.grades[0]!;
  }
  return kinematicViscosity(oil, tC) * 1e-6;
}
