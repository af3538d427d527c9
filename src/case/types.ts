import type { Arrangement, KindForm, RollingKind } from '../core/rolling-kinds.js';
import type { BushingMaterial } from '../data/bushing.js';
/**
 * The duty case as understood, in SI base units. This is what the calculation
 * kernels receive; the case-file loader (src/case/load.ts) produces it from
 * YAML/JSON with units. Units: lengths m, forces N, shaft speed rev/s,
 * angles rad, frequency Hz (full cycles per second), viscosity Pa·s,
 * temperatures °C, pressures Pa, wear factor m³/(N·m) = m²/N.
 * Life targets keep the unit their key names (hours).
 */
export type Shock = 'none' | 'light' | 'moderate' | 'heavy';
export type Supply = 'none' | 'grease' | 'oil-bath' | 'oil-feed';
export type Contamination = 'clean' | 'normal' | 'dirty' | 'severe';
/** What the bearing runs in: air (dry), water, a slurry of water and solids, or a chemical. */
export type Medium = 'dry' | 'water' | 'slurry' | 'chemical';
export type Priority = 'cost' | 'friction' | 'maintenance' | 'noise' | 'precision';

/** A bushing material class, SI (defined with its schema in src/data/bushing.ts). */
export type { BushingMaterial };

export interface OperatingPointSI {
  /** Share of running time, 0..1; shares add to 1. */
  share: number;
  /** Radial load, N. */
  radial: number;
  /** Axial load, N. */
  axial: number;
  /** Shaft speed, rev/s (absent for an oscillating shaft: the shaft's oscillation applies). */
  speed?: number;
}

export interface CaseSI {
  title: string;
  shaft: {
    /** Shaft (journal) diameter, m. */
    diameter: number;
    /** Rotational speed, rev/s. Exactly one of speed and oscillation is present. */
    speed?: number;
    /** Oscillation: total swing angle (rad) and full cycles per second (Hz). */
    oscillation?: { angle: number; frequency: number };
    /** Slope of the shaft relative to the bearing seat, rad (absent: aligned). */
    misalignment?: number;
  };
  load: {
    radial: number;
    axial: number;
    shock: Shock;
    /** Radial load at start and stop, N (shaft at rest); absent: the largest running load. */
    atStart?: number;
  };
  /** Operating points replacing shaft speed and load, when given. */
  duty?: OperatingPointSI[];
  life: {
    /** Life target, hours. */
    hours: number;
    /** Radial wear a bushing may lose, m. */
    wearAllowance: number;
    /** Required reliability for rolling-bearing life, percent (90 unless given). */
    reliability: number;
  };
  space: {
    /** Axial room for the support, m. */
    maxLength: number;
    /** Radial room: housing bore available, m. */
    maxOuterDiameter: number;
  };
  lubrication: {
    supply: Supply;
    /** ISO VG grade number (e.g. 68) when an oil grade is named. */
    oilGrade?: number;
    /** Fixed dynamic viscosity, Pa·s (then no thermal iteration). */
    viscosity?: number;
    /** Oil inlet temperature, °C. */
    inletTemperature: number;
    /** Longest regreasing interval of the maintenance plan, hours; absent: none given (the needed one is reported). */
    regreaseInterval?: number;
  };
  environment: {
    /** Ambient temperature, °C. */
    ambient: number;
    contamination: Contamination;
    startsPerHour: number;
    /** The service medium; absent means not given (the bushing check takes dry and says so). */
    medium?: Medium;
  };
  /** Priorities 1..5 (3 = neutral). */
  priorities: Record<Priority, number>;
  bushing?: { length?: number; material?: string | BushingMaterial };
  rolling?: {
    type?: 'ball' | 'roller';
    /** Kind in the trade's name; restricts the candidates to it (and names the supplier bearing's kind). */
    kind?: RollingKind;
    /** Construction within the kind (rib form of a cylindrical roller bearing, needle roller construction). */
    form?: KindForm;
    /** Nominal contact angle, rad. */
    contactAngle?: number;
    arrangement?: Arrangement;
    /** Dimension series of the tables ("02", "302", "49"); restricts the candidates to it. */
    series?: string;
    /** Supplier bearing bore, m (must be the shaft diameter). */
    bore?: number;
    /** Supplier basic dynamic load rating C, N. */
    dynamicRating?: number;
    /** Supplier basic static load rating C0, N. */
    staticRating?: number;
    /** Supplier fatigue load limit Cu, N. */
    fatigueLimit?: number;
    /** Supplier bearing outside diameter and width, m (optional). */
    outerDiameter?: number;
    width?: number;
  };
  journal?: { length?: number; radialClearance?: number; clearanceRatio?: number };
}

/** An assumption or default applied while reading the case, shown in every output. */
export interface Assumption {
  field: string;
  value: string;
  reason: string;
}
