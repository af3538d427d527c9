/**
 * Lubricant viscosity against temperature.
 *
 * Walther's equation as standardised in ASTM D341 (from memory):
 *   log10(log10(ν + 0.7)) = A − B·log10(T)
 * ν kinematic viscosity, mm²/s; T absolute temperature, K. Two reference points
 * (ν40 at 40 °C and ν100 at 100 °C) fix A and B. Valid for mineral oils above their
 * cloud point and for ν ≥ about 2 mm²/s (the 0.7 offset form); extrapolation beyond
 * the two points is the usual engineering practice but loses accuracy.
 *
 * Dynamic viscosity μ = ν·ρ(T), with ρ(T) = ρ15·(1 − α·(T − 15 °C)); ρ15 density at 15 °C,
 * kg/m³, and α the volumetric coefficient, 1/K, both from data/lubricants.json (α there is
 * 0.00065 /K, from memory: mineral oil density falls about 0.065 %/K).
 */

import type { OilGrade } from '../data/load.js';

/** The oil grade row (defined with its schema in src/data/load.ts), for the kernels that take one. */
export type { OilGrade };

export interface WaltherConstants {
  A: number;
  B: number;
}

const KELVIN = 273.15;
const loglog = (nu: number): number => Math.log10(Math.log10(nu + 0.7));

/** A and B of the Walther line through (T1, ν1) and (T2, ν2); T in °C, ν in mm²/s. */
export function waltherConstants(t1C: number, nu1: number, t2C: number, nu2: number): WaltherConstants {
  const x1 = Math.log10(t1C + KELVIN);
  const x2 = Math.log10(t2C + KELVIN);
  const B = (loglog(nu1) - loglog(nu2)) / (x2 - x1);
  const A = loglog(nu1) + B * x1;
  return { A, B };
}

/** Kinematic viscosity, mm²/s, at temperature tC (°C) on the Walther line. */
export function waltherViscosity(k: WaltherConstants, tC: number): number {
  const z = k.A - k.B * Math.log10(tC + KELVIN);
  return Math.pow(10, Math.pow(10, z)) - 0.7;
}

/** Kinematic viscosity of an oil grade at tC (°C), mm²/s. */
export function kinematicViscosity(oil: Pick<OilGrade, 'nu40' | 'nu100'>, tC: number): number {
  return waltherViscosity(waltherConstants(40, oil.nu40, 100, oil.nu100), tC);
}

/** Density at tC (°C), kg/m³: ρ15·(1 − α·(T − 15)), α the grade's densityCoefficient, 1/K. */
export function density(oil: OilGrade, tC: number): number {
  return oil.density15 * (1 - oil.densityCoefficient * (tC - 15));
}

/** Dynamic viscosity at tC (°C), Pa·s: μ = ν·ρ with ν converted from mm²/s to m²/s. */
export function dynamicViscosity(oil: OilGrade, tC: number): number {
  return kinematicViscosity(oil, tC) * 1e-6 * density(oil, tC);
}
