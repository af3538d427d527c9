import { z } from 'zod';
import { bareNumbersInCase, parseQuantity, QuantityError, type Kind } from './quantity.js';
import { ARRANGEMENTS, FORMS, ROLLING_KINDS } from '../core/rolling-kinds.js';

/**
 * The duty-case file schema (a contract: external tools write these keys).
 * Quantities are strings with units ("40 mm"); a bare number is refused for a quantity with a
 * dimension unless the file says `units: base` (then it is in the internal unit, see
 * quantity.ts). Each is converted to SI here, once. Defaults are not applied here but in
 * defaults.ts, which records each one as an assumption.
 */

type Bound = 'positive' | 'nonnegative' | 'any';

/** A plausibility ceiling: beyond it a value is a typing slip, not a machine (value in the internal unit, and how to say it). */
export interface Ceiling {
  max: number;
  min?: number;
  say: string;
}

/**
 * A quantity field of the given kind; `bound` rejects zero/negative values at the boundary,
 * `range` absurd ones (a 5 km shaft, a 10⁹ N load) that would only make the kernels extrapolate.
 */
export function quantity(kind: Kind, bound: Bound = 'positive', range?: Ceiling) {
  return z.unknown().transform((v, ctx) => {
    if (v === undefined) {
      ctx.addIssue({ code: 'custom', message: `missing; expected ${kindHint(kind)}` });
      return z.NEVER;
    }
    try {
      const n = parseQuantity(v, kind, bareNumbersInCase());
      if (bound === 'positive' && !(n > 0)) {
        ctx.addIssue({ code: 'custom', message: `got ${show(v)}; expected a value greater than zero` });
        return z.NEVER;
      }
      if (bound === 'nonnegative' && !(n >= 0)) {
        ctx.addIssue({ code: 'custom', message: `got ${show(v)}; expected zero or more` });
        return z.NEVER;
      }
      if (range && (n > range.max || (range.min !== undefined && n < range.min))) {
        ctx.addIssue({ code: 'custom', message: `got ${show(v)}; expected ${range.say}` });
        return z.NEVER;
      }
      return n;
    } catch (e) {
      if (!(e instanceof QuantityError)) throw e;
      ctx.addIssue({ code: 'custom', message: e.message });
      return z.NEVER;
    }
  });
}

function kindHint(kind: Kind): string {
  try {
    parseQuantity(Symbol(), kind);
  } catch (e) {
    return (e as Error).message.replace(/^got .*?; expected /, '');
  }
  return kind;
}

function show(v: unknown): string {
  return typeof v === 'string' ? `"${v}"` : JSON.stringify(v);
}

/** A mapping that rejects unknown keys, naming them and the keys it knows. */
export function mapping<S extends z.ZodRawShape>(shape: S) {
  const known = Object.keys(shape).join(', ');
  return z.strictObject(shape, {
    error: (iss) => {
      if (iss.code === 'unrecognized_keys') {
        return `unknown key ${iss.keys.map((k) => `"${k}"`).join(', ')}; expected one of: ${known}`;
      }
      if (iss.code === 'invalid_type') return `got ${describeInput(iss.input)}; expected a mapping with keys: ${known}`;
      return undefined;
    },
  });
}

export function choice<T extends readonly [string, ...string[]]>(values: T) {
  return z.enum(values, {
    error: (iss) => `got ${describeInput(iss.input)}; expected one of: ${values.join(', ')}`,
  });
}

export function describeInput(v: unknown): string {
  if (v === undefined) return 'nothing (missing)';
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'a list';
  if (typeof v === 'object') return 'a mapping';
  return show(v);
}

export const text = (what: string) =>
  z
    .string({ error: (iss) => `got ${describeInput(iss.input)}; expected ${what}` })
    .min(1, { error: `is empty; expected ${what}` });

export const plain = (what: string, min: number, max: number) =>
  z
    .number({ error: (iss) => `got ${describeInput(iss.input)}; expected ${what}` })
    .refine((n) => Number.isFinite(n) && n >= min && n <= max, {
      error: (iss) => `got ${show(iss.input)}; expected ${what}`,
    });

export const FORCE: Ceiling = { max: 1e8, say: 'a force up to 100 MN' };
// Dimensional wear factors of rubbing materials span about 1e-9 to 1e-3 mm^3/(N*m) (unfilled PTFE at the top).
const WEAR: Ceiling = { max: 1e-12, say: 'a wear factor up to 1e-3 mm^3/(N*m)' };
const TEMPERATURE: Ceiling = { min: -60, max: 300, say: 'a temperature from -60 degC to 300 degC' };

