import { assumedFinding, finding, type Finding } from '../../core/finding.js';
import type { LoadFactors } from '../../data/rolling-load-factors.js';
import type { LoadPoint } from './conditions.js';
import { spectrumMean } from './equivalent-load.js';
import type { Notes } from './findings.js';
import { lifeExponent } from './life.js';
import type { KindFacts, RollingCandidate } from './types.js';
import { governingMargin } from '../../core/check.js';
import { kindTraits, type KindTraits } from '../../data/rolling.js';
import { ROLLING_KINDS, type RollingKind } from './kinds.js';

/**
 * Choosing among the evaluated candidates: the best is the least costly feasible kind, then the
 * smallest (common practice; cost classes in data/rolling-kinds.json); when none is feasible,
 * why the nearest miss of each kind is not is said; and when there is no candidate at all, the result's
 * equivalent load is an upper bound over the deep-groove ball X/Y table.
 *
 * References
 * [1] ISO 281:2007, X and Y for radial ball bearings (data/rolling-factors.json, from memory).
 */

/** Ascending order with unknown sizes last (never NaN, which would upset the sort). */
function orderNullLast(a: number | null, b: number | null): number {
  if (a === null && b === null) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  return a - b;
}

/** The traits of each kind, by kind, per table read (the sort below asks for them many times). */
const traitsByTable = new WeakMap<KindTraits[], Map<RollingKind, KindTraits>>();

/**
 * The traits of each kind of a table, by default the one in use (read once per choice, not per
 * comparison; a check passes the table it read once for all its steps).
 */
type TraitsByKind = Map<RollingKind, KindTraits>;
function traitsNow(table: KindTraits[] = kindTraits()): TraitsByKind {
  let byKind = traitsByTable.get(table);
  if (!byKind) {
    byKind = new Map(table.map((t) => [t.kind, t]));
    traitsByTable.set(table, byKind);
  }
  return byKind;
}

/** A kind's traits (data/rolling-kinds.json, common practice); a kind missing from the table is a data defect. */
function traitsOf(kind: RollingKind, byKind: TraitsByKind): KindTraits {
  const t = byKind.get(kind);
  if (!t) throw new Error(`no row for kind "${kind}" in data/rolling-kinds.json`);
  return t;
}

/** Cost class of a candidate (data/rolling-kinds.json, common practice): its kind's or form's, one more for a matched pair. */
function costClass(k: Pick<RollingCandidate, 'kind' | 'form' | 'arrangement'>, byKind: TraitsByKind): number {
  const t = traitsOf(k.kind, byKind);
  const byForm = k.form !== null ? t.costClassByForm?.[k.form] : undefined;
  return (byForm ?? t.costClass) + (k.arrangement === 'single' ? 0 : 1);
}

/**
 * The order practice chooses in: the supplier's own bearing first (it is the one asked
 * about), then the least costly kind, then the kind practice reaches for first, then the
 * smallest outside diameter, then the narrowest (unknown sizes last), then a ball bearing.
 */
function choiceOrder(a: RollingCandidate, b: RollingCandidate, byKind: TraitsByKind): number {
  return (
    (a.ratingSource === 'supplier' ? -1 : 0) - (b.ratingSource === 'supplier' ? -1 : 0) ||
    costClass(a, byKind) - costClass(b, byKind) ||
    traitsOf(a.kind, byKind).preference - traitsOf(b.kind, byKind).preference ||
    orderNullLast(a.outerDiameter, b.outerDiameter) ||
    orderNullLast(a.width, b.width) ||
    (a.type === 'ball' ? -1 : 0) - (b.type === 'ball' ? -1 : 0)
  );
}

/**
 * The first feasible candidate of `list` (of one kind, when given) in choiceOrder: what a stable
 * sort of those candidates would put first, found in one pass without a list of them.
 */
function firstFeasible(
  list: readonly RollingCandidate[],
  byKind: TraitsByKind,
  kind?: RollingKind,
): RollingCandidate | undefined {
  let first: RollingCandidate | undefined;
  for (const k of list)
    if (
      k.feasible &&
      (kind === undefined || k.kind === kind) &&
      (first === undefined || choiceOrder(k, first, byKind) < 0)
    )
      first = k;
  return first;
}

/**
 * The best candidate: of the feasible ones, the first in the order practice chooses in
 * (choiceOrder). Null when none is feasible; then why the nearest miss of each kind is not
 * suitable is said (`leads`: leadOfEachKind of the candidates, when the caller has it).
 */
export function bestCandidate(
  candidates: RollingCandidate[],
  notes: Notes,
  kinds?: KindTraits[],
  leads?: readonly RollingCandidate[],
): RollingCandidate | null {
  const best = firstFeasible(candidates, traitsNow(kinds)) ?? null;
  if (best) return best;
  if (candidates.length === 0) notes.warn(finding('rolling.no-candidate'));
  for (const k of leads ?? leadOfEachKind(candidates, kinds)) {
    const failing = k.checks.filter((x) => !x.pass && !x.advisory);
    notes.warn(
      finding('rolling.not-suitable', {
        designation: k.designation,
        exclusions: k.exclusions,
        failing: failing.map((x) => x.label),
        values: failing.map((x) => x.value),
        limits: failing.map((x) => x.limit),
        units: failing.map((x) => x.unit),
      }),
    );
  }
  return null;
}

