import { finding, type Finding } from '../../core/finding.js';
import type { CandidateSpec } from './candidates.js';
import type { EvalContext, RollingTables } from './context.js';
import type { Notes } from './findings.js';
import { frictionRow } from './friction.js';
import {
  axialCapacity,
  dynamicLoadFrom,
  staticFactorsFrom,
  type AxialCapacity,
  type BearingLoadSpec,
  type DynamicLoad,
  type StaticFactors,
} from './load-factors.js';
import type { FrictionRow } from '../../data/rolling-running.js';
import type { LoadFactors } from '../../data/rolling-load-factors.js';
import type { SpectrumBearing, SpectrumPointIn } from './spectrum.js';
import { inducedAxialForce, inducedAxialForceFromE } from './tapered-pair.js';

/**
 * A candidate's loads at each operating point (evaluate.ts reads them), and what its
 * evaluation reads that depends on neither load nor speed, worked once per candidate.
 *
 * References
 * [1] ISO 281:2007: P = X·Fr + Y·Fa with X, Y, e per kind (load-factors.ts).
 * [2] ISO 76: P0 = X0·Fr + Y0·Fa per kind (load-factors.ts).
 * [3] Induced axial force of a single-row tapered roller or angular-contact ball bearing
 *     under radial load, carried by the bearing that locates it (tapered-pair.ts).
 */

/**
 * A point's loads, N: its dynamic equivalent load with f_d (P, what the lives read, with the
 * point's speed, time share and viscosity: a spectrum point of spectrum.ts), the case's loads Fr
 * and Fa, the axial load the bearing carries (FaBearing), and the dynamic load without f_d with
 * its X, Y, e and key (load).
 */
export interface PointLoad extends SpectrumPointIn {
  Fr: number;
  Fa: number;
  FaBearing: number;
  load: DynamicLoad;
}

/** The load kernels' view of a candidate. */
function loadSpecOf(spec: CandidateSpec): BearingLoadSpec {
  return {
    kind: spec.kind,
    form: spec.form,
    arrangement: spec.arrangement,
    contactAngle: spec.contactAngle,
    C0: spec.C0,
    f0: spec.f0,
    Z: spec.Z,
    Dw: spec.Dw,
    d: spec.bore,
    D: spec.outerDiameter ?? undefined,
    B: spec.width ?? undefined,
  };
}

/**
 * Whether the candidate is a single-row bearing with a contact angle that must be located by
 * an opposed bearing at the shaft's other support (single angular-contact ball or tapered
 * roller bearing, or a tandem pair): its partner's induced axial force then loads it [3].
 */
export function needsOpposedPartner(spec: Pick<CandidateSpec, 'kind' | 'arrangement' | 'contactAngle'>): boolean {
  return (
    (spec.kind === 'tapered roller' || spec.kind === 'angular-contact ball') &&
    (spec.arrangement === 'single' || spec.arrangement === 'pair tandem') &&
    spec.contactAngle > 0
  );
}

/**
 * What a candidate's evaluation reads that depends on neither load nor speed: its load spec, its
 * rows of the tables and whether it needs an opposed partner. Worked once per candidate and
 * tables read (a sweep evaluates the same candidates at every point).
 */
export interface Prepared {
  tables: RollingTables;
  ls: BearingLoadSpec;
  partner: boolean;
  friction: FrictionRow;
  axialCapacity: AxialCapacity;
  static: StaticFactors;
  /** The spectrum life's view of the bearing, kept for the contamination row and a1 it was worked with. */
  bearing: SpectrumBearing | null;
  bearingCont: EvalContext['cont'] | null;
}
const preparedSpecs = new WeakMap<CandidateSpec, Prepared>();

