import { OPTIONS, type OptionName } from '../core/options.js';
import type { Assumption, CaseSI } from '../case/types.js';
import { advise, type AdviceResult } from '../advise/engine.js';
import { loadRules, type LoadedRule } from '../advise/load-rules.js';

import { checkJournal } from '../calc/journal/index.js';
import { logAxis } from './axes.js';
import { bestOf, designOf, type JournalDesign } from './journal-design.js';
import { ruleRunner, type RuleRunner } from './rule-runner.js';
import { fillAdaptive } from './adaptive.js';
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
 * Not every cell is evaluated: fillAdaptive (adaptive.ts) evaluates block corners, fills
 * blocks whose corners agree on the winner and on each option's feasibility, and then
 * evaluates every filled cell next to a different label until no label changes. A filled
 * cell has no scores. MapOptions.full evaluates every cell; the map printed is the same (the
 * tests compare the two cell for cell).
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
  /** The case at a cell from the load and speed factors (default scaleCase; a whole shaft's support also scales its slope). */
  scale?: (c: CaseSI, loadFactor: number, speedFactor: number) => CaseSI;
  /** Called as cells become known: cells done, cells in all. */
  onProgress?: (done: number, total: number) => void;
  /** Evaluate every cell (default: adaptive, see fillAdaptive in adaptive.ts; the same map). */
  full?: boolean;
  /** Adaptive block side, cell steps (default DEFAULT_BLOCK). */
  block?: number;
}

/** Default block side of the adaptive fill, cell steps. */
export const DEFAULT_BLOCK = 8;

export interface MapCell {
  winner: OptionName | null;
  /** Per option, in OPTIONS order (bushing, rolling, journal). */
  feasible: [boolean, boolean, boolean];
  /** Per option, in OPTIONS order; null where the cell was filled from its block's corners (not evaluated). */
  score: [number, number, number] | null;
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
  /** Cells evaluated (the rest filled from agreeing block corners; every cell with MapOptions.full). */
  evaluated: number;
  /** Set for a whole shaft's support: the load axis is shown as the scale k = load / reference of every load on the shaft. */
  loadScale?: { reference: number };
}

