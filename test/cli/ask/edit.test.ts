// Unit tests (no terminal, no file) of the text splice that puts an answer into a case file:
// the rest of the text stays byte for byte, and the result holds the old data with the one key
// set. Scenario values are invented (an irrigation pump jackshaft).
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { setInText } from '../../../src/cli/ask/edit.js';

describe('setInText', () => {
  it('adds a key under an existing block mapping at its own indentation, the rest untouched', () => {
    const text =
      'title:    "Pump"   # from the P&ID\n\nshaft:\n    diameter: 30 mm     # measured\nlife:\n    hours: 2.50e4 h\n';
    const out = setInText(text, ['shaft', 'speed'], '1450 rpm');
    expect(out).toBe(
      'title:    "Pump"   # from the P&ID\n\nshaft:\n    diameter: 30 mm     # measured\n    speed: 1450 rpm\nlife:\n    hours: 2.50e4 h\n',
    );
  });

  it('adds a missing mapping with its key at the end, in the file’s indent step', () => {
    const text = 'shaft:\n    diameter: 30 mm\n# end of the hand-written part\n';
    const out = setInText(text, ['load', 'radial'], '1.2 kN');
    expect(parse(out)).toEqual({ shaft: { diameter: '30 mm' }, load: { radial: '1.2 kN' } });
    expect(out).toContain('load:\n    radial: 1.2 kN\n');
    expect(out.startsWith('shaft:\n    diameter: 30 mm\n')).toBe(true);
    expect(out).toContain('# end of the hand-written part');
  });

  it('adds to a flow mapping inside its braces, quoting a value that would break it', () => {
    expect(setInText('load: {radial: 1.2 kN}\n', ['load', 'axial'], '0 N')).toBe(
      'load: {radial: 1.2 kN, axial: 0 N}\n',
    );
    expect(setInText('load: {}\n', ['load', 'axial'], '0 N')).toBe('load: { axial: 0 N }\n');
    const out = setInText('t: {a: 1}\n', ['t', 'b'], 'x, y');
    expect(parse(out)).toEqual({ t: { a: 1, b: 'x, y' } });
  });

  it('replaces a value keeping its quoting, and fills a key left empty', () => {
    expect(setInText('title: "Old"  # keep\n', ['title'], 'New')).toBe('title: "New"  # keep\n');
    expect(setInText("title: 'Old'\n", ['title'], "Pump's shaft")).toBe("title: 'Pump''s shaft'\n");
    expect(setInText('shaft:\n  speed:\n', ['shaft', 'speed'], '300 rpm')).toBe('shaft:\n  speed: 300 rpm\n');
  });

  it('starts an empty file or a file of comments, and copes with no final newline', () => {
    expect(setInText('', ['shaft', 'diameter'], '40 mm')).toBe('shaft:\n  diameter: 40 mm\n');
    expect(setInText('# notes first\n', ['title'], 'Pump')).toBe('# notes first\ntitle: Pump\n');
    expect(setInText('title: Pump', ['life', 'hours'], '20000 h')).toBe('title: Pump\nlife:\n  hours: 20000 h\n');
  });

  it('a string that reads as a number or a boolean is quoted; a number stays a number', () => {
    expect(parse(setInText('', ['title'], '1450'))).toEqual({ title: '1450' });
    expect(parse(setInText('', ['title'], 'yes'))).toEqual({ title: 'yes' });
    expect(setInText('', ['priorities', 'cost'], 4)).toBe('priorities:\n  cost: 4\n');
  });

  it('a scalar where a mapping belongs gives way to the mapping (the document edit, comments kept)', () => {
    const out = setInText('# mine\nshaft: 40  # typo\ntitle: Pump\n', ['shaft', 'diameter'], '40 mm');
    expect(parse(out)).toEqual({ shaft: { diameter: '40 mm' }, title: 'Pump' });
    expect(out).toContain('# mine');
  });
});
