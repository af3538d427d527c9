/**
 * The shaft kernels' results, SI. Axes: x along the shaft axis (the positions of the case),
 * y and z across it, right-handed (x × y = z). Forces N, couples N·m, positions m, angles rad.
 */

/**
 * A load on the shaft reduced to the shaft axis at `at` (m): a force (fx, fy, fz), N, and a
 * bending couple (my about +y, mz about +z), N·m, right-hand rule. The torque about x that a
 * gear, belt or chain carries does not bend the shaft and is kept apart in `torque`.
 */
export interface PointLoad {
  at: number;
  fx: number;
  fy: number;
  fz: number;
  my: number;
  mz: number;
  /** Torque about +x the load applies to the shaft, N·m (0 for a force or a weight). */
  torque: number;
  /** What it came from: 'force', 'gear', 'belt', 'chain' or 'weight', with its index in the list ("gear 2"). */
  label: string;
}

/** The force one support exerts on the shaft, N. */
export interface SupportReaction {
  /** Component along +y, N. */
  y: number;
  /** Component along +z, N. */
  z: number;
  /** √(y² + z²), N. */
  radial: number;
  /** Component along +x, N (signed; 0 at a support that takes no thrust). */
  axial: number;
}

export interface Statics {
  /** Per support, in the order of ShaftSI.supports. */
  supports: [SupportReaction, SupportReaction];
  /** Index of the support that takes the net axial load, or null when there is none (Σfx = 0). */
  thrustSupport: 0 | 1 | null;
}

/** One station of the beam diagram. */
export interface BeamPoint {
  /** Position along the shaft, m. */
  x: number;
  /** Shear force in the x–y plane (internal force in +y on the part left of x), N. */
  shearY: number;
  /** Shear force in the x–z plane, N. */
  shearZ: number;
  /** Bending moment about z (x–y plane), N·m, sagging positive (M = EI·v″). */
  momentZ: number;
  /** Bending moment about y (x–z plane), N·m, with the same sign rule in that plane (M = EI·w″). */
  momentY: number;
  /** Resultant bending moment √(momentY² + momentZ²), N·m. */
  moment: number;
  /** Deflection along +y, m. */
  deflectionY: number;
  /** Deflection along +z, m. */
  deflectionZ: number;
  /** Resultant deflection √(deflectionY² + deflectionZ²), m. */
  deflection: number;
}

export interface Beam {
  /** Largest resultant deflection anywhere on the shaft (overhang tips included), m. */
  maxDeflection: number;
  /** Where it occurs, m. */
  maxDeflectionAt: number;
  /** Largest resultant bending moment, N·m. */
  maxMoment: number;
  /** Where it occurs, m. */
  maxMomentAt: number;
  /** Stations ordered by x, from one end of the shaft to the other, breakpoints included. */
  diagram: BeamPoint[];
  /** Resultant slope of the shaft axis at each support, rad (order of ShaftSI.supports). */
  slopes: [number, number];
}
