import type { CaseSI } from '../../case/types.js';
import { assumedFinding, finding, type Finding } from '../../core/finding.js';
import { num } from '../../core/format.js';
import { estimatedFatigueLimit } from './aiso.js';
import { catalogue, entriesForShaft, standardBores, type CatalogueEntry } from './catalogue.js';
import type { Notes } from './findings.js';
import { kindType, type Arrangement, type KindForm, type RollingKind } from './kinds.js';
import type { RollingType } from './life.js';
import { estimateRatings, usualContactAngle } from './ratings.js';
import type { RollingCandidate } from './types.js';

/**
 * Which bearings are considered: the case's own bearing when a supplier's C and C0 are given,
 * and every bearing of the tables whose bore is the shaft diameter and that fits the space —
 * every kind in every series practice builds (src/calc/rolling/catalogue.ts) — each with its
 * ratings (the supplier's, or estimated from internal geometry) and that geometry.
 *
 * References
 * [1] ISO 15, ISO 355, ISO 3245, ISO 1206 boundary dimensions (src/calc/rolling/catalogue.ts).
 * [2] ISO 281:2007 basic dynamic rating C and ISO 76 basic static rating C0 from internal
 *     geometry per kind (src/calc/rolling/ratings.ts, geometry.ts).
 * [3] ISO 281:2007 Annex B, fatigue load limit Cu (src/calc/rolling/aiso.ts, from memory).
 */

/** The kind a supplier bearing given only by its type is read as (the simplest of each type). */
const KIND_OF_TYPE: Record<RollingType, RollingKind> = {
  ball: 'deep-groove ball',
  roller: 'cylindrical roller',
};

/** The form a supplier bearing of a kind with several is read as when the case gives none (the one that claims least). */
const DEFAULT_FORM: Partial<Record<RollingKind, KindForm>> = {
  'cylindrical roller': 'ribs on one ring',
  'needle roller': 'machined with inner ring',
};

/** One bearing to evaluate: its identity and size as the result reports them (m), its ratings (N) and geometry. */
export interface CandidateSpec extends Pick<
  RollingCandidate,
  | 'id'
  | 'type'
  | 'kind'
  | 'form'
  | 'arrangement'
  | 'contactAngle'
  | 'series'
  | 'designation'
  | 'bore'
  | 'outerDiameter'
  | 'width'
> {
  /** Basic dynamic rating C, static rating C0, fatigue load limit Cu, N (of the whole support). */
  C: number;
  C0: number;
  Cu: number;
  /** ISO 76 factor f0 of a ball kind (enters the X/Y table as f0·Fa/C0), null for rollers. */
  f0: number | null;
  fatigueLimitEstimated: boolean;
  ratingSource: 'supplier' | 'estimated';
  /** Pitch diameter dm, rolling-element diameter Dw, m; element count Z per row. */
  dm: number;
  Dw: number;
  Z: number;
}

/** Outside diameter of a supplier bearing given without one and without a table row, as a multiple of the bore (so dm = 1.5·d; common practice). */
const UNKNOWN_OUTER_OVER_BORE = 2;
/** C0/C above this is unusual for a deep-groove ball bearing (common practice). */
const BALL_C0_OVER_C_MAX = 1.2;

/**
 * The candidates of a case [1–3]: the supplier's bearing first (when both its ratings are
 * given and positive), then the table's bearings of the shaft's bore (of the case's kind or
 * type, if it names one) that fit the axial room and the housing bore. What is left out, and
 * why, is said. The same case (as far as candidates go) gets the same specs and notes from a
 * memo (specsMemo).
 */
export function candidateSpecs(c: CaseSI, notes: Notes): CandidateSpec[] {
  const tables = catalogue();
  const key = specsKey(c);
  const hit = specsMemo.get(key);
  if (hit && hit.tables === tables) {
    for (const again of hit.replay) again(notes);
    return [...hit.specs];
  }
  const replay: ((n: Notes) => void)[] = [];
  const recorder: Notes = {
    assumed: notes.assumed,
    warnings: notes.warnings,
    assume: (a) => {
      replay.push((n) => n.assume(a));
      notes.assume(a);
    },
    warn: (w, sameAs) => {
      replay.push((n) => n.warn(w, sameAs));
      notes.warn(w, sameAs);
    },
    // Every caution is built and recorded: a later collector may want what this one has.
    wants: () => true,
  };
  const specs = specsOf(c, recorder);
  if (specsMemo.size >= SPECS_MEMO_SIZE) specsMemo.clear();
  specsMemo.set(key, { tables, specs, replay });
  return [...specs];
}

/**
 * The memo's key of a case: what candidateSpecs reads of it, numbers exactly. Built from the
 * values at every call: a case changed in place (the library's caller may do so) gets its own key.
 */
