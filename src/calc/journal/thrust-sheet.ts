import type { SheetLine } from '../../core/check.js';
import { num } from '../../core/format.js';
import { padRectangle } from '../thrust/pad-bearing.js';
import type { JournalThrust } from './thrust.js';

/**
 * The thrust face's lines of the journal's calculation sheet: for the pad thrust bearing its
 * governing point (smallest film) — pad size, unit load, film by load matching, power and
 * heat balance; for the rubbing face its pressure, sliding speed, PV and wear life. Formulas
 * and sources are those of src/calc/thrust/pad-bearing.ts and rubbing.ts. SI values.
 */

const PAD_SOURCE = 'Reynolds (1886) equation solved on the pad (src/calc/thrust/pad.ts)';
const line = (
  label: string,
  formula: string,
  substituted: string,
  value: number,
  unit: string,
  source: string,
): SheetLine => ({ label, formula, substituted, value, unit, source });

/** The sheet lines of thrust path `t` (none without one). */
export function thrustSheet(t: JournalThrust | null): SheetLine[] {
  if (!t) return [];
  if (t.path === 'pad' && t.pad) return padLines(t);
  const r = t.rubbing;
  if (!r) return [];
  const { inner, outer } = r.face;
  return [
    line(
      'Thrust face mean pressure p',
      'p = Fa/(π/4·(d_o² − d_i²))',
      `p = ${num(t.axial)} N/(π/4·(${num(outer)}² − ${num(inner)}²) m²)`,
      r.pressure,
      'Pa',
      'definition',
    ),
    line(
      'Thrust face PV',
      'PV = p·V, V = π·d_m·n',
      `PV = ${num(r.pressure)} Pa · ${num(r.velocity)} m/s`,
      r.pv,
      'Pa*m/s',
      'definition',
    ),
    line(
      'Thrust face wear life',
      't = δ/(f_m·f_e·k·p·V), combined over the points',
      `${r.material}: t = ${num(r.lifeHours)} h`,
      r.lifeHours,
      'h',
      'Archard wear law (src/calc/thrust/rubbing.ts)',
    ),
  ];
}

function padLines(t: JournalThrust): SheetLine[] {
  const pad = t.pad!;
  const g = pad.points[pad.governingPoint]!;
  const { inner, outer, pads, padAngle } = pad.ring;
  const { length: B, width: L } = padRectangle(pad.ring);
  return [
    line(
      'Thrust pad size B × L',
      'B = r_m·β, L = r2 − r1',
      `${pads} pads, d1 = ${num(inner)} m, d2 = ${num(outer)} m, β = ${num(padAngle)} rad: B = ${num(B)} m, L = ${num(L)} m`,
      B,
      'm',
      'common practice: sector pad as the rectangle of its mean dimensions',
    ),
    line(
      'Thrust pad unit load',
      'p = Fa/(N·B·L)',
      `p = ${num(g.axial)} N/(${pads} · ${num(B)} m · ${num(L)} m)`,
      g.unitLoad,
      'Pa',
      'definition',
    ),
    line(
      'Thrust pad minimum film h_min',
      'Fa/N = W*(K)·μ·U·B²·L/h_min², K = δ/h_min',
      `μ = ${num(g.viscosity)} Pa·s, U = ${num(g.velocity)} m/s, δ = ${num(pad.taperDepth)} m: K = ${num(g.taper)}`,
      g.minFilmThickness,
      'm',
      PAD_SOURCE,
    ),
    line(
      'Thrust pad power loss',
      'H = N·F·U, F = F*(K)·μ·U·B·L/h_min',
      `f = ${num(g.frictionCoefficient)}, U = ${num(g.velocity)} m/s`,
      g.powerLoss,
      'W',
      PAD_SOURCE,
    ),
    line(
      'Thrust pad temperature rise ΔT',
      'F·U = ρ·c_p·ΔT·(Q_in − Q_s/2) per pad',
      `Q_in = ${num(g.flow)} m³/s, Q_s = ${num(g.sideFlow)} m³/s (all pads)`,
      g.temperatureRise,
      'K',
      'adiabatic heat balance as the journal (Raimondi & Boyd 1958, from memory)',
    ),
  ];
}
