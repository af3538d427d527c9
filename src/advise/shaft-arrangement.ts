import type { Locates } from '../case/shaft-types.js';
import { finding, type Finding } from '../core/finding.js';
import type { OptionName } from '../core/options.js';
import type { RollingCandidate } from '../calc/rolling/types.js';
import type { RollingKind } from '../calc/rolling/kinds.js';
import { MIN_AXIAL } from '../calc/bushing/check.js';

/**
 * The rolling kinds that hold a shaft axially at a cross-located support, one way each, whatever
 * the thrust's direction in this load case (it reverses at start, braking or reversal): a single
 * row tapered roller or angular-contact ball bearing faced against its partner, or a deep-groove
 * ball bearing, which holds both ways and is what practice fits to light cross-located shafts.
 * Kinds that carry no axial load (cylindrical roller with ribs on one ring, needle roller) and the
 * self-aligning kinds (fitted as locating and floating supports on long shafts) are left out
 * (common practice).
 */
export const CROSS_LOCATED_KINDS: readonly RollingKind[] = [
  'deep-groove ball',
  'tapered roller',
  'angular-contact ball',
];

/** One support as the arrangement sees it: how it locates and what was recommended there. */
export interface ArrangedSupport {
  name: string;
  locates: Locates;
  recommendation: OptionName | null;
  /** The rolling option's chosen bearing at the support (null when none is feasible). */
  rolling: Pick<RollingCandidate, 'kind' | 'form' | 'axialCapacity'> | null;
  /** Axial load the support carries, N. */
  axial: number;
  /** Slope of the shaft at the support, rad. */
  slope: number;
}

/**
 * The arrangement of the two supports (a contract: `arrangement` of a shaft's advice JSON):
 * `locating` the name of the support that holds the shaft axially (both names, joined by " and ",
 * for a cross-located pair); `summary` and `reasons` findings (`shaft.*`, worded in
 * src/report/findings/shaft.ts).
 */
export interface ShaftArrangement {
  locating: string;
  summary: Finding;
  reasons: Finding[];
}

/** What a support is, in the values of a finding: its name, option and (for a rolling bearing) kind and form. */
function what(s: ArrangedSupport): Finding {
  const kind = s.recommendation === 'rolling' && s.rolling ? s.rolling.kind : null;
  const form = s.recommendation === 'rolling' && s.rolling ? s.rolling.form : null;
  return finding('shaft.support', { name: s.name, option: s.recommendation, kind, form });
}

const SELF_ALIGNING = new Set(['spherical roller', 'self-aligning ball']);

/**
 * The two supports judged as a pair, from each support's recommendation (common practice, the
 * rolling-bearing textbooks, e.g. Brändlein, Eschmann, Hasbargen, Weigand, Ball and Roller
 * Bearings, 3rd ed. 1999, ch. on bearing arrangements, from memory):
 *  - a support with no feasible option: the arrangement is incomplete, the support named;
 *  - locating + floating (one support `locates: both`): the locating support takes the thrust
 *    both ways; the floating one lets the shaft grow with temperature, inside the bearing (a
 *    cylindrical roller bearing with ribs on one ring, a needle roller bearing, a plain bushing,
 *    a journal bearing) or by its outer ring sliding in the housing bore (any other rolling kind);
 *    a plain bushing or journal bearing locates with a thrust washer or thrust face;
 *  - cross-located (both `one-direction`): each support stops the shaft one way; a tapered
 *    roller or angular-contact pair is set by its axial play (or preload) and suits short
 *    shafts with little growth; the rolling kind is one that holds the shaft axially
 *    (CROSS_LOCATED_KINDS), the same at both supports; bushings carry a thrust face at each end,
 *    a support this load case puts no thrust on included;
 *  - each support whose recommended rolling kind is self-aligning, with the slope it takes up.
 */
export function shaftArrangement(x: {
  supports: [ArrangedSupport, ArrangedSupport];
  pairRule: boolean;
  /** The kind a cross-located pair's rolling option was advised with (null: the case named its own). */
  crossKind?: RollingKind | null;
}): ShaftArrangement {
  const [a, b] = x.supports;
  const cross = a.locates === 'one-direction' && b.locates === 'one-direction';
  // The loader guarantees one support locating both ways unless the pair is cross-located.
  const locIndex: 0 | 1 = b.locates === 'both' && a.locates !== 'both' ? 1 : 0;
  const locating = cross ? `${a.name} and ${b.name}` : x.supports[locIndex].name;
  const reasons: Finding[] = [];
  const missing = x.supports.filter((s) => s.recommendation === null).map((s) => s.name);
  for (const s of x.supports)
    if (s.recommendation === 'rolling' && s.rolling && SELF_ALIGNING.has(s.rolling.kind))
      reasons.push(finding('shaft.self-aligning', { name: s.name, kind: s.rolling.kind, slope: s.slope }));
  // The kind a cross-located pair's rolling option was advised with, where a rolling bearing is recommended.
  if (cross && x.crossKind && x.supports.some((s) => s.recommendation === 'rolling'))
    reasons.push(finding('shaft.cross-located-kind', { kind: x.crossKind, kinds: [...CROSS_LOCATED_KINDS] }));
  if (missing.length) return { locating, summary: finding('shaft.arrangement-incomplete', { missing }), reasons };

  if (cross) {
    const kinds = x.supports.map((s) => (s.recommendation === 'rolling' ? (s.rolling?.kind ?? null) : null));
    const same = a.recommendation === b.recommendation && kinds[0] === kinds[1];
    reasons.push(finding('shaft.cross-located-growth', {}));
    for (const s of x.supports)
      if ((s.recommendation === 'bushing' || s.recommendation === 'journal') && s.axial < MIN_AXIAL)
        reasons.push(finding('shaft.cross-located-washer', { name: s.name, option: s.recommendation }));
    if (x.pairRule)
      reasons.push(finding('shaft.induced-axial', { supports: [a.name, b.name], axial: [a.axial, b.axial] }));
    if (a.recommendation === 'bushing' && b.recommendation === 'bushing')
      reasons.push(finding('shaft.thrust-face-each-end', {}));
    return {
      locating,
      summary: finding('shaft.arrangement-cross-located', { supports: [what(a), what(b)], same }),
      reasons,
    };
  }

  const loc = x.supports[locIndex];
  const flo = x.supports[locIndex === 0 ? 1 : 0];
  if (loc.recommendation === 'rolling' && loc.rolling && loc.rolling.axialCapacity !== 'both directions')
    reasons.push(
      finding('shaft.locating-one-way', {
        name: loc.name,
        kind: loc.rolling.kind,
        axialCapacity: loc.rolling.axialCapacity,
      }),
    );
  else if (loc.recommendation === 'bushing' || loc.recommendation === 'journal')
    reasons.push(
      finding('shaft.locating-thrust-face', { name: loc.name, option: loc.recommendation, axial: loc.axial }),
    );
  else reasons.push(finding('shaft.locating-takes-thrust', { name: loc.name, axial: loc.axial }));
  const inside =
    flo.recommendation !== 'rolling' ||
    (flo.rolling !== null && (flo.rolling.kind === 'needle roller' || flo.rolling.axialCapacity === 'none'));
  reasons.push(finding(inside ? 'shaft.floats-inside' : 'shaft.floats-in-housing', { name: flo.name }));
  return {
    locating,
    summary: finding('shaft.arrangement-locating-floating', { locating: what(loc), floating: what(flo) }),
    reasons,
  };
}
