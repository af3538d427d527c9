import type { RollingType } from './life.js';

/**
 * The kinds of rolling bearing the check offers, in the trade's own names (a contract: the
 * `kind` of a candidate and of a supplier bearing in a case file takes exactly these), their
 * forms and the arrangements a pair of them is mounted in.
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

/** Ball or roller: the life exponent and the a_ISO constants of ISO 281 follow from it. */
export function kindType(kind: RollingKind): RollingType {
  return kind === 'deep-groove ball' || kind === 'angular-contact ball' || kind === 'self-aligning ball'
    ? 'ball'
    : 'roller';
}

/** True when the arrangement is a pair of bearings acting as one support. */
export function isPair(a: Arrangement): boolean {
  return a !== 'single';
}
