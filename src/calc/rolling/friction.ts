import { rollingRunning, type FrictionRow, type RollingRunning } from '../../data/rolling-running.js';
import type { Arrangement, KindForm, RollingKind } from './kinds.js';
import type { BearingSupply } from './lubrication.js';

/**
 * Friction moment of a rolling bearing as the sum of a viscous (load-independent) term and a
 * load term, the model of Palmgren as the rolling-bearing analysis textbooks give it:
 *
 * References (factors and their sources in data/rolling-running.json → friction)
 * [1] Palmgren, A., Ball and Roller Bearing Engineering, 3rd ed., Burbank, 1959; Harris, T. A.
 *     & Kotzalas, M. N., Rolling Bearing Analysis, 5th ed. (Essential Concepts of Bearing
 *     Technology), CRC 2007, chapter on friction (the formulas and factors from memory; the
 *     split into a moment due to the lubricant and one due to load, seen in its nomenclature).
 *       M_v = 10⁻⁷·f0·(ν·n)^(2/3)·dm³   for ν·n ≥ 2000
 *       M_v = 160·10⁻⁷·f0·dm³           for ν·n < 2000
 *     (ν mm²/s, n r/min, dm mm, M_v N·mm; the two meet at ν·n = 2000, since 2000^(2/3) ≈ 159);
 *       M_l = f1·P1·dm,  f1 = z·(P0/C0)^y,  P1 = max(k_a·Fa + k_r·Fr, Fr)
 *     and, for a cylindrical roller bearing carrying axial load on its ribs, a rib term
 *     k_rib·Fa·dm added to M_l (order of magnitude, from memory).
 * [2] The supply picks the column of f0: grease (after the grease has settled), oil bath, and
 *     fed oil taken as the oil-jet column (conservative: a feed passes more oil than a bath).
 *
 * Valid for bearings running under steady load with a full film or nearly so; seals, starting
 * torque and a fresh, churning grease fill are not included.
 */

export interface FrictionInput {
  kind: RollingKind;
  form: KindForm | null;
  arrangement: Arrangement;
  supply: BearingSupply;
  /** Kinematic viscosity of the oil (or the grease's base oil) at operating temperature, m²/s. */
  nu: number;
  /** Speed, rev/s. */
  n: number;
  /** Pitch diameter, m. */
  dm: number;
  /** Radial and axial load on the support (the pair, for a pair), N. */
  Fr: number;
  Fa: number;
  /** Static equivalent load of the most loaded bearing, N; absent: max(Fr, 0.6·Fr + 0.5·Fa) per bearing. */
  P0?: number;
  /** Basic static rating of one bearing, N. */
  C0: number;
}

/** The loads one bearing of the support carries, N. */
export interface BearingShare {
  Fr: number;
  Fa: number;
}

export interface FrictionMoment {
  /** Load-independent (viscous) moment, N·m, summed over the bearings of the support. */
  viscous: number;
  /** Load moment, N·m, summed likewise. */
  load: number;
  /** viscous + load, N·m. */
  total: number;
  /** The factors used: f0 of the supply, and f1 and P1 (N) of each bearing. */
  f0: number;
  f1: number[];
  P1: number[];
}

/**
 * How a support's loads fall on its bearings: one bearing alone; a back-to-back or
 * face-to-face pair sharing the radial load, one bearing taking the axial load in the
 * direction given; a tandem pair sharing both (common practice).
 */
export function bearingShares(arrangement: Arrangement, Fr: number, Fa: number): BearingShare[] {
  const shares: BearingShare[] = [];
  for (let i = 0; i < bearingCount(arrangement); i++)
    shares.push({ Fr: shareFr(arrangement, Fr), Fa: shareFa(arrangement, Fa, i) });
  return shares;
}

/** Bearings in a support: one, or the two of a pair. */
const bearingCount = (a: Arrangement) => (a === 'single' ? 1 : 2);
/** A bearing's share of the radial load, N: all of it alone, half in a pair. */
const shareFr = (a: Arrangement, Fr: number) => (a === 'single' ? Fr : Fr / 2);
/** Bearing i's share of the axial load, N: all alone, half each in tandem, all on the first of an opposed pair. */
const shareFa = (a: Arrangement, Fa: number, i: number) =>
  a === 'single' ? Fa : a === 'pair tandem' ? Fa / 2 : i === 0 ? Fa : 0;

