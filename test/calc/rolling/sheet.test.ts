// Kind: consistency of the rolling calculation sheet. Reports print `substituted = value unit`,
// so the expression at the end of each line's `substituted` must evaluate to that line's value;
// the sheet writes numbers to five significant figures, so the check allows 0.1 %. The sheets
// of candidates of every kind are checked, worked in the case context check.ts builds. Also:
// the kind's own formulas are the ones written (e = 1.5·tan α, the partner's 0.5·Fr/Y, the
// table key), and the required dynamic rating names its bearing type and p. Invented cases
// (a tumbling-drum idler of our own), no published answers.
import { describe, expect, it } from 'vitest';
import { evaluate as evaluateExpression } from '../../helpers/sheet.js';
import type { CaseSI } from '../../../src/case/types.js';
import type { SheetLine } from '../../../src/core/check.js';
import { candidateSpecs } from '../../../src/calc/rolling/candidates.js';
import type { EvalContext } from '../../../src/calc/rolling/context.js';
import { evaluate } from '../../../src/calc/rolling/evaluate.js';
import { newNotes } from '../../../src/calc/rolling/findings.js';
import { checkRolling } from '../../../src/calc/rolling/index.js';
import { evalContext } from '../../../src/calc/rolling/check.js';
import { lifeExponent, requiredDynamicRating } from '../../../src/calc/rolling/life.js';
import { rollingSheet } from '../../../src/calc/rolling/sheet.js';
import type { RollingCandidate } from '../../../src/calc/rolling/types.js';

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

/** Every candidate of the case with its sheet, worked as checkRolling works them (check.ts). */
function sheets(c: CaseSI): { candidate: RollingCandidate; sheet: SheetLine[]; ctx: EvalContext }[] {
  const notes = newNotes();
  const { ctx, meanSpeed } = evalContext(c, notes);
  return candidateSpecs(c, notes).map((s) => {
    const candidate = evaluate(s, ctx, notes);
    return { candidate, sheet: rollingSheet(candidate, ctx, meanSpeed), ctx };
  });
}

/** The sheet's lines that are plain arithmetic, each checked against its value to 0.1 %; the others must be a function of named arguments. */
function expectConsistent(sheet: SheetLine[], who: string): number {
  let numerical = 0;
  for (const l of sheet) {
    const v = evaluateExpression(l.substituted);
    if (v === null) {
      // A function of named arguments, e.g. "a_ISO(κ = 0.52, e_C·Cu/P = 0.277)": it must end with ")".
      expect(l.substituted.trim().endsWith(')'), `${who}, ${l.label}: "${l.substituted}"`).toBe(true);
      continue;
    }
    numerical++;
    // ν1 is written in mm²/s and stored in m²/s
    const value = l.unit === 'm^2/s' ? l.value * 1e6 : l.value;
    expect(
      Math.abs(v - value) / Math.max(Math.abs(value), 1e-12),
      `${who}, ${l.label}: "${l.substituted}" = ${v}, value ${value}`,
    ).toBeLessThan(0.001);
    expect(l.source.length, `${who}, ${l.label}: source`).toBeGreaterThan(0);
  }
  return numerical;
}

const pick = (all: ReturnType<typeof sheets>, test: (k: RollingCandidate) => boolean, what: string) => {
  const got = all.find((x) => test(x.candidate));
  expect(got, what).toBeDefined();
  return got!;
};

