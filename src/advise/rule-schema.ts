import { OPTIONS } from '../core/options.js';
import { z } from 'zod';
import { PRIORITIES } from '../case/schema.js';

/**
 * The shape of a rule file in rules/ (validated when loaded; json-rules-engine has no schema
 * of its own). A file holds the rules of one concern. Each rule has json-rules-engine
 * conditions over the facts below, an event that scores or excludes an option, a `because`
 * sentence a reviewer can read, and a source ("common practice" where it is a habit of the trade).
 */

/** Facts a rule may read: the case, the derived duty, the three check results and their figures. */
export const FACTS = ['case', 'duty', 'figures', 'bushing', 'rolling', 'journal'] as const;

const OPERATORS = [
  'equal',
  'notEqual',
  'lessThan',
  'lessThanInclusive',
  'greaterThan',
  'greaterThanInclusive',
  'in',
  'notIn',
  'contains',
  'doesNotContain',
] as const;

const scalar = z.union([z.number(), z.string(), z.boolean(), z.null()]);
const factRef = z.strictObject({
  fact: z.enum(FACTS),
  path: z
    .string()
    .regex(/^\$(\.[A-Za-z0-9_]+|\[\d+\])*$/)
    .optional(),
});

export const leafSchema = z.strictObject({
  fact: z.enum(FACTS, { error: (iss) => `fact ${JSON.stringify(iss.input)} is not one of: ${FACTS.join(', ')}` }),
  path: z
    .string()
    .regex(/^\$(\.[A-Za-z0-9_]+|\[\d+\])*$/, {
      error: 'path must be a simple JSONPath such as "$.feasible" or "$.speedRpm"',
    })
    .optional(),
  operator: z.enum(OPERATORS, {
    error: (iss) => `operator ${JSON.stringify(iss.input)} is not one of: ${OPERATORS.join(', ')}`,
  }),
  value: z.union([scalar, z.array(scalar), factRef]),
});

export type Condition = z.infer<typeof leafSchema> | { all: Condition[] } | { any: Condition[] } | { not: Condition };

export const conditionSchema: z.ZodType<Condition> = z.lazy(() =>
  z.union([
    leafSchema,
    z.strictObject({ all: z.array(conditionSchema).min(1) }),
    z.strictObject({ any: z.array(conditionSchema).min(1) }),
    z.strictObject({ not: conditionSchema }),
  ]),
);

const topLevel = z.union([
  z.strictObject({ all: z.array(conditionSchema).min(1) }),
  z.strictObject({ any: z.array(conditionSchema).min(1) }),
  z.strictObject({ not: conditionSchema }),
]);

export const ruleSchema = z.strictObject({
  name: z.string().regex(/^[a-z0-9-]+$/, { error: 'name must be lower-case words joined by dashes' }),
  because: z.string().min(10, { error: 'because must be a sentence a reviewer can read' }),
  source: z.string().min(1),
  conditions: topLevel,
  event: z.discriminatedUnion('type', [
    z.strictObject({
      type: z.literal('score'),
      option: z.enum(OPTIONS),
      points: z
        .number()
        .int()
        .min(-10)
        .max(10)
        .refine((n) => n !== 0, { error: 'points must not be 0' }),
      priority: z.enum(PRIORITIES).optional(),
    }),
    z.strictObject({ type: z.literal('exclude'), option: z.enum(OPTIONS) }),
  ]),
});

export const ruleFileSchema = z.strictObject({
  concern: z.string().min(1),
  description: z.string().min(1),
  rules: z.array(ruleSchema).min(1),
});

export type Rule = z.infer<typeof ruleSchema>;
export type RuleFile = z.infer<typeof ruleFileSchema>;
