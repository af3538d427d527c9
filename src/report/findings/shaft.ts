import type { Finding, FindingValue } from '../../core/finding.js';
import { num } from '../../core/format.js';
import type { KernelWording } from './types.js';

const raw = (v: FindingValue | undefined): string => String(v);
const arcmin = (rad: FindingValue | undefined): string => num((Number(rad) * 180 * 60) / Math.PI, 3);
const kN = (n: FindingValue | undefined): string => num(Number(n) / 1000, 3);

/** A support in words: "the deep-groove ball bearing at drive side", "the plain bushing at free side". */
function supportWords(f: FindingValue | undefined): string {
  const v = (f as Finding).values;
  const option = v['option'];
  const thing =
    option === 'rolling'
      ? `${raw(v['kind'] ?? 'rolling')} bearing${v['form'] ? ` (${raw(v['form'])})` : ''}`
      : option === 'bushing'
        ? 'plain bushing'
        : option === 'journal'
          ? 'oil-film journal bearing'
          : 'no feasible support';
  return `${thing} at ${raw(v['name'])}`;
}

/** The words of the whole-shaft advisor's findings: the arrangement of the two supports and its reasons. */
export const shaftWording: KernelWording = {
  findings: {
    'shaft.support': (v) => supportWords({ code: 'shaft.support', values: v }),
    'shaft.arrangement-locating-floating': (v) =>
      `locating: ${supportWords(v['locating'])}; floating: ${supportWords(v['floating'])}`,
    'shaft.arrangement-cross-located': (v) => {
      const [a, b] = v['supports'] as readonly Finding[];
      return v['same']
        ? `cross-located pair: ${supportWords(a)} and at ${raw(b!.values['name'])}, each holding the shaft one way`
        : `cross-located: ${supportWords(a)} and ${supportWords(b)}, each holding the shaft one way`;
    },
    'shaft.arrangement-incomplete': (v) =>
      `no arrangement: no option is feasible at ${(v['missing'] as readonly string[]).join(' and ')} (see that support's advice for what it would take)`,
    'shaft.locating-takes-thrust': (v) =>
      `the locating support at ${raw(v['name'])} takes the shaft's axial load (${kN(v['axial'])} kN) both ways and fixes the shaft's axial position (common practice)`,
    'shaft.locating-one-way': (v) =>
      `the ${raw(v['kind'])} bearing at ${raw(v['name'])} carries axial load ${raw(v['axialCapacity'])}: to locate both ways it needs a second row, an opposed partner or a shoulder and ring taking the other direction (common practice)`,
    'shaft.locating-thrust-face': (v) =>
      `the ${v['option'] === 'journal' ? 'journal bearing' : 'bushing'} at ${raw(v['name'])} locates with a thrust ${v['option'] === 'journal' ? 'face' : 'washer'} on each side of its collar or shoulder (axial load ${kN(v['axial'])} kN) (common practice)`,
    'shaft.floats-inside': (v) =>
      `the support at ${raw(v['name'])} floats: the shaft slides axially within it, so the shaft grows with temperature without loading the bearings against each other (common practice)`,
    'shaft.floats-in-housing': (v) =>
      `the support at ${raw(v['name'])} floats: its outer ring is a sliding fit in the housing bore, so the shaft grows with temperature without loading the bearings against each other (common practice)`,
    'shaft.cross-located-growth': () =>
      'a cross-located pair is set by its axial play (or preload) at assembly: it suits short shafts whose growth with temperature stays within that play (common practice)',
    'shaft.induced-axial': (v) => {
      const names = v['supports'] as readonly string[];
      const fa = v['axial'] as readonly number[];
      return `axial loads from the opposed-pair rule with each bearing's induced axial force (ISO 281 method for tapered roller bearings, from memory): ${kN(fa[0])} kN at ${names[0]!}, ${kN(fa[1])} kN at ${names[1]!}`;
    },
    'shaft.cross-located-kind': (v) =>
      `each support of the cross-located pair is advised with a ${raw(v['kind'])} bearing: one that holds the shaft axially whatever the thrust's direction in this load case (it reverses at start, braking or reversal), the same kind at both supports; of the kinds that do (${(v['kinds'] as readonly string[]).join(', ')}), the least costly feasible at both, so a deep-groove ball pair on a light shaft, else a mirrored tapered roller or angular-contact pair (common practice)`,
    'shaft.cross-located-washer': (v) =>
      `the ${v['option'] === 'journal' ? 'journal bearing' : 'bushing'} at ${raw(v['name'])} carries no axial load in this load case but is given its thrust ${v['option'] === 'journal' ? 'face' : 'washer'} all the same: a cross-located support holds the shaft one way whatever the thrust's direction (common practice)`,
    'shaft.thrust-face-each-end': () =>
      'each bushing carries a thrust washer on its outer side, each taking the axial load one way (common practice)',
    'shaft.self-aligning': (v) =>
      `the ${raw(v['kind'])} bearing at ${raw(v['name'])} is self-aligning: it takes up the shaft's slope there (${arcmin(v['slope'])} arc min) without edge loading`,
    'shaft.slope-beyond-range': (v) =>
      `the shaft's slope at ${raw(v['support'])} is ${arcmin(v['slope'])} arc min, beyond the ${arcmin(v['max'])} arc min a case checks: that support is advised at ${arcmin(v['max'])} arc min; a stiffer shaft or closer supports are the answer`,
  },
  assumptions: {},
};
