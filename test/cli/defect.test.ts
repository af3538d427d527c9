// An unexpected internal error (here: shipped journal tables corrupted so the table builder's
// own consistency check throws) is reported as a defect: one line, exit 70, trace only with --debug.
import { cpSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli, STACK } from '../helpers/cli.js';

function corruptData(): string {
  const dir = mkdtempSync(join(tmpdir(), 'shaftwise-defect-'));
  cpSync(join(ROOT, 'data'), dir, { recursive: true });
  const t = JSON.parse(readFileSync(join(dir, 'journal-tables.json'), 'utf8'));
  for (const tab of t.tables) tab.rows.reverse(); // S now increases with ε: the builder refuses it
  writeFileSync(join(dir, 'journal-tables.json'), JSON.stringify(t));
  return dir;
}

describe('internal defects', () => {
  const env = { SHAFTWISE_DATA_DIR: corruptData() };
  const args = ['check', 'journal', 'examples/irrigation-pump-lineshaft.yaml'];
  it('print one line naming it a defect and how to report it, exit 70, no trace', () => {
    const r = runCli(args, { env });
    expect(r.code).toBe(70);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(
      /internal defect .*please report it with the case file and the command; run again with --debug/,
    );
    expect(r.stderr).not.toMatch(STACK);
    expect(r.stdout).toBe('');
  });
  it('show the full trace with --debug', () => {
    const r = runCli([...args, '--debug'], { env });
    expect(r.code).toBe(70);
    expect(r.stderr).toMatch(STACK);
  });
});
