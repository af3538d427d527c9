import { describe, expect, it } from 'vitest';
import { validateCase } from '../../src/case/load.js';
import { checkRolling } from '../../src/calc/rolling/index.js';
import { checkJournal } from '../../src/calc/journal/index.js';
import { checkBushing } from '../../src/calc/bushing/index.js';
import { edgeFilmCheck } from '../../src/calc/journal/service-checks.js';
import { kindTraits } from '../../src/data/rolling.js';

/** An invented setting: the tail pulley shaft of a small grain conveyor, one support. */
const doc = (over: Record<string, unknown> = {}, misalignment?: string) => ({
  title: 'Grain conveyor tail pulley (invented)',
  shaft: { diameter: '50 mm', speed: '600 rpm', ...(misalignment === undefined ? {} : { misalignment }) },
  load: { radial: '4 kN' },
  life: { hours: '20000 h', wearAllowance: '0.2 mm' },
  space: { maxLength: '60 mm', maxOuterDiameter: '130 mm' },
  lubrication: { supply: 'oil-bath', oil: 'ISO VG 68' },
  ...over,
});
const caseOf = (m?: string, over: Record<string, unknown> = {}) => validateCase(doc(over, m)).case;
const ARCMIN = Math.PI / (180 * 60);

describe('misalignment checks (shaft.misalignment)', () => {
  it('adds no misalignment check where the case states none', () => {
    const c = caseOf();
    expect(
      checkRolling(c)
        .candidates.flatMap((k) => k.checks)
        .some((x) => x.id === 'misalignment'),
    ).toBe(false);
    expect(checkJournal(c).checks.some((x) => x.id === 'edge-film')).toBe(false);
    expect(
      checkBushing(c)
        .materials.flatMap((m) => m.checks)
        .some((x) => x.id === 'edge-pressure'),
    ).toBe(false);
  });

  it('rolling: 30 arc min fails a deep-groove ball and a cylindrical roller bearing, passes a spherical roller', () => {
    // Permissible misalignment per kind, data/rolling-kinds.json (common practice, from memory):
    // deep-groove ball 5', cylindrical roller 3', spherical roller 90'.
    const r = checkRolling(caseOf('0.5 deg'));
    const check = (kind: string) => {
      const k = r.candidates.find((x) => x.kind === kind);
      expect(k, kind).toBeDefined();
      return k!.checks.find((x) => x.id === 'misalignment')!;
    };
    for (const kind of ['deep-groove ball', 'cylindrical roller']) {
      expect(check(kind).pass).toBe(false);
      expect(check(kind).advisory).toBeFalsy();
      expect(r.candidates.filter((x) => x.kind === kind).every((x) => !x.feasible)).toBe(true);
    }
    const sph = check('spherical roller');
    expect(sph.pass).toBe(true);
    expect(sph.limit).toBeCloseTo(90 * ARCMIN, 12);
    expect(sph.value).toBeCloseTo(30 * ARCMIN, 12);
  });

  it('rolling: the limit of each kind is its tabled permissible misalignment', () => {
    const r = checkRolling(caseOf('0.01 deg'));
    for (const k of r.candidates) {
      const t = kindTraits().find((x) => x.kind === k.kind)!;
      expect(k.checks.find((x) => x.id === 'misalignment')!.limit).toBeCloseTo(t.misalignment_arcmin * ARCMIN, 12);
    }
  });

  it('journal: edge film h0 − θ·L/2 on hand-worked numbers', () => {
    // h0 = 20 µm, L = 60 mm, θ = 2e-4 rad: θ·L/2 = 6 µm, edge film 14 µm; against 10 µm the
    // margin is (14 − 10)/10 = 0.4.
    const c = { ...caseOf(), shaft: { ...caseOf().shaft, misalignment: 2e-4 } };
    const [x] = edgeFilmCheck(c, 20e-6, 0.06, 10e-6);
    expect(x!.value).toBeCloseTo(14e-6, 12);
    expect(x!.margin).toBeCloseTo(0.4, 9);
    expect(x!.pass).toBe(true);
    // θ = 4e-4 rad: 12 µm off the edge, 8 µm left, below the 10 µm allowed.
    const [y] = edgeFilmCheck({ ...c, shaft: { ...c.shaft, misalignment: 4e-4 } }, 20e-6, 0.06, 10e-6);
    expect(y!.value).toBeCloseTo(8e-6, 12);
    expect(y!.pass).toBe(false);
  });

  it('journal: the check reads the governing film and the chosen length', () => {
    const j = checkJournal(caseOf('0.005 deg'));
    const x = j.checks.find((k) => k.id === 'edge-film')!;
    const theta = (0.005 * Math.PI) / 180;
    expect(x.value).toBeCloseTo(j.minFilmThickness - (theta * j.length) / 2, 12);
    expect(x.limit).toBeCloseTo(j.allowableFilmThickness, 12);
  });

  it('bushing: pressure on the bedded-in length min(L, δ/θ), advisory', () => {
    // δ = 0.2 mm, θ = 0.5 deg = 8.727e-3 rad: δ/θ = 22.9 mm, shorter than the bushing.
    const b = checkBushing(caseOf('0.5 deg', { lubrication: { supply: 'grease' } }));
    const theta = (0.5 * Math.PI) / 180;
    for (const m of b.materials) {
      const x = m.checks.find((k) => k.id === 'edge-pressure')!;
      expect(x.advisory).toBe(true);
      const Leff = Math.min(m.length, 0.2e-3 / theta);
      expect(x.value).toBeCloseTo(4000 / (0.05 * Leff), 3);
    }
  });
});
