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
  /** Confidence per criterion key (same names as above): see CONFIDENCES. */
  confidence: Record<string, Confidence>;
}

/**
 * How far a criterion can be trusted: `standard` or `seen` (read in the source), `published`
 * (a named published work, recalled), `from-memory`, `common-practice`, `low` (a guess to be
 * confirmed). A limit of `low` confidence informs and never decides feasibility.
 */
export const CONFIDENCES = ['standard', 'seen', 'published', 'from-memory', 'common-practice', 'low'] as const;
export type Confidence = (typeof CONFIDENCES)[number];

/** True when a limit of this confidence may decide feasibility (anything but `low`). */
export function mayGate(confidence: Confidence | undefined): boolean {
  return confidence !== 'low';
}

const entry = z.object({ value: z.number().positive(), source: z.string().min(1) });
/** A criterion row: its value, its confidence and, where the published form is in other units, that form. */
const criterion = entry.extend({
  confidence: z.enum(CONFIDENCES),
  published: z.object({ value: z.number().positive(), unit: z.string().min(1) }).optional(),
});
const list = z.object({ values: z.array(z.number().positive()).min(1), source: z.string().min(1) });
const criteriaSchema = z.object({
  description: z.string(),
  criteria: z.object({
    minFilmBase_m: criterion,
    minFilmPerDiameter_1: criterion,
    maxTemperature_degC: criterion,
    maxStartUnitLoad_Pa: criterion,
    designLoadFactor_1: criterion,
    typicalUnitLoadMax_Pa: criterion,
    typicalUnitLoadMin_Pa: criterion,
    lightLoadEccentricity_1: criterion,
    frequentStartsPerHour_1: criterion,
    oilBathFlowCapacity_m3_s: criterion,
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
    confidence: {
      minFilmBase: rows.minFilmBase_m.confidence,
      maxTemperature: rows.maxTemperature_degC.confidence,
      maxStartUnitLoad: rows.maxStartUnitLoad_Pa.confidence,
      designLoadFactor: rows.designLoadFactor_1.confidence,
      typicalUnitLoadMax: rows.typicalUnitLoadMax_Pa.confidence,
      lightLoadEccentricity: rows.lightLoadEccentricity_1.confidence,
      frequentStartsPerHour: rows.frequentStartsPerHour_1.confidence,
      oilBathFlowCapacity: rows.oilBathFlowCapacity_m3_s.confidence,
    },
  };
}
