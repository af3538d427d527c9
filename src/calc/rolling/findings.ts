import { num } from '../../core/format.js';
import type { Assumption } from '../../case/types.js';

/**
 * What one rolling check found besides its figures: the assumptions it made and its cautions,
 * in the order a reader meets them. The steps of a check add to one collector in the order
 * they run, so the order of the lists is the order of the steps; a caution found twice (the
 * same words from two operating points, say) is kept once.
 */
export interface Notes {
  readonly assumed: Assumption[];
  readonly warnings: string[];
  assume(a: Assumption): void;
  warn(w: string): void;
}

/** An empty collector for one check. */
export function newNotes(): Notes {
  const assumed: Assumption[] = [];
  const warnings: string[] = [];
  return {
    assumed,
    warnings,
    assume: (a) => void assumed.push(a),
    warn: (w) => {
      if (!warnings.includes(w)) warnings.push(w);
    },
  };
}

/**
 * A number in the kernel's messages: num with the zeros of the exponent form kept (1.000e+6),
 * as these messages have always been written.
 */
export function fmt(v: number): string {
  return num(v, 4, { exponentZeros: 'keep' });
}
