import { z } from 'zod';
import { loadTable } from './load.js';
import { FORMS, ROLLING_KINDS } from '../core/rolling-kinds.js';

/**
 * The running figures of a rolling bearing (data/rolling-running.json): the grease-life
 * constants and the half-lives each kind subtracts, the viscous and load factors of the friction
 * moment, static-safety guidance and speed limits per kind and supply. Every row carries a
 * `source`. The kinds and forms are the vocabulary of src/core/rolling-kinds.ts; the supplies
 * and shock levels are spelt as the case spells them.
 */

const positive = z.number().positive();
const nonNegative = z.number().nonnegative();
const source = z.string().min(1);
const kind = z.enum(ROLLING_KINDS);
const form = z.enum(FORMS);
/** One figure per way of supplying the lubricant. */
const perSupply = z.object({ grease: positive, 'oil-bath': positive, 'oil-feed': positive });

const greaseLifeSchema = z
  .object({
    /** Constant term of log10(hours). */
    intercept: z.number(),
    /** Temperature term, K: log10 L grows by this over T. */
    temperatureCoefficient: positive,
    /** log10(2): one half-life. */
    halvingStep: positive,
    /** Half-lives at the grease speed limit. */
    speedCoefficient: nonNegative,
    /** Half-lives subtracted for the grease itself. */
    greaseHalvings: nonNegative,
    /** °C: below it the life at this temperature is taken. */
    coolTemperature: z.number(),
    /** °C: above it a caution is raised. */
    hotTemperature: z.number(),
    /** P/C above which the load subtracts half-lives. */
    loadThreshold: nonNegative,
    /** P/C per half-life above the threshold. */
    loadStep: positive,
    /** Weibull slope of grease life, for the 10 % life from the 50 % life. */
    weibullSlope: positive,
    /** Share of the 10 % grease life taken as an open bearing's regreasing interval. */
    regreaseFraction: z.number().positive().max(1),
    source,
  })
  .refine((g) => g.hotTemperature > g.coolTemperature, { message: 'hotTemperature must exceed coolTemperature' });

const frictionRowSchema = z.object({
  kind,
  f0: perSupply,
  z: positive,
  y: nonNegative,
  faFactor: nonNegative,
  frFactor: z.number().min(-1).max(1),
  ribFactor: nonNegative,
  source,
});
export type FrictionRow = z.infer<typeof frictionRowSchema>;

const staticSafetyRowSchema = z.object({
  shock: z.enum(['none', 'light', 'moderate', 'heavy']),
  label: z.string().min(1),
  ball: positive,
  roller: positive,
  source,
});
export type StaticSafetyRow = z.infer<typeof staticSafetyRowSchema>;

const speedLimitRowSchema = z.object({ kind, form: form.nullable(), ndm: perSupply, source });
export type SpeedLimitRow = z.infer<typeof speedLimitRowSchema>;

/** The schema of data/rolling-running.json (the tests validate the shipped file with it). */
export const runningSchema = z.object({
  description: z.string(),
  units: z.record(z.string(), z.string()),
  greaseLife: greaseLifeSchema,
  greaseKinds: z.array(z.object({ kind, halvings: nonNegative, source })).min(1),
  friction: z.array(frictionRowSchema).min(1),
  staticSafety: z.array(staticSafetyRowSchema).length(4),
  speedLimits: z.array(speedLimitRowSchema).min(1),
  /** Highest operating temperature of the assumed grease and of bearing steel of standard heat treatment, °C. */
  temperatureLimits: z.object({ grease: z.number(), steel: z.number(), greaseAssumed: z.string(), source }),
});
export type RollingRunning = z.infer<typeof runningSchema>;
export type GreaseLifeConstants = RollingRunning['greaseLife'];

/** The running figures (data/rolling-running.json), validated where the folder is not the shipped one, and cached. */
export function rollingRunning(): RollingRunning {
  return loadTable('rolling-running.json', runningSchema);
}
