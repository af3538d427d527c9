import { describe, expect, it } from 'vitest';
import { len, table, wrapWords } from '../../src/report/table.js';

// The printed width of a cell is its count of code points without colour codes: what a
// terminal shows for the characters the reports use (Latin, Greek, math signs, one emoji).
describe('len: printed width of a cell', () => {
  it('counts code points, a surrogate pair once', () => {
    for (const s of ['', 'abc', 'µm · ≤ 2 °C', 'ω = 2π·n', 'a\u{1F527}b', '\u{1F527}\u{1F527}'])
      expect(len(s)).toBe([...s].length);
  });
  it('counts a lone surrogate as one, as the string iterator does', () => {
    for (const s of ['\ud800', 'x\udc00y', '\udc00\ud800']) expect(len(s)).toBe([...s].length);
  });
  it('leaves colour codes out', () => {
    expect(len('\u001b[32mpass\u001b[39m')).toBe(4);
    expect(len('\u001b[1;31m≤ 5\u001b[0m µm')).toBe(6);
  });
});

describe('table', () => {
  it('right-aligns number columns and pads text columns', () => {
    const t = table(
      ['name', 'value'],
      [
        ['shaft', '12.5 mm'],
        ['bore', '100 mm'],
      ],
    );
    expect(t.split('\n')).toEqual(['  name     value', '  -----  -------', '  shaft  12.5 mm', '  bore    100 mm']);
  });
  it('wraps the widest text column between words to fit the width, numbers never', () => {
    const long = 'a long remark that cannot fit on one line of a narrow table';
    const t = table(['remark', 'margin'], [[long, '+12 %']], '  ', 30);
    const lines = t.split('\n');
    for (const l of lines) expect(len(l)).toBeLessThanOrEqual(30);
    expect(lines.some((l) => l.endsWith('+12 %'))).toBe(true);
    expect(lines.join(' ').replace(/\s+/g, ' ')).toContain('a long remark');
  });
  it('wrapWords cuts a word longer than the width', () => {
    expect(wrapWords('abcdefghij xy', 4)).toEqual(['abcd', 'efgh', 'ij', 'xy']);
  });
});
