import type { OptionName } from '../core/options.js';

/**
 * One verified change to a case file that makes an option feasible (a contract: the
 * `toMakeFeasible` entries of the advice JSON). Setting `field` to `to` in the case file, all
 * else as written, makes `option` feasible in the advise ranking: its check passes and no rule
 * excludes it. Every entry was re-run on the changed case before it was kept.
 */
export interface FeasibleChange {
  option: OptionName;
  /** The case path, e.g. "space.maxOuterDiameter". */
  field: string;
  /** The value as the case file wrote it, or the default it took as a case file would write it; null when neither is known. */
  from: string | null;
  /** The new value as a case file writes it ("32 mm", "oil-bath", "ISO VG 68"). */
  to: string;
  verified: true;
}
