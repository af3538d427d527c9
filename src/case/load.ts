import { CaseError } from '../core/errors.js';
import { num } from '../core/format.js';
import { readFileSync, statSync } from 'node:fs';
import { parse as parseYaml, YAMLParseError } from 'yaml';
import { caseFileSchema } from './schema.js';
import { KINEMATIC_TO_DYNAMIC_DENSITY, readingCase } from './quantity.js';
import { completeCase } from './defaults.js';
import type { Assumption, CaseSI } from './types.js';
import { lubricants } from '../data/load.js';
import { bushingMaterials } from '../data/bushing.js';

export interface LoadedCase {
  case: CaseSI;
  assumed: Assumption[];
  /** The case as the user wrote it (units as given). */
  given: unknown;
}

/** Largest case file accepted, bytes: a duty case is a page of text. */
const MAX_BYTES = 1_000_000;

/** Read and validate a case file (YAML or JSON). Throws CaseError listing every problem. */
export function loadCaseFile(path: string): LoadedCase {
  return parseCaseText(readCaseFileText(path), path);
}

/** The text of a case file, refused (CaseError) when missing, a directory or too large. */
export function readCaseFileText(path: string): string {
  let text: string;
  try {
    const st = statSync(path);
    if (st.isDirectory())
      throw new CaseError(path, [{ field: '(file)', message: 'is a directory; expected a YAML or JSON case file' }]);
    if (st.size > MAX_BYTES)
      throw new CaseError(path, [
        { field: '(file)', message: `is ${st.size} bytes; expected a case file under ${MAX_BYTES} bytes` },
      ]);
    text = readFileSync(path, 'utf8');
  } catch (e) {
    if (e instanceof CaseError) throw e;
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EACCES' ? 'permission denied' : (e as Error).message;
    throw new CaseError(path, [
      { field: '(file)', message: `cannot be read (${why}); expected a YAML or JSON case file` },
    ]);
  }
  return text;
}

/** Validate case text (YAML or JSON); `source` names it in messages. */
export function parseCaseText(text: string, source = '(case)'): LoadedCase {
  return validateCase(parseCaseDocument(text, source), source);
}

/** Case text (YAML or JSON) parsed into a plain document, not yet validated; CaseError when unreadable. */
export function parseCaseDocument(text: string, source = '(case)'): unknown {
  if (text.includes('\u0000')) {
    throw new CaseError(source, [{ field: '(file)', message: 'holds binary data; expected a YAML or JSON text file' }]);
  }
  const depth = bracketDepth(text);
  if (depth > MAX_DEPTH) {
    throw new CaseError(source, [
      {
        field: '(file)',
        message: `nests ${depth} levels deep; expected a case file nesting at most ${MAX_DEPTH} levels`,
      },
    ]);
  }
  let raw: unknown;
  try {
    // maxAliasCount bounds alias expansion ("billion laughs"); duplicate keys are errors.
    raw = parseYaml(text, { maxAliasCount: 50, uniqueKeys: true, prettyErrors: true });
  } catch (e) {
    const msg = e instanceof YAMLParseError ? e.message.split('\n')[0]! : (e as Error).message;
    throw new CaseError(source, [{ field: '(file)', message: `is not valid YAML or JSON: ${msg}` }]);
  }
  return raw;
}

/** A case nests four or five levels; far deeper is junk that would only exhaust the parser's stack. */
const MAX_DEPTH = 64;

/** Deepest nesting of [ and { outside quoted strings (a cheap scan before parsing). */
function bracketDepth(text: string): number {
  let depth = 0;
  let max = 0;
  let quote: string | null = null;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    if (quote) {
      if (ch === '\\') i++;
      else if (ch === quote) quote = null;
    } else if (ch === '"' || ch === "'") quote = ch;
    else if (ch === '[' || ch === '{') max = Math.max(max, ++depth);
    else if (ch === ']' || ch === '}') depth = Math.max(0, depth - 1);
  }
  return max;
}

/** Validate an already-parsed case object. Throws CaseError listing every problem. */
export function validateCase(raw: unknown, source = '(case)'): LoadedCase {
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
    throw new CaseError(source, [
      {
        field: '(file)',
        message: `holds ${raw === null || raw === undefined ? 'nothing' : Array.isArray(raw) ? 'a list' : `a ${typeof raw}`}; expected a mapping with title, shaft, load, life, space…`,
      },
    ]);
  }
  // A bare number for a quantity is refused unless the file says `units: base` (a wrong value of
  // `units` is the schema's to report; the file's numbers are then refused too).
  const bare = (raw as { units?: unknown }).units === 'base' ? 'base' : 'refused';
  const parsed = readingCase(bare, () => caseFileSchema.safeParse(raw));
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => ({
      field: i.path.length
        ? i.path.map((p, k) => (typeof p === 'number' ? `[${p}]` : k ? `.${String(p)}` : String(p))).join('')
        : '(file)',
      message: i.message,
    }));
    throw new CaseError(source, problems);
  }
  const grades = lubricants().grades.map((g) => g.grade);
  const materials = bushingMaterials().map((m) => m.id);
  const done = completeCase(parsed.data, grades, materials);
  if (done.problems.length) throw new CaseError(source, done.problems);
  if (bare === 'base') {
    done.assumed.push({
      field: 'units',
      value: 'base',
      reason:
        'numbers written without a unit are read in SI base units: m, N, rev/s, rad, Hz, Pa, Pa*s, m^3/(N*m); temperatures in degC, life in hours',
    });
  }
  const visc = (raw as { lubrication?: { viscosity?: unknown } }).lubrication?.viscosity;
  if (typeof visc === 'string' && /St\b|m\^?2\/s/.test(visc)) {
    done.assumed.push({
      field: 'lubrication.viscosity',
      value: `${visc} read as ${num(done.case.lubrication.viscosity! * 1000)} mPa*s`,
      reason: `a kinematic viscosity is made dynamic with a density of ${KINEMATIC_TO_DYNAMIC_DENSITY} kg/m^3 (typical mineral oil near 40 degC, from memory); give Pa*s to avoid it`,
    });
  }
  return { case: done.case, assumed: done.assumed, given: raw };
}
