import { assumedFinding, finding, type AssumedFinding, type Finding } from '../../core/finding.js';
import type { BushingMaterial, CaseSI } from '../../case/types.js';
import { governingMargin } from '../../core/check.js';
import { operatingPoints } from '../duty.js';
import { bushingFactors, bushingMaterials, type BushingMaterialRow } from '../../data/bushing.js';
import { oscillatingSlidingSpeed, rotatingSlidingSpeed } from './formulas.js';
import { checkMaterial } from './material.js';
import { bushingSheet } from './sheet.js';
import type { BushingMaterialResult, BushingResult, DutyPoint } from './types.js';

/**
 * Size and check every bushing material class (or the one the case names) for the duty.
 * Method: mean pressure, PV and sliding speed against the material's limits; Archard wear at
 * the most loaded line with motion and environment multipliers, summed over the duty points;
 * the shortest length meeting pressure, PV and the wear life; a lumped temperature rise.
 * See ./formulas.ts for each equation and its source. `sheet: false` skips the calculation
 * sheet's text (sweeps evaluate thousands of points).
 */
export function checkBushing(c: CaseSI, opts: { sheet?: boolean } = {}): BushingResult {
  const factors = bushingFactors();
  const assumed: AssumedFinding[] = [];
  const warnings: Finding[] = [];
  const D = c.shaft.diameter;
  const osc = c.shaft.oscillation;
  const points: DutyPoint[] = operatingPoints(c).map((p) => ({
    share: p.share,
    F: p.radial,
    V: osc ? oscillatingSlidingSpeed(D, osc.angle, osc.frequency) : rotatingSlidingSpeed(D, p.speed ?? 0),
  }));
  if (points.some((p) => p.V === 0)) warnings.push(finding('bushing.zero-speed'));
  if (c.load.axial > 0 || (c.duty ?? []).some((p) => p.axial > 0)) warnings.push(finding('bushing.axial-not-carried'));

  const motionKey = osc ? 'oscillating' : 'rotating';
  const fm = factors.motion.find((m) => m.key === motionKey)!;
  const fe = factors.environment.find((m) => m.key === c.environment.contamination)!;
  assumed.push(
    assumedFinding('bushing.motionFactor', 'bushing.motion-factor', {
      factor: fm.value,
      note: fm.note,
      source: fm.source,
    }),
    assumedFinding('bushing.environmentFactor', 'bushing.environment-factor', {
      contamination: c.environment.contamination,
      factor: fe.value,
      note: fe.note,
      source: fe.source,
    }),
    assumedFinding('bushing.heat', 'bushing.heat-model', {
      dissipation: factors.heat.dissipation,
      areaFactor: factors.heat.areaFactor,
      note: factors.heat.note,
      source: factors.heat.source,
    }),
  );
  if (c.lubrication.supply !== 'none')
    warnings.push(finding('bushing.boundary-conservative', { supply: c.lubrication.supply }));

  const all = bushingMaterials();
  const named = c.bushing?.material;
  const candidates: (BushingMaterial | BushingMaterialRow)[] =
    named === undefined ? all : typeof named === 'string' ? all.filter((m) => m.id === named) : [named];

  const materials = candidates.map((m) => checkMaterial(c, m, points, fm.value, fe.value, factors));
  const feasible = materials.filter((m) => m.feasible);
  let best: BushingMaterialResult | undefined;
  let bestReason: Finding;
  if (feasible.length) {
    // Most robust: the largest smallest margin over the governing checks; ties keep data order.
    best = feasible.reduce((a, b) => (governingMargin(b.checks) > governingMargin(a.checks) ? b : a));
    bestReason = finding('bushing.best', {
      material: best.name,
      length: best.length,
      margin: governingMargin(best.checks),
      passing: feasible.length,
    });
  } else {
    bestReason = noneFeasible(materials);
    warnings.push(bestReason);
  }
  // The material shown when none is feasible: the nearest miss, by the same largest-smallest-margin rule.
  const shown =
    best ??
    materials.reduce<BushingMaterialResult | undefined>(
      (a, b) => (a === undefined || governingMargin(b.checks) > governingMargin(a.checks) ? b : a),
      undefined,
    );
  return {
    option: 'bushing',
    materials,
    best: best?.id ?? null,
    shown: shown?.id ?? null,
    bestReason,
    feasible: best !== undefined,
    assumed,
    warnings,
    sheet: shown && opts.sheet !== false ? bushingSheet(c, shown, points) : [],
  };
}

/** No material passes: each failing limit check's label and the number of materials it fails for. */
function noneFeasible(ms: BushingMaterialResult[]): Finding {
  const count = new Map<string, number>();
  for (const m of ms)
    for (const k of m.checks) if (!k.pass && !k.advisory) count.set(k.label, (count.get(k.label) ?? 0) + 1);
  return finding('bushing.none-feasible', {
    failing: [...count.keys()],
    failingCount: [...count.values()],
    materials: ms.length,
  });
}
