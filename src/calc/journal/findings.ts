import type { Assumption, CaseSI } from '../../case/types.js';
import type { CheckRecord } from '../../core/check.js';
import { num } from '../../core/format.js';
import { lubricants } from '../../data/load.js';
import type { JournalCriteria } from '../../data/journal-criteria.js';
import { REPRESENTATIVE_CLEARANCE_RATIO, type DesignSpace, type JournalDuty } from './candidates.js';
import type { DesignEvaluation } from './design.js';
import { THERMAL_CEILING_C, THERMAL_TOLERANCE_K } from './operating-point.js';
import { PSOR_TOLERANCE } from './reynolds.js';
import { DEFAULT_MESH, lastEccentricity, tableFor } from './table.js';

/**
 * What the journal check found besides its checks: the cautions a reviewer must read
 * (warnings) and the values it took where the case was silent (assumptions), in the order
 * they are reported.
 */

/**
 * The L/D range over which the solver was compared with published tables (Raimondi & Boyd
 * 1958, test/reference/): outside it the figures are the solver's alone.
 */
export const CHECKED_LENGTH_TO_DIAMETER = { min: 0.25, max: 2 } as const;

/** Numbers in the prose: num(), with the exponent form keeping its trailing zeros as the texts always have. */
function textNum(x: number, digits = 4): string {
  const size = Math.abs(x);
  return x === 0 || !Number.isFinite(x) || (size >= 1e-3 && size < 1e6) ? num(x, digits) : x.toExponential(digits - 1);
}

/** Everything the findings are read from. */
export interface FindingInput {
  case: CaseSI;
  crit: JournalCriteria;
  duty: JournalDuty;
  space: DesignSpace;
  chosen: DesignEvaluation;
  checks: readonly CheckRecord[];
}

/** The warnings, in report order: motion and supply first, then what the figures show. */
export function journalWarnings(input: FindingInput): string[] {
  return [...setupWarnings(input), ...figureWarnings(input)];
}

/** Warnings about the duty, the supply and the room, known before any design is evaluated. */
function setupWarnings({ case: c, crit, duty, space }: FindingInput): string[] {
  const warnings: string[] = [];
  const supply = c.lubrication.supply;
  if (c.shaft.oscillation && !c.shaft.speed)
    warnings.push(
      'Oscillating shaft: evaluated at the equivalent rotational speed θ·f/π, but the sliding speed passes through zero at every reversal, so a hydrodynamic film cannot be sustained; the figures are an upper bound on the film.',
    );
  if (duty.points.some((p) => !(p.speed > 0)))
    warnings.push(
      'At least one operating point has zero speed: no hydrodynamic film forms there (film thickness taken as zero).',
    );
  if (supply === 'grease')
    warnings.push(
      'Grease supply: the film figures use the base oil viscosity as if a full film were fed; grease does not sustain one, so they are an upper bound.',
    );
  if (space.noLubricant) warnings.push('No lubricant supply: no film; hydrodynamic figures are zero.');
  const room = c.space.maxLength;
  if (space.exceedsRoom && c.journal?.length !== undefined)
    warnings.push(`journal.length ${textNum(c.journal.length)} m exceeds space.maxLength ${textNum(room)} m.`);
  if (space.shortRoom)
    warnings.push(
      `Axial room ${textNum(room)} m gives L/D = ${textNum(room / c.shaft.diameter, 3)}, below the usual ${Math.min(...crit.lengthToDiameter)}: a short bearing with large side leakage.`,
    );
  return warnings;
}

/** Warnings read from the chosen design's figures and checks. */
function figureWarnings({ case: c, crit, chosen, checks }: FindingInput): string[] {
  const warnings: string[] = [];
  const g = chosen.governing;
  const light = checks.find((k) => k.id === 'light-load');
  if (light && !light.pass)
    warnings.push(
      `Lightly loaded: eccentricity ratio ${textNum(light.value, 3)} below ${light.limit}; a plain full bearing is prone to oil whirl (consider a lobed or tilting-pad bearing, or a smaller length).`,
    );
  if (g.film && g.result.unitLoad < crit.typicalUnitLoadMin)
    warnings.push(
      `Mean unit load ${textNum(g.result.unitLoad / 1e6, 3)} MPa is below the typical ${textNum(crit.typicalUnitLoadMin / 1e6, 2)}–${textNum(crit.typicalUnitLoadMax / 1e6, 2)} MPa: the bearing could be shorter (${crit.sources['typicalUnitLoadMax']}).`,
    );
  if (c.environment.startsPerHour > crit.frequentStartsPerHour)
    warnings.push(
      `Frequent starts (${c.environment.startsPerHour} per hour, above ${crit.frequentStartsPerHour}): each start runs in boundary lubrication; start-up unit load and lining wear govern (${crit.sources['frequentStartsPerHour']}).`,
    );
  const lengthToDiameter = chosen.candidate.length / c.shaft.diameter;
  if (chosen.points.some((p) => p.result.extrapolated))
    warnings.push(
      `Eccentricity ratio beyond ${lastEccentricity(tableFor(lengthToDiameter))} (the end of the solved table): ε and h0 are extrapolated and order-of-magnitude only; the film is far too thin in any case.`,
    );
  if (chosen.points.some((p) => p.result.thermalRunaway))
    warnings.push(
      `No thermal equilibrium below ${THERMAL_CEILING_C} °C: the film would overheat (thermal runaway); the temperatures shown are lower bounds.`,
    );
  if (c.lubrication.supply === 'oil-feed')
    warnings.push(
      `Oil feed: the pump must deliver at least ${textNum(Math.max(...chosen.points.map((p) => p.result.flow)) * 6e4, 3)} L/min per bearing at the inlet temperature (common practice: size the supply above the film's inflow).`,
    );
  const { min, max } = CHECKED_LENGTH_TO_DIAMETER;
  if (lengthToDiameter < min || lengthToDiameter > max)
    warnings.push(
      `L/D = ${textNum(lengthToDiameter, 3)} is outside ${min}–${max}, the range the solver was checked against published tables.`,
    );
  return warnings;
}