export function prepared(spec: CandidateSpec, tables: RollingTables): Prepared {
  const hit = preparedSpecs.get(spec);
  if (hit && hit.tables === tables) return hit;
  const ls = loadSpecOf(spec);
  const p: Prepared = {
    tables,
    ls,
    partner: needsOpposedPartner(spec),
    friction: frictionRow(tables.running, spec.kind),
    axialCapacity: axialCapacity(spec.kind, spec.form, spec.arrangement),
    static: staticFactorsFrom(tables.load, ls),
    bearing: null,
    bearingCont: null,
  };
  preparedSpecs.set(spec, p);
  return p;
}

/**
 * Axial load the bearing carries at one point, N [3]: the case's Fa, plus, for a bearing that
 * needs an opposed partner, that partner's induced force. The partner is taken as the same
 * bearing under the same radial load (the two supports of a symmetric shaft), mounted so that
 * the case's thrust runs into this bearing: by the rules for two bearings that locate each
 * other, this one then carries Fa + 0.5·Fr/Y (tapered roller) or Fa + e·Fr (angular-contact ball,
 * common practice).
 */
export function bearingAxialLoad(t: LoadFactors, spec: CandidateSpec, p: Prepared, Fr: number, Fa: number): number {
  if (!p.partner || !(Fr > 0)) return Fa;
  // The factors at a large axial load: Y above e for a tapered roller bearing, e for an angular-contact one.
  const above = dynamicLoadFrom(t, p.ls, Fr, 10 * Fr + Fa);
  if (spec.kind === 'angular-contact ball') return above.e !== null ? Fa + inducedAxialForceFromE(Fr, above.e) : Fa;
  return above.Y > 0 ? Fa + inducedAxialForce(Fr, above.Y) : Fa;
}

/**
 * Dynamic equivalent load at each point [1], Pi = X·Fr + Y·Fa, and with the service factor
 * Pf,i = f_d·Pi. A point the method cannot rate excludes the bearing (its reason kept once).
 */
export function pointLoads(
  spec: CandidateSpec,
  p: Prepared,
  ctx: EvalContext,
  notes: Notes,
): { per: PointLoad[]; exclusions: Finding[]; heaviest: PointLoad } {
  const t = ctx.tables.load;
  const nu = ctx.lubrication.viscosity;
  const exclusions: Finding[] = [];
  // Lists sized up front here and below: one grown by push from empty reserves room for 17.
  const per = new Array<PointLoad>(ctx.points.length);
  let raised = false;
  let heaviest: PointLoad | undefined;
  for (let i = 0; i < ctx.points.length; i++) {
    const q = ctx.points[i]!;
    const FaBearing = bearingAxialLoad(t, spec, p, q.Fr, q.Fa);
    const r = dynamicLoadFrom(t, p.ls, q.Fr, FaBearing, q.n);
    if (r.exclusion && !excludedFor(exclusions, r.exclusion.code))
      exclusions.push(finding(r.exclusion.code, r.exclusion.values));
    if (r.range === 'below' && r.key !== null && r.key > 0 && r.Y > 0 && notes.wants('rolling.key-below-table', 'once'))
      notes.warn(finding('rolling.key-below-table', { designation: spec.designation, key: r.key }), 'once');
    if (FaBearing > q.Fa) raised = true;
    const point: PointLoad = { P: ctx.serviceFactor * r.P, n: q.n, t: q.t, nu, Fr: q.Fr, Fa: q.Fa, FaBearing, load: r };
    per[i] = point;
    // The first of the largest f_d·P (NaN never replaces it).
    if (heaviest === undefined || point.P > heaviest.P) heaviest = point;
  }
  if (p.partner && raised && notes.wants('rolling.opposed-partner', 'opposed-partner'))
    notes.warn(finding('rolling.opposed-partner', {}), 'opposed-partner');
  return { per, exclusions, heaviest: heaviest! };
}

/** Whether an exclusion of this code is already kept. */
function excludedFor(exclusions: readonly Finding[], code: string): boolean {
  for (const x of exclusions) if (x.code === code) return true;
  return false;
}
