/**
 * One oil and one bath temperature per case (issue 14). Duties invented for these tests.
 */
import { describe, expect, it } from 'vitest';
import { advise as adviseAll, type AdviseOptions } from '../../src/advise/engine.js';
import type { CaseSI } from '../../src/case/types.js';
import { parseCaseText } from '../../src/case/load.js';
import { checkJournal } from '../../src/calc/journal/index.js';
import type { AssumedFinding } from '../../src/core/finding.js';

const caseOf = (text: string) => parseCaseText(text).case;
const advise = (c: CaseSI, opts: AdviseOptions) => adviseAll(c, [], undefined, opts);

/** A conveyor head drive's countershaft in an invented quarry, oil supply named, no grade. */
const fedNoGrade = (supply: string) => `
title: Quarry conveyor countershaft (invented)
shaft: { diameter: 70 mm, speed: 900 rpm }
load: { radial: 9 kN, axial: 0 N }
life: { hours: 40000 h }
space: { maxLength: 80 mm, maxOuterDiameter: 150 mm }
lubrication: { supply: ${supply}, inletTemperature: 45 degC }
environment: { ambient: 25 degC, contamination: normal }
`;

const assumed = (list: readonly unknown[], code: string) =>
  list.find((a) => (a as AssumedFinding).code === code) as AssumedFinding | undefined;

describe('one oil per case', () => {
  it('an oil-fed case with no oil named gives the journal and the rolling bearing the same grade', async () => {
    // Guards the failure where, in one oil-fed case, the journal took ISO VG 220 and the rolling bearing VG 68.
    const r = await advise(caseOf(fedNoGrade('oil-feed')), { traces: false });
    const grade = r.checks.journal.oilGrade;
    expect(grade).not.toBeNull();
    const same = assumed(r.checks.rolling.assumed, 'rolling.same-oil');
    expect(same?.values['grade']).toBe(grade);
    expect(assumed(r.checks.rolling.assumed, 'rolling.default-grade')).toBeUndefined();
    for (const k of r.checks.rolling.candidates) expect(k.viscosity).toBeGreaterThan(0);
  });

  it('the grade does not depend on which check runs first', async () => {
    const c = caseOf(fedNoGrade('oil-feed'));
    const first = await advise(c, { traces: false });
    const journal = checkJournal(c, { sheet: false, pressureProfile: false });
    const second = await advise(c, { traces: false, checks: { journal } });
    expect(assumed(second.checks.rolling.assumed, 'rolling.same-oil')?.values['grade']).toBe(
      assumed(first.checks.rolling.assumed, 'rolling.same-oil')?.values['grade'],
    );
  });

  it("a named oil is everyone's oil, and lubrication.oil: VG 10 loads and runs", async () => {
    // Guards the failure where a VG 10 spindle oil was refused.
    const text = fedNoGrade('oil-feed').replace('inletTemperature: 45 degC', 'oil: VG 10, inletTemperature: 45 degC');
    const r = await advise(caseOf(text), { traces: false });
    expect(r.checks.journal.oilGrade).toBe(10);
    expect(assumed(r.checks.rolling.assumed, 'rolling.same-oil')).toBeUndefined();
    expect(r.ranking.length).toBe(3);
  });

  it('on grease, a named oil is the base oil of both the rolling bearing and the journal', async () => {
    // Guards the failure where, with supply grease and ISO VG 220 named as the base oil, the
    // rolling bearing read VG 220 and the journal the default grease base oil VG 100.
    const text = fedNoGrade('grease').replace(
      'inletTemperature: 45 degC',
      'oil: ISO VG 220, inletTemperature: 45 degC',
    );
    const r = await advise(caseOf(text), { traces: false });
    expect(r.checks.journal.oilGrade).toBe(220);
    expect(assumed(r.checks.rolling.assumed, 'rolling.grade-as-base-oil')?.values['grade']).toBe(220);
  });
});

describe('one bath temperature per case', () => {
  it("an oil-bath case: the journal's inlet and the rolling bearing's temperature both come from the one sump balance", async () => {
    // Guards the failure where, for one bath, the journal used the 40 °C inlet default and the rolling bearing ambient + 20 K.
    const r = await advise(caseOf(fedNoGrade('oil-bath')), { traces: false });
    const j = assumed(r.checks.journal.assumed, 'journal.bath-temperature');
    const k = assumed(r.checks.rolling.assumed, 'rolling.bath-temperature');
    expect(j).toBeDefined();
    expect(k).toBeDefined();
    expect(assumed(r.checks.rolling.assumed, 'rolling.operating-temperature')).toBeUndefined();
    // One model: the same housing area, coefficient and ambient; each option its own loss.
    expect(j!.values['area']).toBe(k!.values['area']);
    expect(j!.values['heatTransfer']).toBe(k!.values['heatTransfer']);
    expect(j!.values['ambient']).toBe(25);
    // Each bath balances its own loss: T = T_amb + P/(h·A) (to the bisection tolerance).
    for (const b of [j!, k!]) {
      const t = Number(b.values['temperature']);
      const rise = Number(b.values['loss']) / (Number(b.values['heatTransfer']) * Number(b.values['area']));
      expect(t).toBeCloseTo(25 + rise, 0);
      expect(t).toBeGreaterThan(25);
    }
    // The rolling bearing runs a stated few kelvin over its bath.
    expect(Number(k!.values['bearingTemperature']) - Number(k!.values['temperature'])).toBe(Number(k!.values['rise']));
  });

  it('an oil-fed case keeps the inlet temperature it gives', async () => {
    const r = await advise(caseOf(fedNoGrade('oil-feed')), { traces: false });
    expect(assumed(r.checks.journal.assumed, 'journal.bath-temperature')).toBeUndefined();
    expect(assumed(r.checks.rolling.assumed, 'rolling.operating-temperature')?.values['temperature']).toBe(55);
  });
});
