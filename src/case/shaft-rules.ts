import type { Problem } from '../core/errors.js';
import { num } from '../core/format.js';
import type { ShaftCaseFile, ShaftLoadFile } from './shaft-schema.js';

/**
 * The rules of a shaft case that involve more than one field: segments end to end, exactly two
 * supports at different places with one way of locating the shaft axially, each load of one
 * kind, every position on the shaft, a motion, the room for each support. Each problem names its
 * field (paths as the file writes them).
 */

/** Positions closer than this are the same place, m (a unit conversion's rounding). */
export const SAME_PLACE = 1e-6;

const KINDS = ['force', 'gear', 'belt', 'chain', 'weight'] as const;

const mm = (m: number) => `${num(m * 1000)} mm`;

/** The length of shaft a case describes, m: the segments' span when they alone give the diameter, else unbounded. */
export function shaftExtent(file: ShaftCaseFile): { from: number; to: number } | undefined {
  const segs = file.shaft.segments;
  if (!segs || file.shaft.diameter !== undefined) return undefined;
  return { from: Math.min(...segs.map((s) => s.from)), to: Math.max(...segs.map((s) => s.to)) };
}

export function shaftProblems(file: ShaftCaseFile): Problem[] {
  return [...geometryProblems(file), ...supportProblems(file), ...loadProblems(file), ...motionProblems(file)];
}

function geometryProblems(file: ShaftCaseFile): Problem[] {
  const problems: Problem[] = [];
  const segs = file.shaft.segments;
  if (!segs && file.shaft.diameter === undefined) {
    problems.push({
      field: 'shaft.diameter',
      message: 'missing; expected a length such as "60 mm" (or shaft.segments giving the diameter along the shaft)',
    });
  }
  if (!segs) return problems;
  segs.forEach((s, i) => {
    if (!(s.to > s.from))
      problems.push({
        field: `shaft.segments[${i}]`,
        message: `runs from ${mm(s.from)} to ${mm(s.to)}; expected "to" beyond "from"`,
      });
  });
  if (problems.length) return problems;
  const order = segs.map((s, i) => ({ ...s, i })).sort((a, b) => a.from - b.from);
  for (let k = 1; k < order.length; k++) {
    const prev = order[k - 1]!;
    const s = order[k]!;
    const step = s.from - prev.to;
    const span = `the segment from ${mm(prev.from)} to ${mm(prev.to)}`;
    if (step > SAME_PLACE)
      problems.push({
        field: `shaft.segments[${s.i}]`,
        message: `starts at ${mm(s.from)}, a gap of ${mm(step)} after ${span}; expected segments that meet end to end`,
      });
    else if (step < -SAME_PLACE)
      problems.push({
        field: `shaft.segments[${s.i}]`,
        message: `starts at ${mm(s.from)}, overlapping ${span} by ${mm(Math.min(-step, s.to - s.from))}; expected segments that meet end to end`,
      });
  }
  return problems;
}

function supportProblems(file: ShaftCaseFile): Problem[] {
  const problems: Problem[] = [];
  const sup = file.shaft.supports;
  if (sup.length !== 2) {
    problems.push({
      field: 'shaft.supports',
      message: `got ${sup.length} support${sup.length === 1 ? '' : 's'}; expected exactly two (the shaft is a beam on two supports)`,
    });
  }
  const extent = shaftExtent(file);
  sup.forEach((s, i) => {
    const where = outside(s.at, extent);
    if (where) problems.push({ field: `shaft.supports[${i}].at`, message: where });
    for (let j = 0; j < i; j++) {
      if (Math.abs(s.at - sup[j]!.at) < SAME_PLACE)
        problems.push({
          field: `shaft.supports[${i}].at`,
          message: `got ${mm(s.at)}, the position of shaft.supports[${j}] ("${sup[j]!.name}"); expected the two supports at different positions`,
        });
      if (s.name === sup[j]!.name)
        problems.push({
          field: `shaft.supports[${i}].name`,
          message: `got "${s.name}", the name of shaft.supports[${j}]; expected a name of its own`,
        });
    }
    const room = s.space ?? file.space;
    const d = s.diameter ?? diameterAt(file, s.at);
    if (room && d !== undefined && room.maxOuterDiameter <= d) {
      problems.push({
        field: s.space ? `shaft.supports[${i}].space.maxOuterDiameter` : 'space.maxOuterDiameter',
        message: `got ${mm(room.maxOuterDiameter)}, not more than the seat diameter ${mm(d)} of "${s.name}"; expected a housing bore larger than the shaft`,
      });
    }
  });
  if (!file.space && sup.some((s) => !s.space)) {
    problems.push({
      field: 'space',
      message: `missing; expected a mapping with keys: maxLength, maxOuterDiameter (or a space on every support; "${sup.find((s) => !s.space)!.name}" gives none)`,
    });
  }
  if (sup.length === 2) {
    const [a, b] = [sup[0]!.locates ?? 'none', sup[1]!.locates ?? 'none'];
    const both = [a, b].filter((l) => l === 'both').length;
    const one = [a, b].filter((l) => l === 'one-direction').length;
    if (both === 2 || (both === 1 && one === 1)) {
      problems.push({
        field: 'shaft.supports',
        message:
          both === 2
            ? 'both supports say locates: true; the shaft would be over-constrained axially (no room for its thermal growth); expected one locating support and the other free (locates: false), or both one-direction'
            : 'one support locates both ways and the other one way; the shaft would be over-constrained axially; expected the other free (locates: false), or both one-direction',
      });
    } else if (both === 0 && one < 2) {
      problems.push({
        field: 'shaft.supports',
        message:
          one === 1
            ? 'only one support locates one way; the shaft has no locating support for thrust the other way; expected one support with locates: true, or both one-direction (a cross-located pair)'
            : 'no support locates the shaft axially; expected one support with locates: true, or both one-direction (a cross-located pair)',
      });
    }
  }
  return problems;
}

