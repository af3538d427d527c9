import { createRequire } from 'node:module';
import type QtyType from 'js-quantities';

type Qty = QtyType;
// js-quantities is slow to load next to a whole start-up: it is loaded only when a spelling
// is not in the common-unit table below (synchronously, as parsing is synchronous).
const requireLib = createRequire(import.meta.url);
let lib: typeof QtyType | undefined;
const Qty = (text: string): Qty => (lib ??= requireLib('js-quantities') as typeof QtyType)(text);

/**
 * Quantity parsing at the boundary: "40 mm", "720 lbf", "1500 rpm", "104 degF",
 * "5e-7 mm^3/(N*m)" → one number in the SI unit the kernels use. Parsed once,
 * here; nothing inside the calculation sees a unit string.
 *
 * A bare number (120, or the string "120") carries no unit. A case file refuses it for a
 * quantity with a dimension, naming the number in the field's usual units (`BareNumbers`
 * "refused"); a file with `units: base`, written by a program, has its bare numbers read in the
 * internal unit of the kind ("base": SI base units; shaft speed rev/s; temperature °C, not K;
 * life hours, as the key says). Other callers (command-line ranges) read them as "base".
 */
export type Kind =
  | 'length'
  | 'force'
  | 'speed'
  | 'velocity'
  | 'time'
  | 'temperature'
  | 'viscosity'
  | 'pressure'
  | 'pv'
  | 'angle'
  | 'frequency'
  | 'wearFactor'
  | 'mass'
  | 'torque'
  | 'modulus';

interface KindInfo {
  /** Unit of the internal number, as js-quantities spells it. */
  unit: string;
  /** Unit shown to people for the internal number. */
  label: string;
  /** Examples of accepted strings, for error messages. */
  examples: string;
  /** Words for the kind, for error messages. */
  noun: string;
}

export const KINDS: Record<Kind, KindInfo> = {
  length: { unit: 'm', label: 'm', examples: '"40 mm" or "1.5 in"', noun: 'a length' },
  force: { unit: 'N', label: 'N', examples: '"3.2 kN" or "720 lbf"', noun: 'a force' },
  speed: { unit: 'rpm', label: 'rev/s', examples: '"1500 rpm" or "25 rev/s"', noun: 'a rotational speed' },
  velocity: { unit: 'm/s', label: 'm/s', examples: '"2 m/s" or "400 ft/min"', noun: 'a sliding speed' },
  time: { unit: 'h', label: 'h', examples: '"20000 h"', noun: 'a duration' },
  temperature: { unit: 'tempC', label: 'degC', examples: '"40 degC" or "104 degF"', noun: 'a temperature' },
  viscosity: { unit: 'Pa*s', label: 'Pa*s', examples: '"0.03 Pa*s" or "68 cSt"', noun: 'a viscosity' },
  pressure: { unit: 'Pa', label: 'Pa', examples: '"2 MPa" or "300 psi"', noun: 'a pressure' },
  pv: {
    unit: 'Pa*m/s',
    label: 'Pa*m/s',
    examples: '"1.75 MPa*m/s" or "50000 psi*ft/min"',
    noun: 'a PV value (pressure × sliding speed)',
  },
  angle: { unit: 'rad', label: 'rad', examples: '"60 deg"', noun: 'an angle' },
  frequency: { unit: 'Hz', label: 'Hz', examples: '"0.5 Hz"', noun: 'a frequency' },
  wearFactor: {
    unit: 'm^2/N',
    label: 'm^3/(N*m)',
    examples: '"5e-7 mm^3/(N*m)"',
    noun: 'a wear factor (volume per load per sliding distance)',
  },
  mass: { unit: 'kg', label: 'kg', examples: '"85 kg" or "190 lb"', noun: 'a mass' },
  torque: { unit: 'N*m', label: 'N*m', examples: '"2.4 kN*m" or "1800 lbf*ft"', noun: 'a torque' },
  modulus: { unit: 'Pa', label: 'Pa', examples: '"210 GPa" or "30e6 psi"', noun: "a Young's modulus" },
};

