import { describe } from './findings/index.js';
import type { BushingResult } from '../calc/bushing/index.js';
import { fmt, type UnitSystem } from './units.js';
import { table } from './table.js';
import { checksTable, heading, mark, paint } from './text.js';

/** A temperature estimate more than twice the allowed rise above ambient (the model is linear and one-node). */
function outOfRange(m: BushingResult['materials'][number]): boolean {
  const k = m.checks.find((x) => x.id === 'temperature');
  return k !== undefined && k.margin < -1;
}

/** The plain-bushing check for a person: a summary over materials, then each material's checks. */
export function bushingText(r: BushingResult, units: UnitSystem): string {
  const out: string[] = [heading('Plain bushing (boundary lubricated)')];
  out.push(
    table(
      ['', 'material', 'length', 'OD', 'P', 'PV', 'life: short / typical / long', 'temp'],
      r.materials.map((m) => [
        mark(m.feasible),
        m.id,
        fmt(m.length, 'm', units),
        fmt(m.outerDiameter, 'm', units),
        fmt(m.pressure, 'Pa', units),
        fmt(m.pv, 'Pa*m/s', units),
        `${fmt(m.lifeBand.short, 'h', units, 2)} / ${fmt(m.lifeBand.typical, 'h', units, 2)} / ${fmt(m.lifeBand.long, 'h', units, 2)}`,
        outOfRange(m) ? `${fmt(m.temperature, 'degC', units)} *` : fmt(m.temperature, 'degC', units),
      ]),
    ),
  );
  if (r.materials.some(outOfRange)) {
    out.push(
      '* beyond twice the allowed rise: the one-node temperature model is out of its range there; read it as "far too hot", not as a figure.',
    );
  }
  out.push(paint.bold(`${r.best ? 'Best' : 'None'}: ${describe(r.bestReason)}.`));
  out.push('Life band: hours to wear through the allowance at the high, typical and low published wear factor.');
  for (const m of r.materials) {
    const lengthNote =
      m.lengthChosen === 'case'
        ? 'length from the case'
        : m.lengthChosen === 'space-limited'
          ? 'length limited by the axial space'
          : 'shortest length meeting the limits';
    out.push(
      `\n${paint.bold(m.name)} (${m.id}) — ${fmt(m.length, 'm', units)} long (${lengthNote}; shortest meeting pressure, PV and wear life: ${fmt(m.minLength, 'm', units)}), ` +
        `wear after the life target ${fmt(m.wearDepth, 'm', units)} (peak pressure; ${fmt(m.wearDepthMeanPressure, 'm', units)} at mean pressure), ` +
        `factors motion ×${m.factors.motion}, environment ×${m.factors.environment}, k = ${fmt(m.wearFactor, 'm^2/N', units)}`,
    );
    out.push(checksTable(m.checks, units, m.source));
    out.push(`  Material data: ${m.source}`);
  }
  return out.join('\n');
}
