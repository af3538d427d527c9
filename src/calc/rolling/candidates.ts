import type { CaseSI } from '../../case/types.js';
import { assumedFinding, finding, type Finding } from '../../core/finding.js';
import { num } from '../../core/format.js';
import { boundaryDimensions, type BoundaryRow, type RollingFactors } from '../../data/rolling.js';
import { estimatedFatigueLimit } from './aiso.js';
import type { Notes } from './findings.js';
import { estimateBallGeometry, estimateRollerGeometry } from './geometry.js';
import type { RollingType } from './life.js';
import type { RollingCandidate } from './types.js';
import { ballDynamicRating, ballStaticRating, rollerDynamicRating, rollerStaticRating } from './ratings.js';

/**
 * Which bearings are considered: the case's own bearing when a supplier's C and C0 are given,
 * and every ISO 15 row whose bore is the shaft diameter and that fits the space, each with its
 * ratings (the supplier's, or estimated from internal geometry) and that geometry.
 *
 * References
 * [1] ISO 15, boundary dimensions (data/rolling-boundary-dimensions.json, from memory).
 * [2] ISO 281:2007 basic dynamic rating C and ISO 76 basic static rating C0 from internal
 *     geometry (src/calc/rolling/ratings.ts); the geometry estimated from d, D, B
 *     (src/calc/rolling/geometry.ts, common practice).
 * [3] ISO 281:2007 Annex B, fatigue load limit Cu (src/calc/rolling/aiso.ts, from memory).
 */

/** Kind of each bearing type, in the words of the trade. */
export const KIND = { ball: 'deep-groove ball', roller: 'cylindrical roller' } as const;

/** One bearing to evaluate: its identity and size as the result reports them (m), its ratings (N). */
export interface CandidateSpec extends Pick<
  RollingCandidate,
  'id' | 'type' | 'kind' | 'series' | 'designation' | 'bore' | 'outerDiameter' | 'width'
> {
  /** Basic dynamic rating C, static rating C0, fatigue load limit Cu, N. */
  C: number;
  C0: number;
  Cu: number;
  fatigueLimitEstimated: boolean;
  ratingSource: 'supplier' | 'estimated';
  /** Pitch diameter dm, rolling-element diameter Dw, m; element count Z. */
  dm: number;
  Dw: number;
  Z: number;
}

/** Bores equal within this, m: the table holds whole millimetres, a case is converted from its unit. */
const BORE_TOLERANCE = 1e-5;
/** Outside diameter of a supplier bearing given without one, as a multiple of the bore (so dm = 1.5·d; common practice). */
const UNKNOWN_OUTER_OVER_BORE = 2;
/** C0/C above this is unusual for a deep-groove ball bearing (common practice). */
const BALL_C0_OVER_C_MAX = 1.2;

/**
 * The candidates of a case [1–3]: the supplier's bearing first (when both its ratings are
 * given and positive), then the ISO 15 rows of the shaft's bore (of the case's type, if it
 * names one) that fit the axial room and the housing bore. What is left out, and why, is said.
 */