export const SHOCKS = ['none', 'light', 'moderate', 'heavy'] as const;
export const SUPPLIES = ['none', 'grease', 'oil-bath', 'oil-feed'] as const;
export const CONTAMINATIONS = ['clean', 'normal', 'dirty', 'severe'] as const;
export const MEDIA = ['dry', 'water', 'slurry', 'chemical'] as const;
export const PRIORITIES = ['cost', 'friction', 'maintenance', 'noise', 'precision'] as const;

export const materialSchema = mapping({
  id: text('a material id such as "my-bronze"'),
  name: text('a material name'),
  maxPressure: quantity('pressure'),
  maxVelocity: quantity('velocity'),
  maxPV: quantity('pv'),
  wearFactor: quantity('wearFactor', 'positive', WEAR),
  wearFactorLow: quantity('wearFactor', 'positive', WEAR).optional(),
  wearFactorHigh: quantity('wearFactor', 'positive', WEAR).optional(),
  friction: plain('a friction coefficient between 0.001 and 1', 0.001, 1),
  maxTemperature: quantity('temperature', 'any', {
    min: -60,
    max: 1000,
    say: 'a temperature limit from -60 degC to 1000 degC',
  }),
  source: text('where the values come from (datasheet, handbook)'),
});

const pointSchema = mapping({
  share: plain('a share of running time between 0 and 1', 0, 1),
  radial: quantity('force', 'positive', FORCE),
  axial: quantity('force', 'nonnegative', FORCE).optional(),
  speed: quantity('speed', 'positive', { max: 100000 / 60, say: 'a speed up to 100 000 rpm' }).optional(),
});

/** Oil as written: "ISO VG 68", "VG 68" or 68. */
const oilSchema = z.unknown().transform((v, ctx) => {
  const m =
    typeof v === 'number'
      ? [String(v), String(v)]
      : typeof v === 'string'
        ? /^\s*(?:ISO\s*)?(?:VG\s*)?(\d+)\s*$/i.exec(v)
        : null;
  if (!m) {
    ctx.addIssue({
      code: 'custom',
      message: `got ${describeInput(v)}; expected an ISO viscosity grade such as "ISO VG 68"`,
    });
    return z.NEVER;
  }
  return Number(m[1]);
});

