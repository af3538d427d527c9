import type { CaseSI } from '../../case/types.js';
import { governingMargin, makeCheck, type CheckRecord } from '../../core/check.js';
import { assumedFinding, type AssumedFinding } from '../../core/finding.js';
import { bushingFactors, bushingMaterials, type BushingMaterialRow } from '../../data/bushing.js';
import type { JournalCriteria } from '../../data/journal-criteria.js';
import { thrustPadRules, type ThrustPadRules } from '../../data/thrust-pads.js';
import { operatingPoints, pointSpeed } from '../duty.js';
import { padBearing, type PadBearingResult, type PadRing } from '../thrust/pad-bearing.js';
import { rubbingThrust, sizeThrustFace, thrustChecks, washerThickness, type ThrustFace } from '../thrust/rubbing.js';
import { allowableFilm } from './design.js';
import type { Fluid } from './operating-point.js';

/**
 * The journal bearing's thrust path: how the option carries the case's axial load. SI: m, N,
 * rev/s, Pa, W, m³/s; temperatures °C.
 *
 * - With an oil supply (bath or feed, or a fixed viscosity) and continuous rotation at every
 *   point with axial load: a hydrodynamic pad thrust bearing, fixed tapered land
 *   (src/calc/thrust/pad-bearing.ts), on the journal's oil. Layout (data/thrust-pads.json,
 *   common practice): pad ring bore d1 = innerToShaft·D, outer d2 = min(space.maxOuterDiameter,
 *   outerToInner·d1); N near-square pads, N = round(coverage·π·d_m/(r2 − r1)) within minPads…
 *   maxPads, each of angle β = coverage·2π/N; taper depth δ = K_design·h_min at the heaviest
 *   axial point (K_design = 1.2, near the wide slider's largest load). Checks: minimum film
 *   h_min ≥ h_allow(d2) (the journal's Trumpler criterion with D the pad ring's outer diameter),
 *   maximum film temperature T_in + ΔT ≤ the journal's allowable, unit load Fa/(N·A) ≤ the pad
 *   limit. Power loss, flow and temperatures are reported.
 * - Without a full film (no supply, grease, an oscillating shaft or a point with axial load and
 *   no speed), or where the pad's film falls below the allowable and a rubbing face would pass:
 *   a boundary-lubricated rubbing face (src/calc/thrust/rubbing.ts) sized in the radial space, of
 *   the bronze row named in data/thrust-pads.json (greased bronze with a lubricant, graphite-
 *   plugged bronze with none); its pressure, speed, PV and wear-life checks, the life combined
 *   over the axial points by the linear damage rule (t = 1/Σ(share_i/t_i)).
 * The thrust collar (pad path: t = max(collarMin, collarToShaft·D)) or washer (rubbing:
 * washerThickness) takes axial room beside the journal: the journal is designed within
 * space.maxLength − t (thrustAxialRoom) and checked (thrust-axial-room).
 * All check ids are prefixed 'thrust-'; a failing one makes the journal infeasible.
 */

export type ThrustPathReason = 'oil-film' | 'no-supply' | 'grease' | 'no-rotation' | 'pad-film-thin';

export interface JournalThrustPad {
  ring: PadRing;
  /** Taper depth δ = h_in − h_min of the fixed tapered land, m. */
  taperDepth: number;
  allowableFilm: number;
  /** Per operating point with axial load, in the case's order. */
  points: (PadBearingResult & { share: number; axial: number; speed: number })[];
  /** Index in `points` of the smallest film. */
  governingPoint: number;
}

export interface JournalThrustRubbing {
  material: string;
  face: ThrustFace;
  /** At the point of highest PV: mean pressure Pa, sliding speed m/s, PV Pa·m/s, friction power W. */
  pressure: number;
  velocity: number;
  pv: number;
  frictionPower: number;
  /** Wear life over the duty, h. */
  lifeHours: number;
  /** Share-weighted mean friction power over the duty, W. */
  meanFrictionPower: number;
}

