// The design-review note's layout (issue 16): the numbered reference list, document control,
// the first-page summary, and the table hints the HTML print layout relies on. Structure, not
// physics; the demo case and invented settings of our own.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { advise } from '../../src/advise/engine.js';
import { loadCaseFile } from '../../src/case/load.js';
import { governingCheck } from '../../src/core/check.js';
import { buildNote, documentControl } from '../../src/report/note/model.js';
import { optionChecks, OPTION_NAMES } from '../../src/report/note/option-sections.js';
import { References, sourceEntries, sourceParts } from '../../src/report/note/references.js';
import type { Block } from '../../src/report/note/document.js';
import { runCli } from '../helpers/cli.js';

const loaded = loadCaseFile('examples/sawmill-infeed-roller.yaml');
const a = await advise(loaded.case, loaded.assumed);
const note = buildNote(loaded, a, { units: 'SI', now: () => new Date('2031-07-09T12:00:00Z'), journalCurves: null });
const tables = (blocks: Block[]) => blocks.filter((b): b is Extract<Block, { kind: 'table' }> => b.kind === 'table');

describe('reference list', () => {
  it('splits a source at top-level semicolons only', () => {
    expect(sourceParts('Work A 1990 (x; y); Work B 2001 [p; q];  ; Work C')).toEqual([
      'Work A 1990 (x; y)',
      'Work B 2001 [p; q]',
      'Work C',
    ]);
  });
  it('keeps a part that names no source of its own with the part before it', () => {
    expect(sourceEntries('Trumpler 1966 (from memory); 0.0002 in x 25.4 um/in = 5.08 um; ISO 281:2007')).toEqual([
      'Trumpler 1966 (from memory); 0.0002 in x 25.4 um/in = 5.08 um',
      'ISO 281:2007',
    ]);
  });
  it('numbers each entry once, in citation order, and cites a labelled repeat by its number', () => {
    const r = new References();
    expect(r.cite('Smith 1990 (seen); Jones 2002 (from memory)')).toBe('[1, 2]');
    expect(r.cite('Jones 2002 (from memory)')).toBe('[2]');
    expect(r.cite('common practice: rollers one step higher; Smith 1990 (seen)')).toBe('[1, 3]');
    expect(r.cite('wear factor: Jones 2002 (from memory)')).toBe('[2]');
    expect(r.cite(undefined)).toBe('—');
    expect(r.list()).toEqual([
      'Smith 1990 (seen)',
      'Jones 2002 (from memory)',
      'common practice: rollers one step higher',
    ]);
  });
  it('in the demo note: every [n] cited resolves to an entry, and every entry is cited', () => {
    const refs = note.sections.find((s) => s.id === 'references')!.blocks.find((b) => b.kind === 'refs')!;
    const n = refs.kind === 'refs' ? refs.items.length : 0;
    expect(n).toBeGreaterThan(10);
    if (refs.kind === 'refs') expect(new Set(refs.items).size).toBe(n);
    const cited = new Set(
      [...JSON.stringify(note.sections.filter((s) => s.id !== 'references')).matchAll(/\[(\d+(?:, \d+)*)\]/g)].flatMap(
        (m) => m[1]!.split(', ').map(Number),
      ),
    );
    for (let i = 1; i <= n; i++) expect(cited.has(i), `[${i}]`).toBe(true);
    expect(Math.max(...cited)).toBe(n);
  });
});

