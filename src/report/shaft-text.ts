import type { AdviceResult } from '../advise/engine.js';
import type { Assumption } from '../case/types.js';
import type { ShaftLoadSI, ShaftSI } from '../case/shaft-types.js';
import type { AssumedFinding, Remark } from '../core/finding.js';
import type { BeamPoint, PointLoad } from '../calc/shaft/types.js';
import { describe } from './findings/index.js';
import { adviceText } from './advice-text.js';
import { fmt, fmtValue, type UnitSystem } from './units.js';
import { table } from './table.js';
import { heading, shorten } from './text.js';

/**
 * A whole shaft for a person: the shaft as understood, its loads as resolved, a sketch to
 * scale, the reactions, the largest moment and deflection, the slopes; then each support's
 * advice in the single-support layout and the arrangement. Reads what the kernels and the
 * advisor computed; recomputes nothing.
 */

/** What the shaft advice holds that the reports read (the advisor's ShaftAdvice has these keys). */
export interface ShaftAdviceView {
  shaft: { maxDeflection: number; maxMoment: number; diagram: BeamPoint[] };
  supports: {
    name: string;
    at: number;
    diameter: number;
    reaction: { y: number; z: number; radial: number; axial: number };
    /** Slope of the shaft at the support, rad. */
    slope: number;
    advice: AdviceResult;
  }[];
  arrangement: { locating: string; summary: Remark; reasons: Remark[] };
  assumed: (Assumption | AssumedFinding)[];
  warnings: Remark[];
}

/** Support letters as the sketch marks them. */
export const SUPPORT_MARKS = ['A', 'B'] as const;

/** The relation a load came from, in words (the statics kernel resolves it; this only names it). */
export function loadRelation(l: ShaftLoadSI): string {
  return RELATIONS[loadKind(l)];
}

const RELATIONS = {
  force: 'the components as given',
  weight: 'm·g, downward (−y)',
  gear: 'Ft = 2T/d, Fr = Ft·tan αn / cos β, Fa = Ft·tan β; Fa at the pitch radius bends (My, Mz)',
  belt: 'pull factor × 2T/d, in the stated direction',
  chain: 'pull factor × 2T/d, in the stated direction',
} as const;

/** The kind of a load as written. */
export function loadKind(l: ShaftLoadSI): keyof typeof RELATIONS {
  return (['force', 'gear', 'belt', 'chain', 'weight'] as const).find((k) => k in l)!;
}

/** Slope as shown: milliradians and minutes of arc (the trade reads both). */
export function slopeText(rad: number): string {
  const a = Math.abs(rad);
  return `${fmtValue(a * 1e3, '1', 'SI')} mrad (${fmtValue((a * 180 * 60) / Math.PI, '1', 'SI', 2)}′)`;
}

const LOCATES = { both: 'locates both ways', none: 'floats', 'one-direction': 'locates one way' } as const;

/** Lowest and highest x the sketch covers: the segments, supports and loads. */
export function shaftExtent(shaft: ShaftSI): [number, number] {
  const xs = [
    ...shaft.segments.flatMap((s) => [s.from, s.to]),
    ...shaft.supports.map((s) => s.at),
    ...shaft.loads.map((l) => l.at),
  ];
  return [Math.min(...xs), Math.max(...xs)];
}

/**
 * The shaft to scale in `width` columns: loads (numbered as in the loads table) above, the shaft
 * line with its segment steps, the supports (A, B) below, and the two ends' positions.
 */
export function shaftSketch(shaft: ShaftSI, units: UnitSystem, width = 72): string[] {
  const [lo, hi] = shaftExtent(shaft);
  const span = hi - lo || 1;
  const col = (x: number) => Math.round(((x - lo) / span) * (width - 1));
  const blank = () => Array<string>(width).fill(' ');
  const marks = blank();
  const arrows = blank();
  shaft.loads.forEach((l, i) => {
    const c = col(l.at);
    const tag = String(i + 1);
    marks[c] = marks[c] === ' ' ? tag[tag.length - 1]! : '*';
    arrows[c] = 'v';
  });
  const line = Array<string>(width).fill('=');
  for (const s of shaft.segments) {
    line[col(s.from)] = '|';
    line[col(s.to)] = '|';
  }
  const sup = blank();
  shaft.supports.forEach((s, i) => {
    const c = col(s.at);
    sup[c] = '^';
    // The letter right of the mark, or left of it at the right-hand end.
    sup[c + 1 < width ? c + 1 : c - 1] = SUPPORT_MARKS[i]!;
  });
  const pad = '  ';
  const left = fmt(lo, 'm', units);
  const right = fmt(hi, 'm', units);
  const ends = left + ' '.repeat(Math.max(1, width - left.length - right.length)) + right;
  return [marks, arrows, line, sup].map((r) => pad + r.join('').trimEnd()).concat(pad + ends);
}