describe('rolling calculation sheet: each substituted expression is the value it is printed with', () => {
  const axial = sheets(drumIdler());
  const radial = sheets(
    drumIdler({
      load: { radial: 3000, axial: 0, shock: 'light' },
      lubrication: { supply: 'none', inletTemperature: 25 },
      duty: [
        { share: 0.7, radial: 3000, axial: 0, speed: 300 / 60 },
        { share: 0.3, radial: 5000, axial: 0, speed: 150 / 60 },
      ],
    }),
  );
  const kinds: [string, ReturnType<typeof sheets>, (k: RollingCandidate) => boolean][] = [
    ['deep-groove ball', axial, (k) => k.kind === 'deep-groove ball'],
    ['tapered roller, single', axial, (k) => k.kind === 'tapered roller' && k.arrangement === 'single'],
    ['angular-contact ball pair', axial, (k) => k.kind === 'angular-contact ball' && k.arrangement.startsWith('pair')],
    ['angular-contact ball, single', axial, (k) => k.kind === 'angular-contact ball' && k.arrangement === 'single'],
    ['spherical roller', axial, (k) => k.kind === 'spherical roller'],
    ['self-aligning ball', axial, (k) => k.kind === 'self-aligning ball'],
    ['cylindrical roller (sealed, radial)', radial, (k) => k.kind === 'cylindrical roller'],
    ['needle roller (sealed, radial)', radial, (k) => k.kind === 'needle roller'],
  ];

  for (const [what, all, test] of kinds) {
    it(`${what}: every numerical line evaluates to its value within 0.1 %`, () => {
      const { sheet } = pick(all, test, what);
      expect(expectConsistent(sheet, what)).toBeGreaterThanOrEqual(15);
    });
  }

  it('deep-groove ball: the table is entered with f0·Fa/C0, the key the point carries', () => {
    const { candidate: k, sheet } = pick(axial, (x) => x.kind === 'deep-groove ball', 'deep-groove ball');
    const keys = sheet.filter((l) => l.label.startsWith('Relative axial load f0·Fa/C0'));
    expect(keys.map((l) => l.value)).toEqual(k.points.map((q) => q.key));
    expect(
      sheet.filter((l) => l.label.startsWith('Limit e')).every((l) => /^e\(f0·Fa\/C0 = /.test(l.substituted)),
    ).toBe(true);
  });

  it('tapered roller, single: e = 1.5·tan α and the partner adds 0.5·Fr/Y with Y = 0.4·cot α', () => {
    // ISO 281:2007 Table 7, single-row radial roller bearing with α ≠ 0: e = 1.5·tan α,
    // X = 0.4, Y = 0.4·cot α above e (from memory; data/rolling-load-factors.json).
    const { candidate: k, sheet } = pick(
      axial,
      (x) => x.kind === 'tapered roller' && x.arrangement === 'single',
      'tapered single',
    );
    const tanA = Math.tan((k.contactAngle * Math.PI) / 180);
    const e = sheet.find((l) => l.label.startsWith('Limit e'))!;
    expect(e.value).toBeCloseTo(1.5 * tanA, 9);
    const partner = sheet.filter((l) => l.label.startsWith('Axial load on the bearing'));
    expect(partner).toHaveLength(2);
    const caseFa = [200, 200];
    const Fr = [3000, 5000];
    partner.forEach((l, i) => expect(l.value).toBeCloseTo(caseFa[i]! + (0.5 * Fr[i]!) / (0.4 / tanA), 6));
  });

  it('angular-contact pair: the double-row factors, no partner force; cylindrical: P = Fr', () => {
    const pair = pick(axial, (x) => x.kind === 'angular-contact ball' && x.arrangement.startsWith('pair b'), 'pair');
    expect(pair.sheet.some((l) => l.label.startsWith('Axial load on the bearing'))).toBe(false);
    expect(pair.sheet.find((l) => l.label.startsWith('Limit e'))!.substituted).toMatch(/double row/);
    const cyl = pick(radial, (x) => x.kind === 'cylindrical roller', 'cylindrical');
    const P = cyl.sheet.filter((l) => l.label.startsWith('Dynamic equivalent load P1'));
    expect(P[0]!.substituted).toBe('P1 = 3000 N');
  });

  it('sealed: the grease life L10 is the last line; open: the regreasing interval is half of it', () => {
    const sealed = pick(radial, (x) => x.kind === 'needle roller', 'needle').sheet;
    expect(sealed[sealed.length - 1]!.label).toBe('Grease life L10 (sealed bearing, greased for life)');
    const open = pick(axial, (x) => x.kind === 'deep-groove ball', 'deep-groove').sheet;
    const l10 = open.find((l) => l.label === 'Grease life L10 (10 % of bearings)')!;
    const tr = open.find((l) => l.label === 'Regreasing interval (open bearing)')!;
    expect(tr.value).toBeCloseTo(0.5 * l10.value, 6);
  });

  it('more points than the sheet writes out one by one: the sums are given and still evaluate', () => {
    const many = sheets(
      drumIdler({
        duty: [1, 2, 3, 4, 5, 6].map((j) => ({ share: j / 21, radial: 1000 * j, axial: 100, speed: (50 * j) / 60 })),
      }),
    );
    for (const what of ['deep-groove ball', 'tapered roller'] as const) {
      const { sheet } = pick(many, (x) => x.kind === what, what);
      expectConsistent(sheet, `${what}, 6 points`);
      expect(sheet.filter((l) => l.label.startsWith('Viscosity ratio κ'))).toHaveLength(1);
      expect(sheet.find((l) => l.label.startsWith('Viscosity ratio κ'))!.label).toMatch(/the lowest κ/);
    }
  });

  it('a shaft that barely turns: no rating life is claimed, static safety governs', () => {
    const slow = sheets(drumIdler({ shaft: { diameter: 0.04, speed: 5 / 60 }, duty: undefined }));
    const { candidate: k, sheet } = pick(slow, (x) => x.kind === 'deep-groove ball', 'deep-groove');
    expect(k.staticOnly).toBe(true);
    expectConsistent(sheet, 'slow deep-groove ball');
    expect(sheet.some((l) => l.label.startsWith('No rating life claimed'))).toBe(true);
    expect(sheet.some((l) => l.label.startsWith('Basic rating life'))).toBe(false);
    expect(sheet.some((l) => l.label === 'Static safety s0 (governs: no rating life claimed)')).toBe(true);
  });

  it('a1 is substituted with R (a1(95 %) = 0.637912, worked from the formula)', () => {
    // ISO 281:2007 a1 formula: 0.95·[ln(100/95)/ln(100/90)]^(2/3) + 0.05: ln(1.052632) = 0.051293,
    // ln(1.111111) = 0.105361, ratio 0.486836, ln of it −0.719874, × 2/3 = −0.479916,
    // exp = 0.618854, × 0.95 = 0.587912, + 0.05 = 0.637912.
    const r = checkRolling(drumIdler());
    const a1 = r.sheet.find((l) => l.label === 'Reliability factor a1')!;
    expect(a1.value).toBeCloseTo(0.637912, 5);
    expect(evaluateExpression(a1.substituted)).toBeCloseTo(0.637912, 5);
  });

  it("a_ISO per point names its arguments and is the point's own; e_C·Cu/P uses the point load with f_d", () => {
    const { candidate: k, sheet, ctx } = pick(axial, (x) => x.kind === 'deep-groove ball', 'deep-groove');
    const a = sheet.filter((l) => l.label.startsWith('Life modification factor a_ISO'));
    const term = sheet.filter((l) => l.label.startsWith('Contamination and fatigue-limit term'));
    expect(a.map((l) => l.value)).toEqual(k.points.map((q) => q.aISO));
    for (const l of a) expect(l.substituted).toMatch(/^(min\(50, )?a_ISO\(κ = [\d.]+, e_C·Cu\/P = [\d.]+\)\)?$/);
    term.forEach((l, i) =>
      expect(l.value).toBeCloseTo((ctx.cont.eC * k.fatigueLimit) / (ctx.serviceFactor * k.points[i]!.P), 9),
    );
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
  it('equals Σ ti·Mi·2π·ni/Σ ti over the points, not M̄·2π·n̄', () => {
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
    const M = k.points.map((q) => q.frictionViscous + q.frictionLoad);
    const expected = 0.5 * M[0]! * 2 * Math.PI * 10 + 0.5 * M[1]! * 2 * Math.PI * (100 / 60);
    expect(k.frictionPower).toBeCloseTo(expected, 9);
    expect(k.frictionTorque).toBeCloseTo(0.5 * (M[0]! + M[1]!), 12);
    // M̄·2π·n̄ weights the slow heavy point's moment with the fast point's speed: larger here.
    expect(k.frictionTorque * 2 * Math.PI * r.equivalentSpeed).toBeGreaterThan(k.frictionPower);
  });
});