function specsKey(c: CaseSI): string {
  return JSON.stringify([c.shaft.diameter, c.space, c.rolling ?? null], exactNumbers);
}

/**
 * The candidates of the cases seen last, with the notes they added, by what candidateSpecs
 * reads of a case (the shaft diameter, the space, the rolling settings): a sweep over load
 * and speed asks for the same candidates at every point. Checked against the tables in use.
 */
const specsMemo = new Map<
  string,
  { tables: CatalogueEntry[]; specs: CandidateSpec[]; replay: ((n: Notes) => void)[] }
>();
const SPECS_MEMO_SIZE = 16;
/** Numbers in a memo key as their exact text (NaN and ±Infinity kept apart, which JSON would not). */
const exactNumbers = (_: string, v: unknown): unknown => (typeof v === 'number' ? `${Object.is(v, -0) ? '-0' : v}` : v);

function specsOf(c: CaseSI, notes: Notes): CandidateSpec[] {
  const d = c.shaft.diameter;
  const sameBore = d > 0 && Number.isFinite(d) ? entriesForShaft(d) : [];
  if (!(d > 0) || !Number.isFinite(d)) {
    notes.warn(finding('rolling.diameter-not-positive', { diameter: d }));
  } else if (sameBore.length === 0) {
    notes.warn(finding('rolling.bore-not-standard', { diameter: d, nearest: nearestBores(d) }));
  }
  const specs: CandidateSpec[] = [];
  const supplierC = c.rolling?.dynamicRating;
  const supplierC0 = c.rolling?.staticRating;
  if (supplierC !== undefined || supplierC0 !== undefined) {
    if (supplierC !== undefined && supplierC0 !== undefined && supplierC > 0 && supplierC0 > 0 && d > 0) {
      specs.push(supplierSpec(c, supplierC, supplierC0, sameBore, notes));
    } else {
      notes.warn(finding('rolling.supplier-ratings-incomplete'));
    }
  }
  specs.push(...entriesInSpace(c, wanted(c, sameBore), notes).map(estimatedSpec));
  if (specs.some((s) => s.ratingSource === 'estimated'))
    notes.assume(assumedFinding('rolling.ratings', 'rolling.estimated-ratings', {}));
  if (specs.some((s) => s.fatigueLimitEstimated))
    notes.assume(assumedFinding('rolling.fatigueLimit', 'rolling.estimated-fatigue-limit'));
  return specs;
}

/** The entries of the case's kind (form, arrangement, dimension series), else of its type, else all. */
function wanted(c: CaseSI, entries: CatalogueEntry[]): CatalogueEntry[] {
  const r = c.rolling;
  if (!r) return entries;
  return entries.filter(
    (e) =>
      (r.type === undefined || kindType(e.kind) === r.type) &&
      (r.kind === undefined || e.kind === r.kind) &&
      (r.form === undefined || e.form === r.form) &&
      (r.arrangement === undefined || e.arrangement === r.arrangement) &&
      (r.series === undefined || e.series === r.series),
  );
}

