/**
 * The conditions a bushing material class sets on the case apart from its limits: the lubricant
 * it needs, the service medium it stands, the motion its limits hold for (used by ./material.ts).
 */
import type { BushingMaterial, CaseSI, Medium, Supply } from '../../case/types.js';
import { makeCheck, type CheckRecord } from '../../core/check.js';
import { finding, type Finding } from '../../core/finding.js';
import type { BushingMaterialRow, LubricantNeed, MediumRating } from '../../data/bushing.js';

type Material = BushingMaterial | BushingMaterialRow;

/**
 * Rank of a lubricant need and of a supply on one scale: none 1 < grease 2 < oil 3 (oil bath and
 * oil feed). Water is off this scale: a water-lubricated class is met by the medium, not the supply.
 */
const NEED_RANK: Record<Exclude<LubricantNeed, 'water'>, number> = { none: 1, grease: 2, oil: 3 };
const SUPPLY_RANK: Record<Supply, number> = { none: 1, grease: 2, 'oil-bath': 3, 'oil-feed': 3 };
/** Rank of a medium rating: good 1, fair 2, poor 3; a material must be at least fair (2) in the case's medium. */
const RATING_RANK: Record<MediumRating, number> = { good: 1, fair: 2, poor: 3 };

/**
 * Whether the case can give the material what it needs, whether it stands the service medium,
 * and whether the shaft moves as the material's limits assume (a pin class: oscillating only). Each unmet condition is a failing limit check (value and limit on the rank scales
 * above: lubricant none 1, grease 2, oil 3; medium rating good 1, fair 2, poor 3) and a finding;
 * met conditions add no check, so they never decide a margin. The checks are pushed onto `checks`;
 * the findings are returned.
 */
export function suitability(c: CaseSI, m: Material, medium: Medium, checks: CheckRecord[]): Finding[] {
  const reasons: Finding[] = [];
  const needs = m.needs ?? 'none';
  const supply = c.lubrication.supply;
  if (needs === 'water') {
    // A water-lubricated class: the medium is its lubricant and coolant (wet 1, dry or chemical 2).
    if (medium !== 'water' && medium !== 'slurry') {
      checks.push(
        makeCheck(
          'lubricant-need',
          'Runs in the water it needs (in water or slurry 1, otherwise 2)',
          2,
          1,
          '1',
          'max',
          m.needsSource ?? m.source,
        ),
      );
      reasons.push(finding('bushing.needs-water', { material: m.name, medium }));
    }
  } else if (NEED_RANK[needs] > SUPPLY_RANK[supply]) {
    checks.push(
      makeCheck(
        'lubricant-need',
        'Lubricant the material needs, within the supply (none 1, grease 2, oil 3)',
        NEED_RANK[needs],
        SUPPLY_RANK[supply],
        '1',
        'max',
        m.needsSource ?? m.source,
      ),
    );
    reasons.push(finding('bushing.needs-lubricant', { material: m.name, needs, supply }));
  }
  const slurry = 'slurry' in m ? m.slurry : undefined;
  const rating =
    medium === 'slurry'
      ? (slurry ?? m.water)
      : medium === 'water'
        ? m.water
        : medium === 'chemical'
          ? m.chemical
          : undefined;
  if (rating !== undefined && RATING_RANK[rating] > RATING_RANK.fair) {
    checks.push(
      makeCheck(
        'medium',
        `Resistance in ${medium} (good 1, fair 2, poor 3)`,
        RATING_RANK[rating],
        RATING_RANK.fair,
        '1',
        'max',
        m.mediaSource ?? m.source,
      ),
    );
    reasons.push(finding('bushing.medium-unsuited', { material: m.name, medium, rating }));
  }
  if (m.motion === 'oscillating' && !c.shaft.oscillation) {
    checks.push(
      makeCheck(
        'motion',
        'Motion the limits hold for (oscillating only 1, any 2)',
        2,
        1,
        '1',
        'max',
        m.motionSource ?? m.source,
      ),
    );
    reasons.push(finding('bushing.motion-unsuited', { material: m.name }));
  }
  return reasons;
}
