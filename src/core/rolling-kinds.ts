/**
 * The kinds of rolling bearing, in the trade's own names (a contract: the `kind` of a candidate
 * and of a supplier bearing in a case file takes exactly these), their forms and the
 * arrangements a pair of them is mounted in. A vocabulary read by the case schema and the
 * rolling check alike, so it lives on the ground floor.
 */

export const ROLLING_KINDS = [
  'deep-groove ball',
  'angular-contact ball',
  'self-aligning ball',
  'cylindrical roller',
  'tapered roller',
  'spherical roller',
  'needle roller',
] as const;
export type RollingKind = (typeof ROLLING_KINDS)[number];

/** How a bearing is mounted: alone, or as a matched pair acting as one support. */
export const ARRANGEMENTS = ['single', 'pair back-to-back', 'pair face-to-face', 'pair tandem'] as const;
export type Arrangement = (typeof ARRANGEMENTS)[number];

/**
 * The construction within a kind, in our own words: the rib forms of a cylindrical roller
 * bearing and the three needle roller constructions; null for the kinds that have one form.
 */
export const FORMS = [
  'ribs on one ring',
  'ribs on both rings',
  'ribs on both rings and a loose rib',
  'drawn cup',
  'machined with inner ring',
  'machined without inner ring',
] as const;
export type KindForm = (typeof FORMS)[number];

/** The kinds whose rolling elements are balls (ISO 281 life exponent 3); the others are rollers (10/3). */
export const BALL_KINDS: ReadonlySet<RollingKind> = new Set([
  'deep-groove ball',
  'angular-contact ball',
  'self-aligning ball',
]);
