import { OPTIONS, type OptionName } from '../core/options.js';
import type { Assumption, BushingMaterial, CaseSI } from '../case/types.js';
import { governingCheck, type CheckRecord } from '../core/check.js';
import { advise, type AdviceResult } from '../advise/engine.js';
import { loadRules, type LoadedRule } from '../advise/load-rules.js';

import { bushingMaterials } from '../data/bushing.js';
import { checkDesign, designOf, type JournalDesign } from './journal-design.js';
import { ruleRunner } from './rule-runner.js';
import { referencePoint, scaleCase } from './scale.js';

/**
 * Sensitivity of the advice to the inputs: each parameter is changed by −25, −10, +10 and
 * +25 % in turn (the others at the case's values), the case advised again, and for each
 * option its governing margin read: the smallest margin over the limit checks (advisory
 * checks excluded) of the design found (bushing: the material chosen, or the nearest miss;
 * rolling: the bearing chosen, or the nearest miss; journal: the design of its sweep).
 * A flip is a change of the recommendation.
 *
 * Parameters: load (every duty point, radial and axial), speed (every point; an oscillating
 * shaft's frequency), life target, oil inlet temperature (per cent of its value in °C),
 * journal radial clearance (about the design found: its length and oil kept, only the
 * journal check re-run) and bushing wear factor (of the material found, given to the check
 * as an inline material with its low and high values scaled alike).
 */
export const STEPS = [-0.25, -0.1, 0.1, 0.25] as const;
/** Span the inlet-temperature steps are shares of, K (shaftwise choice: ±4 K and ±10 K). */
export const INLET_SPAN = 40;

export type ParameterId = 'load' | 'speed' | 'life' | 'inletTemperature' | 'clearance' | 'wearFactor';

export interface GoverningMargin {
  /** Check id that governs (smallest margin), e.g. "wear-life"; empty when the option has no check. */
  check: string;
  margin: number | null;
}

export interface Variation {
  step: number;
  /** The parameter's value used, SI (N, rev/s, h, °C, m, m³/(N·m)). */
  value: number;
  recommendation: OptionName | null;
  flip: boolean;
  margins: Record<OptionName, GoverningMargin>;
}

export interface ParameterResult {
  id: ParameterId;
  label: string;
  unit: string;
  base: number;
  variations: Variation[];
  /** Largest change of any option's governing margin over the steps (for sorting the tornado). */
  swing: number;
}

export interface SensitivityResult {
  title: string;
  recommendation: OptionName | null;
  margins: Record<OptionName, GoverningMargin>;
  parameters: ParameterResult[];
  /** Every flip, in words. */
  flips: string[];
  notes: string[];
}

const minLimit = (checks: readonly CheckRecord[]): GoverningMargin => {
  const k = governingCheck(checks);
  return k ? { check: k.id, margin: k.margin } : { check: '', margin: null };
};

/** Each option's governing margin in an advice. */
export function governingMargins(a: AdviceResult): Record<OptionName, GoverningMargin> {
  const pick = (o: OptionName) => a.ranking.find((r) => r.option === o)!.design;
  const b = a.checks.bushing.materials.find((m) => m.id === pick('bushing')['material']);
  const r = a.checks.rolling.candidates.find((k) => k.id === pick('rolling')['bearing']);
  return {
    bushing: b ? minLimit(b.checks) : { check: '', margin: null },
    rolling: r ? minLimit(r.checks) : { check: '', margin: null },
    journal: minLimit(a.checks.journal.checks),
  };
}

/** One parameter to vary: what it is, its value in the case, and the advice at a step (−0.25 … +0.25). */
interface VariedParameter {
  id: ParameterId;
  label: string;
  unit: string;
  base: number;
  make: (step: number) => Promise<AdviceResult>;
}

/** Advice of a changed case; with `journalOnly`, the case itself with only the journal clearance of `variedCase`. */
type AdviseVariant = (variedCase: CaseSI, journalOnly?: boolean) => Promise<AdviceResult>;

/** The bushing material found by the base advice (or its nearest miss), as an inline row the check takes. */
function bushingMaterialFound(c: CaseSI, base: AdviceResult): BushingMaterial | undefined {
  const materialId = base.ranking.find((r) => r.option === 'bushing')!.design['material'];
  const named = c.bushing?.material;
  return typeof named === 'object' ? named : bushingMaterials().find((m) => m.id === materialId);
}

/** Load, speed, life target and oil inlet temperature: each a change of the case, all three checks re-run. */
function dutyParameters(c: CaseSI, adviseVariant: AdviseVariant): VariedParameter[] {
  return [
    {
      id: 'load',
      label: 'Load (every operating point)',
      unit: 'N',
      base: referencePoint(c).load,
      make: (step) => adviseVariant(scaleCase(c, 1 + step, 1)),
    },
    {
      id: 'speed',
      label: c.shaft.oscillation ? 'Speed (oscillation frequency)' : 'Speed (every operating point)',
      unit: 'rev/s',
      base: referencePoint(c).speed,
      make: (step) => adviseVariant(scaleCase(c, 1, 1 + step)),
    },
    {
      id: 'life',
      label: 'Life target',
      unit: 'h',
      base: c.life.hours,
      make: (step) => adviseVariant({ ...c, life: { ...c.life, hours: c.life.hours * (1 + step) } }),
    },
    {
      id: 'inletTemperature',
      // A percentage of a Celsius value means nothing (0 °C would never move, −5 °C moves the
      // wrong way): the step is that share of a fixed 40 K span, so ±4 K and ±10 K.
      label: `Oil inlet temperature (±10 % / ±25 % of ${INLET_SPAN} K)`,
      unit: 'degC',
      base: c.lubrication.inletTemperature,
      make: (step) =>
        adviseVariant({
          ...c,
          lubrication: { ...c.lubrication, inletTemperature: c.lubrication.inletTemperature + step * INLET_SPAN },
        }),
    },
  ];
}

