// Kind: provenance checks of the shipped tables and rule files (not physics). Every figure in
// data/*.json and every rule in rules/*.json must say where it comes from, and that source
// must be a published work, a computation or "common practice" — never the machine-design
// textbook the project no longer depends on, and never a file outside the repository.
import { execFileSync } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../../', import.meta.url));

/** The tracked data/*.json and rules/*.json files; the folders' listing where git is not at hand. */
function trackedJson(): string[] {
  try {
    const out = execFileSync('git', ['ls-files', '-z', '--', 'data/*.json', 'rules/*.json'], {
      cwd: root,
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'ignore'],
    });
    const files = out.split('\0').filter((f) => f !== '');
    if (files.length > 0) return files;
  } catch {
    // not a git checkout (an unpacked tarball): fall through to the folder listing
  }
  return ['data', 'rules'].flatMap((d) =>
    readdirSync(join(root, d))
      .filter((f) => f.endsWith('.json'))
      .map((f) => `${d}/${f}`),
  );
}

/**
 * The textbook, by its title or its authors' names. Written in pieces so that a search of the
 * tree for the book's name finds nothing, this file included.
 */
const AUTHORS = [['Shig', 'ley'].join(''), ['Budy', 'nas'].join('')];
const TITLE = ['Mechanical', 'Engineering', 'Design'].join(' ');
const TEXTBOOK = new RegExp([...AUTHORS, TITLE.replace(/ /g, '\\s+')].join('|'), 'i');

/**
 * An absolute path of some machine: a Unix path of at least two parts starting after a word
 * boundary ("/srv/x", "(/opt/y"), a drive letter ("C:\", "D:/"), a UNC share, a home-relative
 * "~/" or a file: URL. Unit strings such as "mm^3/(N*m)" or "MPa*m/s" do not match: their
 * slash follows a letter or a bracket, not a boundary.
 */
