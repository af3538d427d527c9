import type { CaseSI } from '../../case/types.js';
import type { SheetLine } from '../../core/check.js';
import { num } from '../../core/format.js';
import { HOUR } from './material.js';
import type { BushingMaterialResult, DutyPoint } from './types.js';

/**
 * The bushing's calculation sheet for the material shown: each figure with its formula and the
 * case's numbers substituted (SI), so a reviewer can redo the arithmetic.
 */
export function bushingSheet(c: CaseSI, m: BushingMaterialResult, points: DutyPoint[]): SheetLine[] {
  const D = c.shaft.diameter;
  const L = m.length;
  const g = points.reduce((a, b) => (b.F * b.V > a.F * a.V ? b : a));
  const Fmax = Math.max(...points.map((p) => p.F));
  const hb = 'The Tribology Handbook 2nd ed. 1995, A4-A5';
  const of = ` (${m.name}, ${num(L * 1000, 3)} mm long)`;
  const lines: SheetLine[] = [
    {
      label: `Mean pressure P${of}`,
      formula: 'P = F/(D·L)',
      substituted: `P = ${num(Fmax)} N / (${num(D)} m · ${num(L)} m)`,
      value: m.pressure,
      unit: 'Pa',
      source: hb,
    },
    {
      label: 'Peak pressure p_peak',
      formula: 'p_peak = 4F/(π·D·L)',
      substituted: `p_peak = 4·${num(Fmax)} N / (π·${num(D)} m · ${num(L)} m)`,
      value: m.peakPressure,
      unit: 'Pa',
      source: hb,
    },
    c.shaft.oscillation
      ? {
          label: 'Mean sliding speed V',
          formula: 'V = θ·D·f',
          substituted: `V = ${num(c.shaft.oscillation.angle)} rad · ${num(D)} m · ${num(c.shaft.oscillation.frequency)} Hz`,
          value: m.velocity,
          unit: 'm/s',
          source: 'kinematics of oscillation',
        }
      : {
          label: 'Sliding speed V',
          formula: 'V = π·D·N',
          substituted: `V = π·${num(D)} m · ${num(m.velocity / (Math.PI * D))} rev/s`,
          value: m.velocity,
          unit: 'm/s',
          source: hb,
        },
    {
      label: 'PV',
      formula: 'PV = F·V/(D·L), largest over the duty',
      substituted: `PV = ${num(g.F)} N · ${num(g.V)} m/s / (${num(D)} m · ${num(L)} m)`,
      value: m.pv,
      unit: 'Pa*m/s',
      source: hb,
    },
    {
      label: 'Wear depth at life target',
      formula: 'h = Σ share·f_m·f_e·k·p_peak·V·t',
      substituted:
        points.length === 1
          ? `h = ${m.factors.motion}·${m.factors.environment}·${num(m.wearFactor)} m^2/N · ${num(m.peakPressure)} Pa · ${num(m.velocity)} m/s · ${num(c.life.hours * HOUR)} s`
          : `h = Σ over ${points.length} duty points, ${m.factors.motion}·${m.factors.environment}·${num(m.wearFactor)} m^2/N · p_peak,i · V_i · share_i · ${num(c.life.hours * HOUR)} s`,
      value: m.wearDepth,
      unit: 'm',
      source: 'Archard 1953; The Tribology Handbook 2nd ed. 1995, A5',
    },
    {
      label: 'Wear life',
      formula: 't = allowance / (h/T)',
      substituted: `t = ${num(c.life.wearAllowance)} m / (${num(m.wearDepth)} m / ${num(c.life.hours)} h)`,
      value: m.lifeHours,
      unit: 'h',
      source: 'Archard 1953',
    },
    {
      label: 'Frictional heat Q',
      formula: 'Q = f·F·V',
      substituted: `Q = ${m.frictionCoefficient} · ${num(g.F)} N · ${num(g.V)} m/s`,
      value: m.frictionPower,
      unit: 'W',
      source: hb,
    },
  ];
  return lines;
}
