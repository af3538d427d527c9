import type { RollingCandidate, RollingResult } from '../calc/rolling/types.js';
import { describe } from './findings/index.js';
import { num } from '../core/format.js';
import { fmt, fmtValue, type UnitSystem } from './units.js';
import { table } from './table.js';
import { checksTable, heading, mark, paint } from './text.js';

const P_TEXT = { ball: '3', roller: '10/3' } as const;

/** One candidate per kind (its choice, else its nearest miss): what a person reads; every candidate stays in the JSON. */
export function kindLeads(r: RollingResult): RollingCandidate[] {
  return r.kinds
    .map((f) => r.candidates.find((k) => k.id === f.id))
    .filter((k): k is RollingCandidate => k !== undefined);
}

/** The rolling-bearing check for a person: candidates with lives, then each candidate's checks. */
export function rollingText(r: RollingResult, units: UnitSystem): string {
  const out: string[] = [heading('Rolling-element bearing (ISO 281, ISO 76, ISO 15)')];
  const types = new Set(r.candidates.map((k) => k.type));
  const needed = r.requiredDynamicRatingFor
    ? `basic dynamic rating needed for the life target ${fmt(r.requiredDynamicRating, 'N', units)} (for a ${r.requiredDynamicRatingFor.type} bearing, p = ${P_TEXT[r.requiredDynamicRatingFor.type]}${types.size > 1 ? '; each candidate\'s own in the column "C needed"' : ''})`
    : `basic dynamic rating needed for the life target ${fmt(r.requiredDynamicRating, 'N', units)}`;
  out.push(
    `Equivalent dynamic load ${fmt(r.equivalentLoad, 'N', units)} at ${fmt(r.equivalentSpeed, 'rev/s', units)}; ${needed}.`,
  );
  if (types.size > 1) {
    // Both types listed: the need per type (P, and so C needed, can differ between ball sizes under axial load).
    for (const t of ['ball', 'roller'] as const) {
      const ofType = r.candidates.filter((k) => k.type === t && k.requiredDynamicRating !== null);
      if (!ofType.length) continue;
      const vals = ofType.map((k) => k.requiredDynamicRating!);
      const lo = Math.min(...vals);
      const hi = Math.max(...vals);
      const range = hi - lo <= 1e-9 * hi ? fmt(lo, 'N', units) : `${fmt(lo, 'N', units)} to ${fmt(hi, 'N', units)}`;
      out.push(`  ${t} bearings (p = ${P_TEXT[t]}): basic dynamic rating needed ${range}.`);
    }
  }
  // One row per kind (its choice, else its nearest miss): every candidate stays in the JSON.
  // The best is its own kind's lead, so it is among these.
  const shown = kindLeads(r);
  if (r.candidates.length) {
    out.push(
      `${r.candidates.length} candidates of ${r.kinds.length} kinds fit the space; each kind's choice (or nearest miss) is shown, every candidate is in --format json.`,
    );
    // Two tables so each fits 100 columns: the bearing and its ratings, then its lives and running figures.
    out.push(
      table(
        ['', 'bearing', 'kind', 'd × D × B', 'C', 'C needed', 'C0', 'rating'],
        shown.map((k) => [
          mark(k.feasible),
          k.id,
          k.arrangement === 'single' ? k.kind : `${k.kind}, ${k.arrangement}`,
          `${fmtValue(k.bore, 'm', units)} × ${fmtValue(k.outerDiameter, 'm', units)} × ${fmt(k.width, 'm', units)}`,
          fmt(k.dynamicRating, 'N', units),
          k.requiredDynamicRating === null ? '—' : fmt(k.requiredDynamicRating, 'N', units),
          fmt(k.staticRating, 'N', units),
          k.ratingSource,
        ]),
      ),
    );
    out.push(
      table(
        ['bearing', 'L10h', 'a_ISO', 'κ', 'L10mh', 's0', 'n·dm', 'friction'],
        shown.map((k) => [
          k.id,
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
  out.push(
    paint.bold(
      best
        ? `Best: ${best.designation} (${best.id}).`
        : 'None: no candidate meets life, static safety, speed and space.',
    ),
  );
  if (r.choice) out.push(describe(r.choice));
  out.push(
    'Ratings marked "estimated" come from boundary dimensions by the ISO 281 / ISO 76 formulas; a supplier\'s rating replaces them. "C needed": the basic dynamic rating each candidate needs for the life target with a1 (a_ISO taken as 1), from its own P and p; "friction": friction power, time mean over the duty.',
  );
  for (const k of shown) {
    out.push(
      `\n${paint.bold(k.designation)} (${k.id}) — X = ${num(k.X, 3)}, Y = ${num(k.Y, 3)}${k.e !== null ? `, e = ${num(k.e, 3)}` : ''}, Fa = ${fmt(k.axialLoad, 'N', units)}, P = ${fmt(k.equivalentLoad, 'N', units)}, P0 = ${fmt(k.staticEquivalentLoad, 'N', units)}, ν = ${(k.viscosity * 1e6).toPrecision(3)} mm²/s at ${fmt(k.temperature, 'degC', units)}`,
    );
    if (k.exclusions.length) out.push(k.exclusions.map((e) => `  ruled out: ${describe(e)}`).join('\n'));
    out.push(checksTable(k.checks, units));
  }
  return out.join('\n');
}