/** Density used to turn a kinematic viscosity into a dynamic one when a case gives cSt, kg/m³ (from memory: typical mineral oil near 40 °C). */
export const KINEMATIC_TO_DYNAMIC_DENSITY = 870;

export class QuantityError extends Error {}

/** How a bare number is read: refused (a case file's default) or in the kind's internal unit (`units: base`). */
export type BareNumbers = 'refused' | 'base';

/**
 * The usual unit of each kind, in which a refusal reads the bare number back to its writer, and a
 * second unit with the factor from the first to it: `120` for a speed → "120 rpm or 2 rev/s".
 */
const USUAL: Record<Kind, { unit: string; other: string; to: (x: number) => number }> = {
  length: { unit: 'mm', other: 'm', to: (x) => x / 1000 },
  force: { unit: 'N', other: 'kN', to: (x) => x / 1000 },
  speed: { unit: 'rpm', other: 'rev/s', to: (x) => x / 60 },
  velocity: { unit: 'm/s', other: 'ft/min', to: (x) => x / FT_MIN },
  time: { unit: 'h', other: 'min', to: (x) => x * 60 },
  temperature: { unit: 'degC', other: 'degF', to: (x) => x * 1.8 + 32 },
  viscosity: { unit: 'mPa*s', other: 'Pa*s', to: (x) => x / 1000 },
  pressure: { unit: 'MPa', other: 'psi', to: (x) => (x * 1e6) / PSI },
  pv: { unit: 'MPa*m/s', other: 'psi*ft/min', to: (x) => (x * 1e6) / (PSI * FT_MIN) },
  angle: { unit: 'deg', other: 'rad', to: (x) => (x * Math.PI) / 180 },
  frequency: { unit: 'Hz', other: '1/min', to: (x) => x * 60 },
  wearFactor: { unit: 'mm^3/(N*m)', other: 'm^3/(N*m)', to: (x) => x * 1e-9 },
  mass: { unit: 'kg', other: 'lb', to: (x) => x / LB },
  torque: { unit: 'N*m', other: 'lbf*ft', to: (x) => x / (LBF * 0.3048) },
  modulus: { unit: 'GPa', other: 'psi', to: (x) => (x * 1e9) / PSI },
};

/** A number as a case file would write it (exponent form outside 1e-3..1e6, six significant figures). */
function write(x: number): string {
  if (x === 0) return '0';
  const a = Math.abs(x);
  const t = a >= 1e-3 && a < 1e6 ? String(+x.toPrecision(6)) : x.toExponential(5).replace(/\.?0+e/, 'e');
  return t.replace(/e\+/, 'e');
}

/** The refusal of a bare number `x` (as given: `shown`) for a quantity of `kind`. */
function bareNumberError(shown: string, x: number, kind: Kind): QuantityError {
  const u = USUAL[kind];
  return new QuantityError(`${shown} has no unit; write ${write(x)} ${u.unit} or ${write(u.to(x))} ${u.other}`);
}

let caseBareNumbers: BareNumbers = 'refused';

/**
 * Run `read` (a synchronous schema parse of one case) with bare numbers read as `mode`, and
 * restore the mode after. The case schema's quantity fields ask `bareNumbersInCase()`.
 */
export function readingCase<T>(mode: BareNumbers, read: () => T): T {
  const was = caseBareNumbers;
  caseBareNumbers = mode;
  try {
    return read();
  } finally {
    caseBareNumbers = was;
  }
}

/** How the case being read takes bare numbers: "refused" unless it says `units: base`. */
export function bareNumbersInCase(): BareNumbers {
  return caseBareNumbers;
}

