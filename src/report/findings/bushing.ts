import { num } from '../../core/format.js';
import type { KernelWording } from './types.js';

const list = (v: unknown): readonly (string | number)[] => (Array.isArray(v) ? v : []);

/** The words of the bushing kernel's findings and assumptions, keyed by code. */
export const bushingWording: KernelWording = {
  findings: {
    'bushing.zero-speed': () => 'an operating point has zero speed: no sliding, no wear at that point',
    'bushing.needs-lubricant': (v) =>
      `${String(v['material'])} needs ${String(v['needs'])} to reach its limits; the case supplies ${String(v['supply'])}`,
    'bushing.needs-water': (v) =>
      `${String(v['material'])} is lubricated and cooled by the water it runs in; the case's medium is ${String(v['medium'])}, not water or slurry`,
    'bushing.motion-unsuited': (v) =>
      `${String(v['material'])} is a class for oscillating pins and pivots; this shaft rotates continuously`,
    'bushing.medium-unsuited': (v) =>
      `${String(v['material'])} is rated ${String(v['rating'])} in ${String(v['medium'])} service: not used there`,
    'bushing.boundary-conservative': (v) =>
      `the case offers ${String(v['supply'])} lubrication; the bushing figures are for boundary (rubbing) lubrication, which is conservative where a lubricant reaches the bore`,
    'bushing.best': (v) => {
      const tied = list(v['tiedWith']);
      const head = `${String(v['material'])} at ${num(Number(v['length']) * 1000, 3)} mm long has the largest smallest margin on its material limits (${(Number(v['margin']) * 100).toFixed(0)} %) of the ${String(v['passing'])} material(s) that pass every check`;
      return tied.length
        ? `${head}; its margin ties with ${tied.join(', ')}, and the tie goes to the lowest mean friction power, then the longest wear life`
        : head;
    },
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
      value: `ΔT = R·μ·P·V, R = (T_max − ${String(v['referenceAmbient'])} degC)/(μ·PV_max)`,
      reason: `${String(v['note'])} (${String(v['source'])})`,
    }),
    'bushing.medium-default': () => ({
      value: 'dry',
      reason:
        'environment.medium not given: the bushing is taken to run in air, so no material is set aside for water, slurry or chemicals',
    }),
    'bushing.thrust-face': (v) => ({
      value: `flange or thrust washer ${num(Number(v['inner']) * 1000, 3)}/${num(Number(v['outer']) * 1000, 3)} mm, ${num(Number(v['thickness']) * 1000, 2)} mm thick`,
      reason:
        'the axial load is carried on a flange or a separate thrust washer of the bushing material at the locating end: bore = shaft + running clearance (the larger of 0.5 mm and 1 % of the shaft), outside = the radial space; its thickness (the larger of 1.5 mm and 5 % of the shaft) is taken from the axial space (common practice)',
    }),
  },
};
