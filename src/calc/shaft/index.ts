export type { PointLoad, SupportReaction, Statics, BeamPoint, Beam } from './types.js';
export { resolveLoads, gearLoad, pullLoad, STANDARD_GRAVITY } from './loads.js';
export { shaftStatics } from './statics.js';
export { shaftBeam } from './beam.js';