export interface JournalThrust {
  path: 'pad' | 'rubbing';
  reason: ThrustPathReason;
  /** Largest axial load, N. */
  axial: number;
  /** Axial room the collar or washer takes beside the journal, m. */
  axialThickness: number;
  /**
   * Time mean of the thrust face's power loss over the duty, W: Σ share·P over the points
   * with axial load (shares of the whole duty, adding to 1; 0 where there is no thrust).
   */
  meanPowerLoss: number;
  pad: JournalThrustPad | null;
  rubbing: JournalThrustRubbing | null;
  checks: CheckRecord[];
}

interface AxialPoint {
  share: number;
  axial: number;
  speed: number;
}

/** Axial load below which a point has no thrust to carry, N: a rounding residue, not a load (our own). */
const NEGLIGIBLE_AXIAL = 1e-3;

function axialPoints(c: CaseSI): AxialPoint[] {
  return operatingPoints(c)
    .filter((p) => p.axial > NEGLIGIBLE_AXIAL)
    .map((p) => ({ share: p.share, axial: p.axial, speed: pointSpeed(c, p) }));
}

/** Why no full film can carry the thrust, or null when a pad may. */
function noFilmReason(c: CaseSI, points: AxialPoint[]): ThrustPathReason | null {
  if (c.lubrication.viscosity === undefined && c.lubrication.supply === 'none') return 'no-supply';
  if (c.lubrication.supply === 'grease') return 'grease';
  if (c.shaft.oscillation || points.some((p) => !(p.speed > 0))) return 'no-rotation';
  return null;
}

/** Collar thickness of the pad path, m: max(collarMin, collarToShaft·D), to 0.1 mm. */
function collarThickness(D: number, rules: ThrustPadRules): number {
  return Math.ceil(Math.max(rules.collarMin, rules.collarToShaft * D) * 1e4 - 1e-9) / 1e4;
}

/**
 * Axial room the thrust face takes beside the journal, m (0 without axial load): the collar
 * when a pad can form a film, else the rubbing washer.
 */
export function thrustAxialRoom(c: CaseSI): number {
  const points = axialPoints(c);
  if (points.length === 0) return 0;
  return noFilmReason(c, points) === null
    ? collarThickness(c.shaft.diameter, thrustPadRules())
    : washerThickness(c.shaft.diameter);
}

/**
 * The case the journal is designed in: its axial room less the thrust collar or washer
 * (thrustAxialRoom), but never below half the room (the thrust-axial-room check then fails).
 */
export function journalRoomCase(c: CaseSI): CaseSI {
  const t = thrustAxialRoom(c);
  if (t === 0) return c;
  return { ...c, space: { ...c.space, maxLength: Math.max(c.space.maxLength - t, 0.5 * c.space.maxLength) } };
}

/** A figure held finite for the report: an unbounded life or pressure is written as 1e30. */
const bounded = (x: number): number => (Number.isFinite(x) ? x : 1e30);

/** The pad ring in the radial space, or null when no ring fits (d2 ≤ d1). */
export function padRing(D: number, maxOuterDiameter: number, rules: ThrustPadRules): PadRing | null {
  const inner = rules.innerToShaft * D;
  const outer = Math.min(maxOuterDiameter, rules.outerToInner * inner);
  if (!(outer > inner)) return null;
  const meanCircumference = (Math.PI * (inner + outer)) / 2;
  const ideal = Math.round((rules.padCoverage * meanCircumference) / ((outer - inner) / 2));
  const pads = Math.min(rules.maxPads, Math.max(rules.minPads, ideal));
  return { inner, outer, pads, padAngle: (rules.padCoverage * 2 * Math.PI) / pads };
}

