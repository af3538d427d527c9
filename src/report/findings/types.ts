import type { FindingValue } from '../../core/finding.js';

/** Words for one finding code: a sentence from its values. */
export type Wording = (v: Record<string, FindingValue>) => string;
/** Words for an assumed finding: the value as taken and the reason. */
export type AssumptionWording = (v: Record<string, FindingValue>) => { value: string; reason: string };
/** One kernel's words, keyed by code. */
export interface KernelWording {
  findings: Record<string, Wording>;
  assumptions: Record<string, AssumptionWording>;
}
