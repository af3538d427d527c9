// A library caller may change a case between two checks (public API: loadCase, checkRolling,
// checkBushing). What the kernels keep between calls for speed must follow the values, not only
// the objects: each check of a changed case equals the check of a fresh case with the change.
import { describe, expect, it } from 'vitest';
import { checkBushing, checkRolling, loadCase } from '../../src/index.js';
import { bushingMaterials } from '../../src/data/bushing.js';

const WORM = 'examples/packaging-worm-drive.yaml';
const SAWMILL = 'examples/sawmill-infeed-roller.yaml';

describe('a case changed in place between two checks', () => {
  it('rolling: a narrower housing bore gives the candidates of a fresh case with that bore', () => {
    const fresh = loadCase(WORM);
    fresh.space.maxOuterDiameter = 0.062;
    const expected = JSON.stringify(checkRolling(fresh));
    const c = loadCase(WORM);
    const before = checkRolling(c);
    c.space.maxOuterDiameter = 0.062;
    const after = checkRolling(c);
    expect(after.candidates.length).not.toBe(before.candidates.length);
    expect(JSON.stringify(after)).toBe(expected);
  });

  it("bushing: a case's own material row with its source changed cites the new source", () => {
    const row = structuredClone(bushingMaterials()[0]!);
    const c = loadCase(SAWMILL);
    c.bushing = { material: row };
    checkBushing(c);
    row.source = 'Supplier datasheet, revision B (test)';
    const sources = checkBushing(c).materials.flatMap((m) => m.checks.map((k) => k.source));
    expect(sources.filter((s) => s.includes('revision B')).length).toBeGreaterThanOrEqual(2);
    expect(sources.some((s) => s.includes('Archard') && s.includes('revision B'))).toBe(true);
  });
});
