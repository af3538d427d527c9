// Behaviour test of the sensitivity: a case built with its bushing wear life 15 % above the
// life target flips at +25 % (wear factor, life target, load, speed) but not at ±10 %.
import { describe, expect, it } from 'vitest';
import { computeSensitivity } from '../../src/explore/sensitivity.js';
import { checkBushing } from '../../src/calc/bushing/index.js';
import { sensitivityHtml, sensitivityJson, sensitivityText } from '../../src/report/explore/sensitivity-report.js';
import { pivot } from './cases.js';

describe('sensitivity near a limit', async () => {
  // The bushing's wear life at the fixed 40 mm length, then a life target 15 % below it.
  const life = checkBushing(pivot('10000 h').case).materials[0]!.lifeHours;
  const l = pivot(`${Math.round(life / 1.15)} h`);
  const r = await computeSensitivity(l.case, l.assumed);
  const p = (id: string) => r.parameters.find((x) => x.id === id)!;
  const at = (id: string, s: number) => p(id).variations.find((v) => v.step === s)!;

  it('the bushing wins, governed by its wear life with about 15 % to spare', () => {
    expect(r.recommendation).toBe('bushing');
    expect(r.margins.bushing.check).toBe('wear-life');
    expect(r.margins.bushing.margin!).toBeCloseTo(0.15, 2);
  });

  it('+25 % wear factor flips it to the rolling bearing; ±10 % and −25 % do not', () => {
    expect(at('wearFactor', 0.25).flip).toBe(true);
    expect(at('wearFactor', 0.25).recommendation).toBe('rolling');
    expect(at('wearFactor', 0.25).margins.bushing.margin!).toBeLessThan(0);
    for (const s of [-0.25, -0.1, 0.1]) expect(at('wearFactor', s).flip, `step ${s}`).toBe(false);
    // Life ∝ 1/k: +10 % leaves 1.15/1.1 − 1 ≈ +4.5 %.
    expect(at('wearFactor', 0.1).margins.bushing.margin!).toBeCloseTo(1.15 / 1.1 - 1, 2);
  });

  it('the life target flips at +25 % only, and the flip is listed', () => {
    expect(p('life').variations.map((v) => v.flip)).toEqual([false, false, false, true]);
    expect(r.flips).toContain('Life target +25 %: bushing → rolling');
  });

  it('inlet temperature does not move the dry bushing: no flip, same margin', () => {
    for (const v of p('inletTemperature').variations) {
      expect(v.flip).toBe(false);
      expect(v.margins.bushing.margin).toBeCloseTo(r.margins.bushing.margin!, 12);
    }
  });

  it('reports: text marks the flips, JSON has the numbers, HTML has a tornado per option', () => {
    expect(sensitivityText(r)).toMatch(/\+25 %.*FLIP/);
    const j = JSON.parse(sensitivityJson(r));
    expect(j.parameters.find((x: { id: string }) => x.id === 'wearFactor').variations).toHaveLength(4);
    const h = sensitivityHtml(r);
    expect(h.match(/<svg /g)).toHaveLength(3);
    expect(h).not.toMatch(/<script|href=|src=/);
    expect(h).toContain('◆ flips at +25 %');
  });
});
