import { resolvePath, STEP } from '../advise/path.js';
import { Engine } from 'json-rules-engine';
import type { RuleFacts, RuleRun } from '../advise/engine.js';
import type { LoadedRule } from '../advise/load-rules.js';
import type { Condition } from '../advise/rule-schema.js';

/**
 * Rule evaluation for sweeps over many cases (the map, sensitivity, batch), with results
 * identical to advise()'s own fresh Engine per case.
 *
 * A fresh json-rules-engine Engine per case costs more than the kernels of a sweep point,
 * most of it in resolving each condition's path (bench/map.mjs measures it). Two steps:
 *
 * 1. One Engine per sweep, the rules added once, facts passed per run, and a path resolver
 *    for the only paths the rule schema admits ("$", ".name", "[index]"; rule-schema.ts):
 *    it walks the same properties jsonpath-plus would, so every condition sees the same
 *    value.
 * 2. `memo`: a run's outcome (which rules fire) depends only on the values the conditions
 *    compare. For each leaf condition the key records, for a number compared with a number,
 *    only the sign of (fact value − rule value), which is all that equal, notEqual,
 *    lessThan(Inclusive) and greaterThan(Inclusive) can see; for anything else (strings,
 *    booleans, lists, comparisons between two facts) the exact value. Each distinct fact path
 *    is read once per run and each distinct comparison enters the key once. Two fact sets with
 *    the same key therefore fire the same rules, and the stored run is reused. A map of 3600
 *    points has a few dozen distinct keys. The condition trees of a reused run carry the
 *    fact values of the first point with that key (advise's `rules` trace), so callers that
 *    show traces do not use memo.
 */
export interface RuleRunner {
  run: (facts: RuleFacts) => Promise<RuleRun>;
  /** Engine runs and memo hits so far (for the bench). */
  stats: { runs: number; hits: number };
}

export { resolvePath };

interface Leaf {
  fact: string;
  path?: string;
  value: unknown;
}

/** A path split into its steps once ("$.a[0]" → ["a", "0"]), so each key costs no regex. */
const stepsOf = (path: string | undefined): string[] =>
  path === undefined ? [] : [...path.matchAll(STEP)].map((m) => m[1] ?? m[2]!);
const walk = (v: unknown, steps: readonly string[]): unknown => {
  let o = v;
  for (const s of steps) {
    if (o === null || o === undefined || typeof o !== 'object') return undefined;
    o = (o as Record<string, unknown>)[s];
  }
  return o;
};

function leaves(c: Condition, out: Leaf[]): Leaf[] {
  if ('all' in c) c.all.forEach((x) => leaves(x, out));
  else if ('any' in c) c.any.forEach((x) => leaves(x, out));
  else if ('not' in c) leaves(c.not, out);
  else {
    const leaf: Leaf = { fact: c.fact, value: c.value };
    if (c.path !== undefined) leaf.path = c.path;
    out.push(leaf);
  }
  return out;
}

const fact = (facts: RuleFacts, name: string): unknown => (facts as unknown as Record<string, unknown>)[name];
/**
 * A value as a key part that no other value (nor a sign) can be read as: a length-prefixed
 * string, a number's text ended by "|", a letter for true, false, null and undefined, JSON
 * (length-prefixed) for anything else.
 */
const exact = (v: unknown): string => {
  switch (typeof v) {
    case 'string':
      return `s${v.length}:${v}`;
    case 'number':
      return `n${v}|`;
    case 'boolean':
      return v ? 't' : 'f';
    case 'undefined':
      return 'u';
    default: {
      if (v === null) return 'z';
      const j = String(JSON.stringify(v));
      return `j${j.length}:${j}`;
    }
  }
};
/** The sign of a − b as one character, for two numbers neither of which is NaN. */
const sign = (a: number, b: number): string => (a < b ? '<' : a > b ? '>' : '=');

/** What a key reads of the facts: a fact's value at a path, walked once per run however many conditions read it. */
interface Read {
  fact: string;
  steps: string[];
}
/** One part of the key: a fact value against a number, a fact value itself, or two fact values against each other. */
type Part =
  | { kind: 'number'; read: number; limit: number }
  | { kind: 'exact'; read: number }
  | { kind: 'pair'; read: number; other: number };

export function ruleRunner(rules: readonly LoadedRule[], opts: { memo?: boolean } = {}): RuleRunner {
  const engine = new Engine([], { allowUndefinedFacts: true, pathResolver: resolvePath });
  rules.forEach((r) =>
    engine.addRule({
      name: r.name,
      conditions: r.conditions as never,
      event: { type: r.event.type, params: { ...r.event } },
    }),
  );
  // The key's parts, each distinct one once (many conditions compare one fact with one value),
  // and the fact paths they read, each distinct one once.
  const reads: Read[] = [];
  const readIndex = new Map<string, number>();
  const readOf = (factName: string, path: string | undefined): number => {
    const id = `${factName}\u0000${path ?? ''}`;
    let i = readIndex.get(id);
    if (i === undefined) {
      readIndex.set(id, (i = reads.length));
      reads.push({ fact: factName, steps: stepsOf(path) });
    }
    return i;
  };
  const parts: Part[] = [];
  const partIds = new Set<string>();
  for (const l of rules.flatMap((r) => leaves(r.conditions as Condition, []))) {
    const read = readOf(l.fact, l.path);
    const ref =
      l.value !== null && typeof l.value === 'object' && !Array.isArray(l.value)
        ? (l.value as { fact: string; path?: string })
        : undefined;
    const part: Part = ref
      ? { kind: 'pair', read, other: readOf(ref.fact, ref.path) }
      : typeof l.value === 'number'
        ? { kind: 'number', read, limit: l.value }
        : { kind: 'exact', read };
    // Object.is keeps -0 and 0 apart (they compare alike, so this only costs a part).
    const id = `${part.kind}:${read}:${part.kind === 'pair' ? part.other : part.kind === 'number' ? String(Object.is(part.limit, -0) ? '-0' : part.limit) : ''}`;
    if (partIds.has(id)) continue;
    partIds.add(id);
    parts.push(part);
  }
  const values: unknown[] = new Array<unknown>(reads.length);
  const stored = new Map<string, RuleRun>();
  const stats = { runs: 0, hits: 0 };

  const key = (facts: RuleFacts): string => {
    for (let i = 0; i < reads.length; i++) values[i] = walk(fact(facts, reads[i]!.fact), reads[i]!.steps);
    let k = '';
    for (const p of parts) {
      const v = values[p.read];
      if (p.kind === 'pair') {
        // Fact against fact: numbers by the sign of their difference, anything else exactly.
        const w = values[p.other];
        k +=
          typeof v === 'number' && typeof w === 'number' && !Number.isNaN(v) && !Number.isNaN(w)
            ? sign(v, w)
            : `~${exact(v)}${exact(w)}`;
      } else if (p.kind === 'number' && typeof v === 'number' && !Number.isNaN(v)) {
        k += sign(v, p.limit);
      } else {
        k += exact(v);
      }
    }
    return k;
  };

  const run = async (facts: RuleFacts): Promise<RuleRun> => {
    const k = opts.memo ? key(facts) : '';
    if (opts.memo) {
      const hit = stored.get(k);
      if (hit) {
        stats.hits++;
        return hit;
      }
    }
    stats.runs++;
    const r = await engine.run({ ...facts });
    const out: RuleRun = { results: r.results, failureResults: r.failureResults };
    if (opts.memo) stored.set(k, out);
    return out;
  };
  return { run, stats };
}
