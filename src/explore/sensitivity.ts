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
 * A flip is a change of the recommendation. A check whose margin no step of any parameter
 * moves and that passes (a fixed geometric check such as a bearing filling its housing room) is left out of
 * the governing margin, and named in the result's `fixed`, so the margin shown is one the
 * swept inputs act on.
 *
 * Parameters: load (every duty point, radial and axial), speed (every point; an oscillating
 * shaft's frequency), life target, oil inlet temperature (in kelvin: −10, −4, +4, +10 K),
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
  /** The governing check's own words (its label); empty when the option has no check. */
  label: string;
  margin: number | null;
}

export interface Variation {
  /** The step as a share (−0.25 … +0.25); for the inlet temperature, a share of INLET_SPAN. */
  step: number;
  /** The change made: a fraction of the case's value, or kelvin for the inlet temperature (see `changeUnit`). */
  change: number;
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
  /** How `change` is counted: a fraction of the case's value ('1') or kelvin ('K'). */
  changeUnit: '1' | 'K';
  variations: Variation[];
  /** Largest change of any option's governing margin over the steps (for sorting the tornado). */
  swing: number;
}

export interface SensitivityResult {
  title: string;
  recommendation: OptionName | null;
  margins: Record<OptionName, GoverningMargin>;
  /** Per option, the checks no step moved (left out of its governing margin): id and label. */
  fixed: Record<OptionName, { check: string; label: string }[]>;
  parameters: ParameterResult[];
  /** Every flip, in words. */
  flips: string[];
  notes: string[];
}

/** The governing limit check, leaving out the checks in `fixed` unless nothing else is left. */
const minLimit = (checks: readonly CheckRecord[] | null, fixed: ReadonlySet<string> = new Set()): GoverningMargin => {
  if (!checks) return { check: '', label: '', margin: null };
  const moving = checks.filter((k) => !fixed.has(k.id));
  const k = governingCheck(moving.some((x) => !x.advisory) ? moving : checks);
  return k ? { check: k.id, label: k.label, margin: k.margin } : { check: '', label: '', margin: null };
};

/** The checks of each option's design found (null when there is none). */
function designChecks(a: AdviceResult): Record<OptionName, CheckRecord[] | null> {
  const pick = (o: OptionName) => a.ranking.find((r) => r.option === o)!.design;
  const b = a.checks.bushing.materials.find((m) => m.id === pick('bushing')['material']);
  const r = a.checks.rolling.candidates.find((k) => k.id === pick('rolling')['bearing']);
  return { bushing: b?.checks ?? null, rolling: r?.checks ?? null, journal: a.checks.journal.checks };
}

/** Each option's governing margin in an advice (every limit check counted). */
export function governingMargins(a: AdviceResult): Record<OptionName, GoverningMargin> {
  const c = designChecks(a);
  return { bushing: minLimit(c.bushing), rolling: minLimit(c.rolling), journal: minLimit(c.journal) };
}

/** Per option, the passing limit checks whose margin is the same (to 1e-9) in the case and at every step. */
function fixedChecks(all: Record<OptionName, CheckRecord[] | null>[]): Record<OptionName, Map<string, string>> {
  const out = {} as Record<OptionName, Map<string, string>>;
  for (const o of OPTIONS) {
    const seen = new Map<string, { label: string; margin: number; same: boolean; count: number }>();
    for (const a of all)
      for (const k of a[o] ?? []) {
        if (k.advisory) continue;
        const s = seen.get(k.id);
        // A fixed check that fails stays in: it decides feasibility whatever the inputs do.
        if (!s) seen.set(k.id, { label: k.label, margin: k.margin, same: k.pass, count: 1 });
        else {
          s.count++;
          if (Math.abs(s.margin - k.margin) > 1e-9 || !k.pass) s.same = false;
        }
      }
    out[o] = new Map([...seen].filter(([, s]) => s.same && s.count === all.length).map(([id, s]) => [id, s.label]));
  }
  return out;
}