/** The assumptions, in report order: the solver, the load, the lubricant, the design, the inlet. */
export function journalAssumptions({ case: c, crit, duty, space }: FindingInput): Assumption[] {
  const assumed: Assumption[] = [
    {
      field: 'journal.solver',
      value: `mesh ${DEFAULT_MESH.nTheta}×${DEFAULT_MESH.nZeta} (half length), PSOR converged when max |Δp| per sweep ≤ ${PSOR_TOLERANCE}·max p; thermal balance to ${THERMAL_TOLERANCE_K} K`,
      reason:
        'convergence criteria of the finite-difference Reynolds solution and the temperature iteration; a solve or balance that does not converge stops the run with an error instead of reporting unconverged numbers',
    },
  ];
  if (duty.axialLoad)
    assumed.push({
      field: 'load.axial',
      value: 'not carried',
      reason:
        'a plain journal bearing carries radial load only; the axial load needs a thrust face or bearing (common practice)',
    });
  const supply = c.lubrication.supply;
  const mu = c.lubrication.viscosity;
  if (mu !== undefined)
    assumed.push({
      field: 'lubrication.viscosity',
      value: `${textNum(mu)} Pa·s, fixed`,
      reason: `no thermal iteration; the temperature rise uses ρ = ${crit.fixedDensity} kg/m³, cp = ${crit.fixedSpecificHeat} J/(kg·K) (${crit.sources['fixedViscosityFluid']})`,
    });
  else if (supply === 'grease') {
    const base = lubricants().greaseBaseOil;
    assumed.push({
      field: 'lubrication.oilGrade',
      value: `ISO VG ${base.grade} (grease base oil)`,
      reason: base.source,
    });
  }
  assumed.push(...designAssumptions(c, crit, space));
  if (supply === 'oil-bath')
    assumed.push({
      field: 'lubrication.inletTemperature',
      value: `${textNum(c.lubrication.inletTemperature)} °C`,
      reason: 'taken as the sump temperature of the bath; the housing heat balance of the sump is not computed',
    });
  return assumed;
}

/** How the design was found: from the sweep (length, clearance, grade), or one representative design. */
function designAssumptions(c: CaseSI, crit: JournalCriteria, space: DesignSpace): Assumption[] {
  const assumed: Assumption[] = [];
  if (space.lengthSwept)
    assumed.push({
      field: 'journal.length',
      value: 'chosen from the sweep',
      reason: `L/D over ${crit.lengthToDiameter.join(', ')} within space.maxLength (${crit.sources['lengthToDiameter']})`,
    });
  if (space.clearanceSwept)
    assumed.push({
      field: 'journal.radialClearance',
      value: 'chosen from the sweep',
      reason: `c/r over ${crit.clearanceRatio.join(', ')} (${crit.sources['clearanceRatio']})`,
    });
  if (space.gradeSwept)
    assumed.push({
      field: 'lubrication.oilGrade',
      value: 'chosen from the sweep',
      reason:
        'ISO VG grades of data/lubricants.json, the one giving the largest film margin within the temperature limit',
    });
  const shown = space.representative;
  if (shown)
    assumed.push({
      field: 'journal.design',
      value: `L = ${textNum(shown.length)} m, c = ${textNum(shown.radialClearance)} m`,
      reason: `with ${c.lubrication.supply === 'none' ? 'no lubricant supply' : 'grease'} no design keeps a full film, so the design is not optimised: the longest allowed length and the common-practice clearance ratio ${REPRESENTATIVE_CLEARANCE_RATIO} show the numbers`,
    });
  return assumed;
}
