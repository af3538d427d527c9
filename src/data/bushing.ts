import { DataError } from '../core/errors.js';
import { z } from 'zod';
import { loadTable } from './load.js';
import type { BushingMaterial } from '../case/types.js';

/**
 * data/bushing-materials.json and data/bushing-factors.json. Rows are written in
 * the units named in each file's `units` header (MPa, m/s, MPa·m/s, mm³/(N·m), °C, mm)
 * and converted to SI here, so a reader of the file sees the figures as handbooks print them.
 */
const pos = z.number().positive();
const rowSchema = z.strictObject({
  id: z.string().regex(/^[a-z0-9-]+$/),
  name: z.string().min(1),
  maxPressure: pos,
  maxVelocity: pos,
  maxPV: pos,
  wearFactor: pos,
  wearFactorLow: pos,
  wearFactorHigh: pos,
  friction: pos.max(1),
  maxTemperature: z.number(),
  wallFraction: pos.max(0.5),
  minWall: pos,
  source: z.string().min(1),
});
const fileSchema = z.strictObject({
  description: z.string(),
  units: z.record(z.string(), z.string()),
  materials: z.array(rowSchema).min(1),
});

export interface BushingMaterialRow extends BushingMaterial {
  wearFactorLow: number;
  wearFactorHigh: number;
  /** Wall thickness as a fraction of bore, and its minimum, m (common practice). */
  wallFraction: number;
  minWall: number;
}

const converted = new WeakMap<object, BushingMaterialRow[]>();

export function bushingMaterials(): BushingMaterialRow[] {
  const t = loadTable('bushing-materials.json', fileSchema);
  const hit = converted.get(t);
  if (hit) return hit;
  const rows = t.materials.map((m) => {
    if (!(m.wearFactorLow <= m.wearFactor && m.wearFactor <= m.wearFactorHigh)) {
      throw new DataError(
        `data/bushing-materials.json: material ${m.id}: wearFactorLow ≤ wearFactor ≤ wearFactorHigh does not hold; expected them in that order`,
      );
    }
    return {
      ...m,
      maxPressure: m.maxPressure * 1e6,
      maxPV: m.maxPV * 1e6,
      wearFactor: m.wearFactor * 1e-9,
      wearFactorLow: m.wearFactorLow * 1e-9,
      wearFactorHigh: m.wearFactorHigh * 1e-9,
      minWall: m.minWall * 1e-3,
    };
  });
  converted.set(t, rows);
  return rows;
}

const factorRow = z.strictObject({ key: z.string(), value: pos, note: z.string(), source: z.string().min(1) });
const factorsSchema = z.strictObject({
  description: z.string(),
  motion: z.array(factorRow).min(1),
  environment: z.array(factorRow).min(1),
  heat: z.strictObject({
    dissipation: pos,
    areaFactor: pos,
    note: z.string(),
    source: z.string().min(1),
  }),
  lengthToDiameter: z.strictObject({ min: pos, max: pos, source: z.string() }),
});
export type BushingFactors = z.infer<typeof factorsSchema>;

export function bushingFactors(): BushingFactors {
  return loadTable('bushing-factors.json', factorsSchema);
}