/** The entries that fit the space (outside diameter D, axial width); how many did not, and the smallest of them, is said. */
function entriesInSpace(c: CaseSI, entries: CatalogueEntry[], notes: Notes): CatalogueEntry[] {
  const fitting: CatalogueEntry[] = [];
  const excluded: Finding[] = [];
  for (const e of entries) {
    const tooWide = e.width > c.space.maxLength;
    const tooBig = e.outerDiameter > c.space.maxOuterDiameter;
    if (!tooWide && !tooBig) {
      fitting.push(e);
      continue;
    }
    excluded.push(
      finding('rolling.size-outside-space', {
        designation: e.designation,
        outerDiameter: e.outerDiameter,
        width: e.width,
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

/** Specs already estimated, per table entry (entries are built once per set of tables): sweeps evaluate thousands of cases. */
const estimated = new WeakMap<CatalogueEntry, CandidateSpec>();

/** A table entry with C, C0 and Cu estimated from its internal geometry [2, 3] (the same for every case: worked once). */
function estimatedSpec(e: CatalogueEntry): CandidateSpec {
  const hit = estimated.get(e);
  if (hit) return hit;
  const spec = estimateSpec(e);
  estimated.set(e, spec);
  return spec;
}

function estimateSpec(e: CatalogueEntry): CandidateSpec {
  const type = kindType(e.kind);
  const g = estimateRatings({
    kind: e.kind,
    form: e.form,
    arrangement: e.arrangement,
    contactAngle: e.contactAngle,
    d: e.d,
    D: e.D,
    B: e.B,
    rollerSetBore: e.rollerSetBore,
  });
  return {
    id: e.id,
    type,
    kind: e.kind,
    form: e.form,
    arrangement: e.arrangement,
    contactAngle: e.contactAngle,
    series: e.series,
    designation: e.designation,
    bore: e.bore,
    outerDiameter: e.outerDiameter,
    width: e.width,
    C: g.C,
    C0: g.C0,
    f0: g.f0,
    Cu: estimatedFatigueLimit(type, g.C0, g.dm),
    fatigueLimitEstimated: true,
    ratingSource: 'estimated',
    dm: g.dm,
    Dw: g.Dw,
    Z: g.Z,
  };
}

/** What the case says of its supplier bearing's kind, form, arrangement and contact angle, with each default said. */
function supplierIdentity(
  c: CaseSI,
  notes: Notes,
): { kind: RollingKind; form: KindForm | null; arrangement: Arrangement; contactAngle: number } {
  const r = c.rolling ?? {};
  const kind = r.kind ?? KIND_OF_TYPE[r.type ?? 'ball'];
  if (r.kind === undefined) notes.assume(assumedFinding('rolling.kind', 'rolling.supplier-kind', { kind }));
  const form = r.form ?? DEFAULT_FORM[kind] ?? null;
  if (r.form === undefined && form !== null)
    notes.assume(assumedFinding('rolling.form', 'rolling.supplier-form', { kind, form }));
  const arrangement = r.arrangement ?? 'single';
  const contactAngle = r.contactAngle !== undefined ? (r.contactAngle * 180) / Math.PI : usualContactAngle(kind);
  if (r.contactAngle === undefined && contactAngle > 0)
    notes.assume(assumedFinding('rolling.contactAngle', 'rolling.supplier-contact-angle', { kind, contactAngle }));
  return { kind, form, arrangement, contactAngle };
}

/**
 * The supplier's bearing: its C and C0 (N) as given, its kind, form, arrangement and contact
 * angle as given or read from its type, its outside diameter and width as given or from the
 * smallest table entry of its kind and bore, its geometry estimated from those [2] for the
 * pitch diameter, f0 and the oscillation criterion, and its Cu as given or estimated [3].
 */
function supplierSpec(c: CaseSI, C: number, C0: number, sameBore: CatalogueEntry[], notes: Notes): CandidateSpec {
  const d = c.shaft.diameter;
  const id = supplierIdentity(c, notes);
  const type = kindType(id.kind);
  const { D, B } = supplierDimensions(c, id.kind, id.arrangement, sameBore, notes);
  if (id.kind === 'deep-groove ball' && C0 > BALL_C0_OVER_C_MAX * C)
    notes.warn(finding('rolling.supplier-ratio-unusual', { ratio: C0 / C }));
  const pair = id.arrangement !== 'single';
  const Dgeom = D ?? UNKNOWN_OUTER_OVER_BORE * d;
  const Bone = B !== null ? (pair ? B / 2 : B) : (Dgeom - d) / 2;
  const g = estimateRatings({
    ...id,
    d,
    D: Dgeom,
    B: Bone,
    rollerSetBore: id.kind === 'needle roller' ? d : undefined,
  });
  const CuGiven = c.rolling?.fatigueLimit;
  const CuIsGiven = CuGiven !== undefined && CuGiven > 0;
  return {
    id: 'supplier',
    type,
    ...id,
    series: 'supplier',
    designation: `supplier ${id.kind} bearing${id.form ? ` (${id.form})` : ''}, bore ${num(d * 1000, 4, { exponentZeros: 'keep' })}${pair ? `, ${id.arrangement}` : ''}`,
    bore: d,
    outerDiameter: D,
    width: B,
    C,
    C0,
    f0: g.f0,
    Cu: CuIsGiven ? CuGiven : estimatedFatigueLimit(type, C0, g.dm),
    fatigueLimitEstimated: !CuIsGiven,
    ratingSource: 'supplier',
    dm: g.dm,
    Dw: g.Dw,
    Z: g.Z,
  };
}

/** Outside diameter D and axial width of the supplier's bearing, m: as given, else from the smallest table entry of its kind and arrangement at its bore. */
function supplierDimensions(
  c: CaseSI,
  kind: RollingKind,
  arrangement: Arrangement,
  sameBore: CatalogueEntry[],
  notes: Notes,
): { D: number | null; B: number | null } {
  const row = sameBore
    .filter((e) => e.kind === kind && e.arrangement === arrangement)
    .sort((a, b) => a.outerDiameter - b.outerDiameter)[0];
  let D: number | null = c.rolling?.outerDiameter ?? null;
  let B: number | null = c.rolling?.width ?? null;
  if ((D === null || B === null) && row) {
    if (D === null) D = row.outerDiameter;
    if (B === null) B = row.width;
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

/** The tables' bores next below and next above d (m), those that exist, m. */
function nearestBores(d: number): number[] {
  const bores = standardBores();
  const below = bores.filter((b) => b < d).pop();
  const above = bores.find((b) => b > d);
  return [below, above].filter((b): b is number => b !== undefined);
}