/** One parameter to vary: what it is, its value in the case, and the advice at a step (−0.25 … +0.25). */
interface VariedParameter {
  id: ParameterId;
  label: string;
  unit: string;
  base: number;
  /** Steps are kelvin (the inlet temperature, step × INLET_SPAN) rather than a fraction of the value. */
  kelvin?: boolean;
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
      label: 'Oil inlet temperature',
      unit: 'degC',
      base: c.lubrication.inletTemperature,
      kelvin: true,
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
): Promise<{ result: ParameterResult; checks: Record<OptionName, CheckRecord[] | null>[] }> {
  const variations: Variation[] = [];
  const checks: Record<OptionName, CheckRecord[] | null>[] = [];
  for (const step of STEPS) {
    const advice = await parameter.make(step);
    checks.push(designChecks(advice));
    variations.push({
      step,
      change: parameter.kelvin ? step * INLET_SPAN : step,
      value: parameter.kelvin ? parameter.base + step * INLET_SPAN : parameter.base * (1 + step),
      recommendation: advice.recommendation,
      flip: advice.recommendation !== base.recommendation,
      margins: governingMargins(advice),
    });
  }
  const { id, label, unit } = parameter;
  const changeUnit = parameter.kelvin ? ('K' as const) : ('1' as const);
  return { result: { id, label, unit, base: parameter.base, changeUnit, variations, swing: 0 }, checks };
}

/** A step as written: "+10 %", or "−4 K" for the inlet temperature. */
export function changeText(v: Pick<Variation, 'change'>, unit: ParameterResult['changeUnit']): string {
  const sign = v.change > 0 ? '+' : v.change < 0 ? '-' : '';
  return unit === 'K'
    ? `${sign}${+Math.abs(v.change).toPrecision(3)} K`
    : `${sign}${Math.round(Math.abs(v.change) * 100)} %`;
}

/**
 * The governing margins again without the fixed checks, each parameter's swing (the largest
 * change of any option's governing margin from the case's) and every flip in words.
 */
function settle(
  parameters: ParameterResult[],
  checks: Record<OptionName, CheckRecord[] | null>[][],
  baseChecks: Record<OptionName, CheckRecord[] | null>,
  base: AdviceResult,
  fixed: Record<OptionName, Map<string, string>>,
): { margins: Record<OptionName, GoverningMargin>; flips: string[] } {
  const margins = (c: Record<OptionName, CheckRecord[] | null>) =>
    Object.fromEntries(OPTIONS.map((o) => [o, minLimit(c[o], new Set(fixed[o].keys()))])) as Record<
      OptionName,
      GoverningMargin
    >;
  const baseMargins = margins(baseChecks);
  const flips: string[] = [];
  parameters.forEach((p, i) => {
    p.variations.forEach((v, j) => {
      v.margins = margins(checks[i]![j]!);
      for (const o of OPTIONS) {
        const m0 = baseMargins[o].margin,
          m1 = v.margins[o].margin;
        if (m0 !== null && m1 !== null) p.swing = Math.max(p.swing, Math.abs(m1 - m0));
      }
      if (v.flip)
        flips.push(
          `${p.label} ${changeText(v, p.changeUnit)}: ${base.recommendation ?? 'none feasible'} → ${v.recommendation ?? 'none feasible'}`,
        );
    });
  });
  return { margins: baseMargins, flips };
}

/** The result's notes: how parameters are changed and what the margins are; names the journal design and material found. */
function sensitivityNotes(design: JournalDesign, material: BushingMaterial | undefined): string[] {
  return [
    "Each parameter is changed alone; the others keep the case's values. Margins are the smallest limit-check margin of the design found: (limit − value)/limit, positive passes.",
    'Load, speed, life target and inlet temperature re-run all three checks (the bushing and rolling bearing are re-sized and the journal design sweep re-run).',
    `Clearance: the journal design found (${design.label}) with only its radial clearance changed. Wear factor: the bushing material found${material ? ` (${material.name})` : ''}, alone, with its wear factor changed.`,
    `Oil inlet temperature is changed in kelvin: ${STEPS.map((x) => `${x > 0 ? '+' : '-'}${Math.abs(x * INLET_SPAN)} K`).join(', ')} (a percentage of a Celsius value has no meaning).`,
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
  const checks: Record<OptionName, CheckRecord[] | null>[][] = [];
  for (const p of params) {
    const varied = await varyParameter(p, base);
    parameters.push(varied.result);
    checks.push(varied.checks);
  }
  const baseChecks = designChecks(base);
  const fixedIds = fixedChecks([baseChecks, ...checks.flat()]);
  const { margins, flips } = settle(parameters, checks, baseChecks, base, fixedIds);
  const order = parameters.map((p) => p.id);
  parameters.sort((x, y) => y.swing - x.swing || order.indexOf(x.id) - order.indexOf(y.id));
  const fixed = Object.fromEntries(
    OPTIONS.map((o) => [o, [...fixedIds[o]].map(([check, label]) => ({ check, label }))]),
  ) as SensitivityResult['fixed'];
  return {
    title: c.title,
    recommendation: base.recommendation,
    margins,
    fixed,
    parameters,
    flips,
    notes: sensitivityNotes(journalDesign, material),
  };
}