/** The shaft summary: speed, diameter, modulus, segments and supports, in lines of at most 100 columns. */
export function shaftSummaryLines(shaft: ShaftSI, units: UnitSystem): string[] {
  const out: string[] = [];
  const speed =
    shaft.speed !== undefined
      ? fmt(shaft.speed, 'rev/s', units)
      : shaft.oscillation
        ? `oscillating ±${fmtValue((shaft.oscillation.angle * 180) / Math.PI, '1', units)}° at ${fmtValue(shaft.oscillation.frequency, '1', units)} Hz`
        : '—';
  out.push(
    `  speed ${speed}, diameter ${fmt(shaft.diameter, 'm', units)}, modulus ${fmtValue(shaft.modulus / 1e9, '1', units)} GPa, shock ${shaft.shock}`,
  );
  for (const s of shaft.segments)
    out.push(
      `  segment ${fmt(s.from, 'm', units)} to ${fmt(s.to, 'm', units)}: diameter ${fmt(s.diameter, 'm', units)}`,
    );
  shaft.supports.forEach((s, i) =>
    out.push(
      shorten(
        `  support ${SUPPORT_MARKS[i]} "${s.name}" at ${fmt(s.at, 'm', units)}, seat ${fmt(s.diameter, 'm', units)}, ${LOCATES[s.locates]}`,
        100,
      ),
    ),
  );
  if (shaft.duty?.length) out.push(`  ${shaft.duty.length} duty points, each with its own loads`);
  return out;
}

/**
 * The loads table: each load as resolved (forces on the shaft, bending couples, the torque it
 * carries), then once per kind the relation it was resolved by.
 */
export function loadsTable(shaft: ShaftSI, resolved: PointLoad[], units: UnitSystem): string {
  const rows = table(['#', 'load', 'at', 'Fy', 'Fz', 'Fx (axial)', 'My', 'Mz', 'torque'], loadRows(resolved, units));
  const kinds = [...new Set(shaft.loads.map(loadKind))];
  return [rows, ...kinds.map((k) => shorten(`  ${k}: ${RELATIONS[k]}`, 100))].join('\n');
}

/** Rounding noise of the kernels' trigonometry (cos 90° = 6e-17) shown as the zero it is: below 1e-9 of the largest. */
const clean = (v: number, scale: number) => (Math.abs(v) < 1e-9 * scale ? 0 : v);

/** The resolved loads as table cells: number, label, position, forces, couples, torque. */
export function loadRows(resolved: PointLoad[], units: UnitSystem): string[][] {
  const f = Math.max(0, ...resolved.flatMap((p) => [Math.abs(p.fx), Math.abs(p.fy), Math.abs(p.fz)]));
  const m = Math.max(0, ...resolved.flatMap((p) => [Math.abs(p.my), Math.abs(p.mz), Math.abs(p.torque)]));
  return resolved.map((p, i) => [
    String(i + 1),
    p.label,
    fmt(p.at, 'm', units),
    fmt(clean(p.fy, f), 'N', units),
    fmt(clean(p.fz, f), 'N', units),
    fmt(clean(p.fx, f), 'N', units),
    fmt(clean(p.my, m), 'N*m', units),
    fmt(clean(p.mz, m), 'N*m', units),
    fmt(clean(p.torque, m), 'N*m', units),
  ]);
}

/** The reactions table: the forces each support exerts on the shaft, and the shaft's slope there. */
export function reactionsTable(a: ShaftAdviceView, units: UnitSystem): string {
  return table(
    ['support', 'at', 'Ry', 'Rz', 'radial', 'axial', 'slope'],
    a.supports.map((s, i) => [
      `${SUPPORT_MARKS[i]} ${s.name}`,
      fmt(s.at, 'm', units),
      fmt(s.reaction.y, 'N', units),
      fmt(s.reaction.z, 'N', units),
      fmt(s.reaction.radial, 'N', units),
      fmt(s.reaction.axial, 'N', units),
      slopeText(s.slope),
    ]),
  );
}

/** The whole shaft's text: shaft, loads, sketch, reactions, each support's advice, the arrangement. */
export function shaftAdviceText(
  shaft: ShaftSI,
  resolved: PointLoad[],
  a: ShaftAdviceView,
  units: UnitSystem,
  explain = false,
): string {
  const out: string[] = [heading('Shaft'), ...shaftSummaryLines(shaft, units), ''];
  out.push('Loads on the shaft, as resolved (forces on the shaft, couples about the axes):');
  out.push(loadsTable(shaft, resolved, units), '');
  out.push('Sketch (to scale along the shaft; v load, ^ support, | diameter step):');
  out.push(...shaftSketch(shaft, units), '');
  out.push('Reactions (the forces the supports exert on the shaft):');
  out.push(reactionsTable(a, units));
  out.push(
    `  largest bending moment ${fmt(a.shaft.maxMoment, 'N*m', units)}, largest deflection ${fmt(a.shaft.maxDeflection, 'um', units)}`,
  );
  const parts = [out.join('\n')];
  a.supports.forEach((s, i) => {
    const head = heading(`Support ${SUPPORT_MARKS[i]}: ${s.name}, at ${fmt(s.at, 'm', units)}`);
    parts.push(
      `${head}\n  seat ${fmt(s.diameter, 'm', units)}, radial ${fmt(s.reaction.radial, 'N', units)}, axial ${fmt(s.reaction.axial, 'N', units)}, slope ${slopeText(s.slope)}\n\n${adviceText(s.advice, units, explain)}`,
    );
  });
  parts.push(
    [
      heading('Arrangement'),
      describe(a.arrangement.summary),
      ...a.arrangement.reasons.map((r) => `  - ${describe(r)}`),
    ].join('\n'),
  );
  return parts.join('\n\n');
}
