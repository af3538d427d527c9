// The bad-input corpus (manifest.json): every entry must end with exit code 2, a message
// naming the field (or option, file, rule), no stack trace and nothing on stdout.
import { cpSync, copyFileSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli, STACK } from '../helpers/cli.js';

interface Entry {
  file: string;
  expect: string;
  note: string;
  args?: string[];
  rulesDir?: string;
  dataPatch?: Record<string, string>;
}

const here = fileURLToPath(new URL('.', import.meta.url));
const manifest = JSON.parse(readFileSync(join(here, 'manifest.json'), 'utf8')) as Entry[];

describe(`bad-input corpus (${manifest.length} inputs)`, () => {
  it('holds at least 40 inputs', () => {
    expect(manifest.length).toBeGreaterThanOrEqual(40);
  });
  for (const e of manifest) {
    it(`${e.file}: ${e.note}`, () => {
      const env: Record<string, string> = {};
      if (e.rulesDir) env.SHAFTWISE_RULES_DIR = join(here, e.rulesDir);
      if (e.dataPatch) {
        const dir = mkdtempSync(join(tmpdir(), 'shaftwise-data-'));
        cpSync(join(ROOT, 'data'), dir, { recursive: true });
        for (const [target, from] of Object.entries(e.dataPatch)) copyFileSync(join(here, from), join(dir, target));
        env.SHAFTWISE_DATA_DIR = dir;
      }
      const args = (e.args ?? ['advise', '{file}']).map((a) => a.replace('{file}', join(here, e.file)).replace('{base}', join(here, 'base.yaml')));
      const r = runCli(args, { env });
      expect(r.code, r.stderr).toBe(2);
      expect(r.stderr).toMatch(new RegExp(e.expect));
      expect(r.stderr).not.toMatch(STACK);
      expect(r.stdout).toBe('');
    });
  }
});

describe('bad input never leaves an output file behind', () => {
  const caseEntries = manifest.filter((e) => !e.args && !e.rulesDir && !e.dataPatch);
  for (const e of caseEntries.slice(0, 12)) {
    it(`${e.file} with --out: exit 2, no note written, no temporary file`, () => {
      const dir = mkdtempSync(join(tmpdir(), 'shaftwise-out-'));
      const out = join(dir, 'note.html');
      const r = runCli(['advise', join(here, e.file), '--format', 'html', '--out', out]);
      expect(r.code).toBe(2);
      expect(readdirSync(dir)).toEqual([]);
    });
  }
  it('a bad case does not touch an existing note even with --force', () => {
    const dir = mkdtempSync(join(tmpdir(), 'shaftwise-out-'));
    const out = join(dir, 'note.html');
    writeFileSync(out, 'previous note');
    const r = runCli(['advise', join(here, 'unit-diameter-kg.yaml'), '--format', 'html', '--out', out, '--force']);
    expect(r.code).toBe(2);
    expect(readFileSync(out, 'utf8')).toBe('previous note');
    expect(readdirSync(dir)).toEqual(['note.html']);
  });
});
