import { OPTIONS, type OptionName } from '../core/options.js';
import type { Assumption, CaseSI } from '../case/types.js';
import { advise, type AdviceResult } from '../advise/engine.js';
import { loadRules, type LoadedRule } from '../advise/load-rules.js';

import { checkJournal } from '../calc/journal/index.js';
import { logAxis } from './axes.js';
import { bestOf, designOf, type JournalDesign } from './journal-design.js';
import { ruleRunner } from './rule-runner.js';
import { referencePoint, scaleCase, type ReferencePoint } from './scale.js';

/**
 * Selection map: which support wins over a load × speed plane around a case.
 *
 * Kept from the case: shaft diameter, space, lubrication, environment, life target,
 * priorities. Swept: the radial load and speed of the governing point (referencePoint in
 * scale.ts) on log axes, every duty point scaled with it. At each cell the bushing and
 * rolling checks run in full (they size their own design there), the journal bearing is
 * evaluated as described below, and the advisor ranks the three (advise() with the same
 * rules, the checks passed in).
 *
 * Journal design across the map (for speed): checkJournal's full design sweep (324 designs,
 * about 10 ms) runs only at the nodes of a coarse sub-grid (up to 5 × 5, corners included);
 * each cell evaluates the design found at its nearest node (fixed geometry and oil, about
 * 0.1 ms; taking the best of the up to four surrounding nodes changed no cell of the five
 * example cases' maps but cost twice the time). Consequence: a cell's journal design is its
 * nearest node's optimum, not a fresh optimum, so
 * the journal can only look worse than a full sweep there, never better; near the edge of
 * its region the boundary may lie slightly inside the true one. The bench measures the
 * agreement with full advise() on a sub-grid.
 *
 * Deterministic: the same case and options give the same result.
 */

export interface MapOptions {
  /** Cells per axis. */
  grid: number;
  /** Radial load range of the governing point, N (default 0.1× to 10× the case's). */
  load?: [number, number];
  /** Speed range of the governing point, rev/s (default 0.1× to 10× the case's). */
  speed?: [number, number];
  /** Coarse journal sub-grid nodes per axis (default 5). */
  journalNodes?: number;
  rules?: LoadedRule[];
  /** Called after each row of cells: cells done, cells in all. */
  onProgress?: (done: number, total: number) => void;
}

export interface MapCell {
  winner: OptionName | null;
  /** Per option, in OPTIONS order (bushing, rolling, journal). */
  feasible: [boolean, boolean, boolean];
  score: [number, number, number];
}

export interface MapResult {
  title: string;
  /** Radial load of the governing point at each row, N, increasing. */
  loads: number[];
  /** Speed of the governing point at each column, rev/s, increasing. */
  speeds: number[];
  /** cells[i][j]: load loads[i], speed speeds[j]. */
  cells: MapCell[][];
  reference: ReferencePoint;
  oscillating: boolean;
  /** The case itself, advised in full (journal design sweep at its own point). */
  atCase: { recommendation: OptionName | null; feasible: [boolean, boolean, boolean]; score: [number, number, number] };
  ranges: { load: [number, number]; speed: [number, number]; loadGiven: boolean; speedGiven: boolean };
  journal: { nodesPerAxis: number; designs: JournalDesign[]; note: string };
  notes: string[];
}

/** Cell summary of an advice. */
function summary(a: AdviceResult): MapCell {
  const f = (o: OptionName) => a.ranking.find((r) => r.option === o)!;
  return {
    winner: a.recommendation,
    feasible: OPTIONS.map((o) => f(o).feasible) as MapCell['feasible'],
    score: OPTIONS.map((o) => f(o).score) as MapCell['score'],
  };
}

/** Indices of the coarse nodes along an axis of n cells: k·(n−1)/(K−1) rounded, ends included. */
export function nodeIndices(n: number, k: number): number[] {
  const K = Math.max(2, Math.min(n, k));
  return [...new Set(Array.from({ length: K }, (_, m) => Math.round((m * (n - 1)) / (K - 1))))];
}

/** Of the bracketing nodes, the one nearest to cell i (the lower on a tie). */
function nearest(nodes: number[], i: number, b: number[]): number {
  return b.length === 1 || i - nodes[b[0]!]! <= nodes[b[1]!]! - i ? b[0]! : b[1]!;
}