function loadProblems(file: ShaftCaseFile): Problem[] {
  const problems: Problem[] = [];
  const extent = shaftExtent(file);
  const check = (loads: ShaftLoadFile[], at: string) =>
    loads.forEach((l, i) => {
      const field = `${at}[${i}]`;
      const kinds = KINDS.filter((k) => l[k] !== undefined);
      if (kinds.length > 1) {
        problems.push({
          field,
          message: `gives both ${kinds.join(' and ')}; expected one of ${KINDS.join(', ')} per load (write two loads at the same position)`,
        });
      } else if (kinds.length === 0 && l.axial === undefined) {
        problems.push({ field, message: `gives none of ${KINDS.join(', ')}; expected one of them` });
      } else if (l.axial !== undefined && kinds.length === 1 && kinds[0] !== 'force') {
        problems.push({
          field: `${field}.axial`,
          message: `given with a ${kinds[0]}; expected axial only beside force${kinds[0] === 'gear' ? " (a gear's axial force comes from its helix angle)" : ''}`,
        });
      }
      if (l.force && l.force.y === undefined && l.force.z === undefined) {
        problems.push({ field: `${field}.force`, message: 'gives neither y nor z; expected at least one component' });
      }
      const where = outside(l.at, extent);
      if (where) problems.push({ field: `${field}.at`, message: where });
    });
  if (file.shaft.loads) check(file.shaft.loads, 'shaft.loads');
  file.duty?.forEach((p, k) => {
    if (p.loads) check(p.loads, `duty[${k}].loads`);
  });
  if (!file.shaft.loads && !(file.duty && file.duty.every((p) => p.loads))) {
    problems.push({
      field: 'shaft.loads',
      message:
        'missing; expected a list of loads, each { at, force | gear | belt | chain | weight } (or loads on every duty point)',
    });
  }
  return problems;
}

/** Speed or oscillation (not both), duty shares adding to 1: as a single case. */
function motionProblems(file: ShaftCaseFile): Problem[] {
  const problems: Problem[] = [];
  const { shaft, duty } = file;
  if (shaft.speed !== undefined && shaft.oscillation !== undefined) {
    problems.push({ field: 'shaft', message: 'gives both speed and oscillation; expected one of them' });
  }
  if (shaft.speed === undefined && shaft.oscillation === undefined && !(duty && duty.every((p) => p.speed))) {
    problems.push({
      field: 'shaft.speed',
      message: 'missing; expected a speed such as "1500 rpm", or shaft.oscillation, or a speed on every duty point',
    });
  }
  if (shaft.oscillation && duty?.some((p) => p.speed !== undefined)) {
    problems.push({
      field: 'duty',
      message:
        'operating points give speeds but the shaft oscillates; expected no speed on the points of an oscillating shaft',
    });
  }
  if (duty) {
    const sum = duty.reduce((s, p) => s + p.share, 0);
    if (Math.abs(sum - 1) > 0.005)
      problems.push({ field: 'duty', message: `shares add up to ${+sum.toFixed(4)}; expected them to add up to 1` });
  }
  return problems;
}

/** Why a position is off the shaft, or undefined when it is on it. */
function outside(at: number, extent: { from: number; to: number } | undefined): string | undefined {
  if (!extent || (at >= extent.from - SAME_PLACE && at <= extent.to + SAME_PLACE)) return undefined;
  return `got ${mm(at)}, outside the shaft's segments (${mm(extent.from)} to ${mm(extent.to)}); expected a position on the shaft, or shaft.diameter for the shaft beyond the segments`;
}

/** The segment holding position `at` (the nearer x = 0 of two that meet there), if any. */
export function segmentAt(file: ShaftCaseFile, at: number): { from: number; to: number; diameter: number } | undefined {
  return [...(file.shaft.segments ?? [])]
    .sort((a, b) => a.from - b.from)
    .find((s) => at >= s.from - SAME_PLACE && at <= s.to + SAME_PLACE);
}

/** The shaft's diameter at `at`, m: its segment's, else shaft.diameter. */
export function diameterAt(file: ShaftCaseFile, at: number): number | undefined {
  return segmentAt(file, at)?.diameter ?? file.shaft.diameter;
}