export const caseFileSchema = mapping({
  title: text('a title for the case'),
  shaft: mapping({
    diameter: quantity('length', 'positive', { max: 5, min: 1e-3, say: 'a shaft diameter from 1 mm to 5 m' }),
    speed: quantity('speed', 'positive', { max: 100000 / 60, say: 'a speed up to 100 000 rpm' }).optional(),
    oscillation: mapping({
      angle: quantity('angle', 'positive', {
        max: 2 * Math.PI,
        say: 'a total swing angle up to 360 deg (more is rotation)',
      }),
      frequency: quantity('frequency', 'positive', { max: 100, say: 'a frequency up to 100 Hz' }),
    }).optional(),
    // The slope of the shaft relative to the bearing seat at this support (absent: aligned).
    misalignment: quantity('angle', 'nonnegative', {
      max: Math.PI / 36,
      say: 'a misalignment angle from 0 deg to 5 deg, written with its unit (0.05 deg, 0.001 rad)',
    }).optional(),
  }),
  load: mapping({
    radial: quantity('force', 'positive', FORCE).optional(),
    axial: quantity('force', 'nonnegative', FORCE).optional(),
    shock: choice(SHOCKS).optional(),
    // The radial load on the bearing when the shaft starts and stops (dead weight, or the load
    // the machine starts under); the journal's start-up unit load is checked at it.
    atStart: quantity('force', 'nonnegative', FORCE).optional(),
  }).optional(),
  duty: z
    .array(pointSchema, { error: 'expected a list of operating points' })
    .min(1, { error: 'is empty; expected at least one operating point' })
    .optional(),
  life: mapping({
    hours: quantity('time', 'positive', { max: 1e6, say: 'a life target up to 1 000 000 h' }),
    wearAllowance: quantity('length', 'positive', { max: 0.05, say: 'a wear allowance up to 50 mm' }).optional(),
    reliability: plain('a reliability in percent between 90 and 99.95', 90, 99.95).optional(),
  }),
  space: mapping({
    maxLength: quantity('length', 'positive', { max: 10, say: 'an axial room up to 10 m' }),
    maxOuterDiameter: quantity('length', 'positive', { max: 10, say: 'a housing bore up to 10 m' }),
  }),
  lubrication: mapping({
    supply: choice(SUPPLIES).optional(),
    oil: oilSchema.optional(),
    viscosity: quantity('viscosity', 'positive', { max: 10, say: 'a viscosity up to 10 Pa*s' }).optional(),
    inletTemperature: quantity('temperature', 'any', {
      min: -30,
      max: 150,
      say: 'an oil inlet temperature from -30 degC to 150 degC (mineral oils)',
    }).optional(),
    // The longest interval the maintenance plan regreases at (an open bearing on grease is held to it).
    regreaseInterval: quantity('time', 'positive', {
      max: 1e6,
      say: 'a regreasing interval up to 1 000 000 h',
    }).optional(),
  }).optional(),
  environment: mapping({
    ambient: quantity('temperature', 'any', TEMPERATURE).optional(),
    contamination: choice(CONTAMINATIONS).optional(),
    startsPerHour: plain('a number of starts per hour from 0 to 10000', 0, 10000).optional(),
    medium: choice(MEDIA).optional(),
  }).optional(),
  priorities: mapping(
    Object.fromEntries(
      PRIORITIES.map((p) => [p, plain('a priority from 1 (unimportant) to 5 (essential)', 1, 5).optional()]),
    ) as Record<(typeof PRIORITIES)[number], z.ZodOptional<ReturnType<typeof plain>>>,
  ).optional(),
  bushing: mapping({
    length: quantity('length', 'positive', { max: 10, say: 'a bushing length up to 10 m' }).optional(),
    // A material id, or an inline row: an inline row's own field problems are reported one by one.
    material: z
      .unknown()
      .transform((v, ctx): string | z.output<typeof materialSchema> => {
        if (typeof v === 'string' && v.length > 0) return v;
        if (v !== null && typeof v === 'object' && !Array.isArray(v)) {
          const r = materialSchema.safeParse(v);
          if (r.success) return r.data;
          for (const i of r.error.issues)
            ctx.addIssue({ code: 'custom', message: i.message, path: i.path as (string | number)[] });
          return z.NEVER;
        }
        ctx.addIssue({
          code: 'custom',
          message: `got ${describeInput(v)}; expected a material id from data/bushing-materials.json or an inline material with id, name, maxPressure, maxVelocity, maxPV, wearFactor, friction, maxTemperature, source`,
        });
        return z.NEVER;
      })
      .optional(),
  }).optional(),
  rolling: mapping({
    type: choice(['ball', 'roller'] as const).optional(),
    kind: choice(ROLLING_KINDS).optional(),
    form: choice(FORMS).optional(),
    contactAngle: quantity('angle', 'nonnegative', {
      max: Math.PI / 3,
      say: 'a nominal contact angle from 0 deg to 60 deg, written with its unit (40 deg)',
    }).optional(),
    arrangement: choice(ARRANGEMENTS).optional(),
    // A dimension series of the tables ("02", "302", "49"); checked against them in defaults.ts.
    // YAML reads an unquoted 03 as the number 3: a whole number is taken as its two-digit series.
    series: z
      .unknown()
      .transform((v, ctx) => {
        if (typeof v === 'string' && v.trim()) return v.trim();
        if (typeof v === 'number' && Number.isInteger(v) && v >= 0) return String(v).padStart(2, '0');
        ctx.addIssue({ code: 'custom', message: `got ${describeInput(v)}; expected a dimension series such as "03"` });
        return z.NEVER;
      })
      .optional(),
    bore: quantity('length', 'positive', { max: 10, say: 'a bearing bore up to 10 m' }).optional(),
    dynamicRating: quantity('force', 'positive', FORCE).optional(),
    staticRating: quantity('force', 'positive', FORCE).optional(),
    fatigueLimit: quantity('force', 'positive', FORCE).optional(),
    outerDiameter: quantity('length', 'positive', { max: 10, say: 'a bearing outside diameter up to 10 m' }).optional(),
    width: quantity('length', 'positive', { max: 10, say: 'a bearing width up to 10 m' }).optional(),
  }).optional(),
  journal: mapping({
    length: quantity('length', 'positive', { max: 10, say: 'a bearing length up to 10 m' }).optional(),
    radialClearance: quantity('length', 'positive', { max: 0.01, say: 'a radial clearance up to 10 mm' }).optional(),
    clearanceRatio: plain('a clearance ratio c/r between 0.0001 and 0.01', 0.0001, 0.01).optional(),
  }).optional(),
  // Document control of the design-review note; absent parts are derived (number from title and date).
  document: mapping({
    number: text('a document number such as "DR-0142"').optional(),
    revision: text('a revision such as "B"').optional(),
    project: text('a project name or number').optional(),
  }).optional(),
  // Bare numbers in SI base units on purpose (files written by programs); load.ts reads it first.
  units: choice(['base'] as const).optional(),
});

export type CaseFile = z.output<typeof caseFileSchema>;
