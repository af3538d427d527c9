import { num } from '../core/format.js';
import type { Problem } from '../core/errors.js';
import type { Assumption, CaseSI, Priority } from './types.js';
import type { CaseFile } from './schema.js';
import { PRIORITIES } from './schema.js';
import { BALL_KINDS } from '../core/rolling-kinds.js';
import { rollingSeries } from './rolling-series.js';

/** A supplier bore within this of the shaft diameter is the shaft diameter, m (a unit conversion's rounding). */
const BORE_MATCH = 1e-5;

/**
 * Defaults applied to a case that leaves a value out. Each is recorded as an
 * assumption so every output lists it. Values marked "common practice" are
 * habits of the trade, not published limits; the others are neutral choices
 * the user should replace with the machine's own figures.
 */
export const DEFAULTS = {
  axial: { value: 0, reason: 'no axial load given' },
  shock: { value: 'none' as const, reason: 'no shock level given' },
  wearAllowance: {
    value: 0.25e-3,
    reason:
      'no wear allowance given; 0.25 mm radial is a neutral starting figure, replace it with what the machine tolerates',
  },
  reliability: { value: 90, reason: 'basic rating life reliability (ISO 281)' },
  supply: { value: 'none' as const, reason: 'no lubricant supply named: the worst case is assumed' },
  inletTemperature: { value: 40, reason: 'no oil inlet temperature given (40 °C, the ISO VG reference temperature)' },
  ambient: { value: 25, reason: 'no ambient temperature given' },
  contamination: { value: 'normal' as const, reason: 'no contamination level given' },
  startsPerHour: { value: 1, reason: 'no start frequency given' },
  priority: { value: 3, reason: 'neutral priority (1 = unimportant, 5 = essential)' },
};

/**
 * Complete a parsed case file into the SI case the kernels use, applying the
 * defaults and checking the rules that involve more than one field.
 * `knownGrades` and `knownMaterials` are the ids in data/ the case may name.
 */
export function completeCase(
  file: CaseFile,
  knownGrades: number[],
  knownMaterials: string[],
): { case: CaseSI; assumed: Assumption[]; problems: Problem[] } {
  const assumed: Assumption[] = [];
  const take = <T>(field: string, given: T | undefined, d: { value: T; reason: string }, show = String(d.value)): T => {
    if (given !== undefined) return given;
    assumed.push({ field, value: show, reason: d.reason });
    return d.value;
  };

  const problems = [...motionProblems(file), ...choiceProblems(file, knownGrades, knownMaterials)];
  const { shaft } = file;
  const hasDuty = file.duty !== undefined;
  const radial = file.load?.radial;
  const lub = file.lubrication ?? {};
  const d = shaft.diameter;

  const priorities = {} as Record<Priority, number>;
  for (const p of PRIORITIES) {
    priorities[p] = take(`priorities.${p}`, file.priorities?.[p], DEFAULTS.priority);
  }

  const c: CaseSI = {
    title: file.title,
    shaft: { diameter: d },
    load: {
      radial: radial ?? Math.max(...(file.duty ?? []).map((p) => p.radial)),
      axial: take('load.axial', file.load?.axial, DEFAULTS.axial, '0 N'),
      shock: take('load.shock', file.load?.shock, DEFAULTS.shock),
      ...(file.load?.atStart !== undefined ? { atStart: file.load.atStart } : {}),
    },
    life: {
      hours: file.life.hours,
      wearAllowance: take('life.wearAllowance', file.life.wearAllowance, DEFAULTS.wearAllowance, '0.25 mm'),
      reliability: take('life.reliability', file.life.reliability, DEFAULTS.reliability, '90 %'),
    },
    space: { ...file.space },
    lubrication: {
      supply: take('lubrication.supply', lub.supply, DEFAULTS.supply),
      inletTemperature: take(
        'lubrication.inletTemperature',
        lub.inletTemperature,
        DEFAULTS.inletTemperature,
        '40 degC',
      ),
    },
    environment: {
      ambient: take('environment.ambient', file.environment?.ambient, DEFAULTS.ambient, '25 degC'),
      contamination: take('environment.contamination', file.environment?.contamination, DEFAULTS.contamination),
      startsPerHour: take('environment.startsPerHour', file.environment?.startsPerHour, DEFAULTS.startsPerHour),
      ...(file.environment?.medium !== undefined ? { medium: file.environment.medium } : {}),
    },
    priorities,
  };
  if (radial === undefined && hasDuty) {
    assumed.push({
      field: 'load.radial',
      value: `${c.load.radial} N`,
      reason: 'taken as the largest radial load of the duty points',
    });
  }
  if (shaft.speed !== undefined) c.shaft.speed = shaft.speed;
  if (shaft.oscillation) c.shaft.oscillation = { ...shaft.oscillation };
  if (shaft.misalignment !== undefined) c.shaft.misalignment = shaft.misalignment;
  if (file.duty) {
    c.duty = file.duty.map((p) => {
      const point: CaseSI['duty'] extends (infer T)[] | undefined ? T : never = {
        share: p.share,
        radial: p.radial,
        axial: p.axial ?? 0,
      };
      if (p.speed !== undefined) point.speed = p.speed;
      return point;
    });
  }
  if (lub.oil !== undefined) c.lubrication.oilGrade = lub.oil;
  if (lub.viscosity !== undefined) c.lubrication.viscosity = lub.viscosity;
  if (lub.regreaseInterval !== undefined) c.lubrication.regreaseInterval = lub.regreaseInterval;
  if (file.bushing) c.bushing = stripUndefined(file.bushing);
  if (file.rolling) c.rolling = stripUndefined(file.rolling);
  if (file.journal) c.journal = stripUndefined(file.journal);
  return { case: c, assumed, problems };
}

