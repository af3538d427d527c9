/** The plain (boundary-lubricated) bushing check: its entry and its result types. */
export { checkBushing } from './check.js';
export type { BushingMaterialResult, BushingResult } from './types.js';
