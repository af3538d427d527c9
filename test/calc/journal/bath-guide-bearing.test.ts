/**
 * A 300 mm bath-lubricated turbine guide bearing (invented duty): the oil-ring capacity, a
 * low-confidence figure, informs but never excludes it.
 */
import { describe, expect, it } from 'vitest';
import { parseCaseText } from '../../../src/case/load.js';
import { checkJournal } from '../../../src/calc/journal/index.js';

const guide = `
title: Run-of-river turbine, upper guide bearing (invented)
shaft: { diameter: 300 mm, speed: 300 rpm }
load: { radial: 25 kN, axial: 0 N }
life: { hours: 100000 h }
space: { maxLength: 300 mm, maxOuterDiameter: 520 mm }
lubrication: { supply: oil-bath, oil: ISO VG 68 }
environment: { ambient: 20 degC, contamination: normal }
`;

describe('bath-lubricated guide bearing', () => {
  it('is not excluded by the oil-ring capacity: that check is advisory and shows its confidence', () => {
    // Guards the failure where the ring capacity ("from memory, low confidence") left nothing feasible.
    const r = checkJournal(parseCaseText(guide).case, { sheet: false, pressureProfile: false });
    const flow = r.checks.find((k) => k.id === 'supply-flow')!;
    expect(flow.advisory).toBe(true);
    expect(flow.label).toMatch(/confidence: low/);
    const gating = r.checks.filter((k) => !k.advisory && !k.pass).map((k) => k.id);
    expect(gating).not.toContain('supply-flow');
    expect(r.feasible).toBe(gating.length === 0);
  });
});
