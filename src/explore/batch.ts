import { num } from '../core/format.js';
import { OPTIONS } from '../core/options.js';
import { CaseError } from '../core/errors.js';
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { loadAnyCaseFile } from '../case/shaft-load.js';
import { advise, type AdviceResult } from '../advise/engine.js';
import { loadRules, type LoadedRule } from '../advise/load-rules.js';

import { ruleRunner } from './rule-runner.js';

/**
 * Batch: advise every case file in a folder, in sorted order (by code point, so the order
 * is the same on every machine), one row per file (per support for a shaft case). A file that cannot be read or validated
 * gets its error on its row and the rest go on. One process, one rules Engine reused for
 * every case (identical results: rule-runner.ts), no journal pressure profile or sheet
 * (the row does not show them).
 */
export interface BatchRow {
  file: string;
  title: string;
  /** "pass": an option is feasible and recommended; "fail": none is; "error": the file could not be advised. */
  result: 'pass' | 'fail' | 'error';
  recommendation: string;
  score: number | null;
  lifeHours: number | null;
  design: string;
  feasible: { bushing: boolean | null; rolling: boolean | null; journal: boolean | null };
  error: string;
}

export const CASE_FILE = /\.(ya?ml|json)$/i;

/** The case files of a folder, sorted. */
export function caseFiles(dir: string): string[] {
  return readdirSync(dir)
    .filter((f) => CASE_FILE.test(f) && statSync(join(dir, f)).isFile())
    .sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
}

const mm = (m: unknown) => (typeof m === 'number' ? `${num(m * 1e3)} mm` : '');

/** The winner's design in words, e.g. "sintered-bronze, L 40 mm" or "6208". */
function designText(a: AdviceResult): string {
  const top = a.ranking[0];
  if (!top || !a.recommendation) return '';
  const d = top.design;
  switch (top.option) {
    case 'bushing':
      return `${d['material']}, L ${mm(d['length'])}`;
    case 'rolling':
      return `${d['designation'] ?? d['bearing']}${d['ratingSource'] ? ` (ratings: ${d['ratingSource']})` : ''}`;
    case 'journal':
      return `L ${mm(d['length'])}, c ${typeof d['radialClearance'] === 'number' ? `${num(d['radialClearance'] * 1e6, 3)} µm` : ''}, ${d['oil']}`;
  }
}

/** One advised support (or single case) as a row. */
function adviceRow(name: string, title: string, a: AdviceResult): BatchRow {
  const top = a.ranking[0]!;
  const f = (o: (typeof OPTIONS)[number]) => a.ranking.find((r) => r.option === o)!.feasible;
  return {
    file: name,
    title,
    result: a.recommendation ? 'pass' : 'fail',
    recommendation: a.recommendation ?? 'none feasible',
    score: a.recommendation ? top.score : null,
    lifeHours: a.recommendation ? top.figures.lifeHours : null,
    design: designText(a),
    feasible: { bushing: f('bushing'), rolling: f('rolling'), journal: f('journal') },
    error: '',
  };
}

/**
 * The rows of one case file: one for a single-support case, one per support for a shaft case
 * (titled "<title>: <support name>"), or one row holding the error.
 */
export async function adviseFile(
  path: string,
  name: string,
  rules: LoadedRule[],
  run: ReturnType<typeof ruleRunner>['run'],
): Promise<BatchRow[]> {
  try {
    const any = loadAnyCaseFile(path);
    if (any.kind === 'shaft') {
      const { adviseShaft } = await import('../advise/shaft.js');
      const sa = await adviseShaft(any.loaded, rules);
      const title = typeof any.loaded.common['title'] === 'string' ? any.loaded.common['title'] : '';
      return sa.supports.map((s) => adviceRow(name, `${title}: ${s.name}`, s.advice));
    }
    const loaded = any.loaded;
    const a = await advise(loaded.case, loaded.assumed, rules, {
      kernel: { pressureProfile: false, sheet: false },
      runRules: run,
    });
    return [adviceRow(name, loaded.case.title, a)];
  } catch (e) {
    const error =
      e instanceof CaseError
        ? e.problems.map((p) => `${p.field}: ${p.message}`).join('; ')
        : `internal defect: ${(e as Error)?.message ?? String(e)}`;
    return [
      {
        file: name,
        title: '',
        result: 'error',
        recommendation: '',
        score: null,
        lifeHours: null,
        design: '',
        feasible: { bushing: null, rolling: null, journal: null },
        error,
      },
    ];
  }
}

/** Advise every case file in `dir`; `onProgress` after each file. */
export async function runBatch(
  dir: string,
  opts: { rules?: LoadedRule[]; onProgress?: (done: number, total: number) => void } = {},
): Promise<BatchRow[]> {
  const rules = opts.rules ?? loadRules();
  const { run } = ruleRunner(rules);
  const files = caseFiles(dir);
  const rows: BatchRow[] = [];
  for (const f of files) {
    rows.push(...(await adviseFile(join(dir, f), f, rules, run)));
    opts.onProgress?.(files.indexOf(f) + 1, files.length);
  }
  return rows;
}