describe('document control', () => {
  it('takes number, revision and project from the case, else derives the number from date and title', () => {
    expect(
      documentControl({ document: { number: 'DR-0142', revision: 'B', project: 'Line 3' } }, 't', '2031-07-09'),
    ).toEqual({
      number: 'DR-0142',
      revision: 'B',
      project: 'Line 3',
    });
    const d = documentControl({}, 'Edger roller', '2031-07-09');
    expect(d.number).toMatch(/^SW-20310709-[0-9A-F]{4}$/);
    expect(d).toMatchObject({ revision: 'A', project: null });
    expect(documentControl(null, 'Edger roller', '2031-07-09').number).toBe(d.number);
    expect(documentControl(null, 'Edger roller, drive end', '2031-07-09').number).not.toBe(d.number);
    expect(note.control.number).toMatch(/^SW-20310709-/);
  });

  const dir = mkdtempSync(join(tmpdir(), 'shaftwise-layout-'));
  const base = [
    'title: Conveyor snub pulley',
    'shaft: { diameter: 30 mm, speed: 200 rpm }',
    'load: { radial: 1.5 kN }',
    'life: { hours: 15000 h }',
    'space: { maxLength: 45 mm, maxOuterDiameter: 72 mm }',
  ];
  it('prints the case document key in HTML (escaped, also in the print stylesheet) and Markdown', () => {
    const file = join(dir, 'doc.yaml');
    writeFileSync(
      file,
      [...base, 'document: { number: "DR-7</style><script>x</script>", revision: C, project: Snub line 2 }'].join('\n'),
    );
    const html = runCli(['advise', file, '--format', 'html']);
    expect(html.code).toBe(0);
    expect(html.stdout).not.toContain('<script>');
    expect(html.stdout.match(/<\/style>/g)).toHaveLength(1);
    expect(html.stdout).toContain(
      '<th scope="row">Document</th><td>DR-7&lt;/style&gt;&lt;script&gt;x&lt;/script&gt;</td>',
    );
    expect(html.stdout).toContain('<th scope="row">Project</th><td>Snub line 2</td>');
    expect(html.stdout).toMatch(
      /@bottom-left \{ content: "DR-7\\3c \/style\\3e \\3c script\\3e x\\3c \/script\\3e {2}rev\. C"/,
    );
    const md = runCli(['advise', file, '--format', 'md']);
    expect(md.stdout).toContain('revision C · project Snub line 2');
    // The key is document control, not duty: not listed among the fields read.
    expect(md.stdout).not.toMatch(/^\| document\./m);
  });
  it('refuses a document key of the wrong shape: exit 2 naming the field', () => {
    const file = join(dir, 'bad-doc.yaml');
    writeFileSync(file, [...base, 'document: { number: 42 }'].join('\n'));
    const r = runCli(['advise', file, '--format', 'html']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/document\.number: got 42; expected a document number/);
    writeFileSync(file, [...base, 'document: { issue: 3 }'].join('\n'));
    expect(runCli(['advise', file]).stderr).toMatch(
      /document: unknown key "issue"; expected one of: number, revision, project/,
    );
  });
});

describe('summary and tables', () => {
  const summary = note.sections[0]!;
  it('opens the note: one row per option with its governing check and margin, then what decided and the recommendation', () => {
    expect(summary.id).toBe('recommendation');
    const [t] = tables(summary.blocks);
    expect(t!.rows.map((r) => r[0])).toEqual(a.ranking.map((r) => `${r.rank}. ${OPTION_NAMES[r.option]}`));
    a.ranking.forEach((r, i) => {
      const gov = governingCheck(optionChecks(r, a));
      expect(t!.rows[i]![3], r.option).toBe(gov?.label ?? '—');
    });
    const decided = summary.blocks.find((b) => b.kind === 'list')!;
    expect(decided.kind === 'list' && decided.items).toHaveLength(a.ranking.length);
    // An option that is not feasible is explained by its failing checks first.
    for (const r of a.ranking.filter((x) => !x.feasible && x.failed.length)) {
      const line = decided.kind === 'list' ? decided.items.find((x) => x.startsWith(OPTION_NAMES[r.option])) : '';
      expect(line, r.option).toContain(r.failed[0]!.label);
    }
    const rec = summary.blocks.findIndex((b) => b.kind === 'p' && b.strong === true);
    expect(rec).toBeGreaterThan(summary.blocks.indexOf(t!));
  });
  it('marks every number, margin, result and citation column of the check tables as never wrapping', () => {
    const checkTables = note.sections.flatMap((s) => tables(s.blocks)).filter((t) => t.head[0] === 'check');
    expect(checkTables.length).toBe(3);
    for (const t of checkTables) {
      expect(t.numeric).toEqual([1, 2, 3, 4, 5]);
      expect(t.widths!.reduce((x, y) => x + y, 0)).toBe(100);
      for (const r of t.rows) expect(r[5]).toMatch(/^\[\d+(, \d+)*\]$/);
    }
  });
  it('forces no page break; the calculation sheet comes last, as an appendix', () => {
    expect(note.sections.filter((s) => s.pageBreak)).toEqual([]);
    expect(note.sections.at(-1)!.title).toBe('Appendix: calculation sheet');
  });
  it('headings and captions are words, not code identifiers', () => {
    const words = note.sections.flatMap((s) => [
      s.title,
      ...s.blocks.flatMap((b) => (b.kind === 'sub' ? [b.title] : b.kind === 'table' && b.caption ? [b.caption] : [])),
    ]);
    for (const w of words) expect(w, w).not.toMatch(/[a-z][A-Z]\w*\(|\b[a-z]+[A-Z]\w*:|\.ts\b/);
  });
});