export function candidateSpecs(c: CaseSI, f: RollingFactors, notes: Notes): CandidateSpec[] {
  const d = c.shaft.diameter;
  const rows = boundaryDimensions().rows;
  const sameBore = rows.filter((r) => Math.abs(r.bore_mm / 1000 - d) <= BORE_TOLERANCE);
  if (!(d > 0) || !Number.isFinite(d)) {
    notes.warn(finding('rolling.diameter-not-positive', { diameter: d }));
  } else if (sameBore.length === 0) {
    notes.warn(finding('rolling.bore-not-standard', { diameter: d, nearest: nearestBores(rows, d * 1000) }));
  }
  const specs: CandidateSpec[] = [];
  const supplierC = c.rolling?.dynamicRating;
  const supplierC0 = c.rolling?.staticRating;
  if (supplierC !== undefined || supplierC0 !== undefined) {
    if (supplierC !== undefined && supplierC0 !== undefined && supplierC > 0 && supplierC0 > 0 && d > 0) {
      specs.push(supplierSpec(c, supplierC, supplierC0, sameBore, f, notes));
    } else {
      notes.warn(finding('rolling.supplier-ratings-incomplete'));
    }
  }
  specs.push(...rowsInSpace(c, sameBore, notes).map((r) => estimatedSpec(r, f)));
  if (specs.some((s) => s.ratingSource === 'estimated'))
    notes.assume(
      assumedFinding('rolling.ratings', 'rolling.estimated-ratings', { geometrySource: f.geometryEstimate.source }),
    );
  if (specs.some((s) => s.fatigueLimitEstimated))
    notes.assume(assumedFinding('rolling.fatigueLimit', 'rolling.estimated-fatigue-limit'));
  return specs;
}

/** The rows of the case's type that fit the space (outside diameter D, width B); the others are said. */
function rowsInSpace(c: CaseSI, sameBore: BoundaryRow[], notes: Notes): BoundaryRow[] {
  const wantType = c.rolling?.type;
  const fitting: BoundaryRow[] = [];
  const excluded: Finding[] = [];
  for (const r of sameBore) {
    if (wantType !== undefined && r.type !== wantType) continue;
    const outerDiameter = r.outerDiameter_mm / 1000;
    const width = r.width_mm / 1000;
    const tooWide = width > c.space.maxLength;
    const tooBig = outerDiameter > c.space.maxOuterDiameter;
    if (!tooWide && !tooBig) {
      fitting.push(r);
      continue;
    }
    excluded.push(
      finding('rolling.size-outside-space', {
        designation: r.designation,
        outerDiameter,
        width,
        tooBig,
        tooWide,
        maxOuterDiameter: c.space.maxOuterDiameter,
        maxLength: c.space.maxLength,
      }),
    );
  }
  if (excluded.length > 0) notes.warn(finding('rolling.space-excluded', { sizes: excluded }));
  return fitting;
}

/** An ISO 15 row with C, C0 and Cu estimated from its internal geometry [2, 3]. */
function estimatedSpec(r: BoundaryRow, f: RollingFactors): CandidateSpec {
  const d = r.bore_mm / 1000;
  const D = r.outerDiameter_mm / 1000;
  const B = r.width_mm / 1000;
  const base = {
    id: r.id,
    type: r.type,
    kind: r.kind,
    series: r.series,
    designation: r.designation,
    bore: d,
    outerDiameter: D,
    width: B,
    ratingSource: 'estimated' as const,
    fatigueLimitEstimated: true,
  };
  if (r.type === 'ball') {
    const g = estimateBallGeometry(d, D, f.geometryEstimate);
    const C = ballDynamicRating(g, f.ratingFactors.fcBall).value;
    const C0 = ballStaticRating(g, f.ratingFactors.f0Ball).value;
    return { ...base, C, C0, Cu: estimatedFatigueLimit('ball', C0, g.Dpw), dm: g.Dpw, Dw: g.Dw, Z: g.Z };
  }
  const g = estimateRollerGeometry(d, D, B, f.geometryEstimate);
  const C = rollerDynamicRating(g, f.ratingFactors.fcRoller).value;
  const C0 = rollerStaticRating(g).value;
  return { ...base, C, C0, Cu: estimatedFatigueLimit('roller', C0, g.Dpw), dm: g.Dpw, Dw: g.Dwe, Z: g.Z };
}

/**
 * The supplier's bearing: its C and C0 (N) as given, its type (ball unless given), its outside
 * diameter and width as given or from the ISO 15 row of its bore, its geometry estimated from
 * those [2] for the pitch diameter and the oscillation criterion, and its Cu as given or
 * estimated [3].
 */
