// Units that cannot be misread: a bare number for a quantity with a dimension is refused in a
// case file, naming the field, the number and two ways to write it; `units: base` reads bare
// numbers in the internal SI units on purpose; the case as the JSON output prints it loads back.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { caseFileOf } from '../../src/case/base-units.js';
import { parseCaseText, validateCase } from '../../src/case/load.js';
import { parseQuantity } from '../../src/case/quantity.js';
import { CaseError } from '../../src/core/errors.js';
import { ROOT } from '../helpers/cli.js';

/** An invented case that uses every quantity key a case file has (a press-brake backgauge idler). */
function fullCase(): Record<string, unknown> {
  return {
    title: 'Test: press-brake backgauge idler (invented)',
    shaft: { diameter: '35 mm', speed: '240 rpm' },
    load: { radial: '2.4 kN', axial: '150 N', shock: 'light' },
    duty: [
      { share: 0.6, radial: '2 kN', axial: '100 N', speed: '200 rpm' },
      { share: 0.3, radial: '2.4 kN', axial: '150 N', speed: '240 rpm' },
      { share: 0.1, radial: '3 kN', axial: '0 N', speed: '60 rpm' },
    ],
    life: { hours: '16000 h', wearAllowance: '0.2 mm', reliability: 95 },
    space: { maxLength: '45 mm', maxOuterDiameter: '75 mm' },
    lubrication: { supply: 'oil-bath', viscosity: '0.04 Pa*s', inletTemperature: '35 degC' },
    environment: { ambient: '22 degC', contamination: 'normal', startsPerHour: 6 },
    priorities: { cost: 4, friction: 2, maintenance: 3, noise: 3, precision: 2 },
    bushing: {
      length: '30 mm',
      material: {
        id: 'shop-bronze',
        name: 'Shop leaded bronze',
        maxPressure: '12 MPa',
        maxVelocity: '1.5 m/s',
        maxPV: '1.2 MPa*m/s',
        wearFactor: '2e-6 mm^3/(N*m)',
        wearFactorLow: '1e-6 mm^3/(N*m)',
        wearFactorHigh: '6e-6 mm^3/(N*m)',
        friction: 0.12,
        maxTemperature: '120 degC',
        source: 'invented for a test',
      },
    },
    rolling: {
      kind: 'angular-contact ball',
      contactAngle: '25 deg',
      arrangement: 'single',
      bore: '35 mm',
      dynamicRating: '25 kN',
      staticRating: '15 kN',
      fatigueLimit: '0.7 kN',
      outerDiameter: '72 mm',
      width: '17 mm',
    },
    journal: { length: '30 mm', radialClearance: '0.03 mm' },
  };
}

function problems(raw: unknown): string[] {
  try {
    validateCase(raw);
  } catch (e) {
    if (e instanceof CaseError) return e.problems.map((p) => `${p.field}: ${p.message}`);
    throw e;
  }
  return [];
}

/** Every leaf of `o` with its case-file path (`duty[2].radial`). */
function leaves(o: unknown, path = ''): [string, (string | number)[], unknown][] {
  if (o === null || typeof o !== 'object') return [[path, [], o]];
  const out: [string, (string | number)[], unknown][] = [];
  for (const [k, v] of Object.entries(o)) {
    const key = Array.isArray(o) ? Number(k) : k;
    const p = typeof key === 'number' ? `${path}[${key}]` : path ? `${path}.${key}` : key;
    for (const [q, keys, leaf] of leaves(v, p)) out.push([q, [key, ...keys], leaf]);
  }
  return out;
}

function setIn(o: Record<string, unknown>, keys: (string | number)[], v: unknown): void {
  let t = o as Record<string | number, unknown>;
  for (const k of keys.slice(0, -1)) t = t[k] as Record<string | number, unknown>;
  t[keys.at(-1)!] = v;
}

const QUANTITY = /^(-?[\d.]+(?:e-?\d+)?) (.+)$/;

