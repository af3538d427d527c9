import type { RollingType } from './life.js';

import { BALL_KINDS, type Arrangement, type RollingKind } from '../../core/rolling-kinds.js';

/**
 * The kinds of rolling bearing the check offers (src/core/rolling-kinds.ts holds the names, the
 * forms and the arrangements), and what follows from a kind.
 */
export {
  ARRANGEMENTS,
  FORMS,
  ROLLING_KINDS,
  type Arrangement,
  type KindForm,
  type RollingKind,
} from '../../core/rolling-kinds.js';

/** Ball or roller: the life exponent and the a_ISO constants of ISO 281 follow from it. */
export function kindType(kind: RollingKind): RollingType {
  return BALL_KINDS.has(kind) ? 'ball' : 'roller';
}

/** True when the arrangement is a pair of bearings acting as one support. */
export function isPair(a: Arrangement): boolean {
  return a !== 'single';
}

/** The supply a bearing runs on ("none" in a case is read as sealed-for-life grease). */
export type BearingSupply = 'grease' | 'oil-bath' | 'oil-feed';
