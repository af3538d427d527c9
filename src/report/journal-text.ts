import type { JournalResult } from '../calc/journal/index.js';
import { fmt, type UnitSystem } from './units.js';
import { table } from './table.js';
import { checksTable, heading, paint } from './text.js';

/** The journal-bearing check for a person: the operating point, the checks, the design sweep. */
export function journalText(r: JournalResult, units: UnitSystem): string {
  const out: string[] = [heading('Hydrodynamic journal bearing (finite-difference Reynolds solution)')];
  out.push(
    `Design: length ${fmt(r.length, 'm', units)} (L/D ${r.lengthToDiameter.toFixed(2)}), radial clearance ${fmt(r.radialClearance, 'm', units, 3)} ` +
      `(c/r ${r.clearanceRatio.toPrecision(2)}), ${r.oil}.`,
  );
  out.push(
    table(
      ['figure', 'value'],
      [
        ['Sommerfeld number S', r.sommerfeld.toPrecision(3)],
        ['Eccentricity ratio ε', r.eccentricityRatio.toFixed(3)],
        [
          'Minimum film thickness h0',
          `${fmt(r.minFilmThickness * 1, 'm', units, 3)} (allowable ${fmt(r.allowableFilmThickness, 'm', units, 3)})`,
        ],
        ['Attitude angle φ', `${r.attitudeAngle.toFixed(1)}°`],
        [
          'Friction coefficient f (Petroff)',
          `${r.frictionCoefficient.toPrecision(3)} (${r.petroffFrictionCoefficient.toPrecision(3)})`,
        ],
        ['Friction torque, power loss', `${fmt(r.frictionTorque, 'N*m', units)}, ${fmt(r.powerLoss, 'W', units)}`],
        ...(r.points.length > 1 ? [['Power loss, time mean over the duty', fmt(r.meanPowerLoss, 'W', units)]] : []),
        ['Oil flow in, side leakage', `${fmt(r.flow, 'm^3/s', units)}, ${fmt(r.sideFlow, 'm^3/s', units)}`],
        [
          'Unit load W/(L·D), peak film pressure',
          `${fmt(r.unitLoad, 'Pa', units)}, ${fmt(r.peakPressure, 'Pa', units)} at ${r.peakPressureAngle.toFixed(0)}°`,
        ],
        [
          'Effective, maximum temperature',
          `${fmt(r.effectiveTemperature, 'degC', units)}, ${fmt(r.maxTemperature, 'degC', units)}`,
        ],
        ['Viscosity at effective temperature', fmt(r.viscosity, 'Pa*s', units)],
      ],
    ),
  );
  out.push(paint.bold(r.feasible ? 'Feasible: every limit check passes.' : 'Not feasible: see the failing checks.'));
  out.push(checksTable(r.checks, units));
  if (r.sweep.length > 1) {
    const rows = [...r.sweep].sort((a, b) => b.filmMargin - a.filmMargin).slice(0, 12);
    out.push(
      `\nDesign sweep (${r.sweep.length} designs; the ${rows.length} with the largest film margin; * = chosen):`,
    );
    out.push(
      table(
        ['', 'L', 'c', 'oil', 'ε', 'h0', 'film margin', 'T max', 'power'],
        rows.map((s) => [
          s.chosen ? '*' : s.passes ? ' ' : 'x',
          fmt(s.length, 'm', units),
          fmt(s.radialClearance, 'm', units, 3),
          s.oil,
          s.eccentricityRatio.toFixed(3),
          fmt(s.minFilmThickness, 'm', units, 3),
          `${(s.filmMargin * 100).toFixed(0)} %`,
          fmt(s.maxTemperature, 'degC', units),
          fmt(s.powerLoss, 'W', units),
        ]),
      ),
    );
    out.push('  x = fails the film, temperature or start-up criterion');
  }
  return out.join('\n');
}
