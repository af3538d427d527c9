// The journal kernel's findings as data: every code it emits over the example cases, the
// scenario matrix and a set of invented cases reaching each of its branches has words, every
// word table entry is reached by some case, and the words print numbers as the journal's
// sentences always have (a property of the code and golden text, not physics).
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkJournal } from '../../src/calc/journal/index.js';
import { parseCaseText, validateCase } from '../../src/case/load.js';
import type { CaseSI } from '../../src/case/types.js';
import { finding } from '../../src/core/finding.js';
import { describe as wordOf, describeAssumption, knownCodes } from '../../src/report/findings/index.js';
import { journalWording } from '../../src/report/findings/journal.js';
import { SCENARIOS } from '../advise/scenarios.js';
import { lineShaftCase } from '../helpers/case.js';

const ROOT = join(import.meta.dirname, '../..');
const exampleCases = (dir: string): [string, CaseSI][] =>
  readdirSync(join(ROOT, dir))
    .filter((f) => f.endsWith('.yaml'))
    .map((f) => [f, parseCaseText(readFileSync(join(ROOT, dir, f), 'utf8'), f).case]);

/** Invented cases (variations of the line-shaft steady bearing), one or more per branch of the findings. */
const BRANCH_CASES: [string, CaseSI][] = [
  ['sweep over length, clearance and grade, oil feed', lineShaftCase()],
  [
    'oscillating shaft',
    lineShaftCase({ shaft: { diameter: 0.06, oscillation: { angle: (20 * Math.PI) / 180, frequency: 1 / 12 } } }),
  ],
  [
    'a duty point at rest',
    lineShaftCase({
      duty: [
        { share: 0.5, radial: 2500, axial: 0, speed: 1450 / 60 },
        { share: 0.5, radial: 2500, axial: 0, speed: 0 },
      ],
    }),
  ],
  ['grease', lineShaftCase({ lubrication: { supply: 'grease', inletTemperature: 40 } })],
  ['no lubricant', lineShaftCase({ lubrication: { supply: 'none', inletTemperature: 40 } })],
  [
    'given length beyond the room, oil bath, axial load, lightly loaded',
    lineShaftCase({
      load: { radial: 3000, axial: 500, shock: 'light' },
      space: { maxLength: 0.04, maxOuterDiameter: 0.12 },
      lubrication: { supply: 'oil-bath', inletTemperature: 50, oilGrade: 68 },
      journal: { length: 0.15, clearanceRatio: 0.0015 },
    }),
  ],
  [
    'axial room below the swept L/D, film beyond the table',
    lineShaftCase({
      shaft: { diameter: 0.08, speed: 10 },
      load: { radial: 10000, axial: 0, shock: 'light' },
      space: { maxLength: 0.015, maxOuterDiameter: 0.12 },
    }),
  ],
  ['frequent starts', lineShaftCase({ environment: { ambient: 30, contamination: 'normal', startsPerHour: 30 } })],
  ['fixed viscosity', lineShaftCase({ lubrication: { supply: 'oil-feed', inletTemperature: 40, viscosity: 0.03 } })],
  [
    'greased shaft with axial load: a rubbing thrust face',
    lineShaftCase({
      load: { radial: 3000, axial: 500, shock: 'light' },
      lubrication: { supply: 'grease', inletTemperature: 40 },
    }),
  ],
  [
    'no thermal equilibrium below the ceiling',
    lineShaftCase({
      shaft: { diameter: 0.2, speed: 10000 / 60 },
      load: { radial: 5000, axial: 0, shock: 'light' },
      space: { maxLength: 0.2, maxOuterDiameter: 0.3 },
      lubrication: { supply: 'oil-feed', inletTemperature: 140, oilGrade: 320 },
      journal: { clearanceRatio: 0.0001 },
    }),
  ],
];

const CASES: [string, CaseSI][] = [
  ...exampleCases('examples'),
  ...exampleCases('examples/batch'),
  ...SCENARIOS.map((s): [string, CaseSI] => [s.id, validateCase(s.case, s.id).case]),
  ...BRANCH_CASES,
];

const results = CASES.map(([id, c]) => [id, checkJournal(c, { sheet: false, pressureProfile: false })] as const);

describe('journal findings', () => {
  const known = new Set(knownCodes());

  it.each(results)('%s: every warning and assumption has words', (_id, r) => {
    for (const w of r.warnings) {
      expect(known.has(w.code), w.code).toBe(true);
      expect(wordOf(w), w.code).not.toMatch(/undefined|NaN|\[object Object\]/);
    }
    for (const a of r.assumed) {
      expect(known.has(a.code), a.code).toBe(true);
      const shown = describeAssumption(a);
      expect(shown.field).toBe(a.field);
      expect(`${shown.value} ${shown.reason}`, a.code).not.toMatch(/undefined|NaN|\[object Object\]/);
    }
  });

  it('the cases reach every code of the journal word table, and the kernel emits only journal codes', () => {
    const emitted = new Set(results.flatMap(([, r]) => [...r.warnings, ...r.assumed].map((f) => f.code)));
    const worded = [...Object.keys(journalWording.findings), ...Object.keys(journalWording.assumptions)];
    expect([...emitted].sort()).toEqual([...worded].sort());
    for (const code of emitted) expect(code).toMatch(/^journal\./);
  });

  it('words numbers as the journal sentences always have: four figures, exponent form keeping its zeros', () => {
    expect(wordOf(finding('journal.length-exceeds-room', { length: 5e-4, maxLength: 0.04 }))).toBe(
      'journal.length 5.000e-4 m exceeds space.maxLength 0.04 m.',
    );
    // 1e-5 m³/s is 0.6 L/min.
    expect(wordOf(finding('journal.oil-feed-flow', { flow: 1e-5 }))).toBe(
      "Oil feed: the pump must deliver at least 0.6 L/min per bearing at the inlet temperature (common practice: size the supply above the film's inflow).",
    );
  });
});
