import type { CaseSI } from '../../case/types.js';
import { operatingPoints, pointSpeed } from '../duty.js';
import { lubricants, oilGrade } from '../../data/load.js';
import type { JournalCriteria } from '../../data/journal-criteria.js';
import type { Candidate, DutyPoint } from './design.js';
import type { Fluid } from './operating-point.js';

/**
 * What the journal check evaluates: the duty as the bearing sees it (radial load and speed
 * per operating point) and the design candidates, every combination of length, radial
 * clearance and lubricant the case leaves open. SI units: m, N, rev/s, Pa·s.
 *
 * Design space (common practice, data/journal-criteria.json): L = (L/D)·D over the listed
 * L/D values that fit the axial room, plus the room itself when it falls between them;
 * c = (c/r)·r over the listed c/r values; the ISO VG grades of data/lubricants.json when
 * the case names no oil. A length, clearance, grade or viscosity the case gives is taken
 * as it is.
 */

/**
 * The clearance ratio c/r of the one design shown when the supply cannot keep a film
 * (no lubricant, or grease): common practice, c/r about 0.001.
 */
export const REPRESENTATIVE_CLEARANCE_RATIO = 0.001;

/**
 * Relative tolerance on lengths compared with the axial room: L = (L/D)·D is a product of
 * rounded numbers, so a length equal to the room must not drop out by a last-digit excess.
 */
const LENGTH_TOLERANCE = 1e-9;

/** The duty as the journal check sees it. */
export interface JournalDuty {
  /** Radial load N, speed rev/s (of an oscillating shaft: the equivalent θ·f/π), time share. */
  points: DutyPoint[];
  /**
   * Radial load at start and stop, N (shaft at rest): the case's load.atStart, or, where it
   * gives none, the largest running load (stated as an assumption, findings.ts).
   */
  startLoad: number;
  /** True when the start-up load is the case's load.atStart rather than the running load. */
  startLoadGiven: boolean;
  /** True when some point carries an axial load, which a plain journal bearing does not. */
  axialLoad: boolean;
}

/**
 * The duty points of a case for the journal: radial load only, the speed of an oscillating
 * shaft taken as the equivalent rotational speed θ·f/π (src/calc/duty.ts).
 */
export function journalDuty(c: CaseSI): JournalDuty {
  const ops = operatingPoints(c);
  const points = ops.map((p) => ({ share: p.share, load: p.radial, speed: pointSpeed(c, p) }));
  return {
    points,
    startLoad: c.load.atStart ?? Math.max(c.load.radial, ...points.map((p) => p.load)),
    startLoadGiven: c.load.atStart !== undefined,
    axialLoad: ops.some((p) => p.axial > 0),
  };
}

/** One lubricant to try: the fluid the film sees and its label ("ISO VG 68", "fixed viscosity"). */
export interface FluidOption {
  fluid: Fluid;
  label: string;
  grade?: number;
}

/** The grade row of data/lubricants.json for ISO VG `grade`; throws naming the grades there when absent. */
function gradeFluid(grade: number, label = `ISO VG ${grade}`): FluidOption {
  const oil = oilGrade(grade);
  if (!oil)
    throw new Error(
      `journal: lubrication.oilGrade ISO VG ${grade} is not in data/lubricants.json (grades: ${lubricants()
        .grades.map((row) => row.grade)
        .join(', ')})`,
    );
  return { fluid: { kind: 'oil', oil }, label, grade };
}

/**
 * The lubricants to try: the case's fixed viscosity (density and specific heat from the
 * criteria data), none, the grease's base oil, the named grade, or every grade of
 * data/lubricants.json. With no lubricant a placeholder fluid of 1 Pa·s stands in: no
 * point is evaluated with a film.
 */
export function fluidOptions(c: CaseSI, crit: JournalCriteria): FluidOption[] {
  const fixed = (viscosity: number, label: string): FluidOption => ({
    fluid: { kind: 'fixed', viscosity, density: crit.fixedDensity, specificHeat: crit.fixedSpecificHeat },
    label,
  });
  const mu = c.lubrication.viscosity;
  if (mu !== undefined && !(mu > 0 && Number.isFinite(mu)))
    throw new Error(`journal: lubrication.viscosity must be positive, got ${mu} Pa·s`);
  if (mu !== undefined) return [fixed(mu, 'fixed viscosity')];
  const supply = c.lubrication.supply;
  if (supply === 'none') return [fixed(1, 'none')];
  if (supply === 'grease') {
    // One oil per case: a grade the case names is the grease's base oil, as the rolling check reads it.
    const base = c.lubrication.oilGrade ?? lubricants().greaseBaseOil.grade;
    return [gradeFluid(base, `grease base oil ISO VG ${base}`)];
  }
  if (c.lubrication.oilGrade !== undefined) return [gradeFluid(c.lubrication.oilGrade)];
  return lubricants().sweepGrades.grades.map((grade) => gradeFluid(grade));
}