/** Rewrite the spellings js-quantities lacks into ones it knows. */
function normalise(text: string, kind: Kind): { text: string; scale: number } {
  let t = text
    .trim()
    .replace(/·/g, '*')
    .replace(/\s*\*\s*/g, '*')
    .replace(/\s*\/\s*/g, '/');
  let scale = 1;
  // Everything after a "/" is a denominator for js-quantities, so "(N*m)" after "/" loses its brackets.
  t = t.replace(/\/\(([^()]*)\)/g, '/$1');
  t = t.replace(/°\s*C\b/g, 'degC').replace(/°\s*F\b/g, 'degF');
  if (kind === 'temperature') {
    t = t
      .replace(/\bdegC\b|\bcelsius\b|\bC$/, 'tempC')
      .replace(/\bdegF\b|\bfahrenheit\b|\bF$/, 'tempF')
      .replace(/\bK$|\bdegK\b|\bkelvin\b/, 'tempK');
  }
  // Revolutions: js-quantities knows rpm only.
  if (/\b(rev|r)\/s$|\brps$/.test(t)) {
    t = t.replace(/\b(rev|r)\/s$|\brps$/, 'rpm');
    scale = 60;
  } else if (/\b(rev|r)\/min$/.test(t)) {
    t = t.replace(/\b(rev|r)\/min$/, 'rpm');
  }
  return { text: t, scale };
}

/**
 * Parse one quantity. Returns the number in the internal unit of `kind`.
 * Throws QuantityError with a message saying what was given and what was expected.
 */