/** Problems of the motion and the load: speed or oscillation (not both), a radial load, duty shares adding up to 1. */
function motionProblems(file: CaseFile): Problem[] {
  const problems: Problem[] = [];
  const shaft = file.shaft;
  const hasDuty = file.duty !== undefined;
  if (shaft.speed !== undefined && shaft.oscillation !== undefined) {
    problems.push({ field: 'shaft', message: 'gives both speed and oscillation; expected one of them' });
  }
  if (
    shaft.speed === undefined &&
    shaft.oscillation === undefined &&
    !(hasDuty && file.duty!.every((p) => p.speed !== undefined))
  ) {
    problems.push({
      field: 'shaft.speed',
      message: 'missing; expected a speed such as "1500 rpm", or shaft.oscillation, or a speed on every duty point',
    });
  }
  if (shaft.oscillation && hasDuty && file.duty!.some((p) => p.speed !== undefined)) {
    problems.push({
      field: 'duty',
      message:
        'operating points give speeds but the shaft oscillates; expected no speed on the points of an oscillating shaft',
    });
  }
  const radial = file.load?.radial;
  if (radial === undefined && !hasDuty) {
    problems.push({
      field: 'load.radial',
      message: 'missing; expected a force such as "3.2 kN" or "720 lbf" (or a duty list)',
    });
  }
  if (hasDuty) {
    const sum = file.duty!.reduce((s, p) => s + p.share, 0);
    if (Math.abs(sum - 1) > 0.005) {
      problems.push({ field: 'duty', message: `shares add up to ${+sum.toFixed(4)}; expected them to add up to 1` });
    }
  }

  return problems;
}

/**
 * Problems of the choices a case names: one of oil and viscosity, a known grade and material,
 * wear factors in order, one form of journal clearance, both supplier ratings or neither, a
 * housing larger than the shaft.
 */
function choiceProblems(file: CaseFile, knownGrades: number[], knownMaterials: string[]): Problem[] {
  const problems: Problem[] = [];
  const lub = file.lubrication ?? {};
  if (lub.oil !== undefined && lub.viscosity !== undefined) {
    problems.push({ field: 'lubrication', message: 'gives both oil and viscosity; expected one of them' });
  }
  if (lub.oil !== undefined && !knownGrades.includes(lub.oil)) {
    problems.push({
      field: 'lubrication.oil',
      message: `got ISO VG ${lub.oil}; expected one of the grades in data/lubricants.json: ${knownGrades.map((g) => `VG ${g}`).join(', ')}`,
    });
  }
  const mat = file.bushing?.material;
  if (typeof mat === 'string' && !knownMaterials.includes(mat)) {
    problems.push({
      field: 'bushing.material',
      message: `got "${mat}"; expected one of the materials in data/bushing-materials.json: ${knownMaterials.join(', ')}, or an inline material`,
    });
  }
  if (typeof mat === 'object') {
    const lo = mat.wearFactorLow ?? mat.wearFactor;
    const hi = mat.wearFactorHigh ?? mat.wearFactor;
    if (!(lo <= mat.wearFactor && mat.wearFactor <= hi)) {
      problems.push({
        field: 'bushing.material',
        message: 'wear factors out of order; expected wearFactorLow ≤ wearFactor ≤ wearFactorHigh',
      });
    }
  }
  if (file.journal?.radialClearance !== undefined && file.journal.clearanceRatio !== undefined) {
    problems.push({ field: 'journal', message: 'gives both radialClearance and clearanceRatio; expected one of them' });
  }
  const r = file.rolling;
  if (r?.series !== undefined && !rollingSeries().includes(r.series)) {
    problems.push({
      field: 'rolling.series',
      message: `got "${r.series}"; expected one of the dimension series of the tables: ${rollingSeries().join(', ')}`,
    });
  }
  if (r && (r.dynamicRating === undefined) !== (r.staticRating === undefined)) {
    problems.push({
      field: 'rolling',
      message: 'gives only one of dynamicRating and staticRating; expected both supplier ratings or neither',
    });
  }
  const d = file.shaft.diameter;
  if (r?.bore !== undefined && Math.abs(r.bore - d) > BORE_MATCH) {
    problems.push({
      field: 'rolling.bore',
      message: `got ${fmtMm(r.bore)}; expected the shaft diameter ${fmtMm(d)} (the bearing's bore sits on the shaft)`,
    });
  }
  if (r?.kind !== undefined && r.type !== undefined && BALL_KINDS.has(r.kind) !== (r.type === 'ball')) {
    problems.push({
      field: 'rolling.type',
      message: `got "${r.type}" for a ${r.kind} bearing; expected "${BALL_KINDS.has(r.kind) ? 'ball' : 'roller'}" or no type`,
    });
  }
  if (file.space.maxOuterDiameter <= d) {
    problems.push({
      field: 'space.maxOuterDiameter',
      message: `got ${fmtMm(file.space.maxOuterDiameter)}, not more than the shaft diameter ${fmtMm(d)}; expected a housing bore larger than the shaft`,
    });
  }

  return problems;
}

function stripUndefined<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
}

function fmtMm(m: number): string {
  return `${num(m * 1000)} mm`;
}