const ABSOLUTE_PATH = [
  /(?:^|[\s"'([{=:,;])\/(?:[\w.~-]+\/)+[\w.~-]*/,
  /(?:^|[^\w])[A-Za-z]:[\\/]/,
  /\\\\[\w.-]+\\/,
  /(?:^|\s)~\//,
  /\bfile:\/\//i,
];
/** The reference-value list once cited by path: it lives outside the repository (name in pieces, as above). */
const OUTSIDE_NAME = ['published', 'values'].join('-');
const OUTSIDE_FILE = new RegExp(OUTSIDE_NAME, 'i');

function problemsOf(text: string): string[] {
  const found: string[] = [];
  if (TEXTBOOK.test(text)) found.push('names the machine-design textbook');
  if (ABSOLUTE_PATH.some((re) => re.test(text))) found.push('holds an absolute path');
  if (OUTSIDE_FILE.test(text)) found.push('cites a file outside the repository');
  return found;
}

interface Visit {
  /** Every `source` value met, with where it is. */
  sources: { at: string; value: unknown }[];
  /** Every string value met (sources, notes, descriptions, reasons), with where it is. */
  strings: { at: string; value: string }[];
  /** Objects that hold a figure (a number) with no source on themselves or on an enclosing object. */
  unsourced: string[];
}

/** Walk a parsed JSON file; a `source` on an object covers the figures of the objects inside it. */
function visit(node: unknown, at: string, covered: boolean, out: Visit): void {
  if (typeof node === 'string') {
    out.strings.push({ at, value: node });
  } else if (Array.isArray(node)) {
    node.forEach((v, i) => visit(v, `${at}[${i}]`, covered, out));
  } else if (node !== null && typeof node === 'object') {
    const obj = node as Record<string, unknown>;
    if ('source' in obj) out.sources.push({ at: `${at}.source`, value: obj.source });
    const hasSource = typeof obj.source === 'string' && obj.source.trim() !== '';
    const holdsFigure = Object.values(obj).some((v) => typeof v === 'number');
    if (holdsFigure && !hasSource && !covered) out.unsourced.push(at || '(top level)');
    for (const [k, v] of Object.entries(obj)) visit(v, `${at}.${k}`, covered || hasSource, out);
  }
}

const files = trackedJson();
const parsed = files.map((f) => {
  const out: Visit = { sources: [], strings: [], unsourced: [] };
  visit(JSON.parse(readFileSync(join(root, f), 'utf8')), '', false, out);
  return { file: f, ...out };
});

describe('the provenance checker itself', () => {
  it('flags the textbook, machine paths and the outside reference file', () => {
    for (const t of [
      `${AUTHORS[0]}'s table of bushing materials`,
      `${AUTHORS[1]} 2014`,
      `${TITLE}, 9th ed.`,
      TITLE.toLowerCase(),
    ]) {
      expect(problemsOf(t), t).toContain('names the machine-design textbook');
    }
    for (const p of [
      'as listed in /srv/refs/x.md',
      'see (/opt/notes/a.txt)',
      'file C:\\data\\table.xlsx',
      'D:/tables/t.csv',
      '\\\\server\\share\\t.csv',
      'in ~/refs/t.md',
      'file:///mnt/me/t.md',
    ]) {
      expect(problemsOf(p), p).toContain('holds an absolute path');
    }
    expect(problemsOf(`as in ${OUTSIDE_NAME}.md`)).toContain('cites a file outside the repository');
  });
  it('passes ordinary source texts with units, ratios and clause numbers', () => {
    for (const ok of [
      'wear factor 1e-7 to 1e-6 mm^3/(N*m): Lancaster 1973 (from memory)',
      'maxPV 0.28-0.35 MPa*m/s dry, h in W/(m^2*K); Fa/C0 and Dw*cos(alpha)/Dpw',
      'ISO 281:2007, cl. 9.2 (from memory); L/D = 1/2 and 1/4',
      'Mott, Machine Elements in Mechanical Design, Table 16-1 (seen, as reproduced)',
      "Carvill, Mechanical Engineer's Data Handbook, 1993, 2.9.3 (seen)",
      'common practice: 1.3 / 1.5 / 3 and/or more',
    ]) {
      expect(problemsOf(ok), ok).toEqual([]);
    }
  });
  it('finds a figure without a source, and accepts one covered by its table', () => {
    const out: Visit = { sources: [], strings: [], unsourced: [] };
    visit({ rows: [{ a: 1, source: 'x' }, { a: 2 }], table: { source: 'y', rows: [{ b: 3 }] } }, '', false, out);
    expect(out.unsourced).toEqual(['.rows[1]']);
  });
});

describe('sources of the shipped tables and rules', () => {
  it('reads every data/*.json and rules/*.json file', () => {
    expect(files.some((f) => f.startsWith('data/'))).toBe(true);
    expect(files.some((f) => f.startsWith('rules/'))).toBe(true);
    expect(files).toContain('data/bushing-materials.json');
    expect(files).toContain('data/bushing-factors.json');
  });

  for (const p of parsed) {
    describe(p.file, () => {
      it('every source is a non-empty text that names neither the textbook nor a path', () => {
        expect(p.sources.length).toBeGreaterThan(0);
        const bad = p.sources
          .map((s) => ({
            at: s.at,
            why:
              typeof s.value === 'string' && s.value.trim() !== '' ? problemsOf(s.value) : ['is empty or not a text'],
          }))
          .filter((s) => s.why.length > 0);
        expect(bad).toEqual([]);
      });
      it('no other text (notes, descriptions, reasons) names the textbook or a path either', () => {
        const bad = p.strings.filter((s) => problemsOf(s.value).length > 0).map((s) => s.at);
        expect(bad).toEqual([]);
      });
      if (p.file.startsWith('data/')) {
        it('every row that holds a figure has a source, its own or its table’s', () => {
          expect(p.unsourced).toEqual([]);
        });
      } else {
        it('every rule has a source', () => {
          const rules = (JSON.parse(readFileSync(join(root, p.file), 'utf8')) as { rules: { source?: unknown }[] })
            .rules;
          expect(rules.length).toBeGreaterThan(0);
          for (const r of rules) expect(typeof r.source === 'string' && r.source.trim() !== '').toBe(true);
        });
      }
    });
  }
});

/** Tracked text files of every kind (code, tests, docs, examples), this checker's own samples aside. */
function trackedText(): string[] {
  try {
    const out = execFileSync('git', ['ls-files', '-z'], {
      cwd: root,
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'ignore'],
    });
    return out
      .split('\0')
      .filter((f) => /\.(ts|mjs|js|json|md|ya?ml|txt|csv)$/.test(f) || f.startsWith('.ci/'))
      .filter((f) => f !== 'test/data/sources.test.ts' && f !== 'package-lock.json');
  } catch {
    return []; // not a git checkout: the tables above are still checked
  }
}

/** A path under a machine's own top folders ("/home/x", "/srv/y", "C:\\Users"). */
const MACHINE_PATH = /(?:^|[^\w.])(?:\/(?:home|work|Users|root|mnt|srv|opt|tmp)\/[\w.-]+|[A-Za-z]:\\Users\\)/;

describe('no tracked file cites the textbook, the outside reference file or a machine path', () => {
  const texts = trackedText();
  it.skipIf(texts.length === 0)('code, tests, docs and examples, file by file', () => {
    const bad = texts.flatMap((f) => {
      const text = readFileSync(join(root, f), 'utf8');
      const found = [
        TEXTBOOK.test(text) ? 'names the machine-design textbook' : '',
        OUTSIDE_FILE.test(text) ? 'cites a file outside the repository' : '',
        MACHINE_PATH.exec(text)?.[0] ?? '',
      ].filter((x) => x !== '');
      return found.length ? [`${f}: ${found.join('; ')}`] : [];
    });
    expect(bad).toEqual([]);
    expect(MACHINE_PATH.test('see /home/me/refs.md')).toBe(true);
    expect(MACHINE_PATH.test('units mm^3/(N*m), ./src/x.ts')).toBe(false);
  });
});
