// The built CLI: `advise --format md|html` (the design-review note), its sections, escaping of
// user text, and safe writing (no clobber, --force, failed writes). Contract tests of the
// report's structure, not physics.
import { chmodSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli, STACK } from '../helpers/cli.js';

const DEMO = 'examples/sawmill-infeed-roller.yaml';
const EPOCH = { SOURCE_DATE_EPOCH: '1709640000' }; // 2024-03-05T12:00:00Z
const dir = mkdtempSync(join(tmpdir(), 'shaftwise-note-'));

/** The headings every note carries, in both formats. */
const SECTIONS = [
  'Summary and recommendation',
  'What decided',
  'Duty as understood',
  'Assumptions and defaults',
  'Plain bushing',
  'Rolling bearing',
  'Oil-film journal bearing',
  'Why it lost',
  'Methods',
  'References',
  'Cautions',
  'Sign-off',
  'Appendix: calculation sheet',
];
const CAUTION_WORDS = [
  "a concept-stage estimate, to be confirmed with the supplier's data and by test",
  'Bearing failure can injure people: follow local codes, standards and licensed engineering practice',
];

const EVIL = '<script>alert(1)</script> & "x"';
const evilCase = join(dir, 'evil.yaml');
writeFileSync(
  evilCase,
  [
    `title: ${JSON.stringify(EVIL)}`,
    'shaft: { diameter: 30 mm, speed: 300 rpm }',
    'load: { radial: 1.2 kN, axial: 0 N, shock: light }',
    'life: { hours: 10000 h, wearAllowance: 0.2 mm }',
    'space: { maxLength: 50 mm, maxOuterDiameter: 62 mm }',
    'lubrication: { supply: oil-bath, oil: ISO VG 68, inletTemperature: 40 degC }',
    'environment: { ambient: 25 degC, contamination: normal, startsPerHour: 2 }',
    'bushing:',
    '  material: { id: shop-bronze, name: "<b>Shop</b> bronze & co", maxPressure: 10 MPa, maxVelocity: 1 m/s, maxPV: 1 MPa*m/s, wearFactor: 1e-7 mm^3/(N*m), friction: 0.1, maxTemperature: 90 degC, source: "supplier <sheet> 7" }',
  ].join('\n'),
);

describe('advise --format md', () => {
  const r = runCli(['advise', DEMO, '--format', 'md'], { env: EPOCH });
  it('prints the note to stdout with every section, the date from SOURCE_DATE_EPOCH and the cautions', () => {
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^# Design-review note: Sawmill edger/);
    expect(r.stdout).toContain('Date: 2024-03-05');
    for (const s of SECTIONS) expect(r.stdout, s).toMatch(new RegExp(`^#{2,3} (\\d\\. )?${s}`, 'm'));
    for (const w of CAUTION_WORDS) expect(r.stdout).toContain(w);
    expect(r.stdout).toMatch(/\| Prepared \| &nbsp; \| &nbsp; \| &nbsp; \|/);
    expect(r.stdout).toMatch(/\| Checked \|/);
    expect(r.stdout).toMatch(/\| Approved \|/);
  });
  it('writes GitHub tables: a header rule under every header row, and the same cell count in each row', () => {
    const lines = r.stdout.split('\n');
    const cells = (l: string) => l.replace(/\\\|/g, '').split('|').length;
    for (let i = 0; i < lines.length; i++) {
      if (!/^\| (---:?|---) \|/.test(lines[i]!)) continue;
      const n = cells(lines[i - 1]!);
      expect(cells(lines[i]!)).toBe(n);
      for (let k = i + 1; k < lines.length && lines[k]!.startsWith('|'); k++)
        expect(cells(lines[k]!), lines[k]).toBe(n);
    }
  });
  it('shows each check with value, limit, margin, result and source, and the sheet with substituted values', () => {
    expect(r.stdout).toContain('| check | value | limit | margin | result | source |');
    // Sintered bronze, 60 mm, dirty (f_e = 4): rate = 4·3e-17 m²/N·(0.7·1.5915 MPa·0.20944 m/s +
    // 0.3·2.6526 MPa·0.083776 m/s) = 3.6e-11 m/s; 0.25 mm / (3.6e-11·3600) = 1929 h; margin −90 %.
    expect(r.stdout).toMatch(
      /\| Hours to wear through the allowance \(typical wear factor\) \| 1929 h \| ≥ 20000 h \| -90 % \| FAIL \| \\\[\d+(, \d+)*\\\] \|/,
    );
    // The source is cited by number; the numbered list holds it once, its marks with it.
    expect(r.stdout).toMatch(/^\d+\. Archard wear law, The Tribology Handbook 2nd ed\. 1995, A5$/m);
    expect(r.stdout.match(/^\d+\. Archard wear law, The Tribology Handbook 2nd ed\. 1995, A5$/gm)).toHaveLength(1);
    expect(r.stdout).toContain('P = 5000 N / (0.04 m · 0.06 m)');
    expect(r.stdout).toContain('| shaft.diameter | 40 mm | 40 mm (0.04 m) |');
    expect(r.stdout).toContain('| life.reliability | (default) | 90 % |');
  });
  it('is the same bytes on a second run with the same SOURCE_DATE_EPOCH', () => {
    expect(runCli(['advise', DEMO, '--format', 'md'], { env: EPOCH }).stdout).toBe(r.stdout);
  });
  it('escapes markup in user text', () => {
    const e = runCli(['advise', evilCase, '--format', 'md'], { env: EPOCH });
    expect(e.code).toBe(0);
    expect(e.stdout).not.toContain('<script>');
    expect(e.stdout).not.toContain('<b>');
    expect(e.stdout).toContain('&lt;script&gt;alert(1)&lt;/script&gt; &amp; "x"');
  });
});

