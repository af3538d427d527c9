// Behaviour of the bushing check on invented cases (properties of the method, worked by hand).
import { describe, expect, it } from 'vitest';
import { describe as wordOf } from '../../../src/report/findings/index.js';
import { checkBushing } from '../../../src/calc/bushing/index.js';
import { pumpCase } from '../../helpers/case.js';

describe('checkBushing', () => {
  it('at the reported shortest length the governing limit is met with zero margin', () => {
    const first = checkBushing(pumpCase({ bushing: { material: 'sintered-bronze' } })).materials[0]!;
    const atMin = checkBushing(pumpCase({ bushing: { material: 'sintered-bronze', length: `${first.minLength} m` } }))
      .materials[0]!;
    const governing = Math.min(
      ...atMin.checks.filter((k) => ['pressure', 'pv', 'wear-life'].includes(k.id)).map((k) => k.margin),
    );
    expect(governing).toBeCloseTo(0, 9);
  });

  it('reports the life as a band ordered by wear factor, and the depth at the life target', () => {
    const r = checkBushing(pumpCase());
    for (const m of r.materials) {
      expect(m.lifeBand.short).toBeLessThan(m.lifeBand.typical);
      expect(m.lifeBand.typical).toBeLessThan(m.lifeBand.long);
      expect(m.lifeHours).toBe(m.lifeBand.typical);
      // depth after T hours and hours to the allowance are the same straight line
      expect(m.wearDepth * (m.lifeHours / 10000)).toBeCloseTo(0.2e-3, 12);
      expect(m.wearDepthMeanPressure / m.wearDepth).toBeCloseTo(Math.PI / 4, 12);
    }
  });

  it('wear over a duty spectrum is the share-weighted sum of the points', () => {
    const fixed = { material: 'acetal', length: '30 mm' };
    const a = checkBushing(
      pumpCase({ bushing: fixed, load: { radial: '1 kN' }, shaft: { diameter: '30 mm', speed: '200 rpm' } }),
    ).materials[0]!;
    const b = checkBushing(
      pumpCase({ bushing: fixed, load: { radial: '2 kN' }, shaft: { diameter: '30 mm', speed: '50 rpm' } }),
    ).materials[0]!;
    const duty = checkBushing(
      pumpCase({
        bushing: fixed,
        shaft: { diameter: '30 mm', speed: '200 rpm' },
        duty: [
          { share: 0.6, radial: '1 kN', speed: '200 rpm' },
          { share: 0.4, radial: '2 kN', speed: '50 rpm' },
        ],
      }),
    ).materials[0]!;
    expect(duty.wearDepth).toBeCloseTo(0.6 * a.wearDepth + 0.4 * b.wearDepth, 12);
    expect(duty.pressure).toBeCloseTo(b.pressure, 6); // governing = largest load
  });

  it('a longer bushing never wears deeper and never has a higher PV', () => {
    let last = Infinity;
    let lastPv = Infinity;
    for (const L of [15, 20, 30, 45]) {
      const m = checkBushing(pumpCase({ bushing: { material: 'nylon', length: `${L} mm` } })).materials[0]!;
      expect(m.wearDepth).toBeLessThan(last);
      expect(m.pv).toBeLessThan(lastPv);
      last = m.wearDepth;
      lastPv = m.pv;
    }
  });

  it('an oscillating shaft slides at θ·D·f and carries the oscillation motion factor', () => {
    const r = checkBushing(
      pumpCase({ shaft: { diameter: '30 mm', oscillation: { angle: '60 deg', frequency: '0.5 Hz' } } }),
    );
    const m = r.materials[0]!;
    expect(m.velocity).toBeCloseTo((Math.PI / 3) * 0.03 * 0.5, 12);
    expect(m.factors.motion).toBe(2);
  });

  it('names the best material or says why none fits', () => {
    const easy = checkBushing(
      pumpCase({ shaft: { diameter: '30 mm', speed: '20 rpm' }, load: { radial: '300 N' }, life: { hours: '2000 h' } }),
    );
    expect(easy.best).not.toBeNull();
    expect(easy.materials.find((m) => m.id === easy.best)!.feasible).toBe(true);
    const hard = checkBushing(pumpCase({ shaft: { diameter: '30 mm', speed: '3000 rpm' }, load: { radial: '20 kN' } }));
    expect(hard.best).toBeNull();
    expect(hard.bestReason.code).toBe('bushing.none-feasible');
    expect(wordOf(hard.bestReason)).toMatch(/^no material passes every check: .+ fails for \d+ of \d+/);
  });
});

describe('bushing calculation sheet', () => {
  it('names the material shown and every numerical line evaluates to its value within 1 % (four-figure numbers)', async () => {
    const { evaluate } = await import('../../helpers/sheet.js');
    const r = checkBushing(pumpCase());
    expect(r.sheet[0]!.label).toContain(r.materials.find((m) => m.id === r.shown)!.name);
    let numerical = 0;
    for (const l of r.sheet) {
      const v = evaluate(
        l.substituted
          .replace(/m\^2\/N/g, '')
          .replace(/m\/s/g, '')
          .replace(/\bs\b/g, '')
          .replace(/rad|Hz/g, ''),
      );
      if (v === null) continue;
      numerical++;
      expect(Math.abs(v / l.value - 1), `${l.label}: ${l.substituted}`).toBeLessThan(0.01);
    }
    expect(numerical).toBeGreaterThanOrEqual(5);
  });

  it('with axial load the thrust face lines evaluate to their values too', async () => {
    const { evaluate } = await import('../../helpers/sheet.js');
    const r = checkBushing(pumpCase({ load: { radial: '1.2 kN', axial: '800 N', shock: 'light' } }));
    const lines = r.sheet.filter((l) => l.label.startsWith('Thrust face'));
    expect(lines).toHaveLength(2);
    for (const l of lines) {
      const v = evaluate(l.substituted);
      expect(v, l.substituted).not.toBeNull();
      expect(Math.abs(v! / l.value - 1), `${l.label}: ${l.substituted}`).toBeLessThan(0.01);
    }
  });
});