/**
 * One candidate per kind, in the order of the kinds: the first feasible one in the order
 * practice chooses in, else the nearest miss (nothing excludes it outright, then the largest
 * governing margin). What a person reads first; every candidate stays in the result.
 */
export function leadOfEachKind(candidates: RollingCandidate[], kinds?: KindTraits[]): RollingCandidate[] {
  const byKind = traitsNow(kinds);
  const out: RollingCandidate[] = [];
  for (const kind of ROLLING_KINDS) {
    const lead = firstFeasible(candidates, byKind, kind) ?? nearestMiss(candidates, kind);
    if (lead) out.push(lead);
  }
  return out;
}

/**
 * The nearest miss of a kind: the candidate a stable sort on (exclusions ascending, governing
 * margin descending) puts first, each margin worked once, in one pass. A NaN margin makes that
 * sort's order depend on its comparisons, so then the sort itself is run.
 */
function nearestMiss(candidates: readonly RollingCandidate[], kind: RollingKind): RollingCandidate | undefined {
  let miss: RollingCandidate | undefined;
  let missMargin = 0;
  for (const k of candidates) {
    if (k.kind !== kind) continue;
    const m = governingMargin(k.checks);
    if (Number.isNaN(m)) return nearestMissBySort(candidates.filter((x) => x.kind === kind));
    const d = miss === undefined ? -1 : k.exclusions.length - miss.exclusions.length;
    if (d < 0 || (d === 0 && m > missMargin)) {
      miss = k;
      missMargin = m;
    }
  }
  return miss;
}

/** nearestMiss by the sort itself (the candidates of one kind). */
function nearestMissBySort(of: RollingCandidate[]): RollingCandidate | undefined {
  const margin = new Map(of.map((k) => [k, governingMargin(k.checks)]));
  return [...of].sort((a, b) => a.exclusions.length - b.exclusions.length || margin.get(b)! - margin.get(a)!)[0];
}

/**
 * Upper bound of the duty-mean dynamic equivalent load of a deep-groove ball bearing (p = 3)
 * over its X/Y table [1], N, for a case with no candidate to read X and Y from: at each point
 * Pi = f_d·Fr when Fa/Fr ≤ the table's smallest e, else f_d·max(Fr, X·Fr + Y_max·Fa) with X
 * above e and the table's largest Y.
 */
export function equivalentLoadBound(
  points: LoadPoint[],
  serviceFactor: number,
  table: LoadFactors['radialBall'],
  notes: Notes,
): number {
  const eMin = Math.min(...table.rows.map((r) => r.e));
  const yMax = Math.max(...table.rows.map((r) => r.Y));
  const bound = points.map((q) => ({
    P: serviceFactor * (q.Fr > 0 && q.Fa / q.Fr <= eMin ? q.Fr : Math.max(q.Fr, table.xAboveE * q.Fr + yMax * q.Fa)),
    n: q.n,
    t: q.t,
  }));
  const P = spectrumMean(bound, lifeExponent('ball')).P;
  notes.assume(
    assumedFinding('equivalentLoad', 'rolling.load-bound', {
      load: P,
      xBelowE: 1,
      eMin,
      xAboveE: table.xAboveE,
      yMax,
    }),
  );
  return P;
}

/** The facts of a candidate's kind (common-practice traits from data/rolling-kinds.json). */
export function kindFacts(k: RollingCandidate, kinds?: KindTraits[]): KindFacts {
  const byKind = traitsNow(kinds);
  const t = traitsOf(k.kind, byKind);
  return {
    kind: k.kind,
    id: k.id,
    feasible: k.feasible,
    axialCapacity: k.axialCapacity,
    misalignment_arcmin: t.misalignment_arcmin,
    sectionHeight: k.outerDiameter === null ? null : (k.outerDiameter - k.bore) / 2,
    costClass: costClass(k, byKind),
    speedClass: t.speedClass,
  };
}

/**
 * Why the best candidate's kind was picked, as a finding: it is the least costly kind that
 * meets every check (then the smallest), and each less costly or equally costly kind that
 * does not, with its first reason. Null when nothing is feasible.
 */
export function choiceFinding(
  best: RollingCandidate | null,
  candidates: RollingCandidate[],
  leads: RollingCandidate[] = leadOfEachKind(candidates),
  kinds?: KindTraits[],
): Finding | null {
  if (!best) return null;
  const byKind = traitsNow(kinds);
  const passedOver = leads
    .filter((k) => k.kind !== best.kind && !k.feasible && costClass(k, byKind) <= costClass(best, byKind))
    .map((k) => {
      const failing = k.checks.find((x) => !x.pass && !x.advisory);
      return finding('rolling.passed-over', {
        kind: k.kind,
        exclusion: k.exclusions[0] ?? null,
        failing: failing ? failing.label : null,
      });
    });
  return finding('rolling.kind-chosen', {
    kind: best.kind,
    arrangement: best.arrangement,
    costClass: costClass(best, byKind),
    axialCapacity: best.axialCapacity,
    passedOver,
  });
}
