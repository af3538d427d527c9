// Kind: the rolling check's collector of cautions (findings.ts) keeps a caution once: by its
// code and values, or by the name a step gives it; `wants` says whether a named one would be kept.
import { describe, expect, it } from 'vitest';
import { finding } from '../../../src/core/finding.js';
import { newNotes } from '../../../src/calc/rolling/findings.js';

describe('newNotes', () => {
  it('keeps a caution once by code and values, apart from named ones', () => {
    const n = newNotes();
    n.warn(finding('rolling.a', { x: 1 }));
    n.warn(finding('rolling.a', { x: 2 }));
    n.warn(finding('rolling.a', { x: 1 }));
    n.warn(finding('rolling.b', { x: 1 }));
    n.warn(finding('rolling.a', { x: 3 }), 'once');
    n.warn(finding('rolling.a', { x: 4 }), 'once');
    n.warn(finding('rolling.a', { x: 1 }), 'other');
    expect(n.warnings.map((w) => [w.code, w.values['x']])).toEqual([
      ['rolling.a', 1],
      ['rolling.a', 2],
      ['rolling.b', 1],
      ['rolling.a', 3],
      ['rolling.a', 1],
    ]);
  });

  it('wants a named caution until one of that code and name is kept', () => {
    const n = newNotes();
    expect(n.wants('rolling.a', 'once')).toBe(true);
    n.warn(finding('rolling.a', { x: 1 }));
    expect(n.wants('rolling.a', 'once')).toBe(true);
    n.warn(finding('rolling.a', { x: 1 }), 'once');
    expect(n.wants('rolling.a', 'once')).toBe(false);
    expect(n.wants('rolling.a', 'other')).toBe(true);
    expect(n.wants('rolling.b', 'once')).toBe(true);
  });
});
