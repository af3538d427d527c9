import type { RankedOption } from '../advise/engine.js';
import { describe } from './findings/index.js';

/**
 * The ranking table's reading of an option's place. Feasible options come first (the engine
 * ranks them so); an excluded option's score is the sum of the rules that fired for it and
 * can exceed the winner's, so the table shows "excluded" in its place and the first reason.
 * JSON keeps the score (a contract key); only the tables read it this way.
 */
export const scoreCell = (r: RankedOption): string => (r.feasible ? r.score.toFixed(2) : 'excluded');

/** The first reason an option is excluded, in words; '' for a feasible option. */
export const firstExclusion = (r: RankedOption): string =>
  r.feasible ? '' : describe(r.excluded[0] ?? 'its check found no feasible design');
