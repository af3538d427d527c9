/**
 * Axial loads of two single-row bearings with a contact angle (tapered roller, angular-contact
 * ball) that locate each other, mounted in opposition (back-to-back or face-to-face, at the two
 * supports of a shaft or side by side).
 *
 * A radial load on such a bearing produces an axial force that tries to part its rings, the
 * induced axial force Fi. The shaft is in axial equilibrium only if one bearing carries more
 * than its own Fi: the rules of ISO 281's method for tapered roller bearings, as the
 * rolling-bearing textbooks give them (e.g. Harris and Kotzalas, Rolling Bearing Analysis,
 * 5th ed., 2006; Brändlein, Eschmann, Hasbargen, Weigand, Ball and Roller Bearings, 3rd ed.,
 * 1999; from memory):
 *
 *   with Ka the external axial force on the shaft, positive towards bearing B (so that B
 *   carries it; A carries axial force acting towards A),
 *   if FiA + Ka ≥ FiB:  FaB = FiA + Ka,  FaA = FiA      (B carries the net thrust)
 *   else:               FaA = FiB − Ka,  FaB = FiB      (A carries the net thrust)
 *
 * Forces in N.
 */

/**
 * Induced axial force of a single-row tapered roller bearing under radial load:
 *   Fi = 0.5·Fr / Y   (= 1.25·tan α·Fr with ISO 281's Y = 0.4·cot α)
 * the axial component of the roller loads when about half the rollers carry load (Brändlein
 * et al. 1999, from memory). Fr radial load, N (≥ 0); Y the bearing's axial factor above e,
 * dimensionless, > 0. Returns 0 for Fr ≤ 0.
 */
export function inducedAxialForce(Fr: number, Y: number): number {
  if (!(Fr > 0)) return 0;
  if (!(Y > 0)) throw new RangeError(`inducedAxialForce: Y must be > 0, got ${Y}`);
  return (0.5 * Fr) / Y;
}

/**
 * Induced axial force of a single-row angular-contact ball bearing under radial load, the
 * common-practice rule Fi = e·Fr with e of ISO 281:2007 Table 3 for its contact angle (e.g.
 * 1.14·Fr at 40°): the axial load at which, with half the balls loaded, the bearing's rings are
 * just held together (common practice). Fr in N (≥ 0), e dimensionless (> 0).
 */
export function inducedAxialForceFromE(Fr: number, e: number): number {
  if (!(Fr > 0)) return 0;
  if (!(e > 0)) throw new RangeError(`inducedAxialForceFromE: e must be > 0, got ${e}`);
  return e * Fr;
}

export interface OpposedAxialLoads {
  /** Axial load carried by A and by B, N (≥ 0 when Fi ≥ 0 and Ka does not overpower both). */
  FaA: number;
  FaB: number;
  /** The bearing that carries the net thrust (more than its own induced force); 'B' on a tie. */
  governing: 'A' | 'B';
}

/**
 * The rules above, given the two induced forces: FiA, FiB in N (≥ 0); Ka in N, positive
 * towards B.
 */
export function opposedAxialLoadsFromInduced(x: { FiA: number; FiB: number; Ka: number }): OpposedAxialLoads {
  const { FiA, FiB, Ka } = x;
  if (FiA + Ka >= FiB) return { FaA: FiA, FaB: FiA + Ka, governing: 'B' };
  return { FaA: FiB - Ka, FaB: FiB, governing: 'A' };
}

/**
 * Axial loads of two opposed single-row tapered roller bearings A and B: the rules above with
 * Fi = 0.5·Fr/Y for each. FrA, FrB radial loads, N; YA, YB the axial factors above e; Ka
 * external axial force, N, positive towards B.
 */
export function opposedPairAxialLoads(x: {
  FrA: number;
  FrB: number;
  YA: number;
  YB: number;
  Ka: number;
}): OpposedAxialLoads {
  return opposedAxialLoadsFromInduced({
    FiA: inducedAxialForce(x.FrA, x.YA),
    FiB: inducedAxialForce(x.FrB, x.YB),
    Ka: x.Ka,
  });
}
