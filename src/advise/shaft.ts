import type { Assumption } from '../case/types.js';
import type { ShaftLoadSI, ShaftSI } from '../case/shaft-types.js';
import { validateCase, type LoadedCase } from '../case/load.js';
import { finding, type AssumedFinding, type Remark } from '../core/finding.js';
import { resolveLoads, shaftBeam, shaftStatics, type Beam, type BeamPoint, type Statics } from '../calc/shaft/index.js';
import {
  inducedAxialForce,
  inducedAxialForceFromE,
  opposedAxialLoadsFromInduced,
} from '../calc/rolling/tapered-pair.js';
import type { RollingCandidate } from '../calc/rolling/types.js';
import type { RollingKind } from '../calc/rolling/kinds.js';
import { MIN_AXIAL } from '../calc/bushing/check.js';
import { kindTraits } from '../data/rolling.js';
import { advise, type AdviceResult } from './engine.js';
import { loadRules, type LoadedRule } from './load-rules.js';
import { withToMakeFeasible } from './to-feasible.js';
import { CROSS_LOCATED_KINDS, shaftArrangement, type ShaftArrangement } from './shaft-arrangement.js';

/** What adviseShaft reads of a loaded shaft case (the case layer's LoadedShaftCase has these keys). */
export interface ShaftCaseInput {
  shaft: ShaftSI;
  /** The keys both supports share, as written (title, life, space, lubrication, …). */
  common: Record<string, unknown>;
  assumed: Assumption[];
  given: unknown;
}

/** One support's part of the advice. SI: m, N, rad. */
export interface ShaftSupportAdvice {
  name: string;
  /** Position along the shaft, m. */
  at: number;
  /** Seat diameter, m. */
  diameter: number;
  /** Force the support exerts on the shaft, N (axial: the load the support carries, ≥ 0, induced forces included). */
  reaction: { y: number; z: number; radial: number; axial: number };
  /** Slope of the shaft at the support, rad (largest over the duty points). */
  slope: number;
  /** The single-support case document advised (units written out), its paths those of `advice.toMakeFeasible`. */
  document: Record<string, unknown>;
  /** That document as validated (the single-support case and its assumptions). */
  loaded: LoadedCase;
  advice: AdviceResult;
}

/** A whole shaft's advice (the JSON contract of a shaft case). */
export interface ShaftAdvice {
  shaft: { maxDeflection: number; maxMoment: number; diagram: BeamPoint[] };
  supports: [ShaftSupportAdvice, ShaftSupportAdvice];
  arrangement: ShaftArrangement;
  assumed: (Assumption | AssumedFinding)[];
  warnings: Remark[];
}

/** The schema's ceiling of shaft.misalignment, rad (5°). */
const MAX_SLOPE = Math.PI / 36;
/** A support whose reaction is below this is advised at it, N (a case's radial load must be positive). */
const MIN_RADIAL = 1;
const PAIR_KINDS = new Set(['tapered roller', 'angular-contact ball']);
/** Re-advice passes of a cross-located pair on the opposed-pair axial loads. */
const MAX_PAIR_PASSES = 3;

/** A number as a case file writes it, with its unit (twelve significant figures). */
const q = (x: number, unit: string) => `${Number(x.toPrecision(12))} ${unit}`;

/** One load state of the shaft: the loads at a duty point (or the case's), their statics and beam. */
interface State {
  share: number;
  speed: number | undefined;
  statics: Statics;
  beam: Beam;
  /** Net axial force on the shaft from the loads, N, along +x. */
  fx: number;
}

function stateOf(shaft: ShaftSI, loads: ShaftLoadSI[], share: number, speed: number | undefined): State {
  const point = resolveLoads(loads);
  const statics = shaftStatics(shaft, point);
  return { share, speed, statics, beam: shaftBeam(shaft, point, statics), fx: point.reduce((s, l) => s + l.fx, 0) };
}

