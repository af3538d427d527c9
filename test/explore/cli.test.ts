// CLI tests through the built program (npm test builds first): map, sensitivity, batch.
import { describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync, copyFileSync, readdirSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli, STACK, ROOT } from '../helpers/cli.js';

const tmp = () => mkdtempSync(join(tmpdir(), 'shaftwise-explore-'));
const demo = 'examples/irrigation-pump-lineshaft.yaml';
const batchDir = join(ROOT, 'examples/batch');

/** Split a CSV (RFC 4180, CRLF) into rows of fields. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [],
    f = '',
    q = false;
  for (let k = 0; k < text.length; k++) {
    const ch = text[k]!;
    if (q) {
      if (ch === '"' && text[k + 1] === '"') {
        f += '"';
        k++;
      } else if (ch === '"') q = false;
      else f += ch;
    } else if (ch === '"') q = true;
    else if (ch === ',') {
      row.push(f);
      f = '';
    } else if (ch === '\r' && text[k + 1] === '\n') {
      row.push(f);
      rows.push(row);
      row = [];
      f = '';
      k++;
    } else f += ch;
  }
  return rows;
}

describe('shaftwise batch', () => {
  it('survives a broken file: its error on its row, the other rows complete, exit 1', () => {
    const d = tmp();
    for (const f of readdirSync(batchDir)) copyFileSync(join(batchDir, f), join(d, f));
    writeFileSync(
      join(d, '00-broken.yaml'),
      'title: "Broken, on purpose"\nshaft: { diameter: 40 parsecs, speed: 100 rpm }\n',
    );
    writeFileSync(join(d, 'notes.txt'), 'not a case file');
    const out = join(d, 'summary.csv');
    const r = runCli(['batch', d, '--out', out]);
    expect(r.code).toBe(1);
    expect(r.stderr).not.toMatch(STACK);
    const rows = parseCsv(readFileSync(out, 'utf8'));
    expect(rows[0]).toEqual([
      'file',
      'title',
      'result',
      'recommendation',
      'score',
      'life_h',
      'design',
      'bushing_feasible',
      'rolling_feasible',
      'journal_feasible',
      'error',
    ]);
    expect(rows.map((x) => x[0])).toEqual([
      'file',
      '00-broken.yaml',
      '01-intake-screen-drum.yaml',
      '02-booster-line-shaft.yaml',
      '03-sluice-gate-pivot.yaml',
      '04-fan-jackshaft.yaml',
    ]);
    const broken = rows[1]!;
    expect(broken[2]).toBe('error');
    expect(broken[10]).toMatch(/shaft\.diameter/);
    expect(broken[10]).toMatch(/life/);
    for (const x of rows.slice(2)) {
      expect(x[2]).toBe('pass');
      expect(['bushing', 'rolling', 'journal']).toContain(x[3]);
      expect(x[6]).not.toBe('');
      expect(x[10]).toBe('');
    }
    // A title with a comma is quoted per RFC 4180 in the raw text.
    expect(readFileSync(out, 'utf8')).toContain('"Intake debris-screen drum, drive-side shaft"');
    // Nothing but the CSV was left in the folder (the temporary file was renamed).
    expect(readdirSync(d).filter((f) => f.startsWith('.'))).toEqual([]);
  });

  it('all good: exit 0; an existing --out is kept without --force', () => {
    const d = tmp();
    const out = join(d, 'summary.csv');
    expect(runCli(['batch', batchDir, '--out', out]).code).toBe(0);
    const first = readFileSync(out, 'utf8');
    const again = runCli(['batch', batchDir, '--out', out]);
    expect(again.code).toBe(2);
    expect(again.stderr).toContain('already exists');
    expect(readFileSync(out, 'utf8')).toBe(first);
  });

  it('a missing folder or a missing --out: exit 2, one clear message, no trace', () => {
    const a = runCli(['batch', 'no/such/folder', '--out', join(tmp(), 'x.csv')]);
    expect(a.code).toBe(2);
    expect(a.stderr).toContain('batch: folder "no/such/folder" does not exist');
    const b = runCli(['batch', batchDir]);
    expect(b.code).toBe(2);
    expect(b.stderr).toContain('--out: missing');
    for (const r of [a, b]) expect(r.stderr).not.toMatch(STACK);
  });
});

describe('shaftwise map', () => {
  it('text map with legend and axes; same output twice; no progress bar off a terminal', () => {
    const a = runCli(['map', demo, '--grid', '16']);
    expect(a.code).toBe(0);
    expect(a.stdout).toContain('Legend: B bushing wins');
    expect(a.stdout).toContain('r/min');
    expect(a.stderr).toBe('');
    expect(runCli(['map', demo, '--grid', '16']).stdout).toBe(a.stdout);
  });

  it('SVG and HTML files; ranges with units', () => {
    const d = tmp();
    const svg = join(d, 'm.svg');
    const r = runCli(['map', demo, '--grid', '10', '--load', '500N..12kN', '--speed', '100rpm..6000rpm', '--out', svg]);
    expect(r.code).toBe(0);
    const s = readFileSync(svg, 'utf8');
    expect(s.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    for (const tick of ['>1 kN<', '>10 kN<', '>100<', '>200<', '>500<', '>1000<', '>6000<']) expect(s).toContain(tick);
    const html = join(d, 'm.html');
    expect(runCli(['map', demo, '--grid', '10', '--out', html]).code).toBe(0);
    expect(readFileSync(html, 'utf8')).toMatch(/^<!doctype html>[\s\S]*<svg[\s\S]*<\/html>/);
  });

  it('bad options: exit 2 naming the option, the value and what was expected; no file written', () => {
    const d = tmp();
    const cases: [string[], RegExp][] = [
      [['--grid', '1'], /--grid: got "1"; expected a whole number of cells per axis from 2 to 200/],
      [['--load', '20kN..100N'], /--load: got "20kN\.\.100N"; expected MIN\.\.MAX with units/],
      [['--speed', '10 parsecs..20 rpm'], /--speed: got "10 parsecs\.\.20 rpm"/],
      [['--out', join(d, 'map.png')], /--out: got ".*map\.png"; expected a file name ending in \.svg or \.html/],
    ];
    for (const [args, msg] of cases) {
      const r = runCli(['map', demo, ...args]);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.stderr).toMatch(msg);
      expect(r.stderr).not.toMatch(STACK);
    }
    expect(existsSync(join(d, 'map.png'))).toBe(false);
  });
});

describe('shaftwise sensitivity', () => {
  it('text, JSON and HTML', () => {
    const t = runCli(['sensitivity', demo]);
    expect(t.code).toBe(0);
    expect(t.stdout).toContain('Sensitivity:');
    const j = runCli(['sensitivity', demo, '--format', 'json']);
    expect(JSON.parse(j.stdout).parameters).toHaveLength(6);
    const h = runCli(['sensitivity', demo, '--format', 'html']);
    expect(h.stdout).toMatch(/^<!doctype html>/);
    const bad = runCli(['sensitivity', demo, '--format', 'pdf']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain('--format: got "pdf"; expected one of: text, json, html');
  });
});