export function parseQuantity(value: unknown, kind: Kind, bare: BareNumbers = 'base'): number {
  const info = KINDS[kind];
  if (typeof value === 'number') {
    if (!Number.isFinite(value))
      throw new QuantityError(
        bare === 'base'
          ? `got ${String(value)}; expected a finite number or ${info.noun} such as ${info.examples}`
          : `got ${String(value)}; expected a finite number with a unit: ${info.noun} such as ${info.examples}`,
      );
    if (bare === 'refused') throw bareNumberError(String(value), value, kind);
    return value;
  }
  if (typeof value !== 'string') {
    throw new QuantityError(`got ${describe(value)}; expected ${info.noun} such as ${info.examples}`);
  }
  const { text, scale } = normalise(value, kind);
  if (NUMBER.test(text)) {
    if (bare === 'refused') throw bareNumberError(`"${value}"`, Number(text), kind);
    return Number(text);
  }
  const m = /^([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.+)$/.exec(text);
  const unreadable = () =>
    new QuantityError(
      `"${value}" is not a quantity this tool can read; expected ${info.noun} such as ${info.examples}`,
    );
  if (!m) throw unreadable();
  const x = Number(m[1]);
  if (!Number.isFinite(x))
    throw new QuantityError(`"${value}" is not a finite number; expected ${info.noun} such as ${info.examples}`);
  const fast = kind === 'temperature' ? undefined : COMMON[kind][m[2]!];
  if (fast !== undefined) {
    const n = x * fast * scale;
    if (!Number.isFinite(n))
      throw new QuantityError(
        `"${value}" is not a finite number in ${KINDS[kind].label}; expected ${info.noun} such as ${info.examples}`,
      );
    return n;
  }
  if (kind === 'temperature' && m[2]! in TEMPERATURES) return TEMPERATURES[m[2]!]!(x);
  // The unit is converted as "1 <unit>" and the number multiplied after: js-quantities then never
  // sees extreme or subnormal scalars (it fails on some), and the factor is exact to its table.
  // Temperatures are affine, so they alone are converted with their value.
  let q: Qty;
  try {
    q = Qty(kind === 'temperature' ? `${x} ${m[2]}` : `1 ${m[2]}`);
  } catch {
    throw unreadable();
  }
  try {
    if (kind === 'viscosity' && q.isCompatible('m^2/s') && !q.isCompatible('Pa*s')) {
      return x * q.to('m^2/s').scalar * KINEMATIC_TO_DYNAMIC_DENSITY;
    }
    if (kind === 'temperature' && !q.units().startsWith('temp') && q.kind() === 'temperature') {
      throw new QuantityError(
        `"${value}" is a temperature difference; expected a temperature such as ${info.examples}`,
      );
    }
    if (!q.isCompatible(info.unit)) {
      const got = q.kind() ? `a ${q.kind().replace(/_/g, ' ')}` : `units of ${q.units()}`;
      throw new QuantityError(`"${value}" is ${got}; expected ${info.noun} such as ${info.examples}`);
    }
    let n = kind === 'temperature' ? q.to(info.unit).scalar : x * q.to(info.unit).scalar;
    n *= scale;
    if (kind === 'speed') n /= 60; // internal shaft speed: rev/s
    if (!Number.isFinite(n))
      throw new QuantityError(
        `"${value}" is not a finite number in ${KINDS[kind].label}; expected ${info.noun} such as ${info.examples}`,
      );
    return n;
  } catch (e) {
    if (e instanceof QuantityError) throw e;
    throw unreadable();
  }
}

const IN = 0.0254;
const LBF = 4.4482216152605;
const LB = 0.45359237;
const PSI = 6894.757293168;
const FT_MIN = 0.3048 / 60;

/**
 * Factors to the internal unit for the spellings people write most, exact by definition
 * (NIST SP 811, 2008, Appendix B): js-quantities builds its unit tables on first use, which
 * costs more start-up than the whole calculation. Every factor is checked against
 * js-quantities in test/case/quantity.test.ts; any other spelling goes to the library.
 * Keys are as normalise() leaves them (revolutions already in rpm).
 */
const COMMON: Record<Exclude<Kind, 'temperature'>, Record<string, number>> = {
  length: { m: 1, mm: 1e-3, cm: 1e-2, um: 1e-6, in: IN, ft: 0.3048 },
  force: { N: 1, kN: 1e3, MN: 1e6, lbf: LBF },
  speed: { rpm: 1 / 60 },
  velocity: { 'm/s': 1, 'mm/s': 1e-3, 'ft/min': FT_MIN },
  time: { h: 1, min: 1 / 60, s: 1 / 3600 },
  viscosity: {
    'Pa*s': 1,
    'mPa*s': 1e-3,
    cP: 1e-3,
    cSt: 1e-6 * KINEMATIC_TO_DYNAMIC_DENSITY,
    'mm^2/s': 1e-6 * KINEMATIC_TO_DYNAMIC_DENSITY,
  },
  pressure: { Pa: 1, kPa: 1e3, MPa: 1e6, GPa: 1e9, bar: 1e5, psi: PSI },
  pv: { 'Pa*m/s': 1, 'MPa*m/s': 1e6, 'psi*ft/min': PSI * FT_MIN },
  angle: { rad: 1, deg: Math.PI / 180 },
  frequency: { Hz: 1, '1/s': 1 },
  wearFactor: {
    'm^2/N': 1,
    'm^3/N*m': 1,
    'mm^3/N*m': 1e-9,
    'in^3*min/lbf*ft*h': (IN ** 3 * 60) / (LBF * 0.3048 * 3600),
  },
  mass: { kg: 1, g: 1e-3, t: 1e3, lb: LB },
  torque: { 'N*m': 1, 'kN*m': 1e3, 'lbf*ft': LBF * 0.3048, 'lbf*in': LBF * IN },
  modulus: { Pa: 1, MPa: 1e6, GPa: 1e9, psi: PSI },
};

/** Absolute temperatures to °C (exact). */
const TEMPERATURES: Record<string, (x: number) => number> = {
  tempC: (x) => x,
  tempF: (x) => (x - 32) / 1.8,
  tempK: (x) => x - 273.15,
};

/** The fast-path table, for the test that checks it against js-quantities. */
export const COMMON_UNITS = COMMON;

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

function describe(v: unknown): string {
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'a list';
  if (typeof v === 'object') return 'a mapping';
  return `${typeof v} ${JSON.stringify(v)}`;
}
