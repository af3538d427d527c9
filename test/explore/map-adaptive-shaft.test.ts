// The adaptive map of a whole shaft equals the one with every cell evaluated, per support; and
// the CLI contract: `map CASE --full` prints what `map CASE` prints (text and SVG), on a
// single-support example and the shaft example. The CLI tests spawn the bundle: npm run build first.
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadAnyCaseFile } from '../../src/case/shaft-load.js';
import { computeShaftMap } from '../../src/explore/shaft-map.js';
import { shaftMapText } from '../../src/report/explore/shaft-map.js';
import { runCli, ROOT } from '../helpers/cli.js';

const SHAFT = 'examples/shaft/cider-mill-crusher-shaft.yaml';

describe('adaptive map of a whole shaft = every cell evaluated', () => {
  it('per support, cell for cell, 11 × 11, blocks of 3 and 8', async () => {
    const any = loadAnyCaseFile(join(ROOT, SHAFT));
    if (any.kind !== 'shaft') throw new Error('expected a shaft case');
    const opts = { grid: 11, journalNodes: 3 };
    const full = await computeShaftMap(any.loaded, { ...opts, full: true });
    const cellsOf = (m: typeof full) =>
      m.supports.map((s) => s.map.cells.map((r) => r.map((c) => [c.winner, c.feasible])));
    for (const block of [3, 8]) {
      const m = await computeShaftMap(any.loaded, { ...opts, block });
      expect(cellsOf(m)).toEqual(cellsOf(full));
      expect(shaftMapText(m)).toBe(shaftMapText(full));
      for (const s of m.supports) expect(s.map.evaluated).toBeLessThan(121);
    }
  });
});

describe('map CASE --full prints what map CASE prints', () => {
  const out = mkdtempSync(join(tmpdir(), 'shaftwise-map-full-'));
  for (const [file, grid] of [
    ['examples/packaging-worm-drive.yaml', '16'],
    [SHAFT, '10'],
  ] as const) {
    it(`${file}: text and SVG`, () => {
      const a = runCli(['map', file, '--grid', grid]);
      const b = runCli(['map', file, '--grid', grid, '--full']);
      expect(a.code, a.stderr).toBe(0);
      expect(b.code, b.stderr).toBe(0);
      expect(b.stdout).toBe(a.stdout);
      // One file name per case: the folder is shared by the cases of this loop.
      const svg = (name: string, extra: string[]) => {
        const path = join(out, `grid${grid}-${name}`);
        const r = runCli(['map', file, '--grid', grid, '--out', path, ...extra]);
        expect(r.code, r.stderr).toBe(0);
        return readFileSync(path, 'utf8');
      };
      expect(svg('full.svg', ['--full'])).toBe(svg('adaptive.svg', []));
    });
  }
});
