import { UsageError } from '../core/errors.js';
import type { CaseSI } from '../case/types.js';
import { adviseShaft, type ShaftAdvice, type ShaftCaseInput } from '../advise/shaft.js';
import { loadRules } from '../advise/load-rules.js';
import { computeMap, type MapOptions, type MapResult } from './map.js';
import { referencePoint, scaleCase } from './scale.js';

/**
 * Selection map of a whole shaft: one map per support, load scale × speed.
 *
 * The shaft's statics and its beam are linear in the loads, so scaling every load on the
 * shaft by k scales each support's reactions (radial and axial) and the slope at each support
 * by k. A support's map is therefore computeMap on that support's own single-support case
 * (as adviseShaft built and advised it) with its loads scaled by k, its slope
 * (shaft.misalignment) scaled by k as well (scaleSupportCase), and the shaft speed swept. The
 * load axis is shown as k (MapResult.loadScale), the support's largest radial load at k = 1
 * beside it.
 *
 * Approximations, stated in the map's notes: the slope is held at the case schema's ceiling
 * (5°) beyond it; a cross-located pair shares the thrust as the pair chosen at k = 1 does
 * (the opposed-pair rule is homogeneous in the loads for a given pair, a different pair
 * elsewhere on the map would share it differently).
 */

/** Default load scale range, ×. */
export const DEFAULT_LOAD_SCALE: [number, number] = [0.25, 4];
/** The ceiling of shaft.misalignment in a case file, rad (5°). */
export const MAX_SLOPE = Math.PI / 36;

export interface ShaftMapOptions extends Omit<MapOptions, 'load' | 'scale' | 'onProgress'> {
  /** Range of the load scale k, × (default 0.25 to 4). */
  loadScale?: [number, number];
  /** Called after each row of cells of either map: cells done, cells in all (both maps). */
  onProgress?: (done: number, total: number) => void;
}

export interface ShaftSupportMap {
  name: string;
  /** Position along the shaft, m. */
  at: number;
  /** The support's largest radial load at k = 1, N. */
  radial: number;
  /** The slope at the support at k = 1, rad. */
  slope: number;
  /** The whole-shaft advice's recommendation for the support. */
  recommendation: string | null;
  map: MapResult;
}

export interface ShaftMapResult {
  title: string;
  loadScale: [number, number];
  loadScaleGiven: boolean;
  supports: ShaftSupportMap[];
}

/**
 * A support's case at load scale k and speed factor s: scaleCase (every radial and axial
 * load × k, every speed × s) with the slope shaft.misalignment × k, held at MAX_SLOPE.
 */
export function scaleSupportCase(c: CaseSI, k: number, s: number): CaseSI {
  const out = scaleCase(c, k, s);
  if (c.shaft.misalignment !== undefined) out.shaft.misalignment = Math.min(MAX_SLOPE, c.shaft.misalignment * k);
  return out;
}

/** Parse --scale "MIN..MAX": two plain positive numbers, MIN < MAX (a factor on every load). */
export function parseLoadScale(text: string): [number, number] {
  const expected = 'expected MIN..MAX, two plain numbers with 0 < MIN < MAX, e.g. "0.25..4"';
  const parts = text.split('..');
  const ends = parts.map((p) => (/^\s*\d*\.?\d+(e[+-]?\d+)?\s*$/i.test(p) ? Number(p) : NaN));
  if (ends.length !== 2 || !(ends[0]! > 0) || !(ends[1]! > ends[0]!))
    throw new UsageError(`--scale: got "${text}"; ${expected}`);
  return ends as [number, number];
}

const fmtN = (x: number) => (x >= 1000 ? `${+(x / 1000).toPrecision(3)} kN` : `${+x.toPrecision(3)} N`);
const fmtDeg = (rad: number) => `${+((rad * 180) / Math.PI).toPrecision(3)}°`;

/** The notes a support's map adds to computeMap's (its first, the axes, replaced). */
function shaftNotes(c: CaseSI, name: string, radial: number, range: [number, number], cross: boolean): string[] {
  const slope = c.shaft.misalignment ?? 0;
  const notes = [
    `Axes: load scale k of every load on the shaft (support "${name}": largest radial load ${fmtN(radial)} at k = 1) and speed of the shaft; log scales.`,
    `Whole shaft: the statics and the beam are linear in the loads, so every load on the shaft × k gives this support's radial reaction, axial load and slope (${fmtDeg(slope)} at k = 1, as shaft.misalignment) × k; the cell is this support's own case so scaled.`,
  ];
  if (slope > 0 && slope * range[1] > MAX_SLOPE)
    notes.push(
      `The slope reaches 5° (the ceiling of shaft.misalignment) at k = ${+(MAX_SLOPE / slope).toPrecision(3)}; beyond it the cell takes 5°.`,
    );
  if (cross)
    notes.push(
      'Cross-located pair: the axial loads are those of the pair chosen at k = 1 (induced forces and thrust both scale with k); where another pair would win, it would share the thrust differently.',
    );
  return notes;
}

/**
 * One map per support of a whole shaft (see the module comment). `advice` is adviseShaft's
 * result for `input` when the caller has it (else it is computed).
 */
export async function computeShaftMap(
  input: ShaftCaseInput,
  opts: ShaftMapOptions,
  advice?: ShaftAdvice,
): Promise<ShaftMapResult> {
  const rules = opts.rules ?? loadRules();
  const sa = advice ?? (await adviseShaft(input, rules));
  const range = opts.loadScale ?? DEFAULT_LOAD_SCALE;
  const cross = input.shaft.supports.every((s) => s.locates === 'one-direction');
  const perMap = opts.grid * opts.grid;
  const supports: ShaftSupportMap[] = [];
  for (const [index, s] of sa.supports.entries()) {
    const c = s.loaded.case;
    const ref = referencePoint(c);
    const mapOpts: MapOptions = {
      ...opts,
      rules,
      load: [range[0] * ref.load, range[1] * ref.load],
      scale: scaleSupportCase,
      onProgress: opts.onProgress && ((done) => opts.onProgress!(index * perMap + done, 2 * perMap)),
    };
    const m = await computeMap(c, s.loaded.assumed, mapOpts);
    const notes = [...shaftNotes(c, s.name, ref.load, range, cross), ...m.notes.slice(1)];
    supports.push({
      name: s.name,
      at: s.at,
      radial: ref.load,
      slope: c.shaft.misalignment ?? 0,
      recommendation: s.advice.recommendation,
      map: { ...m, notes, loadScale: { reference: ref.load } },
    });
  }
  const title = typeof input.common['title'] === 'string' ? input.common['title'] : 'Shaft';
  return { title, loadScale: range, loadScaleGiven: opts.loadScale !== undefined, supports };
}