function supplierSpec(
  c: CaseSI,
  C: number,
  C0: number,
  sameBore: BoundaryRow[],
  f: RollingFactors,
  notes: Notes,
): CandidateSpec {
  const d = c.shaft.diameter;
  const type: RollingType = c.rolling?.type ?? 'ball';
  if (c.rolling?.type === undefined) notes.assume(assumedFinding('rolling.type', 'rolling.supplier-type', { type }));
  const { D, B } = supplierDimensions(c, type, sameBore, notes);
  if (type === 'ball' && C0 > BALL_C0_OVER_C_MAX * C)
    notes.warn(finding('rolling.supplier-ratio-unusual', { ratio: C0 / C }));
  const g = supplierGeometry(type, d, D, B, f);
  const CuGiven = c.rolling?.fatigueLimit;
  const CuIsGiven = CuGiven !== undefined && CuGiven > 0;
  return {
    id: 'supplier',
    type,
    kind: KIND[type],
    series: 'supplier',
    designation: `supplier ${KIND[type]} bearing, bore ${num(d * 1000, 4, { exponentZeros: 'keep' })}`,
    bore: d,
    outerDiameter: D,
    width: B,
    C,
    C0,
    Cu: CuIsGiven ? CuGiven : estimatedFatigueLimit(type, C0, g.dm),
    fatigueLimitEstimated: !CuIsGiven,
    ratingSource: 'supplier',
    ...g,
  };
}

/** Outside diameter D and width B of the supplier's bearing, m: as given, else from the smallest ISO 15 row of its bore and type. */
function supplierDimensions(
  c: CaseSI,
  type: RollingType,
  sameBore: BoundaryRow[],
  notes: Notes,
): { D: number | null; B: number | null } {
  const row = sameBore.filter((r) => r.type === type).sort((a, b) => a.outerDiameter_mm - b.outerDiameter_mm)[0];
  let D: number | null = c.rolling?.outerDiameter ?? null;
  let B: number | null = c.rolling?.width ?? null;
  if ((D === null || B === null) && row) {
    if (D === null) D = row.outerDiameter_mm / 1000;
    if (B === null) B = row.width_mm / 1000;
    notes.assume(
      assumedFinding('rolling.outerDiameter/width', 'rolling.supplier-dimensions', {
        outerDiameter: D,
        width: B,
        row: row.designation,
      }),
    );
  }
  if (D === null)
    notes.warn(finding('rolling.supplier-no-outer-diameter', { pitchOverBore: (1 + UNKNOWN_OUTER_OVER_BORE) / 2 }));
  if (B === null) notes.warn(finding('rolling.supplier-no-width'));
  return { D, B };
}

/**
 * Internal geometry of the supplier's bearing [2]: from d and D (m), with D = 2·d when it is
 * unknown (so dm = 1.5·d) and, for a roller, B = (D − d)/2 when the width is unknown.
 */
function supplierGeometry(
  type: RollingType,
  d: number,
  D: number | null,
  B: number | null,
  f: RollingFactors,
): { dm: number; Dw: number; Z: number } {
  const Dgeom = D ?? UNKNOWN_OUTER_OVER_BORE * d;
  if (type === 'ball') {
    const b = estimateBallGeometry(d, Dgeom, f.geometryEstimate);
    return { dm: b.Dpw, Dw: b.Dw, Z: b.Z };
  }
  const r = estimateRollerGeometry(d, Dgeom, B ?? (Dgeom - d) / 2, f.geometryEstimate);
  return { dm: r.Dpw, Dw: r.Dwe, Z: r.Z };
}

/** The table's bores next below and next above dMm (mm), those that exist, m. */
function nearestBores(rows: BoundaryRow[], dMm: number): number[] {
  const bores = [...new Set(rows.map((r) => r.bore_mm))].sort((a, b) => a - b);
  const below = bores.filter((b) => b < dMm).pop();
  const above = bores.find((b) => b > dMm);
  return [below, above].filter((b): b is number => b !== undefined).map((b) => b / 1000);
}
