import { num } from '../../core/format.js';
import type { KernelWording } from './types.js';

const list = (v: unknown): readonly (string | number)[] => (Array.isArray(v) ? v : []);

/** The words of the bushing kernel's findings and assumptions, keyed by code. */
export const bushingWording: KernelWording = {
  findings: {
    'bushing.zero-speed': () => 'an operating point has zero speed: no sliding, no wear at that point',
    'bushing.axial-not-carried': () =>
      'axial load is not carried by a plain bushing: add a thrust washer or shoulder (not checked here)',
    'bushing.boundary-conservative': (v) =>
      `the case offers ${String(v['supply'])} lubrication; the bushing figures are for boundary (rubbing) lubrication, which is conservative where a lubricant reaches the bore`,
    'bushing.best': (v) =>
      `${String(v['material'])} at ${num(Number(v['length']) * 1000, 3)} mm long has the largest smallest margin (${(Number(v['margin']) * 100).toFixed(0)} %) of the ${String(v['passing'])} material(s) that pass every check`,
    'bushing.none-feasible': (v) => {
      const counts = list(v['failingCount']);
      const each = list(v['failing']).map((label, i) => `${label} fails for ${counts[i]} of ${String(v['materials'])}`);
      return `no material passes every check: ${each.join('; ')}`;
    },
  },
  assumptions: {
    'bushing.motion-factor': (v) => ({
      value: String(v['factor']),
      reason: `${String(v['note'])} (${String(v['source'])})`,
    }),
    'bushing.environment-factor': (v) => ({
      value: String(v['factor']),
      reason: `${String(v['contamination'])}: ${String(v['note'])} (${String(v['source'])})`,
    }),
    'bushing.heat-model': (v) => ({
      value: `h = ${String(v['dissipation'])} W/(m^2*K), A = ${String(v['areaFactor'])}·π·D·L`,
      reason: `${String(v['note'])} (${String(v['source'])})`,
    }),
  },
};
