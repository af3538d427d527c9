/**
 * The rolling-element bearing check: checkRolling and the shape of its result. The steps it
 * runs (conditions, lubrication, candidates, evaluate, checks, select, sheet) and the formula
 * kernels (life, aiso, equivalent-load, ratings, geometry, speed) are imported from their own
 * modules by whoever needs them.
 */
export { checkRolling } from './check.js';
export { journalOil } from './lubrication.js';
export type { RollingCandidate, RollingResult } from './types.js';