describe('advise --format html', () => {
  const out = join(dir, 'demo.html');
  const r = runCli(['advise', DEMO, '--format', 'html', '--out', out], { env: EPOCH });
  const html = existsSync(out) ? readFileSync(out, 'utf8') : '';
  it('writes one self-contained file with every section, the charts and a print stylesheet', () => {
    expect(r.code).toBe(0);
    expect(r.stdout).toBe('');
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).toContain('<time datetime="2024-03-05">');
    for (const s of SECTIONS) expect(html, s).toMatch(new RegExp(`<h[23]>(\\d\\. )?${s}`));
    for (const w of CAUTION_WORDS) expect(html).toContain(w.replace("'", '&#39;'));
    for (const id of ['bushing-wear', 'rolling-life', 'journal-film', 'journal-temperature', 'journal-pressure'])
      expect(html, id).toContain(`<svg xmlns="http://www.w3.org/2000/svg" class="chart" id="chart-${id}"`);
    expect(html).toMatch(/@page \{ size: portrait; margin:/);
    expect(html).toContain('content: "page " counter(page) " of " counter(pages)');
    expect(html).toMatch(/@media print \{[^]*break-inside: avoid/);
    expect(html).toMatch(/<table class="signoff">[^]*Prepared[^]*Checked[^]*Approved/);
    // Nothing fetched at view time: no script, no external stylesheet, font or image.
    expect(html).not.toMatch(/<script|<link|@import|url\((?!#)|src=|https?:\/\/(?!www\.w3\.org\/2000\/svg)/);
  });
  it('prints to stdout without --out', () => {
    const s = runCli(['advise', DEMO, '--format', 'html'], { env: EPOCH });
    expect(s.code).toBe(0);
    expect(s.stdout.trimEnd()).toBe(html.trimEnd());
  });
  it('escapes a title and an inline material name that contain markup', () => {
    const e = runCli(['advise', evilCase, '--format', 'html'], { env: EPOCH });
    expect(e.code).toBe(0);
    expect(e.stdout).not.toContain('<script>');
    expect(e.stdout).not.toContain('<b>Shop');
    expect(e.stdout).not.toContain('<sheet>');
    expect(e.stdout).toContain(
      ': design-review note: &lt;script&gt;alert(1)&lt;/script&gt; &amp; &quot;x&quot;</title>',
    );
    expect(e.stdout).toContain(
      '<h1>Design-review note: &lt;script&gt;alert(1)&lt;/script&gt; &amp; &quot;x&quot;</h1>',
    );
    expect(e.stdout).toContain('&lt;b&gt;Shop&lt;/b&gt; bronze &amp; co');
    expect(e.stdout).toContain('supplier &lt;sheet&gt; 7');
  });
});

describe('advise --out: safe writing', () => {
  it('does not replace an existing file without --force: exit 2, the reason, the original untouched', () => {
    const f = join(dir, 'kept.html');
    writeFileSync(f, 'the reviewer’s marked-up copy');
    const r = runCli(['advise', DEMO, '--format', 'html', '--out', f]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(`--out: "${f}" already exists and was left untouched; pass --force to replace it`);
    expect(r.stderr).not.toMatch(STACK);
    expect(readFileSync(f, 'utf8')).toBe('the reviewer’s marked-up copy');
    expect(readdirSync(dir).filter((x) => x.endsWith('.tmp'))).toEqual([]);
  });
  it('replaces it with --force', () => {
    const f = join(dir, 'replaced.md');
    writeFileSync(f, 'old');
    const r = runCli(['advise', DEMO, '--format', 'md', '--out', f, '--force']);
    expect(r.code).toBe(0);
    expect(readFileSync(f, 'utf8')).toMatch(/^# Design-review note: Sawmill edger/);
  });
  it('a write into a directory that does not exist: exit 2 naming it, nothing left behind', () => {
    const f = join(dir, 'no-such-dir', 'note.html');
    const r = runCli(['advise', DEMO, '--format', 'html', '--out', f]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(`--out: cannot write "${f}" (directory "${join(dir, 'no-such-dir')}" does not exist)`);
    expect(r.stderr).not.toMatch(STACK);
    expect(existsSync(join(dir, 'no-such-dir'))).toBe(false);
  });
  it('--out naming a directory: exit 2', () => {
    const r = runCli(['advise', DEMO, '--format', 'html', '--out', dir]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(`--out: got "${dir}", which is a directory; expected a file path`);
  });
  const root = process.getuid?.() === 0;
  it.skipIf(root)(
    `a read-only directory: exit 2, the previous file intact, no temporary file${root ? ' (skipped: running as root, which may write into a read-only directory; the same path is covered in note-write-file.test.ts by an injected write failure)' : ''}`,
    () => {
      const ro = join(dir, 'read-only');
      mkdirSync(ro);
      const f = join(ro, 'note.html');
      writeFileSync(f, 'previous');
      chmodSync(ro, 0o555);
      try {
        const r = runCli(['advise', DEMO, '--format', 'html', '--out', f, '--force']);
        expect(r.code).toBe(2);
        expect(r.stderr).toContain('permission denied');
        expect(readFileSync(f, 'utf8')).toBe('previous');
        expect(readdirSync(ro)).toEqual(['note.html']);
      } finally {
        chmodSync(ro, 0o755);
      }
    },
  );
});

describe('advise: bad options', () => {
  it.each([
    [['--format', 'pdf'], '--format: got "pdf"; expected one of: text, json, md, html'],
    [['--out', join(dir, 'x.txt')], '--out: applies to --format json, md or html; got --format text'],
    [['--format', 'md', '--force'], '--force: applies only with --out FILE; got --force without --out'],
  ])('%j: exit 2 with one message', (args, msg) => {
    const r = runCli(['advise', DEMO, ...args]);
    expect(r.code).toBe(2);
    expect(r.stderr.trim()).toBe(`shaftwise: ${msg}`);
    expect(r.stdout).toBe('');
  });
  it('a bad case with --out: exit 2 and no file written', () => {
    const bad = join(dir, 'bad.yaml');
    writeFileSync(bad, 'title: x\nshaft: { diameter: 40 parsecs }\n');
    const f = join(dir, 'never.html');
    const r = runCli(['advise', bad, '--format', 'html', '--out', f]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('shaft.diameter');
    expect(existsSync(f)).toBe(false);
  });
});
