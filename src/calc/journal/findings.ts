import type { CaseSI } from '../../case/types.js';
import type { CheckRecord } from '../../core/check.js';
import { assumedFinding, finding, type AssumedFinding, type Finding } from '../../core/finding.js';
import { lubricants } from '../../data/load.js';
import type { JournalCriteria } from '../../data/journal-criteria.js';
import { REPRESENTATIVE_CLEARANCE_RATIO, type DesignSpace, type JournalDuty } from './candidates.js';
import type { DesignEvaluation } from './design.js';
import { THERMAL_CEILING_C, THERMAL_TOLERANCE_K } from './operating-point.js';
import { PSOR_TOLERANCE } from './reynolds.js';
import { bathValues, type BathTemperature } from '../sump.js';
import { DEFAULT_MESH, lastEccentricity, tableFor } from './table.js';

/**
 * What the journal check found besides its checks: the cautions a reviewer must read
 * (warnings) and the values it took where the case was silent (assumptions), in the order
 * they are reported. As data: a code "journal.<what>" and the values it rests on (SI numbers,
 * temperatures °C, names); the words are src/report/findings/journal.ts.
 */

/**
 * The L/D range over which the solver was compared with published tables (Raimondi & Boyd
 * 1958, test/reference/): outside it the figures are the solver's alone.
 */
export const CHECKED_LENGTH_TO_DIAMETER = { min: 0.25, max: 2 } as const;

/** Everything the findings are read from. */
export interface FindingInput {
  case: CaseSI;
  crit: JournalCriteria;
  duty: JournalDuty;
  space: DesignSpace;
  chosen: DesignEvaluation;
  checks: readonly CheckRecord[];
  /** The oil-bath heat balance that set the inlet temperature (src/calc/sump.ts), when there is one. */
  bath?: BathTemperature | null;
  /** Of the bath's loss, the thrust face's share, W (0 or absent without thrust). */
  bathThrustLoss?: number;
}

/** The warnings, in report order: motion and supply first, then what the figures show. */
export function journalWarnings(input: FindingInput): Finding[] {
  return [...setupWarnings(input), ...figureWarnings(input)];
}

/** Warnings about the duty, the supply and the room, known before any design is evaluated. */
function setupWarnings({ case: c, crit, duty, space }: FindingInput): Finding[] {
  const warnings: Finding[] = [];
  if (c.shaft.oscillation && !c.shaft.speed) warnings.push(finding('journal.oscillating'));
  if (duty.points.some((p) => !(p.speed > 0))) warnings.push(finding('journal.zero-speed'));
  if (c.lubrication.supply === 'grease') warnings.push(finding('journal.grease-upper-bound'));
  if (space.noLubricant) warnings.push(finding('journal.no-lubricant'));
  const maxLength = c.space.maxLength;
  if (space.exceedsRoom && c.journal?.length !== undefined)
    warnings.push(finding('journal.length-exceeds-room', { length: c.journal.length, maxLength }));
  if (space.shortRoom)
    warnings.push(
      finding('journal.short-room', {
        maxLength,
        lengthToDiameter: maxLength / c.shaft.diameter,
        usualMinLengthToDiameter: Math.min(...crit.lengthToDiameter),
      }),
    );
  return warnings;
}

