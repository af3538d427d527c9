import { z } from 'zod';
import { caseFileSchema, choice, describeInput, mapping, plain, quantity, SHOCKS, text } from './schema.js';

/**
 * The shaft-case file schema (a contract: issue 15's keys, external tools write them): a whole
 * shaft with its loads where they act and two supports, beside the keys a single-support case
 * shares (life, space, lubrication, environment, priorities, bushing, rolling, journal, units),
 * whose pieces are the single case's own. Quantities are converted to SI here, once; the rules
 * that involve more than one field (segments end to end, two supports, one locating, positions
 * on the shaft) are checked in shaft-load.ts.
 */

const single = caseFileSchema.shape;

const POSITION = { min: -100, max: 100, say: 'a position from -100 m to 100 m along the shaft' };
const SIGNED_FORCE = { min: -1e8, max: 1e8, say: 'a force from -100 MN to 100 MN (the sign is the direction)' };
const TURN = { min: -2 * Math.PI, max: 2 * Math.PI, say: 'an angle from -360 deg to 360 deg' };
const TORQUE = { min: -1e7, max: 1e7, say: 'a torque from -10 MN*m to 10 MN*m' };
const PITCH = { max: 10, say: 'a pitch diameter up to 10 m' };

/** A position along the shaft axis (m; may be negative: an overhung load before x = 0). */
function position() {
  const inner = quantity('length', 'any', POSITION);
  return z.unknown().transform((v, ctx) => {
    if (v === undefined) {
      ctx.addIssue({
        code: 'custom',
        message: 'missing; expected a position along the shaft axis such as "450 mm" (negative before x = 0)',
      });
      return z.NEVER;
    }
    const r = inner.safeParse(v);
    if (r.success) return r.data;
    for (const i of r.error.issues) ctx.addIssue({ code: 'custom', message: i.message });
    return z.NEVER;
  });
}

const seatDiameter = (what: string) =>
  quantity('length', 'positive', { max: 5, min: 1e-3, say: `${what} from 1 mm to 5 m` });

const forceSchema = mapping({
  y: quantity('force', 'any', SIGNED_FORCE).optional(),
  z: quantity('force', 'any', SIGNED_FORCE).optional(),
});

const gearSchema = mapping({
  pitchDiameter: quantity('length', 'positive', PITCH),
  torque: quantity('torque', 'any', TORQUE),
  pressureAngle: quantity('angle', 'positive', {
    max: Math.PI / 4,
    say: 'a normal pressure angle above 0 deg and up to 45 deg',
  }).optional(),
  helixAngle: quantity('angle', 'any', {
    min: -Math.PI / 4,
    max: Math.PI / 4,
    say: 'a helix angle from -45 deg to 45 deg (the sign is the hand)',
  }).optional(),
  mesh: quantity('angle', 'any', TURN),
});

const pullSchema = mapping({
  pitchDiameter: quantity('length', 'positive', PITCH),
  torque: quantity('torque', 'any', TORQUE),
  pullFactor: plain('a pull factor from 1 to 10 (shaft load over the net pull 2T/d)', 1, 10),
  direction: quantity('angle', 'any', TURN),
});

/** One load as written: exactly one of force (with axial), gear, belt, chain, weight; checked in shaft-load.ts. */
export const shaftLoadSchema = mapping({
  at: position(),
  force: forceSchema.optional(),
  axial: quantity('force', 'any', SIGNED_FORCE).optional(),
  gear: gearSchema.optional(),
  belt: pullSchema.optional(),
  chain: pullSchema.optional(),
  weight: mapping({ mass: quantity('mass', 'positive', { max: 1e6, say: 'a mass up to 1000 t' }) }).optional(),
});

/** How a support holds the shaft axially, as written → as understood. */
const locatesSchema = z.unknown().transform((v, ctx): 'both' | 'none' | 'one-direction' => {
  if (v === true) return 'both';
  if (v === false) return 'none';
  if (v === 'one-direction') return 'one-direction';
  ctx.addIssue({
    code: 'custom',
    message: `got ${describeInput(v)}; expected true (takes the axial load both ways), false (free to float) or one-direction (one of a cross-located pair)`,
  });
  return z.NEVER;
});

const supportSchema = mapping({
  name: text('a name for the support such as "drive side"'),
  at: position(),
  locates: locatesSchema.optional(),
  diameter: seatDiameter('a seat diameter').optional(),
  space: single.space.optional(),
});

const segmentSchema = mapping({
  from: position(),
  to: position(),
  diameter: seatDiameter('a segment diameter'),
});

const loadList = z
  .array(shaftLoadSchema, { error: 'expected a list of loads, each { at, force | gear | belt | chain | weight }' })
  .min(1, { error: 'is empty; expected at least one load' });

const dutyPointSchema = mapping({
  share: plain('a share of running time between 0 and 1', 0, 1),
  speed: quantity('speed', 'positive', { max: 100000 / 60, say: 'a speed up to 100 000 rpm' }).optional(),
  loads: loadList.optional(),
});

export const shaftCaseSchema = mapping({
  title: single.title,
  shaft: mapping({
    speed: single.shaft.shape.speed,
    oscillation: single.shaft.shape.oscillation,
    diameter: single.shaft.shape.diameter.optional(),
    modulus: quantity('modulus', 'positive', {
      min: 1e8,
      max: 1e12,
      say: "a Young's modulus from 0.1 GPa to 1000 GPa",
    }).optional(),
    segments: z
      .array(segmentSchema, { error: 'expected a list of segments, each { from, to, diameter }' })
      .min(1, { error: 'is empty; expected at least one segment, or no segments key' })
      .optional(),
    supports: z.array(supportSchema, {
      error: (iss) => `got ${describeInput(iss.input)}; expected a list of two supports, each { name, at, locates }`,
    }),
    loads: loadList.optional(),
  }),
  load: mapping({ shock: choice(SHOCKS).optional() }).optional(),
  duty: z
    .array(dutyPointSchema, { error: 'expected a list of operating points' })
    .min(1, { error: 'is empty; expected at least one operating point' })
    .optional(),
  life: single.life,
  space: single.space.optional(),
  lubrication: single.lubrication,
  environment: single.environment,
  priorities: single.priorities,
  bushing: single.bushing,
  rolling: single.rolling,
  journal: single.journal,
  units: single.units,
});

export type ShaftCaseFile = z.output<typeof shaftCaseSchema>;
export type ShaftLoadFile = z.output<typeof shaftLoadSchema>;