/** The journal radial clearance about the design found (its length and oil kept; only the journal check re-run). */
function clearanceParameter(c: CaseSI, design: JournalDesign, adviseVariant: AdviseVariant): VariedParameter {
  return {
    id: 'clearance',
    label: 'Journal radial clearance (design found)',
    unit: 'm',
    base: design.radialClearance,
    make: (step) => adviseVariant({ ...c, journal: { radialClearance: design.radialClearance * (1 + step) } }, true),
  };
}

/** The wear factor of the bushing material found, its low and high values scaled alike. */
function wearFactorParameter(c: CaseSI, material: BushingMaterial, adviseVariant: AdviseVariant): VariedParameter {
  const wearFactor = material.wearFactor;
  return {
    id: 'wearFactor',
    label: 'Bushing wear factor (material found)',
    unit: 'm^2/N',
    base: wearFactor,
    make: (step) => {
      const scaled: BushingMaterial = {
        ...material,
        wearFactor: wearFactor * (1 + step),
        wearFactorLow: (material.wearFactorLow ?? wearFactor / 3) * (1 + step),
        wearFactorHigh: (material.wearFactorHigh ?? wearFactor * 3) * (1 + step),
      };
      return adviseVariant({ ...c, bushing: { ...c.bushing, material: scaled } });
    },
  };
}

/**
 * One parameter over STEPS: each step's recommendation and governing margins, the largest
 * change of any option's margin from the base (swing), and each flip of the recommendation
 * in words.
 */
async function varyParameter(
  parameter: VariedParameter,
  base: AdviceResult,
  baseMargins: Record<OptionName, GoverningMargin>,
): Promise<{ result: ParameterResult; flips: string[] }> {
  const variations: Variation[] = [];
  const flips: string[] = [];
  let swing = 0;
  for (const step of STEPS) {
    const advice = await parameter.make(step);
    const margins = governingMargins(advice);
    for (const o of OPTIONS) {
      const m0 = baseMargins[o].margin,
        m1 = margins[o].margin;
      if (m0 !== null && m1 !== null) swing = Math.max(swing, Math.abs(m1 - m0));
    }
    const flip = advice.recommendation !== base.recommendation;
    if (flip)
      flips.push(
        `${parameter.label} ${step > 0 ? '+' : ''}${Math.round(step * 100)} %: ${base.recommendation ?? 'none feasible'} → ${advice.recommendation ?? 'none feasible'}`,
      );
    variations.push({
      step,
      value: parameter.base * (1 + step),
      recommendation: advice.recommendation,
      flip,
      margins,
    });
  }
  const { id, label, unit } = parameter;
  return { result: { id, label, unit, base: parameter.base, variations, swing }, flips };
}

/** The result's notes: how parameters are changed and what the margins are; names the journal design and material found. */
function sensitivityNotes(design: JournalDesign, material: BushingMaterial | undefined): string[] {
  return [
    "Each parameter is changed alone; the others keep the case's values. Margins are the smallest limit-check margin of the design found: (limit − value)/limit, positive passes.",
    'Load, speed, life target and inlet temperature re-run all three checks (the bushing and rolling bearing are re-sized and the journal design sweep re-run).',
    `Clearance: the journal design found (${design.label}) with only its radial clearance changed. Wear factor: the bushing material found${material ? ` (${material.name})` : ''}, alone, with its wear factor changed.`,
    'Inlet temperature is changed by per cent of its value in °C.',
  ];
}

/** Sensitivity of the advice of a case to each parameter (see the module comment). */
export async function computeSensitivity(
  c: CaseSI,
  assumed: Assumption[],
  opts: { rules?: LoadedRule[] } = {},
): Promise<SensitivityResult> {
  const rules = opts.rules ?? loadRules();
  const { run } = ruleRunner(rules);
  const base = await advise(c, assumed, rules, { runRules: run });
  const baseMargins = governingMargins(base);
  const journalDesign = designOf(base.checks.journal, c);
  const material = bushingMaterialFound(c, base);

  const adviseVariant: AdviseVariant = (variedCase, journalOnly = false) =>
    journalOnly
      ? advise(c, assumed, rules, {
          runRules: run,
          checks: {
            journal: checkDesign(c, { ...journalDesign, radialClearance: variedCase.journal!.radialClearance! }),
          },
        })
      : advise(variedCase, assumed, rules, { runRules: run });
  const params: VariedParameter[] = [
    ...dutyParameters(c, adviseVariant),
    clearanceParameter(c, journalDesign, adviseVariant),
  ];
  if (material) params.push(wearFactorParameter(c, material, adviseVariant));

  const parameters: ParameterResult[] = [];
  const flips: string[] = [];
  for (const p of params) {
    const varied = await varyParameter(p, base, baseMargins);
    parameters.push(varied.result);
    flips.push(...varied.flips);
  }
  parameters.sort(
    (x, y) => y.swing - x.swing || params.findIndex((p) => p.id === x.id) - params.findIndex((p) => p.id === y.id),
  );
  return {
    title: c.title,
    recommendation: base.recommendation,
    margins: baseMargins,
    parameters,
    flips,
    notes: sensitivityNotes(journalDesign, material),
  };
}