/** Cell summary of an advice. */
function summary(a: AdviceResult): MapCell & { score: [number, number, number] } {
  const f = (o: OptionName) => a.ranking.find((r) => r.option === o)!;
  return {
    winner: a.recommendation,
    feasible: OPTIONS.map((o) => f(o).feasible) as MapCell['feasible'],
    score: OPTIONS.map((o) => f(o).score) as [number, number, number],
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

/** The load and speed ranges of the map (given, or 0.1× to 10× the governing point) and their log axes. */
function mapAxes(
  ref: ReferencePoint,
  opts: MapOptions,
): { load: [number, number]; speed: [number, number]; loads: number[]; speeds: number[] } {
  if (!(ref.load > 0) || !(ref.speed > 0)) {
    throw new Error(
      'map: the case needs a positive load and speed at its governing point to centre the map (give --load and --speed)',
    );
  }
  const load = opts.load ?? [ref.load / 10, ref.load * 10];
  const speed = opts.speed ?? [ref.speed / 10, ref.speed * 10];
  const loads = logAxis(load[0], load[1], opts.grid);
  const speeds = logAxis(speed[0], speed[1], opts.grid);
  return { load, speed, loads, speeds };
}

/**
 * checkJournal's full design sweep at every coarse node (nodes × nodes): the distinct designs
 * found, in order of first finding, and for each node (row node, column node) the index of
 * its design among them.
 */
function sweepJournalNodes(
  nodes: number[],
  caseAt: (loadIndex: number, speedIndex: number) => CaseSI,
): { designs: JournalDesign[]; nodeDesign: number[][] } {
  const designs: JournalDesign[] = [];
  const keyOf = (d: JournalDesign) => `${d.length}|${d.radialClearance}|${d.grade ?? ''}`;
  const seen = new Map<string, number>();
  const nodeDesign: number[][] = nodes.map((loadIndex) =>
    nodes.map((speedIndex) => {
      const nodeCase = caseAt(loadIndex, speedIndex);
      const design = designOf(checkJournal(nodeCase, { pressureProfile: false, sheet: false }), nodeCase);
      const key = keyOf(design);
      if (!seen.has(key)) {
        seen.set(key, designs.length);
        designs.push(design);
      }
      return seen.get(key)!;
    }),
  );
  return { designs, nodeDesign };
}

/** What a cell needs besides its indices: the case at a cell, the rules and the journal nodes. */
interface CellInputs {
  caseAt: (loadIndex: number, speedIndex: number) => CaseSI;
  runRules: RuleRunner['run'];
  rules: LoadedRule[];
  nodes: number[];
  designs: JournalDesign[];
  nodeDesign: number[][];
}

/**
 * One cell of the map: the case scaled to the cell, its journal bearing evaluated with its
 * nearest node's design, and the three options ranked by advise().
 */
function cellEvaluator(inputs: CellInputs): (loadIndex: number, speedIndex: number) => Promise<MapCell> {
  const { caseAt, rules, nodes, designs, nodeDesign } = inputs;
  return async (loadIndex, speedIndex) => {
    const loadNode = nearest(nodes, loadIndex, bracket(nodes, loadIndex));
    const speedNode = nearest(nodes, speedIndex, bracket(nodes, speedIndex));
    const cellCase = caseAt(loadIndex, speedIndex);
    const journal = bestOf(cellCase, [designs[nodeDesign[loadNode]![speedNode]!]!]).result;
    const advice = await advise(cellCase, [], rules, {
      checks: { journal },
      kernel: { sheet: false },
      runRules: inputs.runRules,
      traces: false,
    });
    return summary(advice);
  };
}

/** Every cell evaluated, row by row (load index, then speed index); progress after each row. */
async function everyCell(
  n: number,
  cellAt: (i: number, j: number) => Promise<MapCell>,
  onProgress?: (done: number, total: number) => void,
): Promise<MapCell[][]> {
  const cells: MapCell[][] = [];
  for (let i = 0; i < n; i++) {
    const row: MapCell[] = [];
    for (let j = 0; j < n; j++) row.push(await cellAt(i, j));
    cells.push(row);
    onProgress?.((i + 1) * n, n * n);
  }
  return cells;
}

/** A cell's label for the adaptive fill: its winner and each option's feasibility (all the map shows). */
const cellLabel = (c: MapCell): string => `${c.winner ?? '-'}|${c.feasible.map(Number).join('')}`;

/** The map's notes: axes, scaling of the duty, what is kept, the journal approximation, oscillation. */
function mapNotes(c: CaseSI, ref: ReferencePoint, nodesPerAxis: number): string[] {
  const notes = [
    `Axes: radial load and speed of the governing point (largest radial load ${fmtN(ref.load)}, highest speed ${fmtRpm(ref.speed)} of the case); log scales.`,
    ref.spectrum
      ? "Duty spectrum: every operating point's load and speed is scaled by the cell's factor relative to the governing point; shares are kept."
      : 'Single operating point: the cell is the case at that load and speed.',
    'Kept from the case: shaft diameter, space, lubrication, environment, life target and priorities. Axial load is scaled with the radial load.',
    `Journal bearing: full design sweep at ${nodesPerAxis} × ${nodesPerAxis} coarse nodes; each cell evaluates the design of its nearest node, so the journal region may be slightly smaller than a fresh design at every cell would give.`,
  ];
  if (c.shaft.oscillation)
    notes.push(
      'Oscillating shaft: speed is the equivalent rotational speed θ·f/π; the frequency is scaled, the swing kept.',
    );
  return notes;
}

/** The selection map of a case (see the module comment): axes, every cell, the case itself and notes. */
export async function computeMap(c: CaseSI, assumed: Assumption[], opts: MapOptions): Promise<MapResult> {
  const rules = opts.rules ?? loadRules();
  const ref = referencePoint(c);
  const { load, speed, loads, speeds } = mapAxes(ref, opts);
  const runner = ruleRunner(rules, { memo: true });
  const scale = opts.scale ?? scaleCase;
  const caseAt = (i: number, j: number) => scale(c, loads[i]! / ref.load, speeds[j]! / ref.speed);

  // The case itself, in full.
  const full = await advise(c, assumed, rules);

  // Journal design sweep at the coarse nodes, then every cell.
  const nodes = nodeIndices(opts.grid, opts.journalNodes ?? 5);
  const { designs, nodeDesign } = sweepJournalNodes(nodes, caseAt);
  const cellAt = cellEvaluator({ caseAt, rules, runRules: runner.run, nodes, designs, nodeDesign });
  let cells: MapCell[][];
  let evaluated = opts.grid * opts.grid;
  if (opts.full) cells = await everyCell(opts.grid, cellAt, opts.onProgress);
  else {
    const a = await fillAdaptive({
      n: opts.grid,
      block: opts.block ?? DEFAULT_BLOCK,
      evaluate: cellAt,
      label: cellLabel,
      fill: (t) => ({ winner: t.winner, feasible: t.feasible, score: null }),
      onProgress: opts.onProgress,
    });
    cells = a.cells;
    evaluated = a.count;
  }

  const notes = mapNotes(c, ref, nodes.length);
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
    evaluated,
  };
}

const fmtN = (x: number) => (x >= 1000 ? `${+(x / 1000).toPrecision(3)} kN` : `${+x.toPrecision(3)} N`);
const fmtRpm = (x: number) => `${+(x * 60).toPrecision(3)} r/min`;
