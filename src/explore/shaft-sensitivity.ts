import { adviseShaft, type ShaftAdvice, type ShaftCaseInput } from '../advise/shaft.js';
import { loadRules, type LoadedRule } from '../advise/load-rules.js';
import { computeSensitivity, type SensitivityResult } from './sensitivity.js';

/**
 * Sensitivity of a whole shaft: per support, computeSensitivity on that support's own
 * single-support case as adviseShaft built and advised it (its reaction as the load, its axial
 * load, the shaft speed, its slope as shaft.misalignment, the shared life, space, lubrication…).
 * The inputs varied are the support's: its load changes alone, the slope stays at the
 * shaft's value and the other support is not re-advised (the map scales every load on the
 * shaft together, slopes included).
 */
export interface ShaftSensitivityResult {
  title: string;
  supports: { name: string; at: number; sensitivity: SensitivityResult }[];
  notes: string[];
}

export const SHAFT_SENSITIVITY_NOTES = [
  "The inputs varied are each support's own single-support case (built by the whole-shaft advice): load is that support's radial and axial load, speed the shaft's; the support's slope (shaft.misalignment) is held at the shaft's value and the other support is not re-advised.",
  'To scale every load on the shaft together (reactions and slopes of both supports), use map on the shaft case.',
];

/** Each support's sensitivity (see the module comment); `advice` is adviseShaft's result when the caller has it. */
export async function computeShaftSensitivity(
  input: ShaftCaseInput,
  opts: { rules?: LoadedRule[] } = {},
  advice?: ShaftAdvice,
): Promise<ShaftSensitivityResult> {
  const rules = opts.rules ?? loadRules();
  const sa = advice ?? (await adviseShaft(input, rules));
  const supports: ShaftSensitivityResult['supports'] = [];
  for (const s of sa.supports) {
    const sensitivity = await computeSensitivity(s.loaded.case, s.loaded.assumed, { rules });
    supports.push({ name: s.name, at: s.at, sensitivity });
  }
  const title = typeof input.common['title'] === 'string' ? input.common['title'] : 'Shaft';
  return { title, supports, notes: [...SHAFT_SENSITIVITY_NOTES] };
}
