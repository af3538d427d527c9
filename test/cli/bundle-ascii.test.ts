// The built scripts hold ASCII only (scripts/bundle.mjs escapes the rest): one character beyond it
// makes V8 keep the whole script as a two-byte string, 0.9 MB more start-up snapshot to read at
// every start. npm test builds first.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT } from '../helpers/cli.js';

const scripts = [
  join(ROOT, 'dist/snapshot/shaftwise.cjs'),
  ...readdirSync(join(ROOT, 'dist/bundle'))
    .filter((f) => f.endsWith('.mjs'))
    .map((f) => join(ROOT, 'dist/bundle', f)),
];

describe('the built scripts', () => {
  it('are there to check', () => {
    expect(scripts.length).toBeGreaterThan(2);
  });
  for (const file of scripts)
    it(`${file.slice(ROOT.length + 1)} holds ASCII only`, () => {
      const text = readFileSync(file, 'utf8');
      const at = text.search(/[\u0080-\uffff]/);
      expect(at, at >= 0 ? `"${text.slice(Math.max(0, at - 20), at + 20)}"` : '').toBe(-1);
    });
});
