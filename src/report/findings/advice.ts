import type { Finding } from '../../core/finding.js';
import type { KernelWording } from './types.js';

const mm = (m: unknown) => `${Math.round(Number(m) * 1000)} mm`;

/**
 * The advisor's own findings: what would make an option feasible when none is. Each sentence
 * names its option first. `describeNested` words a finding one of them rests on.
 */
export function adviceWording(describeNested: (f: Finding | string) => string): KernelWording {
  return {
    findings: {
      'bushing.to-feasible-length': (v) =>
        `bushing: ${String(v['material'])} would need ${mm(v['minLength'])} of length (the case allows ${mm(v['maxLength'])}); or a shorter life target (it reaches ${Math.round(Number(v['lifeHours']))} h of ${String(v['targetHours'])} h), a larger wear allowance or cleaner running`,
      'bushing.to-feasible-speed': () =>
        'bushing: the sliding speed is beyond every material class: a lower speed or a smaller shaft',
      'rolling.to-feasible': (v) => {
        const why = v['why'];
        const first = why === null || why === undefined ? 'no candidate fits' : describeNested(why as Finding | string);
        return `rolling: ${v['failing'] ? `fails on ${String(v['failing'])}` : first}; more radial room (a larger housing bore) admits a larger series, or give a supplier's bearing with higher ratings`;
      },
      'advice.tie-broken': (v) =>
        `${(v['options'] as readonly string[]).join(' and ')} tie on ${String(v['score'])} points; the tie is broken by the fixed order bushing, rolling, journal (the simpler and cheaper support first)`,
      'journal.to-feasible-oil': () =>
        'journal: an oil supply (oil bath, or pumped and filtered oil) is needed for a full film',
      'journal.to-feasible-film': (v) =>
        `journal: fails on ${String(v['failing']) || 'its criteria'}; more length, a higher speed or a more viscous oil thickens the film`,
    },
    assumptions: {},
  };
}
