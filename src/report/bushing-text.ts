import { describe } from './findings/index.js';
import type { BushingResult } from '../calc/bushing/index.js';
import { fmt, type UnitSystem } from './units.js';
import { table } from './table.js';
import { checksTable, heading, mark, paint } from './text.js';

/** A temperature estimate above the material's limit: the heat balance is linear up to the PV limit only. */
function outOfRange(m: BushingResult['materials'][number]): boolean {
  const k = m.checks.find((x) => x.id === 'temperature');
  return k !== undefined && !k.pass;
}

/** The plain-bushing check for a person: a summary over materials, then each material's checks. */
export function bushingText(r: BushingResult, units: UnitSystem): string {
  const out: string[] = [heading('Plain bushing (boundary lubricated)')];
  // Two tables so each fits 100 columns: the size of each material, then its duty figures.
  out.push(
    table(
      ['', 'material', 'needs', 'length', 'shortest', 'OD'],
      r.materials.map((m) => [
        mark(m.feasible),
        m.id,
        m.needs,
        fmt(m.length, 'm', units),
        fmt(m.minLength, 'm', units),
        fmt(m.outerDiameter, 'm', units),
      ]),
    ),
  );
  out.push(
    table(
      ['material', 'P', 'PV', 'life: short / typical / long', 'temp'],
      r.materials.map((m) => [
        m.id,
        fmt(m.pressure, 'Pa', units),
        fmt(m.pv, 'Pa*m/s', units),
        `${fmt(m.lifeBand.short, 'h', units, 2)} / ${fmt(m.lifeBand.typical, 'h', units, 2)} / ${fmt(m.lifeBand.long, 'h', units, 2)}`,
        outOfRange(m)
          ? `> ${fmt(m.checks.find((k) => k.id === 'temperature')!.limit, 'degC', units)} *`
          : fmt(m.temperature, 'degC', units),
      ]),
    ),
  );
  if (r.materials.some(outOfRange)) {
    out.push(
      "* above the material's temperature limit: the heat balance holds up to the PV limit only, so no figure is given beyond it.",
    );
  }
  out.push(paint.bold(`${r.best ? 'Best' : 'None'}: ${describe(r.bestReason)}.`));
  out.push('Life band: hours to wear through the allowance at the high, typical and low published wear factor.');
  for (const m of r.materials) {
    const lengthNote =
      m.lengthChosen === 'case'
        ? 'length from the case'
        : 'the common length of every material: the longest in the axial space, L/D at most 2';
    out.push(
      `\n${paint.bold(m.name)} (${m.id}) — ${fmt(m.length, 'm', units)} long (${lengthNote}; shortest meeting pressure, PV and wear life: ${fmt(m.minLength, 'm', units)}), ` +
        `wear after the life target ${fmt(m.wearDepth, 'm', units)} (peak pressure; ${fmt(m.wearDepthMeanPressure, 'm', units)} at mean pressure), ` +
        `factors motion ×${m.factors.motion}, environment ×${m.factors.environment}, k = ${fmt(m.wearFactor, 'm^2/N', units)}`,
    );
    if (m.thrust)
      out.push(
        `  Thrust face ${fmt(m.thrust.face.inner, 'm', units)} / ${fmt(m.thrust.face.outer, 'm', units)}, ${fmt(m.thrust.thickness, 'm', units)} thick: ` +
          `p ${fmt(m.thrust.pressure, 'Pa', units)}, PV ${fmt(m.thrust.pv, 'Pa*m/s', units)}, wear life ${fmt(m.thrust.lifeHours, 'h', units, 2)}`,
      );
    for (const reason of m.reasons) out.push(`  ${describe(reason)}`);
    out.push(checksTable(m.checks, units, m.source));
    out.push(`  Material data: ${m.source}`);
  }
  return out.join('\n');
}
