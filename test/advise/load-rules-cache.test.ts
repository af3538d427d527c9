// The program's own rules/ are read once per process; every call gets its own copy, equal to a
// fresh read; another folder is read on every call.
import { cpSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterEach, describe, expect, it } from 'vitest';
import { loadRules } from '../../src/advise/load-rules.js';

const OWN = fileURLToPath(new URL('../../rules/', import.meta.url));

describe('loadRules: the shipped rules read once', () => {
  afterEach(() => {
    delete process.env.SHAFTWISE_RULES_DIR;
  });

  it('gives each call its own copy, equal to a fresh read of the same files', () => {
    const a = loadRules();
    const b = loadRules();
    expect(b).toEqual(a);
    expect(b).not.toBe(a);
    expect(b[0]).not.toBe(a[0]);
    a[0]!.because = 'changed by a caller';
    a.pop();
    expect(loadRules()).toEqual(b);
    const copy = mkdtempSync(join(tmpdir(), 'shaftwise-rules-copy-'));
    cpSync(OWN, copy, { recursive: true });
    expect(loadRules(pathToFileURL(copy + '/'))).toEqual(b);
  });

  it('reads a folder named by SHAFTWISE_RULES_DIR on every call', () => {
    const d = mkdtempSync(join(tmpdir(), 'shaftwise-rules-env-'));
    cpSync(OWN, d, { recursive: true });
    process.env.SHAFTWISE_RULES_DIR = d;
    const before = loadRules();
    const { file: _file, concern: _concern, ...rule } = before[0]!;
    const extra = {
      concern: 'extra',
      description: 'a rule added to a team copy',
      rules: [{ ...rule, name: 'added-later' }],
    };
    writeFileSync(join(d, 'zz-extra.json'), JSON.stringify(extra));
    const after = loadRules();
    expect(after).toHaveLength(before.length + 1);
    expect(after.at(-1)!.name).toBe('added-later');
  });
});