/**
 * The axial load each support carries at one state, N (≥ 0): the statics' (the locating
 * support, or the cross-located one the thrust pushes towards), or for a cross-located pair of
 * tapered roller or angular-contact bearings the opposed-pair rule with each bearing's induced
 * force (tapered-pair.ts): Fi = 0.5·Fr/Y, Y = 0.4·cot α, α the candidate's contact angle (tapered, ISO 281, from memory), or
 * Fi = e·Fr (angular-contact ball), Ka = Σfx towards the second support.
 */
function axialLoads(shaft: ShaftSI, s: State, pair: [RollingCandidate, RollingCandidate] | null): [number, number] {
  const [ra, rb] = s.statics.supports;
  if (!pair) return [Math.abs(ra.axial), Math.abs(rb.axial)];
  const induced = (k: RollingCandidate, Fr: number) =>
    k.kind === 'tapered roller'
      ? inducedAxialForce(Fr, 0.4 / Math.tan((k.contactAngle * Math.PI) / 180))
      : inducedAxialForceFromE(Fr, k.e ?? 0);
  const towardsB = Math.sign(shaft.supports[1].at - shaft.supports[0].at);
  const r = opposedAxialLoadsFromInduced({
    FiA: induced(pair[0], ra.radial),
    FiB: induced(pair[1], rb.radial),
    Ka: s.fx * towardsB,
  });
  return [r.FaA, r.FaB];
}

/**
 * The single-support case document of support i: the shared keys as written, then the shaft
 * (seat diameter, speed or oscillation, misalignment = the largest slope at the support), the
 * load (reaction, axial load, shock) or one duty point per shaft duty point, and the support's
 * own room where it gives one. Every quantity written with its unit.
 */
function supportDocument(
  input: ShaftCaseInput,
  i: 0 | 1,
  states: State[],
  axial: [number, number][],
  hasDuty: boolean,
  kind: RollingKind | null = null,
): Record<string, unknown> {
  const { shaft, common } = input;
  const support = shaft.supports[i];
  // A one-way locating support holds the shaft whatever this load case's thrust: at least
  // MIN_AXIAL, so a bushing there is sized with its thrust washer (and a journal with its face).
  const least = support.locates === 'one-direction' ? MIN_AXIAL : 0;
  const fa = (n: number) => q(Math.max(least, n), 'N');
  const slope = Math.min(MAX_SLOPE, Math.max(...states.map((s) => s.beam.slopes[i])));
  const radial = (s: State) => q(Math.max(MIN_RADIAL, s.statics.supports[i].radial), 'N');
  const title = typeof common['title'] === 'string' ? common['title'] : 'Shaft';
  const doc: Record<string, unknown> = {
    ...structuredClone(common),
    title: `${title}: ${support.name}`,
    shaft: {
      diameter: q(support.diameter, 'm'),
      ...(shaft.speed !== undefined ? { speed: q(shaft.speed * 60, 'rpm') } : {}),
      ...(shaft.oscillation
        ? { oscillation: { angle: q(shaft.oscillation.angle, 'rad'), frequency: q(shaft.oscillation.frequency, 'Hz') } }
        : {}),
      misalignment: q(slope, 'rad'),
    },
  };
  if (kind) {
    const given = common['rolling'] && typeof common['rolling'] === 'object' ? common['rolling'] : {};
    doc['rolling'] = { ...structuredClone(given), kind, arrangement: 'single' };
  }
  if (!hasDuty) doc['load'] = { radial: radial(states[0]!), axial: fa(axial[0]![i]), shock: shaft.shock };
  else {
    doc['load'] = { shock: shaft.shock };
    doc['duty'] = states.map((s, k) => ({
      share: s.share,
      radial: radial(s),
      axial: fa(axial[k]![i]),
      ...(s.speed !== undefined ? { speed: q(s.speed * 60, 'rpm') } : {}),
    }));
  }
  if (support.space)
    doc['space'] = {
      maxLength: q(support.space.maxLength, 'm'),
      maxOuterDiameter: q(support.space.maxOuterDiameter, 'm'),
    };
  return doc;
}

/** The rolling option's chosen (else first) candidate of an advice. */
function rollingChoice(a: AdviceResult): RollingCandidate | null {
  const r = a.checks.rolling;
  return r.candidates.find((k) => k.id === r.best) ?? null;
}

