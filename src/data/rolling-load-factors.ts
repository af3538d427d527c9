import { z } from 'zod';
import { loadTable } from './load.js';

/**
 * The factors of the dynamic and static equivalent loads of radial rolling bearings, by kind
 * (data/rolling-load-factors.json): ISO 281:2007 X, Y, e; ISO 76:2006 X0, Y0; and the factors of
 * the permissible axial load of a cylindrical roller bearing carrying axial load on its ribs.
 * Every table carries a `source`.
 */

const positive = z.number().positive();
const nonNegative = z.number().nonnegative();
const source = z.string().min(1);
/** A column of nine (or more) factors, one per key of the table. */
const column = z.array(positive).min(2);

const radialBallSchema = z.object({
  note: z.string(),
  xAboveE: positive,
  source,
  rows: z.array(z.object({ key: positive, e: positive, Y: positive })).min(2),
});

const keyedAngleSchema = z.object({
  angle: positive,
  single: z.object({ xAboveE: positive, e: column, Y: column }),
  double: z.object({ e: column, xAboveE: positive, yBelowE: column, yAboveE: column }),
});

const fixedAngleSchema = z.object({
  angle: positive,
  e: positive,
  singleX: positive,
  singleY: positive,
  doubleYBelowE: positive,
  doubleX: positive,
  doubleY: positive,
});

const staticAngleSchema = z.object({ angle: positive, singleY0: positive, doubleY0: positive });

export const loadFactorsSchema = z
  .object({
    description: z.string(),
    units: z.record(z.string(), z.string()),
    radialBall: radialBallSchema,
    angularContactKeyed: z.object({
      note: z.string(),
      source,
      keys: z.array(positive).min(2),
      angles: z.array(keyedAngleSchema).min(1),
    }),
    angularContactFixed: z.object({ note: z.string(), source, rows: z.array(fixedAngleSchema).min(1) }),
    selfAligningBall: z.object({
      note: z.string(),
      eTan: positive,
      yBelowECot: positive,
      xAboveE: positive,
      yAboveECot: positive,
      source,
    }),
    radialRoller: z.object({
      note: z.string(),
      eTan: positive,
      single: z.object({ xAboveE: positive, yAboveECot: positive }),
      double: z.object({ yBelowECot: positive, xAboveE: positive, yAboveECot: positive }),
      source,
    }),
    static: z.object({
      source,
      radialBall: z.object({ X0: positive, Y0: nonNegative }),
      angularContactX0: z.object({ single: positive, double: positive }),
      angularContact: z.array(staticAngleSchema).min(2),
      selfAligningBall: z.object({ X0: positive, y0Cot: positive }),
      radialRoller: z.object({
        single: z.object({ X0: positive, y0Cot: positive }),
        double: z.object({ X0: positive, y0Cot: positive }),
      }),
    }),
    ribAxialLoad: z.object({
      note: z.string(),
      kS: z.object({ poor: positive, normal: positive, good: positive }),
      kB: z.array(z.object({ widthRatioUpTo: positive, kB: positive })).min(1),
      radialShare: positive,
      source,
    }),
  })
  .superRefine((t, ctx) => {
    const n = t.angularContactKeyed.keys.length;
    t.angularContactKeyed.angles.forEach((a, i) => {
      const cols = [a.single.e, a.single.Y, a.double.e, a.double.yBelowE, a.double.yAboveE];
      if (cols.some((c) => c.length !== n))
        ctx.addIssue({
          code: 'custom',
          path: ['angularContactKeyed', 'angles', i],
          message: `every column must have one value per key (${n})`,
        });
    });
    const ascending = (xs: number[]) => xs.every((x, i) => i === 0 || x > xs[i - 1]!);
    if (!ascending(t.radialBall.rows.map((r) => r.key)))
      ctx.addIssue({ code: 'custom', path: ['radialBall', 'rows'], message: 'keys must ascend' });
    if (!ascending(t.angularContactKeyed.keys))
      ctx.addIssue({ code: 'custom', path: ['angularContactKeyed', 'keys'], message: 'keys must ascend' });
    const angles = [...t.angularContactKeyed.angles, ...t.angularContactFixed.rows].map((r) => r.angle);
    if (!ascending(angles))
      ctx.addIssue({ code: 'custom', path: ['angularContactFixed', 'rows'], message: 'contact angles must ascend' });
    if (!ascending(t.static.angularContact.map((r) => r.angle)))
      ctx.addIssue({ code: 'custom', path: ['static', 'angularContact'], message: 'contact angles must ascend' });
  });
export type LoadFactors = z.infer<typeof loadFactorsSchema>;
export type KeyedAngle = z.infer<typeof keyedAngleSchema>;
export type FixedAngle = z.infer<typeof fixedAngleSchema>;

/** The load factors by kind (data/rolling-load-factors.json), validated and cached as loadTable does. */
export function loadFactors(): LoadFactors {
  return loadTable('rolling-load-factors.json', loadFactorsSchema);
}
