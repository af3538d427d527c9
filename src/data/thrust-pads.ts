import { z } from 'zod';
import { loadTable } from './load.js';

/**
 * data/thrust-pads.json: how the journal bearing's thrust face is laid out in the case's space
 * (pad ring proportions, pad count, design taper, collar thickness), the unit-load limit of
 * the pads, and the bushing-material rows used for a rubbing thrust face. SI units as each key
 * names them (`_m`, `_Pa`, `_1` for a plain number); every entry carries its `source`.
 */
export interface ThrustPadRules {
  /** Pad ring bore over shaft diameter, 1. */
  innerToShaft: number;
  /** Largest outer over inner diameter of the pads, 1. */
  outerToInner: number;
  /** Share of the circle covered by pads, 1. */
  padCoverage: number;
  minPads: number;
  maxPads: number;
  /** K = h_in/h_min − 1 at the heaviest thrust, which sets the taper depth, 1. */
  designTaper: number;
  /** Collar thickness: collarToShaft·D, at least collarMin (m). */
  collarToShaft: number;
  collarMin: number;
  /** Unit load limit Fa/(N·A), Pa. */
  maxUnitLoad: number;
  /** Bushing-material ids of a rubbing thrust face: with some lubricant, and with none. */
  rubbingLubricated: string;
  rubbingDry: string;
  /** Source text per key (the names above). */
  sources: Record<string, string>;
}

const entry = z.object({ value: z.number().positive(), source: z.string().min(1) });
const face = z.object({ material: z.string().min(1), source: z.string().min(1) });
const schema = z.object({
  description: z.string(),
  layout: z.object({
    innerToShaft_1: entry,
    outerToInner_1: entry,
    padCoverage_1: entry,
    minPads_1: entry,
    maxPads_1: entry,
    designTaper_1: entry,
    collarToShaft_1: entry,
    collarMin_m: entry,
  }),
  limits: z.object({ maxUnitLoad_Pa: entry }),
  rubbingFace: z.object({ lubricated: face, dry: face }),
});
export const thrustPadsSchema = schema;

/** The rules of data/thrust-pads.json (validated and cached by loadTable, per data folder). */
export function thrustPadRules(): ThrustPadRules {
  const t = loadTable('thrust-pads.json', schema);
  const l = t.layout;
  return {
    innerToShaft: l.innerToShaft_1.value,
    outerToInner: l.outerToInner_1.value,
    padCoverage: l.padCoverage_1.value,
    minPads: l.minPads_1.value,
    maxPads: l.maxPads_1.value,
    designTaper: l.designTaper_1.value,
    collarToShaft: l.collarToShaft_1.value,
    collarMin: l.collarMin_m.value,
    maxUnitLoad: t.limits.maxUnitLoad_Pa.value,
    rubbingLubricated: t.rubbingFace.lubricated.material,
    rubbingDry: t.rubbingFace.dry.material,
    sources: {
      ...Object.fromEntries(Object.entries(l).map(([k, v]) => [k.replace(/_[^_]+$/, ''), v.source])),
      maxUnitLoad: t.limits.maxUnitLoad_Pa.source,
      rubbingLubricated: t.rubbingFace.lubricated.source,
      rubbingDry: t.rubbingFace.dry.source,
    },
  };
}
