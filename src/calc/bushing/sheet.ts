import type { CaseSI } from '../../case/types.js';
import type { SheetLine } from '../../core/check.js';
import { num } from '../../core/format.js';
import { HOUR } from './material.js';
import type { BushingMaterialResult, DutyPoint } from './types.js';

/** The temperature and PV limits the result's checks were held against. */
const tempLimit = (m: BushingMaterialResult) => m.checks.find((k) => k.id === 'temperature')?.limit ?? NaN;
const pvLimit = (m: BushingMaterialResult) => m.checks.find((k) => k.id === 'pv')?.limit ?? NaN;

/**
 * The bushing's calculation sheet for the material shown: each figure with its formula and the
 * case's numbers substituted (SI), so a reviewer can redo the arithmetic.
 */
export function bushingSheet(
  c: CaseSI,
  m: BushingMaterialResult,
  points: DutyPoint[],
  refAmbient: number,
): SheetLine[] {
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
      label: 'Frictional heat Q of the bore',
      formula: 'Q = f·F·V',
      substituted: `Q = ${m.frictionCoefficient} · ${num(g.F)} N · ${num(g.V)} m/s`,
      value: m.frictionCoefficient * g.F * g.V,
      unit: 'W',
      source: hb,
    },
    {
      label: 'Rubbing-surface temperature (advisory)',
      formula: 'T = T_amb + (T_max − T_ref)·PV/PV_max  (ΔT = R·μ·P·V, R = (T_max − T_ref)/(μ·PV_max))',
      substituted: `T = ${num(c.environment.ambient)} + (${num(tempLimit(m))} − ${num(refAmbient)})·${num(m.pv)} / ${num(pvLimit(m))}`,
      value: m.temperature,
      unit: 'degC',
      source: 'The Tribology Handbook 2nd ed. 1995, A4 (form from memory)',
    },
  ];
  const t = m.thrust;
  if (t) {
    const Fa = Math.max(...points.map((p) => p.Fa));
    lines.push(
      {
        label: 'Thrust face mean pressure p',
        formula: 'p = Fa / (π/4·(d_o² − d_i²))',
        substituted: `p = ${num(Fa)} N / (π/4·(${num(t.face.outer)}² − ${num(t.face.inner)}²))`,
        value: t.pressure,
        unit: 'Pa',
        source: hb,
      },
      {
        label: 'Thrust face wear life',
        formula: 't = δ / (Σ share·f_m·f_e·k·p·V_m·3600)',
        substituted:
          points.filter((p) => p.Fa > 0).length === 1
            ? `t = ${num(c.life.wearAllowance)} m / (${m.factors.motion}·${m.factors.environment}·${num(m.wearFactor)}·${num(t.pressure)}·${num(t.velocity)}·3600)`
            : `t = ${num(c.life.wearAllowance)} m / (Σ over the duty points with axial load, at p_max ${num(t.pressure)} Pa, V_m ${num(t.velocity)} m/s)`,
        value: t.lifeHours,
        unit: 'h',
        source: 'Archard 1953; The Tribology Handbook 2nd ed. 1995, A5',
      },
    );
  }
  return lines;
}
