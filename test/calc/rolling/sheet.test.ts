// Kind: consistency of the rolling calculation sheet. Reports print `substituted = value unit`,
// so the expression at the end of each line's `substituted` must evaluate to that line's
// value. Numbers on the sheet have four significant figures, so the check allows 1 %.
// Also: the required dynamic rating names its bearing type and p. Invented case (a
// tumbling-drum idler of our own), no published answers.
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../helpers/sheet.js';
import type { CaseSI } from '../../../src/case/types.js';
import { checkRolling } from '../../../src/calc/rolling/index.js';
import { lifeExponent, requiredDynamicRating } from '../../../src/calc/rolling/life.js';

function drumIdler(over: Partial<CaseSI> = {}): CaseSI {
  return {
    title: 'tumbling-drum idler (invented)',
    shaft: { diameter: 0.04, speed: 300 / 60 },
    load: { radial: 3000, axial: 200, shock: 'light' },
    life: { hours: 20000, wearAllowance: 0.0002, reliability: 95 },
    space: { maxLength: 0.05, maxOuterDiameter: 0.12 },
    lubrication: { supply: 'grease', inletTemperature: 25 },
    environment: { ambient: 25, contamination: 'normal', startsPerHour: 4 },
    priorities: { cost: 3, friction: 3, maintenance: 3, noise: 3, precision: 3 },
    duty: [
      { share: 0.7, radial: 3000, axial: 200, speed: 300 / 60 },
      { share: 0.3, radial: 5000, axial: 200, speed: 150 / 60 },
    ],
    ...over,
  };
}

describe('rolling calculation sheet: each substituted expression is the value it is printed with', () => {
  const r = checkRolling(drumIdler());

  it('the sheet exists and names the lines the reviewer found wrong', () => {
    const labels = r.sheet.map((l) => l.label);
    expect(labels).toContain('Contamination and fatigue-limit term e_C·Cu/P');
    expect(labels).toContain('Life modification factor a_ISO');
    expect(labels).toContain('Reliability factor a1');
  });

  it('every numerical line evaluates to its value within 1 %; the others are written as functions of their arguments', () => {
    let numerical = 0;
    for (const l of r.sheet) {
      const lhs = l.substituted;
      const v = evaluate(lhs);
      if (v === null) {
        // A function of named arguments, e.g. "a_ISO(κ = 0.52, e_C·Cu/P = 0.277)": it must end with ")".
        expect(lhs.trim().endsWith(')'), `${l.label}: "${lhs}"`).toBe(true);
        continue;
      }
      numerical++;
      // ν1 is written in mm²/s and stored in m²/s
      const value = l.unit === 'm^2/s' ? l.value * 1e6 : l.value;
      expect(
        Math.abs(v - value) / Math.max(Math.abs(value), 1e-12),
        `${l.label}: "${lhs}" = ${v}, value ${value}`,
      ).toBeLessThan(0.01);
    }
    expect(numerical).toBeGreaterThanOrEqual(10);
  });

  it('a1 is substituted with R, not printed as "R = 95 %" (a1(95 %) = 0.637912, worked from the formula)', () => {
    // ISO 281:2007 a1 formula: 0.95·[ln(100/95)/ln(100/90)]^(2/3) + 0.05: ln(1.052632) = 0.051293,
    // ln(1.111111) = 0.105361, ratio 0.486836, ln of it −0.719874, × 2/3 = −0.479916,
    // exp = 0.618854, × 0.95 = 0.587912, + 0.05 = 0.637912.
    const a1 = r.sheet.find((l) => l.label === 'Reliability factor a1')!;
    expect(a1.value).toBeCloseTo(0.637912, 5);
    expect(evaluate(a1.substituted)).toBeCloseTo(0.637912, 5);
  });

  it('a_ISO line names its arguments; the e_C·Cu/P line carries that intermediate as its value', () => {
    const best =
      r.candidates.find((k) => k.id === r.sheet[0]!.label.match(/\(([^)]*)\)$/)?.[1]) ??
      r.candidates.find((k) => k.id === (r.best ?? r.candidates[0]!.id))!;
    const term = r.sheet.find((l) => l.label.startsWith('Contamination and fatigue-limit term'))!;
    const a = r.sheet.find((l) => l.label === 'Life modification factor a_ISO')!;
    expect(a.substituted).toMatch(/^a_ISO\(κ = [\d.]+, e_C·Cu\/P = [\d.]+\)$/);
    expect(a.value).toBe(best.aISO);
    expect(term.value).toBeCloseTo((0.55 * best.fatigueLimit) / best.equivalentLoad, 9);
  });
});

describe('required dynamic rating names its bearing type', () => {
  it('top level: the type and p it was worked for; each candidate: its own, from its own P and p', () => {
    const r = checkRolling(drumIdler());
    const lead = r.candidates.find((k) => k.id === r.best) ?? r.candidates[0]!;
    expect(r.requiredDynamicRatingFor).toEqual({ type: lead.type, p: lifeExponent(lead.type) });
    expect(r.requiredDynamicRating).toBeCloseTo(lead.requiredDynamicRating!, 6);
    for (const k of r.candidates) {
      expect(k.requiredDynamicRating).toBeCloseTo(
        requiredDynamicRating(k.equivalentLoad, r.equivalentSpeed, 20000, lifeExponent(k.type), k.a1)!,
        6,
      );
    }
  });
  it('the two types differ: p = 3 and p = 10/3 give different needs for the same case', () => {
    const r = checkRolling(drumIdler({ load: { radial: 3000, axial: 0, shock: 'light' }, duty: undefined }));
    const ball = r.candidates.find((k) => k.type === 'ball');
    const roller = r.candidates.find((k) => k.type === 'roller');
    expect(ball && roller).toBeTruthy();
    expect(ball!.requiredDynamicRating).not.toBeCloseTo(roller!.requiredDynamicRating!, 0);
  });
});

describe('friction power is a time mean over the duty', () => {
  it('equals Σ ti·Mi·2π·ni/Σ ti with Mi = μ·Pi·d/2, not M̄·2π·n̄', () => {
    const r = checkRolling(
      drumIdler({
        load: { radial: 3000, axial: 0, shock: 'light' },
        duty: [
          { share: 0.5, radial: 3000, axial: 0, speed: 600 / 60 },
          { share: 0.5, radial: 6000, axial: 0, speed: 100 / 60 },
        ],
      }),
    );
    const k = r.candidates.find((c) => c.type === 'roller')!;
    // Roller: Pi = Fr. Mi = μ·Fr·d/2; mean of Mi·2π·ni with equal shares.
    const mu = (2 * k.frictionTorque) / (((3000 + 6000) / 2) * 0.04); // μ from the mean torque
    const expected = 0.5 * (mu * 3000 * 0.02) * 2 * Math.PI * 10 + 0.5 * (mu * 6000 * 0.02) * 2 * Math.PI * (100 / 60);
    expect(k.frictionPower).toBeCloseTo(expected, 6);
    // M̄·2π·n̄ would be larger by (4500·5.833)/(0.5·3000·10 + 0.5·6000·1.667) = 1.3125
    expect(k.frictionTorque * 2 * Math.PI * r.equivalentSpeed).toBeGreaterThan(k.frictionPower * 1.3);
  });
});
