import type { Shock } from '../../case/types.js';
import { rollingRunning, type RollingRunning, type SpeedLimitRow } from '../../data/rolling-running.js';
import type { BearingSupply, KindForm, RollingKind } from './kinds.js';
import type { RollingType } from './life.js';

/**
 * Speed figures of a rolling bearing, the speed limit of each kind and the static-safety
 * guidance (the friction moment is in friction.ts, grease life and the regreasing interval in
 * grease.ts).
 *
 * References
 * [1] Speed factor n·dm against limits per kind and supply (common practice; limits in
 *     data/rolling-running.json, each row with its source).
 * [2] Friction power from a friction moment: mechanics (the moment itself in friction.ts).
 * [3] Small-swing criterion for oscillating bearings: the angle a ring must swing for
 *     each rolling element to roll onto the track of its neighbour (kinematics of the
 *     cage; criterion common practice).
 * [4] Static safety s0 = C0/P0 guidance per shock level and ball/roller: values of our own,
 *     common practice, ranges as in Brändlein, Eschmann, Hasbargen & Weigand, Ball and Roller
 *     Bearings, 3rd ed., Wiley 1999 (from memory); rows in data/rolling-running.json.
 */

/**
 * Speed factor n·dm, mm·r/min [1]. n rev/s, dm pitch diameter m; the product is
 * returned in the trade's unit (dm in mm times n in r/min).
 */
export function speedFactor(n: number, dm: number): number {
  return Math.max(0, n) * 60 * dm * 1000;
}

/** Friction power, W: N_R = M·ω = M·2π·n, M in N·m, n rev/s. */
export function frictionPower(M: number, n: number): number {
  return M * 2 * Math.PI * Math.max(0, n);
}

/**
 * Smallest swing angle, rad, for every rolling element of an oscillating bearing to
 * roll onto the track of its neighbour on both rings [3]. With the inner ring swinging
 * through θ and the outer ring still, the cage turns θ·(1 − γ)/2 relative to the outer
 * ring and θ·(1 + γ)/2 relative to the inner ring, γ = Dw/dm. An element's contact
 * sweeps one element pitch 2π/Z on the outer ring when
 *   θ_crit = 2·(2π/Z) / (1 − γ)
 * (the inner ring needs the smaller 2·(2π/Z)/(1 + γ)). Z elements, Dw element
 * diameter m, dm pitch diameter m. Below θ_crit the same patches of track are loaded
 * every cycle: false brinelling and fretting are the risk and the equivalent-speed
 * life estimate is not reliable.
 */
export function criticalSwingAngle(Z: number, Dw: number, dm: number): number {
  const gamma = Dw / dm;
  return (2 * ((2 * Math.PI) / Z)) / (1 - gamma);
}

/** A speed limit: n·dm, mm·r/min, and where it comes from. */
export interface SpeedLimit {
  ndm: number;
  source: string;
}

/**
 * Speed limit of a kind on a supply [1], as n·dm in mm·r/min (compare with speedFactor).
 * A row for the kind's form is taken where the table has one (the drawn-cup needle roller
 * bearing), else the kind's general row. The limits are common practice for bearings of
 * normal precision with a pressed or moulded cage; a sealed bearing with contact seals runs
 * below them. Throws when the table has no row for the kind (a data defect).
 */
export function speedLimit(kind: RollingKind, supply: BearingSupply, form: KindForm | null = null): SpeedLimit {
  return speedLimitFrom(rollingRunning(), kind, supply, form);
}

/** speedLimit with the running table given (a sweep reads it once per case); one frozen record per row and supply. */
export function speedLimitFrom(
  t: RollingRunning,
  kind: RollingKind,
  supply: BearingSupply,
  form: KindForm | null = null,
): SpeedLimit {
  const row = speedRow(t, kind, form);
  let limit = row.limits[supply];
  if (!limit) row.limits[supply] = limit = Object.freeze({ ndm: row.row.ndm[supply], source: row.row.source });
  return limit;
}

/** A kind's row of speed limits and the limit records given out for it, per supply. */
interface KeptRow {
  row: SpeedLimitRow;
  limits: Partial<Record<BearingSupply, SpeedLimit>>;
}

/** The row of each kind and form, per table read (every candidate at every point asks). */
const speedRows = new WeakMap<RollingRunning, Map<RollingKind, Map<KindForm | null, KeptRow>>>();

function speedRow(t: RollingRunning, kind: RollingKind, form: KindForm | null): KeptRow {
  let byKind = speedRows.get(t);
  if (!byKind) speedRows.set(t, (byKind = new Map()));
  let byForm = byKind.get(kind);
  if (!byForm) byKind.set(kind, (byForm = new Map()));
  const hit = byForm.get(form);
  if (hit) return hit;
  const rows = t.speedLimits.filter((r) => r.kind === kind);
  const row = rows.find((r) => form !== null && r.form === form) ?? rows.find((r) => r.form === null);
  if (!row) throw new Error(`no speed limit for ${kind}`);
  const kept: KeptRow = { row, limits: {} };
  byForm.set(form, kept);
  return kept;
}

/** Static-safety guidance: the least s0 = C0/P0 for a shock level, its label and its source. */
export interface StaticSafetyGuidance {
  label: string;
  min: number;
  source: string;
}

/**
 * Least static safety s0 = C0/P0 [4] for the case's shock level and a ball or roller kind
 * (C0 basic static rating, P0 static equivalent load, both N; ISO 76:2006 defines C0 by the
 * contact stress that leaves a permanent deformation of about 1/10 000 of the element
 * diameter, from memory). The label is our own wording of the shock level.
 */
export function staticSafetyGuidance(shock: Shock, type: RollingType): StaticSafetyGuidance {
  const row = rollingRunning().staticSafety.find((r) => r.shock === shock);
  if (!row) throw new Error(`no static-safety guidance for shock level ${shock}`);
  return { label: row.label, min: row[type], source: row.source };
}