/** Warnings read from the chosen design's figures and checks. */
function figureWarnings({ case: c, crit, chosen, checks }: FindingInput): Finding[] {
  const warnings: Finding[] = [];
  const g = chosen.governing;
  const light = checks.find((k) => k.id === 'light-load');
  if (light && !light.pass)
    warnings.push(finding('journal.light-load', { eccentricityRatio: light.value, limit: light.limit }));
  if (g.film && g.result.unitLoad < crit.typicalUnitLoadMin)
    warnings.push(
      finding('journal.low-unit-load', {
        unitLoad: g.result.unitLoad,
        typicalMin: crit.typicalUnitLoadMin,
        typicalMax: crit.typicalUnitLoadMax,
        source: crit.sources['typicalUnitLoadMax'] ?? '',
      }),
    );
  if (c.environment.startsPerHour > crit.frequentStartsPerHour)
    warnings.push(
      finding('journal.frequent-starts', {
        startsPerHour: c.environment.startsPerHour,
        limit: crit.frequentStartsPerHour,
        source: crit.sources['frequentStartsPerHour'] ?? '',
      }),
    );
  const lengthToDiameter = chosen.candidate.length / c.shaft.diameter;
  if (chosen.points.some((p) => p.result.extrapolated))
    warnings.push(finding('journal.extrapolated', { tableEnd: lastEccentricity(tableFor(lengthToDiameter)) }));
  if (chosen.points.some((p) => p.result.thermalRunaway))
    warnings.push(finding('journal.thermal-runaway', { ceiling: THERMAL_CEILING_C }));
  if (c.lubrication.supply === 'oil-feed')
    warnings.push(finding('journal.oil-feed-flow', { flow: Math.max(...chosen.points.map((p) => p.result.flow)) }));
  const { min, max } = CHECKED_LENGTH_TO_DIAMETER;
  if (lengthToDiameter < min || lengthToDiameter > max)
    warnings.push(finding('journal.ld-unchecked', { lengthToDiameter, checkedMin: min, checkedMax: max }));
  return warnings;
}

/** The assumptions, in report order: the solver, the load, the lubricant, the design, the inlet. */
export function journalAssumptions({
  case: c,
  crit,
  duty,
  space,
  bath,
  bathThrustLoss = 0,
}: FindingInput): AssumedFinding[] {
  const assumed: AssumedFinding[] = [
    assumedFinding('journal.solver', 'journal.solver', {
      nTheta: DEFAULT_MESH.nTheta,
      nZeta: DEFAULT_MESH.nZeta,
      psorTolerance: PSOR_TOLERANCE,
      thermalTolerance: THERMAL_TOLERANCE_K,
    }),
  ];
  const supply = c.lubrication.supply;
  const viscosity = c.lubrication.viscosity;
  if (viscosity !== undefined)
    assumed.push(
      assumedFinding('lubrication.viscosity', 'journal.fixed-viscosity', {
        viscosity,
        density: crit.fixedDensity,
        specificHeat: crit.fixedSpecificHeat,
        source: crit.sources['fixedViscosityFluid'] ?? '',
      }),
    );
  else if (supply === 'grease') {
    const base = lubricants().greaseBaseOil;
    assumed.push(
      assumedFinding('lubrication.oilGrade', 'journal.grease-base-oil', { grade: base.grade, source: base.source }),
    );
  }
  if (!duty.startLoadGiven)
    assumed.push(assumedFinding('load.atStart', 'journal.start-load-running', { load: duty.startLoad }));
  assumed.push(...designAssumptions(c, crit, space));
  if (supply === 'oil-bath' && bath)
    assumed.push(
      assumedFinding('lubrication.inletTemperature', 'journal.bath-temperature', {
        ...bathValues(bath),
        thrustLoss: bathThrustLoss,
      }),
    );
  return assumed;
}

/** How the design was found: from the sweep (length, clearance, grade), or one representative design. */
function designAssumptions(c: CaseSI, crit: JournalCriteria, space: DesignSpace): AssumedFinding[] {
  const assumed: AssumedFinding[] = [];
  if (space.lengthSwept)
    assumed.push(
      assumedFinding('journal.length', 'journal.length-swept', {
        lengthToDiameter: crit.lengthToDiameter,
        source: crit.sources['lengthToDiameter'] ?? '',
      }),
    );
  if (space.clearanceSwept)
    assumed.push(
      assumedFinding('journal.radialClearance', 'journal.clearance-swept', {
        clearanceRatio: crit.clearanceRatio,
        source: crit.sources['clearanceRatio'] ?? '',
      }),
    );
  if (space.gradeSwept) assumed.push(assumedFinding('lubrication.oilGrade', 'journal.grade-swept'));
  const shown = space.representative;
  if (shown)
    assumed.push(
      assumedFinding('journal.design', 'journal.representative-design', {
        length: shown.length,
        radialClearance: shown.radialClearance,
        supply: c.lubrication.supply,
        clearanceRatio: REPRESENTATIVE_CLEARANCE_RATIO,
      }),
    );
  return assumed;
}