/** The pad thrust bearing over the axial points on `fluid`: design the taper, evaluate each point. */
function padPath(
  points: AxialPoint[],
  ring: PadRing,
  fluid: Fluid,
  tIn: number,
  crit: JournalCriteria,
  rules: ThrustPadRules,
): JournalThrustPad {
  const heaviest = points.reduce((a, b) => (b.axial > a.axial || (b.axial === a.axial && b.speed < a.speed) ? b : a));
  const design = padBearing({
    ring,
    form: { kind: 'taper-ratio', taper: rules.designTaper },
    load: heaviest.axial,
    speed: heaviest.speed,
    fluid,
    inletTemperature: tIn,
  });
  const taperDepth = design.inletFilmThickness - design.minFilmThickness;
  const form = { kind: 'tapered', taperDepth } as const;
  const evaluated: JournalThrustPad['points'] = [];
  let governingPoint = 0;
  for (const p of points) {
    // padBearing returns a new result: the point's share, load and speed are set on it, not copied with it.
    const r = padBearing({
      ring,
      form,
      load: p.axial,
      speed: p.speed,
      fluid,
      inletTemperature: tIn,
    }) as JournalThrustPad['points'][number];
    r.share = p.share;
    r.axial = p.axial;
    r.speed = p.speed;
    if (r.minFilmThickness < (evaluated[governingPoint]?.minFilmThickness ?? Infinity))
      governingPoint = evaluated.length;
    evaluated.push(r);
  }
  return {
    ring,
    taperDepth,
    allowableFilm: allowableFilm(ring.outer, crit),
    points: evaluated,
    governingPoint,
  };
}

function padChecks(pad: JournalThrustPad, crit: JournalCriteria, rules: ThrustPadRules, tIn: number): CheckRecord[] {
  const g = pad.points[pad.governingPoint]!;
  const hottest = Math.max(...pad.points.map((p) => p.maxTemperature));
  const unitLoad = Math.max(...pad.points.map((p) => p.unitLoad));
  return [
    makeCheck(
      'thrust-film',
      'Thrust pads: minimum film thickness h_min (smallest over the points with axial load)',
      g.minFilmThickness,
      pad.allowableFilm,
      'm',
      'min',
      `${crit.sources['minFilmBase'] ?? 'Trumpler (1966)'}; applied to the thrust pads with D = their outer diameter (our application)`,
    ),
    makeCheck(
      'thrust-temperature',
      'Thrust pads: maximum film temperature T_in + ΔT (adiabatic)',
      hottest,
      crit.maxTemperature,
      'degC',
      'max',
      crit.sources['maxTemperature'] ?? 'Trumpler (1966)',
      tIn,
    ),
    makeCheck(
      'thrust-unit-load',
      'Thrust pads: unit load Fa/(N·A)',
      unitLoad,
      rules.maxUnitLoad,
      'Pa',
      'max',
      rules.sources['maxUnitLoad'] ?? '',
    ),
  ];
}

/** The rubbing face over the axial points, with the bronze row of data/thrust-pads.json. */
function rubbingPath(
  c: CaseSI,
  points: AxialPoint[],
  rules: ThrustPadRules,
): { result: JournalThrustRubbing; checks: CheckRecord[] } {
  const id =
    c.lubrication.viscosity === undefined && c.lubrication.supply === 'none'
      ? rules.rubbingDry
      : rules.rubbingLubricated;
  const material: BushingMaterialRow | undefined = bushingMaterials().find((m) => m.id === id);
  if (!material)
    throw new Error(
      `journal thrust: material ${id} named in data/thrust-pads.json is not in data/bushing-materials.json`,
    );
  const factors = bushingFactors();
  const osc = c.shaft.oscillation;
  const fMotion = factors.motion.find((m) => m.key === (osc ? 'oscillating' : 'rotating'))!.value;
  const fEnv = factors.environment.find((m) => m.key === c.environment.contamination)!.value;
  const face = sizeThrustFace(c.shaft.diameter, c.space.maxOuterDiameter);
  const results = points.map((p) => {
    const inp = { axial: p.axial, face, hours: c.life.hours, wearAllowance: c.life.wearAllowance, fMotion, fEnv };
    return rubbingThrust(osc ? { ...inp, oscillation: osc } : { ...inp, speed: p.speed }, material);
  });
  const worst = results.reduce((a, b) => (governingMargin(b.checks) < governingMargin(a.checks) ? b : a));
  const damage = points.reduce((s, p, i) => s + p.share / results[i]!.lifeHours, 0);
  // Shares are of the whole duty: a point without axial load wears the face not at all.
  const lifeHours = damage > 0 ? 1 / damage : Infinity;
  const fig = {
    pressure: bounded(worst.pressure),
    velocity: worst.velocity,
    pv: bounded(worst.pv),
    lifeHours: bounded(lifeHours),
  };
  return {
    result: {
      material: id,
      face,
      ...fig,
      frictionPower: worst.frictionPower,
      meanFrictionPower: points.reduce((s, p, i) => s + p.share * results[i]!.frictionPower, 0),
    },
    checks: thrustChecks(fig, material, c.life.hours),
  };
}

