import type { ShaftSI } from '../../case/shaft-types.js';
import type { PointLoad, Statics, SupportReaction } from './types.js';

/**
 * Reactions of a shaft on two supports (rigid, simple supports: each takes a force across the
 * shaft, no couple), from the equilibrium of the whole shaft in the x–y and x–z planes, moments
 * about the first support A (at a) with B at b:
 *
 *   x–y:  R_By = −[Σ (x_i − a)·fy_i + Σ mz_i] / (b − a),   R_Ay = −Σ fy_i − R_By
 *   x–z:  R_Bz = [−Σ (x_i − a)·fz_i + Σ my_i] / (b − a),   R_Az = −Σ fz_i − R_Bz
 *   radial R = √(Ry² + Rz²)
 *
 * x_i position m, fy_i, fz_i forces on the shaft N, my_i, mz_i couples on the shaft N·m
 * (right-hand rule; the z-moment of fy at lever x is +x·fy, the y-moment of fz is −x·fz).
 * Loads may lie anywhere along the shaft, outside the supports too (overhung). Statics of a
 * rigid body (any mechanics text, e.g. Gere & Goodno, Mechanics of Materials, 8th ed. 2013,
 * ch. 4, from memory).
 *
 * Axial: the support that locates both ways (`locates: 'both'`) takes the net axial load,
 * Rx = −Σ fx_i. For a cross-located pair (both 'one-direction') each support stops the shaft
 * moving towards its own end: the support at larger x takes thrust towards +x (Σ fx > 0), the
 * one at smaller x thrust towards −x. The induced axial forces of tapered and angular-contact
 * bearings are not included here (the advise layer adds them). Throws a RangeError (a defect:
 * the case loader refuses such shafts) for supports at the same position or an axial load with
 * no support able to take it.
 */
export function shaftStatics(shaft: Pick<ShaftSI, 'supports'>, loads: readonly PointLoad[]): Statics {
  const [sa, sb] = shaft.supports;
  const a = sa.at;
  const span = sb.at - a;
  if (!(Math.abs(span) > 0)) throw new RangeError(`shaft supports at the same position (${a} m)`);
  let fx = 0;
  let fy = 0;
  let fz = 0;
  let mzA = 0; // Σ moments about z through A of the loads
  let myA = 0; // Σ moments about y through A of the loads
  for (const l of loads) {
    const lever = l.at - a;
    fx += l.fx;
    fy += l.fy;
    fz += l.fz;
    mzA += lever * l.fy + l.mz;
    myA += -lever * l.fz + l.my;
  }
  const by = -mzA / span;
  const bz = myA / span;
  const ay = -fy - by;
  const az = -fz - bz;
  const thrustSupport = fx === 0 ? null : thrustTaker(shaft.supports, fx);
  const reaction = (y: number, z: number, i: 0 | 1): SupportReaction => ({
    y,
    z,
    radial: Math.hypot(y, z),
    axial: thrustSupport === i ? -fx : 0,
  });
  return { supports: [reaction(ay, az, 0), reaction(by, bz, 1)], thrustSupport };
}

/** Which support takes a net axial load fx (N, on the shaft): see shaftStatics. */
function thrustTaker(supports: ShaftSI['supports'], fx: number): 0 | 1 {
  const both = supports.findIndex((s) => s.locates === 'both');
  if (both === 0 || both === 1) return both;
  const [s0, s1] = supports;
  // The support the shaft is pushed towards: larger x for fx > 0, smaller x for fx < 0.
  const towards: 0 | 1 = fx > 0 === s1.at > s0.at ? 1 : 0;
  // The other support of a cross-located pair holds the shaft the opposite way only: no fallback.
  if (supports[towards].locates === 'one-direction') return towards;
  throw new RangeError('an axial load towards a support that does not locate the shaft that way');
}
