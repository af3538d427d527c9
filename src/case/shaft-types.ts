/**
 * A whole shaft as understood, in SI base units: loads where they act, two supports. The
 * shaft-case loader (src/case/shaft-load.ts) produces it from a case file whose `shaft` has
 * `supports` and `loads`; the statics and beam kernels (src/calc/shaft/) take it. Positions are
 * along the shaft axis x, m; forces N; torques N·m; angles rad; mass kg; modulus Pa.
 * The other keys of the case (life, space, lubrication, environment, priorities, bushing,
 * rolling, journal) are shared by both supports and kept as written in `LoadedShaftCase.common`.
 */

/** One plain length of a stepped shaft, from `from` to `to` (m), of diameter m. */
export interface ShaftSegmentSI {
  from: number;
  to: number;
  diameter: number;
}

/** How a support holds the shaft axially: both ways, not at all, or one way (a cross-located pair). */
export type Locates = 'both' | 'none' | 'one-direction';

export interface ShaftSupportSI {
  name: string;
  /** Position along the shaft, m. */
  at: number;
  /** Journal (bearing seat) diameter, m: the support's own, else the segment's at `at`, else the shaft's. */
  diameter: number;
  locates: Locates;
  /** The support's own room, m, where it gives one (else the case's `space`). */
  space?: { maxLength: number; maxOuterDiameter: number };
}

/**
 * A load on the shaft at position `at` (m), as written: a force by components, a gear mesh, a
 * belt or chain pull, or a weight. Resolved into forces by src/calc/shaft/loads.ts.
 */
export type ShaftLoadSI =
  | { at: number; force: { y: number; z: number }; axial: number }
  | {
      at: number;
      /** Gear on the shaft: pitch diameter m, torque N·m, normal pressure angle and helix angle rad, mesh angle rad around the shaft (0 = +y). */
      gear: { pitchDiameter: number; torque: number; pressureAngle: number; helixAngle: number; mesh: number };
    }
  | {
      at: number;
      /** Belt pulley: pitch diameter m, torque N·m, pull factor (1), direction rad of the pull on the shaft in the y–z plane (0 = +y). */
      belt: { pitchDiameter: number; torque: number; pullFactor: number; direction: number };
    }
  | {
      at: number;
      /** Chain sprocket: as a belt. */
      chain: { pitchDiameter: number; torque: number; pullFactor: number; direction: number };
    }
  | { at: number; weight: { mass: number } };

export interface ShaftSI {
  /** Rotational speed, rev/s, or an oscillation as in CaseSI. */
  speed?: number;
  oscillation?: { angle: number; frequency: number };
  /** Diameter where no segment says otherwise, m. */
  diameter: number;
  /** Young's modulus, Pa (steel 210 GPa unless given, stated under Assumed). */
  modulus: number;
  /** Stepped segments (may be empty: a plain shaft of `diameter`), ordered by `from`. */
  segments: ShaftSegmentSI[];
  /** Exactly two, ordered as written. */
  supports: [ShaftSupportSI, ShaftSupportSI];
  loads: ShaftLoadSI[];
  /** Operating points with their own loads (and speed), replacing `loads` and `speed` when given. */
  duty?: { share: number; speed?: number; loads: ShaftLoadSI[] }[];
  /** Shock level, as `load.shock` of a single-support case. */
  shock: 'none' | 'light' | 'moderate' | 'heavy';
}
