// Kind: behaviour of two case keys of the rolling bearing: rolling.series (the candidates of one
// dimension series) and lubrication.regreaseInterval (an open bearing on grease held to the
// maintenance plan). Duties are invented settings of our own.
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../../src/case/load.js';
import { rollingSeries } from '../../../src/case/rolling-series.js';
import { CaseError } from '../../../src/core/errors.js';
import { checkRolling } from '../../../src/calc/rolling/index.js';
import { regreaseCheck } from '../../../src/calc/rolling/checks.js';

/** A mixer's agitator drive, greased and open (invented). */
const agitator = (extra: { rolling?: object; lubrication?: object; [k: string]: unknown } = {}) => ({
  title: 'Agitator drive of a glue-mixing tank, open bearing regreased (invented)',
  shaft: { diameter: '45 mm', speed: '3000 rpm' },
  load: { radial: '1.5 kN' },
  life: { hours: '30000 h' },
  space: { maxLength: '40 mm', maxOuterDiameter: '120 mm' },
  environment: { ambient: '60 degC' },
  ...extra,
  lubrication: { supply: 'grease', ...extra.lubrication },
});

function caseError(doc: unknown): CaseError {
  try {
    validateCase(doc);
  } catch (e) {
    if (e instanceof CaseError) return e;
    throw e;
  }
  throw new Error('no CaseError');
}

describe('rolling.series: the candidates of one dimension series', () => {
  it('only bearings of the named series are considered, of every kind built in it', () => {
    for (const series of ['03', '22', '302']) {
      const r = checkRolling(validateCase(agitator({ rolling: { series } })).case, { sheet: false });
      expect(r.candidates.length, series).toBeGreaterThan(0);
      expect(new Set(r.candidates.map((k) => k.series)), series).toEqual(new Set([series]));
    }
  });

  it('an unquoted YAML 03 (the number 3) is read as series "03"', () => {
    expect(validateCase(agitator({ rolling: { series: 3 } })).case.rolling?.series).toBe('03');
  });

  it('an unknown series is refused naming the field, the value and every series of the tables', () => {
    const e = caseError(agitator({ rolling: { series: '04' } }));
    expect(e.message).toContain('rolling.series');
    expect(e.message).toContain('"04"');
    for (const s of rollingSeries()) expect(e.message).toContain(s);
    expect(rollingSeries()).toEqual(expect.arrayContaining(['10', '02', '03', '22', '23', '302', '49']));
  });
});

describe('lubrication.regreaseInterval: an open bearing against the plan', () => {
  it('the check on hand numbers: needs 900 h, the plan 2000 h, fails with margin (900 − 2000)/2000', () => {
    const k = regreaseCheck(900, 2000);
    expect(k.pass).toBe(false);
    expect(k.margin).toBeCloseTo(-0.55, 12);
    expect(k.advisory).toBeUndefined();
    const ok = regreaseCheck(2500, 2000);
    expect(ok.pass).toBe(true);
    expect(ok.margin).toBeCloseTo(0.25, 12);
  });

  const withPlan = (plan: string) =>
    checkRolling(validateCase(agitator({ lubrication: { regreaseInterval: plan } })).case, { sheet: false });

  it('each open candidate is held to the plan: its needed interval (half its 10 % grease life) against it', () => {
    const r = withPlan('100000 h');
    for (const k of r.candidates) {
      const ch = k.checks.find((x) => x.id === 'regrease-interval')!;
      expect(ch.value).toBe(k.relubricationHours);
      expect(ch.limit).toBe(100000);
      expect(ch.pass).toBe(false);
    }
    expect(r.feasible).toBe(false);
  });

  it('a plan that regreases often enough passes; without a plan there is no check and the interval is reported', () => {
    const short = withPlan('10 h');
    expect(short.feasible).toBe(true);
    expect(short.candidates.every((k) => k.checks.find((x) => x.id === 'regrease-interval')!.pass)).toBe(true);
    const none = checkRolling(validateCase(agitator()).case, { sheet: false });
    expect(none.candidates.some((k) => k.checks.some((x) => x.id === 'regrease-interval'))).toBe(false);
    expect(none.candidates.every((k) => k.relubricationHours! > 0)).toBe(true);
  });

  it('a sealed bearing (no supply) is not held to a regreasing plan', () => {
    const sealed = checkRolling(
      validateCase(agitator({ lubrication: { supply: 'none', regreaseInterval: '100000 h' } })).case,
      { sheet: false },
    );
    expect(sealed.candidates.some((k) => k.checks.some((x) => x.id === 'regrease-interval'))).toBe(false);
  });
});