/** The lengths to try, m, and what the case's room did to them. */
export interface LengthOptions {
  lengths: number[];
  /** True when the lengths come from the L/D sweep (the case gives none). */
  swept: boolean;
  /** The case's own length is longer than the axial room. */
  exceedsRoom: boolean;
  /** The room is shorter than the smallest swept L/D allows: the room itself is the one length. */
  shortRoom: boolean;
}

/** Lengths: the case's, else L = (L/D)·D over the swept L/D within the axial room (see the module comment). */
export function lengthOptions(c: CaseSI, crit: JournalCriteria): LengthOptions {
  const diameter = c.shaft.diameter;
  const room = c.space.maxLength;
  const given = c.journal?.length;
  if (given !== undefined) return { lengths: [given], swept: false, exceedsRoom: given > room, shortRoom: false };
  const lengths = crit.lengthToDiameter
    .map((ratio) => ratio * diameter)
    .filter((length) => length <= room * (1 + LENGTH_TOLERANCE));
  const ldMax = Math.max(...crit.lengthToDiameter);
  const ldMin = Math.min(...crit.lengthToDiameter);
  const roomListed = lengths.some((length) => Math.abs(length - room) < LENGTH_TOLERANCE * diameter);
  if (room < ldMax * diameter && room >= ldMin * diameter && !roomListed) lengths.push(room);
  if (lengths.length === 0) return { lengths: [room], swept: true, exceedsRoom: false, shortRoom: true };
  return { lengths, swept: true, exceedsRoom: false, shortRoom: false };
}

/** Radial clearances, m: the case's c or c/r, else c = (c/r)·r over the swept c/r values. */
export function clearanceOptions(c: CaseSI, crit: JournalCriteria): { clearances: number[]; swept: boolean } {
  const radius = c.shaft.diameter / 2;
  if (c.journal?.radialClearance !== undefined) return { clearances: [c.journal.radialClearance], swept: false };
  if (c.journal?.clearanceRatio !== undefined) return { clearances: [c.journal.clearanceRatio * radius], swept: false };
  return { clearances: crit.clearanceRatio.map((ratio) => ratio * radius), swept: true };
}

/** The candidates and how they were found (what the findings report). */
export interface DesignSpace {
  candidates: Candidate[];
  /** The duty points the candidates are evaluated at (speed 0 throughout with no lubricant). */
  points: DutyPoint[];
  noLubricant: boolean;
  /** Length, clearance and grade came from a sweep (false for each when a representative design replaced it). */
  lengthSwept: boolean;
  clearanceSwept: boolean;
  gradeSwept: boolean;
  exceedsRoom: boolean;
  shortRoom: boolean;
  /** The one design shown when the supply cannot keep a film, or null. */
  representative: { length: number; radialClearance: number } | null;
}

/**
 * The design space of a case. Without an oil supply (none, grease) no design can hold a
 * film, so none is optimised: one representative geometry, the longest allowed length and
 * c/r = REPRESENTATIVE_CLEARANCE_RATIO (unless the case gives the clearance), shows the numbers.
 */
export function designSpace(c: CaseSI, crit: JournalCriteria, duty: JournalDuty): DesignSpace {
  const fluids = fluidOptions(c, crit);
  const length = lengthOptions(c, crit);
  const clearance = clearanceOptions(c, crit);
  const supply = c.lubrication.supply;
  const noLubricant = c.lubrication.viscosity === undefined && supply === 'none';
  let { lengths } = length;
  let { clearances } = clearance;
  const representative = (supply === 'none' || supply === 'grease') && (lengths.length > 1 || clearances.length > 1);
  if (representative) {
    lengths = [Math.max(...lengths)];
    if (c.journal?.radialClearance === undefined && c.journal?.clearanceRatio === undefined)
      clearances = [REPRESENTATIVE_CLEARANCE_RATIO * (c.shaft.diameter / 2)];
  }
  const candidates: Candidate[] = [];
  for (const len of lengths)
    for (const cl of clearances)
      for (const option of fluids) {
        const candidate: Candidate = { length: len, radialClearance: cl, fluid: option.fluid, oil: option.label };
        if (option.grade !== undefined) candidate.grade = option.grade;
        candidates.push(candidate);
      }
  return {
    candidates,
    points: noLubricant ? duty.points.map((p) => ({ ...p, speed: 0 })) : duty.points,
    noLubricant,
    lengthSwept: length.swept && !representative,
    clearanceSwept: clearance.swept && !representative,
    gradeSwept: fluids.length > 1,
    exceedsRoom: length.exceedsRoom,
    shortRoom: length.shortRoom,
    representative: representative ? { length: lengths[0]!, radialClearance: clearances[0]! } : null,
  };
}
