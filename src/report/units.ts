import { num } from '../core/format.js';

/**
 * Display units: results are SI inside; they are written once, here, in SI
 * (engineering multiples) or US customary as the user asks.
 */
export type UnitSystem = 'SI' | 'US';

interface Display {
  unit: string;
  /** SI value → displayed value. */
  to: (x: number) => number;
}

const same = (unit: string): Display => ({ unit, to: (x) => x });
const scale = (unit: string, k: number): Display => ({ unit, to: (x) => x * k });

const TABLE: Record<string, { SI: Display; US: Display }> = {
  m: { SI: scale('mm', 1e3), US: scale('in', 1 / 0.0254) },
  um: { SI: scale('µm', 1e6), US: scale('in', 1 / 0.0254) },
  N: { SI: scale('kN', 1e-3), US: scale('lbf', 1 / 4.4482216152605) },
  Pa: { SI: scale('MPa', 1e-6), US: scale('psi', 1 / 6894.757293168) },
  'm/s': { SI: same('m/s'), US: scale('ft/min', 60 / 0.3048) },
  'Pa*m/s': { SI: scale('MPa·m/s', 1e-6), US: scale('psi·ft/min', 1 / 35.0253) },
  h: { SI: same('h'), US: same('h') },
  degC: { SI: same('°C'), US: { unit: '°F', to: (x) => x * 1.8 + 32 } },
  K: { SI: same('K'), US: scale('°F (difference)', 1.8) },
  'm^2/s': { SI: scale('mm²/s', 1e6), US: scale('cSt', 1e6) },
  W: { SI: same('W'), US: same('W') },
  'N*m': { SI: same('N·m'), US: scale('lbf·in', 1 / 0.1129848290276167) },
  'rev/s': { SI: scale('r/min', 60), US: scale('r/min', 60) },
  'Pa*s': { SI: scale('mPa·s', 1e3), US: scale('reyn', 1 / 6894.757293168) },
  'm^2/N': { SI: scale('mm³/(N·m)', 1e9), US: scale('in³·min/(lbf·ft·h)', 1e9 / 201.4) },
  'm^3/s': { SI: scale('L/min', 6e4), US: scale('gal/min', 6e4 / 3.785411784) },
  'mm*r/min': { SI: same('mm·r/min'), US: same('mm·r/min') },
  deg: { SI: same('°'), US: same('°') },
  '1': { SI: same(''), US: same('') },
};

/** The displayed unit for an SI unit key. */
export function displayUnit(unit: string, system: UnitSystem): string {
  return TABLE[unit]?.[system].unit ?? unit;
}

/** Value and unit as text, e.g. fmt(0.04, 'm', 'SI') → "40 mm". */
export function fmt(x: number | null | undefined, unit: string, system: UnitSystem, digits = 3): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  const d = TABLE[unit]?.[system] ?? same(unit);
  const v = d.to(x);
  const text = Math.abs(v) >= 10 ** digits ? String(Math.round(v)) : num(v, digits);
  return d.unit ? `${text} ${d.unit}` : text;
}

/** Value only in display units (for table cells that state the unit in the header). */
export function fmtValue(x: number | null | undefined, unit: string, system: UnitSystem, digits = 3): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  const v = (TABLE[unit]?.[system] ?? same(unit)).to(x);
  return Math.abs(v) >= 10 ** digits ? String(Math.round(v)) : num(v, digits);
}
