// The command line with units that cannot be misread: `advise --format json` prints the case it
// understood as a case file in SI base units, and that printed case, saved as a file, loads back
// to the same SI case and the same advice. Spawns the bundled CLI (npm run build first).
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCaseText, validateCase } from '../../src/case/load.js';
import { ROOT, runCli } from '../helpers/cli.js';

const EXAMPLES = [
  ...readdirSync(join(ROOT, 'examples')).filter((f) => f.endsWith('.yaml')),
  ...readdirSync(join(ROOT, 'examples/batch'))
    .filter((f) => f.endsWith('.yaml'))
    .map((f) => `batch/${f}`),
];

function json(args: string[]): Record<string, unknown> {
  const r = runCli(args);
  expect(r.code, r.stderr).toBe(0);
  return JSON.parse(r.stdout) as Record<string, unknown>;
}

const dir = mkdtempSync(join(tmpdir(), 'shaftwise-units-'));

describe('advise --format json: the printed case loads back the same', () => {
  for (const name of EXAMPLES) {
    it(name, () => {
      const file = join(ROOT, 'examples', name);
      const printed = json(['advise', file, '--format', 'json']);
      const echoed = printed.case as Record<string, unknown>;
      expect(echoed.units).toBe('base');
      // Loaded back: the very SI case the tool read from the example.
      expect(validateCase(echoed).case).toEqual(parseCaseText(readFileSync(file, 'utf8'), file).case);
      // Saved as a file and advised again: the same case and the same ranking.
      const again = join(dir, `${name.replace('/', '-')}.json`);
      writeFileSync(again, JSON.stringify(echoed, null, 2));
      const second = json(['advise', again, '--format', 'json']);
      expect(second.case).toEqual(echoed);
      expect(second.recommendation).toEqual(printed.recommendation);
      expect(second.ranking).toEqual(printed.ranking);
    });
  }

  it('check bushing --format json prints the case the same way', () => {
    const file = join(ROOT, 'examples', EXAMPLES[0]!);
    const printed = json(['check', 'bushing', file, '--format', 'json']);
    expect(validateCase(printed.case).case).toEqual(parseCaseText(readFileSync(file, 'utf8'), file).case);
  });
});

describe('shaft.speed: 120 (the regression of the issue)', () => {
  const text = (units: string) => `${units}title: Test case, paper-mill felt roll (invented)
shaft: { diameter: 60 mm, speed: 120 }
load: { radial: 4 kN }
life: { hours: 30000 h }
space: { maxLength: 80 mm, maxOuterDiameter: 130 mm }
`;

  it('is refused with exit 2, naming the field and how to write it', () => {
    const f = join(dir, 'bare-speed.yaml');
    writeFileSync(f, text(''));
    const r = runCli(['advise', f]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('shaft.speed: 120 has no unit; write 120 rpm or 2 rev/s');
    expect(r.stdout).toBe('');
  });

  it('with units: base it is read as 120 rev/s (7200 rpm)', () => {
    const f = join(dir, 'base-speed.yaml');
    writeFileSync(f, text('units: base\n'));
    const printed = json(['advise', f, '--format', 'json']);
    expect((printed.case as { shaft: { speed: number } }).shaft.speed).toBe(120);
  });
});
