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
 *    booleans, lists, comparisons between two facts) the exact value. Two fact sets with the
 *    same key therefore fire the same rules, and the stored run is reused. A map of 3600
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
const exact = (v: unknown): string =>
  v === undefined ? 'u' : typeof v === 'number' && !Number.isFinite(v) ? `n${v}` : JSON.stringify(v);

export function ruleRunner(rules: readonly LoadedRule[], opts: { memo?: boolean } = {}): RuleRunner {
  const engine = new Engine([], { allowUndefinedFacts: true, pathResolver: resolvePath });
  rules.forEach((r) =>
    engine.addRule({
      name: r.name,
      conditions: r.conditions as never,
      event: { type: r.event.type, params: { ...r.event } },
    }),
  );
  const all = rules
    .flatMap((r) => leaves(r.conditions as Condition, []))
    .map((l) => {
      const ref =
        l.value !== null && typeof l.value === 'object' && !Array.isArray(l.value)
          ? (l.value as { fact: string; path?: string })
          : undefined;
      return {
        fact: l.fact,
        steps: stepsOf(l.path),
        value: l.value,
        ref: ref && { fact: ref.fact, steps: stepsOf(ref.path) },
      };
    });
  const stored = new Map<string, RuleRun>();
  const stats = { runs: 0, hits: 0 };

  const key = (facts: RuleFacts): string => {
    let k = '';
    for (const l of all) {
      const v = walk(fact(facts, l.fact), l.steps);
      const ref = l.value;
      if (l.ref) {
        // Fact against fact: numbers by the sign of their difference, anything else exactly.
        const w = walk(fact(facts, l.ref.fact), l.ref.steps);
        k +=
          typeof v === 'number' && typeof w === 'number' && !Number.isNaN(v) && !Number.isNaN(w)
            ? (v < w ? '<' : v > w ? '>' : '=') + '|'
            : exact(v) + '~' + exact(w) + '|';
      } else if (typeof v === 'number' && typeof ref === 'number' && !Number.isNaN(v)) {
        k += (v < ref ? '<' : v > ref ? '>' : '=') + '|';
      } else {
        k += exact(v) + '|';
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