/** The node indices bracketing cell index i (one when i is a node). */
function bracket(nodes: number[], i: number): number[] {
  for (let m = 0; m < nodes.length; m++) {
    if (nodes[m] === i) return [m];
    if (nodes[m]! > i) return [m - 1, m];
  }
  return [nodes.length - 1];
}

export async function computeMap(c: CaseSI, assumed: Assumption[], opts: MapOptions): Promise<MapResult> {
  const rules = opts.rules ?? loadRules();
  const ref = referencePoint(c);
  if (!(ref.load > 0) || !(ref.speed > 0)) {
    throw new Error(
      'map: the case needs a positive load and speed at its governing point to centre the map (give --load and --speed)',
    );
  }
  const load = opts.load ?? [ref.load / 10, ref.load * 10];
  const speed = opts.speed ?? [ref.speed / 10, ref.speed * 10];
  const n = opts.grid;
  const loads = logAxis(load[0], load[1], n);
  const speeds = logAxis(speed[0], speed[1], n);
  const runner = ruleRunner(rules, { memo: true });
  const at = (i: number, j: number) => scaleCase(c, loads[i]! / ref.load, speeds[j]! / ref.speed);

  // The case itself, in full.
  const full = await advise(c, assumed, rules);

  // Journal design sweep at the coarse nodes.
  const nodes = nodeIndices(n, opts.journalNodes ?? 5);
  const designs: JournalDesign[] = [];
  const keyOf = (d: JournalDesign) => `${d.length}|${d.radialClearance}|${d.grade ?? ''}`;
  const seen = new Map<string, number>();
  const nodeDesign: number[][] = nodes.map((i) =>
    nodes.map((j) => {
      const cc = at(i, j);
      const d = designOf(checkJournal(cc, { pressureProfile: false, sheet: false }), cc);
      const k = keyOf(d);
      if (!seen.has(k)) {
        seen.set(k, designs.length);
        designs.push(d);
      }
      return seen.get(k)!;
    }),
  );

  const cells: MapCell[][] = [];
  const total = n * n;
  for (let i = 0; i < n; i++) {
    const row: MapCell[] = [];
    const bi = bracket(nodes, i);
    for (let j = 0; j < n; j++) {
      const bj = bracket(nodes, j);
      const ids = [nodeDesign[nearest(nodes, i, bi)]![nearest(nodes, j, bj)]!];
      const cc = at(i, j);
      const journal = bestOf(
        cc,
        ids.map((k) => designs[k]!),
      ).result;
      const a = await advise(cc, [], rules, {
        checks: { journal },
        kernel: { sheet: false },
        runRules: runner.run,
        traces: false,
      });
      row.push(summary(a));
    }
    cells.push(row);
    opts.onProgress?.((i + 1) * n, total);
  }

  const notes = [
    `Axes: radial load and speed of the governing point (largest radial load ${fmtN(ref.load)}, highest speed ${fmtRpm(ref.speed)} of the case); log scales.`,
    ref.spectrum
      ? "Duty spectrum: every operating point's load and speed is scaled by the cell's factor relative to the governing point; shares are kept."
      : 'Single operating point: the cell is the case at that load and speed.',
    'Kept from the case: shaft diameter, space, lubrication, environment, life target and priorities. Axial load is scaled with the radial load.',
    `Journal bearing: full design sweep at ${nodes.length} × ${nodes.length} coarse nodes; each cell evaluates the design of its nearest node, so the journal region may be slightly smaller than a fresh design at every cell would give.`,
  ];
  if (c.shaft.oscillation)
    notes.push(
      'Oscillating shaft: speed is the equivalent rotational speed θ·f/π; the frequency is scaled, the swing kept.',
    );
  return {
    title: c.title,
    loads,
    speeds,
    cells,
    reference: ref,
    oscillating: c.shaft.oscillation !== undefined,
    atCase: { ...summary(full), recommendation: full.recommendation },
    ranges: { load, speed, loadGiven: opts.load !== undefined, speedGiven: opts.speed !== undefined },
    journal: { nodesPerAxis: nodes.length, designs, note: notes[3]! },
    notes,
  };
}

const fmtN = (x: number) => (x >= 1000 ? `${+(x / 1000).toPrecision(3)} kN` : `${+x.toPrecision(3)} N`);
const fmtRpm = (x: number) => `${+(x * 60).toPrecision(3)} r/min`;
