import type { RollingResult } from '../calc/rolling/types.js';
import { fmt, type UnitSystem } from './units.js';
import { table } from './table.js';
import { checksTable, heading, mark, paint } from './text.js';

/** The rolling-bearing check for a person: candidates with lives, then each candidate's checks. */
export function rollingText(r: RollingResult, units: UnitSystem): string {
  const out: string[] = [heading('Rolling-element bearing (ISO 281, ISO 76, ISO 15)')];
  out.push(
    `Equivalent dynamic load ${fmt(r.equivalentLoad, 'N', units)} at ${fmt(r.equivalentSpeed, 'rev/s', units)}; ` +
      `basic dynamic rating needed for the life target ${fmt(r.requiredDynamicRating, 'N', units)}.`,
  );
  if (r.candidates.length) {
    out.push(
      table(
        ['', 'bearing', 'd × D × B', 'C', 'C0', 'rating', 'L10h', 'a_ISO', 'κ', 'L10mh', 's0', 'n·dm', 'friction'],
        r.candidates.map((k) => [
          mark(k.feasible),
          k.id,
          `${fmt(k.bore, 'm', units)} × ${k.outerDiameter === null ? '—' : fmt(k.outerDiameter, 'm', units)} × ${k.width === null ? '—' : fmt(k.width, 'm', units)}`,
          fmt(k.dynamicRating, 'N', units),
          fmt(k.staticRating, 'N', units),
          k.ratingSource,
          fmt(k.L10h, 'h', units),
          k.aISO === null ? '—' : k.aISO.toFixed(2),
          k.kappa === null ? '—' : k.kappa.toFixed(2),
          fmt(k.L10mh, 'h', units),
          k.s0 === null ? '—' : k.s0.toFixed(1),
          `${Math.round(k.ndm)} mm·r/min`,
          fmt(k.frictionPower, 'W', units),
        ]),
      ),
    );
  } else {
    out.push('No candidate: see the warnings.');
  }
  const best = r.candidates.find((k) => k.id === r.best);
  out.push(paint.bold(best ? `Best: ${best.designation} (${best.id}), the smallest meeting life, static safety, speed and space.` : 'None: no candidate meets life, static safety, speed and space.'));
  out.push('Ratings marked "estimated" come from boundary dimensions by the ISO 281 / ISO 76 formulas; a supplier\'s rating replaces them.');
  for (const k of r.candidates) {
    out.push(`\n${paint.bold(k.designation)} (${k.id}) — X = ${k.X}, Y = ${k.Y}, P = ${fmt(k.equivalentLoad, 'N', units)}, P0 = ${fmt(k.staticEquivalentLoad, 'N', units)}, ν = ${(k.viscosity * 1e6).toPrecision(3)} mm²/s at ${fmt(k.temperature, 'degC', units)}`);
    if (k.exclusions.length) out.push(k.exclusions.map((e) => `  ruled out: ${e}`).join('\n'));
    out.push(checksTable(k.checks, units));
  }
  return out.join('\n');
}
