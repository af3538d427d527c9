import { z } from 'zod';
import { loadTable } from './load.js';

/**
 * data/journal-criteria.json: the design criteria of the hydrodynamic journal bearing check
 * (allowable film, temperature and start-up unit load, the advisory thresholds), the design
 * space of the sweep (L/D and c/r values) and the fluid properties used with a fixed
 * viscosity. Written in SI units as each key names them (`_m`, `_Pa`, `_degC`, `_1` for a
 * plain number); every entry carries its `source`.
 */
export interface JournalCriteria {
  /** h_base of h_allow = h_base + k_D·D, m. */
  minFilmBase: number;
  /** k_D of h_allow = h_base + k_D·D, 1. */
  minFilmPerDiameter: number;
  /** Allowable maximum film temperature, °C. */
  maxTemperature: number;
  /** Allowable start-up unit load W/(L·D), Pa. */
  maxStartUnitLoad: number;
  /** Factor on the running load of the advisory design-load film check, 1. */
  designLoadFactor: number;
  /** Typical range of the mean unit load, Pa. */
  typicalUnitLoadMax: number;
  typicalUnitLoadMin: number;
  /** Eccentricity ratio below which the bearing is lightly loaded (whirl-prone), 1. */
  lightLoadEccentricity: number;
  /** Starts per hour above which start-up wear governs. */
  frequentStartsPerHour: number;
  /** Flow an oil ring or bath can deliver, m³/s. */
  oilBathFlowCapacity: number;
  /** L/D values of the design sweep. */
  lengthToDiameter: number[];
  /** c/r values of the design sweep. */
  clearanceRatio: number[];
  /** Density, kg/m³, and specific heat, J/(kg·K), of a fluid given by a fixed viscosity. */
  fixedDensity: number;
  fixedSpecificHeat: number;
  /** Source text per criterion key (same names as above). */
  sources: Record<string, string>;
}

const entry = z.object({ value: z.number().positive(), source: z.string().min(1) });
const list = z.object({ values: z.array(z.number().positive()).min(1), source: z.string().min(1) });
const criteriaSchema = z.object({
  description: z.string(),
  criteria: z.object({
    minFilmBase_m: entry,
    minFilmPerDiameter_1: entry,
    maxTemperature_degC: entry,
    maxStartUnitLoad_Pa: entry,
    designLoadFactor_1: entry,
    typicalUnitLoadMax_Pa: entry,
    typicalUnitLoadMin_Pa: entry,
    lightLoadEccentricity_1: entry,
    frequentStartsPerHour_1: entry,
    oilBathFlowCapacity_m3_s: entry,
  }),
  designSpace: z.object({ lengthToDiameter_1: list, clearanceRatio_1: list }),
  fixedViscosityFluid: z.object({ density_kg_m3: entry, specificHeat_J_kgK: entry }),
});

/** The journal criteria of data/journal-criteria.json (validated and cached by loadTable, per data folder). */
export function journalCriteria(): JournalCriteria {
  const table = loadTable('journal-criteria.json', criteriaSchema);
  const rows = table.criteria;
  const space = table.designSpace;
  return {
    minFilmBase: rows.minFilmBase_m.value,
    minFilmPerDiameter: rows.minFilmPerDiameter_1.value,
    maxTemperature: rows.maxTemperature_degC.value,
    maxStartUnitLoad: rows.maxStartUnitLoad_Pa.value,
    designLoadFactor: rows.designLoadFactor_1.value,
    typicalUnitLoadMax: rows.typicalUnitLoadMax_Pa.value,
    typicalUnitLoadMin: rows.typicalUnitLoadMin_Pa.value,
    lightLoadEccentricity: rows.lightLoadEccentricity_1.value,
    frequentStartsPerHour: rows.frequentStartsPerHour_1.value,
    oilBathFlowCapacity: rows.oilBathFlowCapacity_m3_s.value,
    lengthToDiameter: space.lengthToDiameter_1.values,
    clearanceRatio: space.clearanceRatio_1.values,
    fixedDensity: table.fixedViscosityFluid.density_kg_m3.value,
    fixedSpecificHeat: table.fixedViscosityFluid.specificHeat_J_kgK.value,
    sources: {
      minFilmBase: rows.minFilmBase_m.source,
      maxTemperature: rows.maxTemperature_degC.source,
      maxStartUnitLoad: rows.maxStartUnitLoad_Pa.source,
      designLoadFactor: rows.designLoadFactor_1.source,
      typicalUnitLoadMax: rows.typicalUnitLoadMax_Pa.source,
      lightLoadEccentricity: rows.lightLoadEccentricity_1.source,
      frequentStartsPerHour: rows.frequentStartsPerHour_1.source,
      oilBathFlowCapacity: rows.oilBathFlowCapacity_m3_s.source,
      lengthToDiameter: space.lengthToDiameter_1.source,
      clearanceRatio: space.clearanceRatio_1.source,
      fixedViscosityFluid: table.fixedViscosityFluid.density_kg_m3.source,
    },
  };
}
