// The adaptive map equals the map with every cell evaluated, cell for cell (winner and each
// option's feasibility: all the map shows), and prints the same. Cases: the examples and the
// explore tests' invented cases; small grids to keep the test short.
import { describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { loadCaseFile, type LoadedCase } from '../../src/case/load.js';
import { computeMap, type MapOptions, type MapResult } from '../../src/explore/map.js';
import { fillAdaptive } from '../../src/explore/adaptive.js';
import { loadRules } from '../../src/advise/load-rules.js';
import { mapText } from '../../src/report/explore/map-text.js';
import { mapSvg } from '../../src/report/explore/map-svg.js';
import { oilFedLineShaft, pivot } from './cases.js';

const root = fileURLToPath(new URL('../..', import.meta.url));
const example = (file: string) => () => loadCaseFile(join(root, 'examples', file));
const rpm = (r: number) => r / 60;

const cases: [string, () => LoadedCase][] = [
  ['irrigation pump line shaft', example('irrigation-pump-lineshaft.yaml')],
  ['packaging worm drive', example('packaging-worm-drive.yaml')],
  ['sawmill infeed roller', example('sawmill-infeed-roller.yaml')],
  ['intake screen drum', example('batch/01-intake-screen-drum.yaml')],
  ['fan jackshaft', example('batch/04-fan-jackshaft.yaml')],
  ['oil-fed line shaft', oilFedLineShaft],
  ['sluice-gate pivot', () => pivot('20000 h')],
];

/** Two ranges: the default (0.1× to 10× the case) and a wide fixed one. */
const ranges: [string, Pick<MapOptions, 'load' | 'speed'>][] = [
  ['default range', {}],
  ['100 N..50 kN, 2..8000 r/min', { load: [100, 50000], speed: [rpm(2), rpm(8000)] }],
];

const labels = (m: MapResult) => m.cells.map((row) => row.map((c) => `${c.winner ?? '-'} ${c.feasible.join(',')}`));

describe('adaptive map = every cell evaluated', async () => {
  const rules = loadRules();
  for (const [name, load] of cases)
    for (const [rangeName, range] of ranges)
      for (const grid of [7, 12]) {
        it(`${name}, ${rangeName}, ${grid} × ${grid}, blocks of 2, 4 and 8`, async () => {
          const l = load();
          const opts: MapOptions = { grid, ...range, rules, journalNodes: 3 };
          const full = await computeMap(l.case, l.assumed, { ...opts, full: true });
          expect(full.evaluated).toBe(grid * grid);
          expect(full.cells.flat().every((c) => c.score !== null)).toBe(true);
          for (const block of [2, 4, 8]) {
            const m = await computeMap(l.case, l.assumed, { ...opts, block });
            expect(labels(m), `block ${block}`).toEqual(labels(full));
            expect(mapText(m)).toBe(mapText(full));
            expect(mapSvg(m)).toBe(mapSvg(full));
            expect(m.evaluated).toBeLessThanOrEqual(grid * grid);
            expect(m.cells.flat().filter((c) => c.score !== null)).toHaveLength(m.evaluated);
          }
        });
      }
});

describe('fillAdaptive on a made-up plane', () => {
  const run = (n: number, block: number, f: (i: number, j: number) => string) => {
    const calls: string[] = [];
    return fillAdaptive({
      n,
      block,
      evaluate: async (i, j) => {
        calls.push(`${i},${j}`);
        return f(i, j);
      },
      label: (t) => t,
      fill: (t) => t,
    }).then((r) => ({ ...r, calls }));
  };

  it('a plane of one label: only the block corners are evaluated', async () => {
    const r = await run(17, 8, () => 'a');
    expect(r.count).toBe(9);
    expect(r.cells.flat().every((t) => t === 'a')).toBe(true);
  });

  it('a curved boundary: the same labels as every cell, each cell evaluated at most once, fewer than all', async () => {
    const f = (i: number, j: number) => ((i - 3) ** 2 + (j + 2) ** 2 < 150 ? 'in' : j > 25 ? 'far' : 'out');
    for (const block of [1, 3, 8, 40]) {
      const r = await run(40, block, f);
      expect(r.cells).toEqual(Array.from({ length: 40 }, (_, i) => Array.from({ length: 40 }, (_, j) => f(i, j))));
      expect(new Set(r.calls).size).toBe(r.calls.length);
      expect(r.count).toBe(r.calls.length);
      if (block > 1) expect(r.count).toBeLessThan(1600);
    }
  });

  it('the grid of one cell and of two', async () => {
    expect((await run(1, 8, () => 'x')).cells).toEqual([['x']]);
    expect((await run(2, 8, (i, j) => `${i}${j}`)).cells).toEqual([
      ['00', '01'],
      ['10', '11'],
    ]);
  });

  it('an island inside a block that touches no corner evaluated is not found (the stated limit)', async () => {
    const r = await run(17, 16, (i, j) => (i === 5 && j === 6 ? 'island' : 'sea'));
    expect(r.cells[5]![6]).toBe('sea');
  });
});
