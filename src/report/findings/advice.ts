import type { Finding, FindingValue } from '../../core/finding.js';
import type { FeasibleChange } from '../../advise/to-feasible-types.js';
import type { KernelWording } from './types.js';

/** What a change of one case field is called, the new value as the case file writes it. */
const CHANGE_WORDS: Record<string, (to: string) => string> = {
  'space.maxOuterDiameter': (to) => `a housing bore of ${to}`,
  'space.maxLength': (to) => `an axial room of ${to}`,
  'life.hours': (to) => `a life target of ${to}`,
  'life.wearAllowance': (to) => `a wear allowance of ${to}`,
  'bushing.length': (to) => `a bushing ${to} long`,
  'bushing.material': (to) => `the material ${to}`,
  'lubrication.supply': (to) =>
    ({ none: 'no lubricant', grease: 'grease', 'oil-bath': 'an oil bath', 'oil-feed': 'pumped oil' })[to] ??
    `supply ${to}`,
  'lubrication.oil': (to) => `oil ${to}`,
  'environment.contamination': (to) => `${to} running`,
  'rolling.kind': (to) => `a ${to} bearing`,
  'rolling.series': (to) => `a bearing of dimension series ${to}`,
  'lubrication.regreaseInterval': (to) => `regreasing every ${to}`,
};

/** One change in words, with the line to write in the case file: "a housing bore of 32 mm (space.maxOuterDiameter: 32 mm)". */
export function changeWords(field: string, to: string): string {
  const w = CHANGE_WORDS[field];
  return `${w ? w(to) : `${field} ${to}`} (${field}: ${to})`;
}

/**
 * The advisor's own findings: a tie broken, and what it would take to make an option
 * feasible. `describeNested` words a finding one of them rests on.
 */
export function adviceWording(describeNested: (f: Finding | string) => string): KernelWording {
  void describeNested;
  return {
    findings: {
      'advice.tie-broken': (v) =>
        `${(v['options'] as readonly string[]).join(' and ')} tie on ${String(v['score'])} points; the tie is broken by the fixed order bushing, rolling, journal (the simpler and cheaper support first)`,
      'advice.feasible-with': (v) => {
        const fields = v['fields'] as readonly string[];
        const tos = v['to'] as readonly string[];
        return `${String(v['option'])}: feasible with ${fields.map((f, i) => changeWords(f, tos[i]!)).join(', or with ')}`;
      },
      'advice.no-single-change': (v) =>
        `${String(v['option'])}: no single change found (of the room, life target, wear allowance, lubrication, cleanliness, material or kind, each tried alone) that makes it feasible`,
    },
    assumptions: {},
  };
}

/**
 * The "what it would take" findings of an advice, in its order: per option (the nearest first
 * when none is feasible) the verified changes as one `advice.feasible-with`, then each option
 * no single change makes feasible.
 */
export function whatItWouldTake(a: {
  toMakeFeasible: readonly FeasibleChange[];
  noSingleChange: readonly Finding[];
}): Finding[] {
  const byOption = new Map<string, FeasibleChange[]>();
  for (const ch of a.toMakeFeasible) byOption.set(ch.option, [...(byOption.get(ch.option) ?? []), ch]);
  const values = (option: string, chs: FeasibleChange[]): Record<string, FindingValue> => ({
    option,
    fields: chs.map((c) => c.field),
    to: chs.map((c) => c.to),
  });
  return [
    ...[...byOption].map(([o, chs]) => ({ code: 'advice.feasible-with', values: values(o, chs) })),
    ...a.noSingleChange,
  ];
}
