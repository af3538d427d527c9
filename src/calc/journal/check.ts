import type { CaseSI } from '../../case/types.js';
import { allLimitsPass } from '../../core/check.js';
import { journalCriteria } from '../../data/journal-criteria.js';
import { shippedJournalTables } from '../../data/journal-tables.js';
import { dataDirHref } from '../../data/load.js';
import { designSpace, journalDuty } from './candidates.js';
import { sweepWithInlet } from './bath.js';
import { allowableFilm, designChecks, evaluateDesign } from './design.js';
import { journalAssumptions, journalWarnings } from './findings.js';
import { pressureProfile } from './profile.js';
import { assertFinite, meanPowerLoss, pointSummaries } from './result.js';
import { edgeFilmCheck, serviceChecks } from './service-checks.js';
import { buildSheet } from './sheet.js';
import { journalRoomCase, journalThrust, thrustFinding } from './thrust.js';
import { thrustSheet } from './thrust-sheet.js';
import { clearTableCache, seedTables } from './table.js';
import type { JournalOptions, JournalResult } from './types.js';

/** The data folder whose journal tables seed the table cache (undefined before the first check). */
let seededFrom: string | undefined;

/**
 * Seed the table cache with the dimensionless tables of the data folder in use
 * (data/journal-tables.json, or the copy in SHAFTWISE_DATA_DIR), once per folder: the folder
 * is read on each call, so a change between two checks drops the tables seeded or solved
 * before it rather than answering with another folder's rows.
 */
function seedShippedTables(): void {
  const folder = dataDirHref();
  if (seededFrom === folder) return;
  if (seededFrom !== undefined) {
    clearTableCache();
    seededFrom = undefined;
  }
  seedTables(shippedJournalTables().tables);
  seededFrom = folder;
}

/**
 * Hydrodynamic journal bearing check of a case: chooses (or takes) the length, radial
 * clearance and ISO VG grade, evaluates every operating point with the finite-length
 * Reynolds solution (table.ts), the thermal balance (operating-point.ts) and the design
 * criteria (design.ts), and reports the governing point (smallest film margin).
 *
 * Steps: the duty and the design candidates (candidates.ts), the sweep and the design
 * checks (design.ts) with the motion and supply checks (service-checks.ts), the findings
 * (findings.ts), the pressure profile (profile.ts) and the calculation sheet (sheet.ts).
 *
 * Inputs: CaseSI (SI units: m, N, rev/s, Pa·s, °C). Output: JournalResult (SI; angles in
 * degrees where the key says so; temperatures °C). Every number is finite; a failure to
 * converge throws an Error naming what failed.
 *
 * Sources: Raimondi & Boyd (1958) for the film solution and its conventions; Trumpler
 * (1966, from memory) for the criteria; common practice for the design ranges; see each
 * module's header and each check's `source`.
 */
export function checkJournal(c: CaseSI, opts: JournalOptions = {}): JournalResult {
  seedShippedTables();
  const crit = journalCriteria();
  const D = c.shaft.diameter;
  if (!(D > 0 && Number.isFinite(D))) throw new Error(`journal: shaft diameter must be positive, got ${D} m`);
  const supply = c.lubrication.supply;
  const duty = journalDuty(c);
  // The thrust collar or washer takes its axial room beside the journal (thrust.ts).
  const space = designSpace(journalRoomCase(c), crit, duty);

  // The inlet: the case's with oil feed, the sump balance's bath temperature with an oil bath (bath.ts).
  const swept = sweepWithInlet(c, D, space.candidates, space.points, duty.startLoad, crit, !space.noLubricant);
  const { chosen, rows } = swept;
  const tIn = swept.inletTemperature;
  const designLoad = space.noLubricant
    ? undefined
    : evaluateDesign(D, chosen.candidate, space.points, tIn, duty.startLoad, crit, crit.designLoadFactor);
  const thrust = journalThrust(c, crit, chosen.candidate.fluid, tIn, chosen.candidate.length);
  const checks = [
    ...designChecks(chosen, designLoad, supply, crit, tIn),
    ...serviceChecks(c),
    ...(space.noLubricant
      ? []
      : edgeFilmCheck(c, chosen.governing.result.minFilmThickness, chosen.candidate.length, allowableFilm(D, crit))),
    ...(thrust?.checks ?? []),
  ];
  const findingInput = {
    case: c,
    crit,
    duty,
    space,
    chosen,
    checks,
    bath: swept.bath,
    bathThrustLoss: swept.thrustLoss,
  };

  const res = chosen.governing.result;
  const L = chosen.candidate.length;
  const cl = chosen.candidate.radialClearance;
  const points = pointSummaries(chosen);
  const out: JournalResult = {
    option: 'journal',
    length: L,
    radialClearance: cl,
    clearanceRatio: cl / (D / 2),
    lengthToDiameter: L / D,
    sommerfeld: res.sommerfeld,
    eccentricityRatio: res.eccentricityRatio,
    minFilmThickness: res.minFilmThickness,
    allowableFilmThickness: allowableFilm(D, crit),
    attitudeAngle: res.attitudeDeg,
    frictionCoefficient: res.frictionCoefficient,
    petroffFrictionCoefficient: res.petroffFrictionCoefficient,
    frictionTorque: res.frictionTorque,
    powerLoss: res.powerLoss,
    meanPowerLoss: meanPowerLoss(points) + (thrust?.meanPowerLoss ?? 0),
    flow: res.flow,
    sideFlow: res.sideFlow,
    peakPressure: res.peakPressure,
    peakPressureAngle: res.peakAngleDeg,
    unitLoad: res.unitLoad,
    temperatureRise: res.temperatureRise,
    effectiveTemperature: res.effectiveTemperature,
    maxTemperature: chosen.maxTemperature,
    viscosity: res.viscosity,
    oil: chosen.candidate.oil,
    oilGrade: chosen.candidate.grade ?? null,
    feasible: allLimitsPass(checks),
    checks,
    sweep: rows,
    assumed: thrust ? [...journalAssumptions(findingInput), thrustFinding(thrust)] : journalAssumptions(findingInput),
    warnings: journalWarnings(findingInput),
    sheet:
      opts.sheet === false
        ? []
        : [
            ...buildSheet({ ...c, lubrication: { ...c.lubrication, inletTemperature: tIn } }, chosen, crit, supply),
            ...thrustSheet(thrust),
          ],
    pressureProfile: opts.pressureProfile === false ? [] : pressureProfile(chosen.governing, L / D, D / 2, cl),
    governingPoint: chosen.governingIndex,
    points,
    thrust,
  };
  assertFinite(out);
  return out;
}
