import { DataError } from '../core/errors.js';
import { readdirSync, readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';

import { copyData } from './copy.js';
import { ruleFileSchema, type Rule } from './rule-schema.js';

interface Issue {
  code: string;
  path: PropertyKey[];
  message: string;
  errors?: Issue[][];
}

/**
 * A condition is a union (leaf, all, any, not); zod reports a failed union as one
 * "invalid input". Dig into the branches for the most specific problem: the one
 * whose path reaches deepest, so the message names the bad fact or operator.
 */
function deepest(issue: Issue): Issue {
  if (issue.code !== 'invalid_union' || !issue.errors?.length) return issue;
  let best: Issue | undefined;
  for (const branch of issue.errors) {
    for (const inner of branch) {
      const d = deepest(inner);
      const full = { ...d, path: [...issue.path, ...d.path] };
      // Prefer deeper paths; among equals, prefer a specific message over "unknown key".
      if (
        !best ||
        full.path.length > best.path.length ||
        (full.path.length === best.path.length &&
          best.code === 'unrecognized_keys' &&
          full.code !== 'unrecognized_keys')
      )
        best = full;
    }
  }
  return best ?? issue;
}

export interface LoadedRule extends Rule {
  /** The file it came from, e.g. "rules/lubrication.json". */
  file: string;
  concern: string;
}

/** A rule file that does not validate: names the file and the rule. Exit code 2. */
export class RuleFileError extends DataError {}

/** rules/ beside the program, or the folder named by SHAFTWISE_RULES_DIR (a team's own rule set). */
export function rulesDir(): URL {
  const dir = process.env.SHAFTWISE_RULES_DIR;
  return dir ? pathToFileURL(dir.endsWith('/') ? dir : `${dir}/`) : ownRulesDir();
}

/** The program's own rules/ folder. */
const ownRulesDir = (): URL => new URL('../../rules/', import.meta.url);

/** The rules of the program's own rules/ folder, read once (see loadRules). */
let shipped: { href: string; rules: LoadedRule[] } | undefined;

/**
 * Load and validate every rules/*.json, in file-name order (so results are deterministic).
 * The program's own rules/ folder is read once per process, as the tables in data/ are, and
 * each call gets its own copy (a caller may change what it is given without touching what the
 * next one gets); any other folder (named by SHAFTWISE_RULES_DIR or passed in) holds someone's
 * own rules and is read on every call.
 */
export function loadRules(dir: URL = rulesDir()): LoadedRule[] {
  const own = !process.env.SHAFTWISE_RULES_DIR && dir.href === ownRulesDir().href;
  if (own && shipped?.href === dir.href) return copyData(shipped.rules) as LoadedRule[];
  const rules = readRules(dir);
  if (own) shipped = { href: dir.href, rules: structuredClone(rules) };
  return rules;
}

function readRules(dir: URL): LoadedRule[] {
  let listing: string[];
  try {
    listing = readdirSync(dir);
  } catch (e) {
    throw new RuleFileError(
      `rules folder ${dir.pathname}: cannot be read (${(e as NodeJS.ErrnoException).code ?? (e as Error).message}); expected a folder of rule files`,
    );
  }
  const files = listing.filter((f) => f.endsWith('.json')).sort();
  const out: LoadedRule[] = [];
  const names = new Map<string, string>();
  for (const f of files) {
    const label = `rules/${f}`;
    let raw: unknown;
    try {
      raw = JSON.parse(readFileSync(new URL(f, dir), 'utf8'));
    } catch (e) {
      throw new RuleFileError(`${label}: not valid JSON (${(e as Error).message})`);
    }
    const parsed = ruleFileSchema.safeParse(raw);
    if (!parsed.success) {
      const issue = deepest(parsed.error.issues[0]!);
      const idx = issue.path[0] === 'rules' && typeof issue.path[1] === 'number' ? issue.path[1] : undefined;
      const ruleName =
        idx !== undefined ? ((raw as { rules?: { name?: unknown }[] }).rules?.[idx]?.name ?? `#${idx + 1}`) : undefined;
      const where = ruleName !== undefined ? `rule ${JSON.stringify(ruleName)}, ` : '';
      throw new RuleFileError(
        `${label}: ${where}field ${issue.path.slice(idx !== undefined ? 2 : 0).join('.') || '(file)'}: ${issue.message}`,
      );
    }
    for (const r of parsed.data.rules) {
      const seen = names.get(r.name);
      if (seen)
        throw new RuleFileError(
          `${label}: rule "${r.name}": the name is already used in ${seen}; expected unique rule names`,
        );
      names.set(r.name, label);
      out.push({ ...r, file: label, concern: parsed.data.concern });
    }
  }
  if (!out.length) throw new RuleFileError(`rules/: no rule files found; expected rules/*.json`);
  return out;
}
