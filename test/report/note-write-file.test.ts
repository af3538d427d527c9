// Safe writing (src/cli/write-file.ts) in-process: a write that fails part-way (the disk
// fills) leaves the previous file intact and removes the temporary file; the no-clobber
// rule holds. Contract tests, not physics.
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it, vi } from 'vitest';

const failWrite = { on: false };
vi.mock('node:fs', async (importOriginal) => {
  const fs = await importOriginal<typeof import('node:fs')>();
  return {
    ...fs,
    writeSync: (...args: Parameters<typeof fs.writeSync>) => {
      if (failWrite.on) throw Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });
      return (fs.writeSync as (...a: unknown[]) => number)(...args);
    },
  };
});

const { writeFileSafe } = await import('../../src/cli/write-file.js');
const { UsageError } = await import('../../src/core/errors.js');

afterEach(() => {
  failWrite.on = false;
});

describe('writeFileSafe', () => {
  it('a failed write (disk full) keeps the previous file and leaves no temporary file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'shaftwise-write-'));
    const f = join(dir, 'note.html');
    writeFileSync(f, 'previous note');
    failWrite.on = true;
    expect(() => writeFileSafe(f, 'new note', { force: true })).toThrow(UsageError);
    expect(() => writeFileSafe(f, 'new note', { force: true })).toThrow(
      `--out: cannot write "${f}" (no space left on the device)`,
    );
    expect(readFileSync(f, 'utf8')).toBe('previous note');
    expect(readdirSync(dir)).toEqual(['note.html']);
  });
  it('writes a new file, and replaces one only with force', () => {
    const dir = mkdtempSync(join(tmpdir(), 'shaftwise-write-'));
    const f = join(dir, 'note.md');
    writeFileSafe(f, 'one', { force: false });
    expect(readFileSync(f, 'utf8')).toBe('one');
    expect(() => writeFileSafe(f, 'two', { force: false })).toThrow('already exists and was left untouched');
    expect(readFileSync(f, 'utf8')).toBe('one');
    writeFileSafe(f, 'three', { force: true });
    expect(readFileSync(f, 'utf8')).toBe('three');
    expect(readdirSync(dir)).toEqual(['note.md']);
  });
  it('names the option it was given in messages', () => {
    const dir = mkdtempSync(join(tmpdir(), 'shaftwise-write-'));
    const f = join(dir, 'a.html');
    writeFileSync(f, 'x');
    expect(() => writeFileSafe(f, 'y', { force: false, option: 'note file' })).toThrow(/^note file: /);
  });
});
