/**
 * A duty of the practice matrix: a case as a designer would write it (every dimensioned number
 * with its unit), the options practice accepts as the recommendation, the options it would never
 * recommend, and why. Every setting is invented; the answers are common practice.
 */
import type { OptionName } from '../../../src/core/options.js';

export interface Duty {
  /** Short stable id (used in test names and in the known-disagreement list). */
  id: string;
  /** The machine family the duty stands for. */
  family:
    | 'conveyor'
    | 'gear reducer'
    | 'worm drive'
    | 'pump'
    | 'fan'
    | 'pin or hinge'
    | 'kiln or dryer'
    | 'turbomachine'
    | 'machine tool'
    | 'agricultural'
    | 'food and packaging'
    | 'marine'
    | 'appliance and office'
    | 'slurry'
    | 'high speed'
    | 'paper machine'
    | 'heavy rotating';
  /** The case, YAML as a user writes it. */
  yaml: string;
  /** What practice accepts as the recommendation; null: none of the three as given. */
  accept: readonly (OptionName | null)[];
  /** Options practice would never recommend for this duty. */
  reject: readonly OptionName[];
  /** The practice reasoning (common practice). */
  why: string;
  /** Where practitioners would differ, and how. */
  ambiguous?: string;
}
