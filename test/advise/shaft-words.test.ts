// The whole-shaft findings each have words (values as the advisor writes them).
import { describe, expect, it } from 'vitest';
import { finding } from '../../src/core/finding.js';
import { describe as wordOf } from '../../src/report/findings/index.js';

const sup = (name: string, option: string | null, kind: string | null = null) =>
  finding('shaft.support', { name, option, kind, form: null });

describe('shaft finding words', () => {
  it.each([
    finding('shaft.arrangement-locating-floating', { locating: sup('A', 'bushing'), floating: sup('B', 'journal') }),
    finding('shaft.arrangement-cross-located', {
      supports: [sup('A', 'rolling', 'tapered roller'), sup('B', 'bushing')],
      same: false,
    }),
    finding('shaft.arrangement-incomplete', { missing: ['B'] }),
    finding('shaft.locating-one-way', { name: 'A', kind: 'tapered roller', axialCapacity: 'one direction' }),
    finding('shaft.locating-thrust-face', { name: 'A', option: 'bushing', axial: 500 }),
    finding('shaft.floats-inside', { name: 'B' }),
    finding('shaft.thrust-face-each-end', {}),
    finding('shaft.slope-beyond-range', { support: 'B', slope: 0.1, max: Math.PI / 36 }),
  ])('$code', (f) => expect(wordOf(f)).toMatch(/\w/));
  it('says the slope in arc min', () =>
    expect(
      wordOf(finding('shaft.self-aligning', { name: 'A', kind: 'spherical roller', slope: Math.PI / 10800 })),
    ).toContain('(1 arc min)'));
});