/**
 * Viscous moment of one bearing, N·m [1]: 10⁻⁷·f0·(ν·n)^(2/3)·dm³ N·mm for ν·n ≥ 2000,
 * 160·10⁻⁷·f0·dm³ below (ν mm²/s, n r/min, dm mm inside; given in SI: ν m²/s, n rev/s, dm m).
 * 0 when the bearing does not turn. The two branches do not meet: 2000^(2/3) = 158.7, not 160,
 * so just above ν·n = 2000 the published form would give a smaller moment than just below; the
 * larger of the two is taken there (at most 0.8 % more, for ν·n up to 2024), so the moment
 * never falls as the speed rises.
 */
export function viscousMoment(f0: number, nu: number, n: number, dm: number): number {
  if (!(n > 0)) return 0;
  const nuN = Math.max(0, nu) * 1e6 * n * 60;
  const dmMm = dm * 1000;
  const nmm = 1e-7 * f0 * Math.max(160, nuN >= 2000 ? Math.pow(nuN, 2 / 3) : 160) * dmMm ** 3;
  return nmm / 1000;
}

/** The load P1 the load term takes, N [1]: max(k_a·Fa + k_r·Fr, Fr). */
export function frictionLoad(row: Pick<FrictionRow, 'faFactor' | 'frFactor'>, Fr: number, Fa: number): number {
  return Math.max(row.faFactor * Fa + row.frFactor * Fr, Fr);
}

/** f1 = z·(P0/C0)^y [1] (y = 0 for the roller kinds: f1 = z). */
export function loadFactor(row: Pick<FrictionRow, 'z' | 'y'>, P0: number, C0: number): number {
  if (row.y === 0) return row.z;
  return row.z * Math.pow(C0 > 0 ? Math.max(0, P0) / C0 : 0, row.y);
}

/**
 * Friction moment of a support, N·m [1][2]: M = Σ (M_v + M_l) over its bearings
 * (bearingShares). Loads are taken as magnitudes.
 */
export function frictionMoment(x: FrictionInput): FrictionMoment {
  return frictionMomentWith(frictionRow(rollingRunning(), x.kind), x);
}

/** The friction factors of a kind (data/rolling-running.json → friction); a kind missing is a data defect. */
export function frictionRow(t: RollingRunning, kind: RollingKind): FrictionRow {
  const row = t.friction.find((r) => r.kind === kind);
  if (!row) throw new Error(`no friction factors for ${kind}`);
  return row;
}

/** frictionMoment with the kind's row of factors given (a sweep looks it up once per bearing). */
export function frictionMomentWith(row: FrictionRow, x: FrictionInput): FrictionMoment {
  const f1: number[] = [];
  const P1: number[] = [];
  const m = momentOver(row, x, f1, P1);
  return { viscous: m.viscous, load: m.load, total: m.total, f0: row.f0[x.supply], f1, P1 };
}

/** The viscous, load and total moments of frictionMomentWith, N·m, without the factors of each bearing. */
export type FrictionTerms = Pick<FrictionMoment, 'viscous' | 'load' | 'total'>;

/** frictionMomentWith's moments alone (a sweep works them at every point of every candidate). */
export function frictionTerms(row: FrictionRow, x: FrictionInput): FrictionTerms {
  return momentOver(row, x, null, null);
}

/** The sum over the support's bearings [1]; f1 and P1 of each bearing pushed where lists are given. */
function momentOver(row: FrictionRow, x: FrictionInput, f1: number[] | null, P1: number[] | null): FrictionTerms {
  const f0 = row.f0[x.supply];
  const Fr = Math.abs(x.Fr);
  const Fa = Math.abs(x.Fa);
  let viscous = 0;
  let load = 0;
  for (let i = 0; i < bearingCount(x.arrangement); i++) {
    const sFr = shareFr(x.arrangement, Fr);
    const sFa = shareFa(x.arrangement, Fa, i);
    const P0 = x.P0 ?? Math.max(sFr, 0.6 * sFr + 0.5 * sFa);
    const f = loadFactor(row, P0, x.C0);
    const p = frictionLoad(row, sFr, sFa);
    f1?.push(f);
    P1?.push(p);
    viscous += viscousMoment(f0, x.nu, x.n, x.dm);
    load += f * p * x.dm + row.ribFactor * sFa * x.dm;
  }
  return { viscous, load, total: viscous + load };
}