describe('a bare number for a quantity with a dimension is refused', () => {
  it('the full test case loads as written, with units', () => {
    expect(problems(fullCase())).toEqual([]);
  });

  it('shaft.speed: 120 names the field, the number, and 120 rpm or 2 rev/s (the issue)', () => {
    const raw = fullCase();
    setIn(raw, ['shaft', 'speed'], 120);
    expect(problems(raw)).toEqual(['shaft.speed: 120 has no unit; write 120 rpm or 2 rev/s']);
  });

  it('a duty point names its index, and a quoted number is no better than a bare one', () => {
    const raw = fullCase();
    setIn(raw, ['duty', 2, 'radial'], 3000);
    setIn(raw, ['shaft', 'diameter'], '35');
    expect(problems(raw)).toEqual([
      'shaft.diameter: "35" has no unit; write 35 mm or 0.035 m',
      'duty[2].radial: 3000 has no unit; write 3000 N or 3 kN',
    ]);
  });

  // Every quantity of the full case, one at a time: the message names its path and offers two spellings.
  const quantities = leaves(fullCase()).filter(([, , v]) => typeof v === 'string' && QUANTITY.test(v));
  it('the full case has a quantity under every group that holds one', () => {
    const groups = new Set(quantities.map(([p]) => p.split(/[.[]/)[0]));
    for (const g of [
      'shaft',
      'load',
      'duty',
      'life',
      'space',
      'lubrication',
      'environment',
      'bushing',
      'rolling',
      'journal',
    ])
      expect(groups, g).toContain(g);
    expect(quantities.length).toBeGreaterThanOrEqual(35);
  });
  for (const [path, keys, v] of quantities) {
    it(`${path}: ${String(v)} written bare`, () => {
      const raw = fullCase();
      const n = Number(QUANTITY.exec(v as string)![1]);
      setIn(raw, keys, n);
      const p = problems(raw);
      expect(p).toHaveLength(1);
      expect(p[0]).toMatch(
        new RegExp(`^${path.replace(/[.[\]]/g, '\\$&')}: ${n} has no unit; write \\S+ \\S+ or \\S+ \\S+$`),
      );
      // Each spelling offered is one the parser reads, and both mean the same quantity.
      const [, a, ua, b, ub] = /write (\S+) (\S+) or (\S+) (\S+)$/.exec(p[0]!)!;
      const kind = kindOf(path);
      const first = parseQuantity(`${a} ${ua}`, kind);
      expect(Math.abs(parseQuantity(`${b} ${ub}`, kind) - first)).toBeLessThanOrEqual(Math.abs(first) * 1e-5);
    });
  }

  it('dimensionless keys keep bare numbers: shares, reliability %, priorities, starts per hour, friction, clearance ratio, oil grade', () => {
    const raw = fullCase();
    setIn(raw, ['journal'], { length: '30 mm', clearanceRatio: 0.0015 });
    setIn(raw, ['lubrication'], { supply: 'oil-bath', oil: 68, inletTemperature: '35 degC' });
    const { case: c } = validateCase(raw);
    expect(c.duty!.map((p) => p.share)).toEqual([0.6, 0.3, 0.1]);
    expect(c.life.reliability).toBe(95);
    expect(c.priorities.cost).toBe(4);
    expect(c.environment.startsPerHour).toBe(6);
    expect((c.bushing!.material as { friction: number }).friction).toBe(0.12);
    expect(c.journal!.clearanceRatio).toBe(0.0015);
    expect(c.lubrication.oilGrade).toBe(68);
  });
});

/** The kind of a path of the full case, for reading the offered spellings back. */
function kindOf(path: string): Parameters<typeof parseQuantity>[1] {
  const key = path
    .split('.')
    .at(-1)!
    .replace(/\[\d+\]$/, '');
  if (/temperature$|^ambient$/i.test(key)) return 'temperature';
  if (/^(radial|axial)$|Rating$|fatigueLimit/.test(key)) return 'force';
  if (key === 'speed') return 'speed';
  if (key === 'hours') return 'time';
  if (key === 'viscosity') return 'viscosity';
  if (key === 'maxPressure') return 'pressure';
  if (key === 'maxVelocity') return 'velocity';
  if (key === 'maxPV') return 'pv';
  if (key.startsWith('wearFactor')) return 'wearFactor';
  if (key === 'contactAngle' || key === 'angle') return 'angle';
  if (key === 'frequency') return 'frequency';
  return 'length';
}

describe('units: base reads bare numbers in SI base units (rev/s, °C, hours)', () => {
  it('shaft.speed: 120 is 120 rev/s (7200 rpm) in such a file, and the reading is listed as an assumption', () => {
    const raw = { ...fullCase(), units: 'base' };
    setIn(raw, ['shaft', 'speed'], 120);
    const { case: c, assumed } = validateCase(raw);
    expect(c.shaft.speed).toBe(120);
    expect(assumed.find((a) => a.field === 'units')?.reason).toMatch(/rev\/s.*degC.*hours/);
    expect(validateCase(fullCase()).assumed.some((a) => a.field === 'units')).toBe(false);
  });

  it('the whole case in bare SI numbers gives the case written with units; strings with units still read', () => {
    const withUnits = validateCase(fullCase()).case;
    const bare = { ...fullCase(), units: 'base' };
    for (const [path, keys, v] of leaves(fullCase()))
      if (typeof v === 'string' && QUANTITY.test(v)) setIn(bare, keys, parseQuantity(v, kindOf(path)));
    // One left with its unit: a file in base units may still say what it means.
    setIn(bare, ['space', 'maxLength'], '45 mm');
    expect(validateCase(bare).case).toEqual(withUnits);
  });

  it('temperatures are °C, not kelvin; life in hours; angles in radians', () => {
    const raw = { ...fullCase(), units: 'base' };
    setIn(raw, ['environment', 'ambient'], 22);
    setIn(raw, ['life', 'hours'], 16000);
    setIn(raw, ['rolling', 'contactAngle'], 0.25);
    const { case: c } = validateCase(raw);
    expect(c.environment.ambient).toBe(22);
    expect(c.life.hours).toBe(16000);
    expect(c.rolling!.contactAngle).toBe(0.25);
  });

  it('another value of units is refused, and bare numbers with it', () => {
    const raw = { ...fullCase(), units: 'SI' };
    setIn(raw, ['shaft', 'speed'], 2);
    expect(problems(raw).sort()).toEqual([
      'shaft.speed: 2 has no unit; write 2 rpm or 0.0333333 rev/s',
      'units: got "SI"; expected one of: base',
    ]);
  });
});

const EXAMPLES = [
  ...readdirSync(join(ROOT, 'examples')).filter((f) => f.endsWith('.yaml')),
  ...readdirSync(join(ROOT, 'examples/batch'))
    .filter((f) => f.endsWith('.yaml'))
    .map((f) => `batch/${f}`),
];

describe('the case as printed (a case file in base units) loads back to the same SI case', () => {
  it('finds the examples', () => expect(EXAMPLES.length).toBeGreaterThanOrEqual(6));
  for (const name of EXAMPLES) {
    it(`examples/${name} loads, and its printed form loads back the same`, () => {
      const c = parseCaseText(readFileSync(join(ROOT, 'examples', name), 'utf8'), name).case;
      const printed = JSON.parse(JSON.stringify(caseFileOf(c))) as Record<string, unknown>;
      expect(printed.units).toBe('base');
      expect(validateCase(printed).case).toEqual(c);
    });
  }

  it('the full test case (duty points, inline material, supplier bearing, journal, viscosity) and one with an oil grade', () => {
    for (const raw of [fullCase(), { ...fullCase(), lubrication: { supply: 'oil-feed', oil: 'ISO VG 46' } }]) {
      const c = validateCase(raw).case;
      const back = validateCase(JSON.parse(JSON.stringify(caseFileOf(c)))).case;
      expect(back).toEqual(c);
    }
  });

  it('an oscillating shaft', () => {
    const raw: Record<string, unknown> = {
      ...fullCase(),
      shaft: { diameter: '35 mm', oscillation: { angle: '70 deg', frequency: '0.4 Hz' } },
    };
    delete raw.duty;
    const c = validateCase(raw).case;
    expect(validateCase(JSON.parse(JSON.stringify(caseFileOf(c)))).case).toEqual(c);
  });
});