/** The axial-room check: the journal length plus the collar or washer within space.maxLength. */
function roomCheck(c: CaseSI, journalLength: number, thickness: number): CheckRecord {
  return makeCheck(
    'thrust-axial-room',
    'Journal length plus thrust collar or washer thickness within the axial room',
    // To the nanometre: whole millimetres plus a collar add up with a floating-point residue.
    Math.round((journalLength + thickness) * 1e9) / 1e9,
    c.space.maxLength,
    'm',
    'max',
    'common practice: the thrust collar or washer sits beside the journal in the same axial room (data/thrust-pads.json)',
  );
}

/**
 * The thrust path of case `c` (null without axial load), on the journal's design fluid `fluid`
 * at the journal's oil inlet (or bath) temperature `tIn` (°C), beside a journal of length
 * `journalLength` (m).
 */
export function journalThrust(
  c: CaseSI,
  crit: JournalCriteria,
  fluid: Fluid,
  tIn: number,
  journalLength: number,
): JournalThrust | null {
  const points = axialPoints(c);
  if (points.length === 0) return null;
  const rules = thrustPadRules();
  const axial = Math.max(...points.map((p) => p.axial));
  const D = c.shaft.diameter;
  const rubbing = (reason: ThrustPathReason): JournalThrust => {
    const r = rubbingPath(c, points, rules);
    const axialThickness = washerThickness(D);
    return {
      path: 'rubbing',
      reason,
      axial,
      axialThickness,
      meanPowerLoss: r.result.meanFrictionPower,
      pad: null,
      rubbing: r.result,
      checks: [...r.checks, roomCheck(c, journalLength, axialThickness)],
    };
  };
  const why = noFilmReason(c, points);
  const ring = padRing(D, c.space.maxOuterDiameter, rules);
  if (why !== null || ring === null) return rubbing(why ?? 'no-rotation');
  const pad = padPath(points, ring, fluid, tIn, crit, rules);
  const axialThickness = collarThickness(D, rules);
  const checks = [...padChecks(pad, crit, rules, tIn), roomCheck(c, journalLength, axialThickness)];
  const filmThin = !checks[0]!.pass;
  if (filmThin) {
    const alternative = rubbing('pad-film-thin');
    if (governingMargin(alternative.checks) >= 0) return alternative;
  }
  const meanPowerLoss = pad.points.reduce((sum, p) => sum + p.share * p.powerLoss, 0);
  return { path: 'pad', reason: 'oil-film', axial, axialThickness, meanPowerLoss, pad, rubbing: null, checks };
}

/** The finding that says which thrust path was taken and why (worded in src/report/findings/journal.ts). */
export function thrustFinding(t: JournalThrust): AssumedFinding {
  if (t.path === 'pad' && t.pad)
    return assumedFinding('load.axial', 'journal.thrust-pad', {
      axial: t.axial,
      pads: t.pad.ring.pads,
      inner: t.pad.ring.inner,
      outer: t.pad.ring.outer,
      taperDepth: t.pad.taperDepth,
      collar: t.axialThickness,
    });
  return assumedFinding('load.axial', 'journal.thrust-rubbing', {
    axial: t.axial,
    reason: t.reason,
    material: t.rubbing?.material ?? '',
    inner: t.rubbing?.face.inner ?? 0,
    outer: t.rubbing?.face.outer ?? 0,
    washer: t.axialThickness,
  });
}