/** The case's own rolling kind, if it names one (then a cross-located pair keeps it). */
function givenKind(common: Record<string, unknown>): unknown {
  const r = common['rolling'];
  return r && typeof r === 'object' ? (r as Record<string, unknown>)['kind'] : undefined;
}

/**
 * The order a cross-located pair's kinds are tried in (CROSS_LOCATED_KINDS): those with a
 * feasible single bearing at more supports (on the statics' axial loads) first, then the order the
 * rolling choice uses (least costly, then the kind practice reaches for first;
 * data/rolling-kinds.json, common practice): a deep-groove ball pair where it suffices, else a
 * mirrored tapered roller or angular-contact ball pair.
 */
export function crossLocatedOrder(advice: readonly AdviceResult[]): RollingKind[] {
  const traits = new Map(kindTraits().map((t) => [t.kind, t]));
  const at = (kind: RollingKind) =>
    advice.filter((a) =>
      a.checks.rolling.candidates.some((k) => k.kind === kind && k.feasible && k.arrangement === 'single'),
    ).length;
  return [...CROSS_LOCATED_KINDS].sort(
    (a, b) =>
      at(b) - at(a) ||
      traits.get(a)!.costClass - traits.get(b)!.costClass ||
      traits.get(a)!.preference - traits.get(b)!.preference,
  );
}

/**
 * Advice for a whole shaft (issue 15). Steps:
 *  1. loads resolved, statics and beam (src/calc/shaft) for the case's loads, or for each duty
 *     point's loads and speed (the diagram then shows the point with the largest moment);
 *  2. per support a single-support case document (supportDocument), validated as a case file
 *     is, advised with the same rules;
 *  3. a cross-located pair (both supports `one-direction`): each support's rolling option is
 *     advised again with one kind of CROSS_LOCATED_KINDS at both, the kinds tried in
 *     crossLocatedOrder (each through step 4) until one is feasible at both supports, else the
 *     first; a case that names its rolling kind keeps it. Each support is advised on at least
 *     MIN_AXIAL of axial load, so a bushing there has its thrust washer (a journal its thrust
 *     face) whatever the thrust's direction in this load case;
 *  4. a cross-located pair whose rolling option is a tapered
 *     roller or angular-contact ball bearing at both supports: the axial loads recomputed by the
 *     opposed-pair rule with the induced forces of those two bearings, and both supports
 *     advised again on them until the chosen pair repeats; when the choice swings between
 *     bearings (the loads move the choice), each support takes the largest axial load of the
 *     passes (conservative) and is advised once more on it;
 *  5. what it would take (withToMakeFeasible) on each support's document; a `space.*` field of a
 *     support with its own room is renamed `shaft.supports[i].space.*`, the path in the shaft file;
 *  6. the arrangement as a pair (shaft-arrangement.ts).
 */
