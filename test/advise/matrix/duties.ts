/** The practice matrix: every duty, in one list (ids unique; checked by matrix.test.ts). */
import type { Duty } from './duty.js';
import { DRIVE_DUTIES } from './duties-drives.js';
import { SLOW_DUTIES } from './duties-slow.js';
import { FAST_DUTIES } from './duties-fast.js';

export type { Duty } from './duty.js';
export const DUTIES: readonly Duty[] = [...DRIVE_DUTIES, ...SLOW_DUTIES, ...FAST_DUTIES];