export async function adviseShaft(input: ShaftCaseInput, rules: LoadedRule[] = loadRules()): Promise<ShaftAdvice> {
  const { shaft } = input;
  const hasDuty = !!shaft.duty?.length;
  const states = hasDuty
    ? shaft.duty!.map((p) => stateOf(shaft, p.loads, p.share, p.speed ?? shaft.speed))
    : [stateOf(shaft, shaft.loads, 1, shaft.speed)];
  const shown = states.reduce((a, b) => (b.beam.maxMoment > a.beam.maxMoment ? b : a));
  const warnings: Remark[] = [];
  const slopes = [0, 1].map((i) => Math.max(...states.map((s) => s.beam.slopes[i as 0 | 1])));
  slopes.forEach((s, i) => {
    if (s > MAX_SLOPE)
      warnings.push(
        finding('shaft.slope-beyond-range', { support: shaft.supports[i]!.name, slope: s, max: MAX_SLOPE }),
      );
  });

  const run = async (axial: [number, number][], kind: RollingKind | null) => {
    const out: { doc: Record<string, unknown>; advice: AdviceResult; loaded: LoadedCase }[] = [];
    for (const i of [0, 1] as const) {
      const doc = supportDocument(input, i, states, axial, hasDuty, kind);
      const loaded = validateCase(structuredClone(doc), `${shaft.supports[i].name}`);
      out.push({ doc, advice: await advise(loaded.case, loaded.assumed, rules), loaded });
    }
    return out;
  };
  const cross = shaft.supports.every((s) => s.locates === 'one-direction');
  // The pair's bearings decide the axial loads, and the axial loads may change the bearings:
  // re-advised until the chosen pair repeats (at most MAX_PAIR_PASSES times).
  const settle = async (kind: RollingKind | null) => {
    let axial = states.map((s) => axialLoads(shaft, s, null));
    let runs = await run(axial, kind);
    let pairRule = false;
    const seen: string[] = [];
    let envelope: [number, number][] | null = null;
    for (let pass = 0; cross && pass <= MAX_PAIR_PASSES; pass++) {
      const pair = runs.map((r) => rollingChoice(r.advice));
      if (!pair.every((k) => k && PAIR_KINDS.has(k.kind) && (k.kind === 'tapered roller' || k.e !== null))) break;
      const ids = pair.map((k) => k!.id).join('|');
      if (ids === seen.at(-1)) break;
      const next = states.map((s) => axialLoads(shaft, s, pair as [RollingCandidate, RollingCandidate]));
      envelope = envelope ? envelope.map((e, k) => [Math.max(e[0], next[k]![0]), Math.max(e[1], next[k]![1])]) : next;
      // A choice that comes back (or one pass too many) does not settle: the largest loads found.
      const settled = !seen.includes(ids) && pass < MAX_PAIR_PASSES;
      axial = settled ? next : envelope;
      runs = await run(axial, kind);
      seen.push(ids);
      pairRule = true;
      if (!settled) break;
    }
    return { runs, axial, pairRule, kind };
  };
  let settled = await settle(null);
  // A cross-located pair: each support among the kinds that hold the shaft one way, the same
  // kind at both, tried in crossLocatedOrder until one is feasible at both supports once its
  // axial loads settle (else the first); a case that names its rolling kind keeps it.
  if (cross && givenKind(input.common) === undefined) {
    let chosen: typeof settled | null = null;
    for (const kind of crossLocatedOrder(settled.runs.map((r) => r.advice))) {
      const tried = await settle(kind);
      chosen ??= tried;
      if (tried.runs.every((r) => r.advice.checks.rolling.best !== null)) {
        chosen = tried;
        break;
      }
    }
    settled = chosen!;
  }
  const { runs, axial, pairRule, kind } = settled;

  const supports = [] as unknown as [ShaftSupportAdvice, ShaftSupportAdvice];
  for (const i of [0, 1] as const) {
    const { doc, advice, loaded } = runs[i]!;
    const full = await withToMakeFeasible(advice, { given: doc, assumed: loaded.assumed }, rules);
    const own = !!shaft.supports[i].space;
    const renamed = own
      ? full.toMakeFeasible.map((c) =>
          c.field.startsWith('space.') ? { ...c, field: `shaft.supports[${i}].${c.field}` } : c,
        )
      : full.toMakeFeasible;
    const r = shown.statics.supports[i];
    supports[i] = {
      name: shaft.supports[i].name,
      at: shaft.supports[i].at,
      diameter: shaft.supports[i].diameter,
      reaction: { y: r.y, z: r.z, radial: r.radial, axial: Math.max(...axial.map((a) => a[i])) },
      slope: slopes[i]!,
      document: doc,
      loaded,
      advice: { ...full, toMakeFeasible: renamed },
    };
  }
  const arrangement = shaftArrangement({
    supports: shaft.supports.map((s, i) => ({
      name: s.name,
      locates: s.locates,
      recommendation: supports[i]!.advice.recommendation,
      rolling: rollingChoice(supports[i]!.advice),
      axial: supports[i]!.reaction.axial,
      slope: supports[i]!.slope,
    })) as Parameters<typeof shaftArrangement>[0]['supports'],
    pairRule,
    crossKind: kind,
  });
  return {
    shaft: { maxDeflection: shown.beam.maxDeflection, maxMoment: shown.beam.maxMoment, diagram: shown.beam.diagram },
    supports,
    arrangement,
    assumed: [...input.assumed],
    warnings,
  };
}
