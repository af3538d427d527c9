/**
 * Adaptive filling of a square grid of labelled cells, for the selection map.
 *
 * 1. The grid (n × n cells) is cut into blocks of `block` cells a side, neighbouring blocks
 *    sharing their edge cells. A block's four corner cells are evaluated; when their labels
 *    agree, every cell of the block not yet known is filled from them; otherwise the block is
 *    halved along each axis longer than one step and each part treated the same way.
 * 2. Every filled cell next to a cell of a different label (the eight neighbours) is evaluated;
 *    that repeats until a pass changes no label, so a boundary between labels is always traced
 *    by evaluated cells on both sides.
 *
 * A region that lies wholly inside a block and touches none of the corners evaluated there is
 * not found; the map's tests check, on every example and several test cases, that the result
 * equals evaluating every cell. Deterministic: the order of evaluation depends on n and block only.
 */

export interface AdaptiveResult<T> {
  /** cells[i][j], evaluated or filled. */
  cells: T[][];
  /** Whether each cell was evaluated (else filled from its block's corners). */
  evaluated: boolean[][];
  /** How many cells were evaluated. */
  count: number;
}

export interface AdaptiveOptions<T> {
  /** Cells per axis, ≥ 1. */
  n: number;
  /** Block side in cell steps, ≥ 1 (a block spans block + 1 cells, its edges shared). */
  block: number;
  /** The value of cell (i, j). */
  evaluate: (i: number, j: number) => Promise<T>;
  /** The label two cells must share for a block to be filled (the same label: the same cell in the map). */
  label: (t: T) => string;
  /** A filled cell's value from the corner cell it copies. */
  fill: (t: T) => T;
  /** Called as cells become known: cells known, cells in all. */
  onProgress?: (done: number, total: number) => void;
}

/** Fill an n × n grid adaptively (see the module comment). */
export async function fillAdaptive<T>(o: AdaptiveOptions<T>): Promise<AdaptiveResult<T>> {
  const { n, evaluate, label } = o;
  const block = Math.max(1, Math.floor(o.block));
  const cells: (T | undefined)[][] = Array.from({ length: n }, () => new Array<T | undefined>(n));
  const labels: (string | undefined)[][] = Array.from({ length: n }, () => new Array<string | undefined>(n));
  const evaluated: boolean[][] = Array.from({ length: n }, () => new Array<boolean>(n).fill(false));
  let count = 0;
  let known = 0;

  const at = async (i: number, j: number): Promise<string> => {
    if (!evaluated[i]![j]) {
      const t = await evaluate(i, j);
      if (cells[i]![j] === undefined) known++;
      cells[i]![j] = t;
      labels[i]![j] = label(t);
      evaluated[i]![j] = true;
      count++;
    }
    return labels[i]![j]!;
  };

  const region = async (i0: number, i1: number, j0: number, j1: number): Promise<void> => {
    const corners = [await at(i0, j0), await at(i0, j1), await at(i1, j0), await at(i1, j1)];
    if (i1 - i0 <= 1 && j1 - j0 <= 1) return;
    if (corners.every((x) => x === corners[0])) {
      const source = cells[i0]![j0]!;
      for (let i = i0; i <= i1; i++)
        for (let j = j0; j <= j1; j++)
          if (cells[i]![j] === undefined) {
            cells[i]![j] = o.fill(source);
            labels[i]![j] = corners[0];
            known++;
          }
      return;
    }
    const rows = i1 - i0 > 1 ? [i0, (i0 + i1) >> 1, i1] : [i0, i1];
    const columns = j1 - j0 > 1 ? [j0, (j0 + j1) >> 1, j1] : [j0, j1];
    for (let a = 0; a + 1 < rows.length; a++)
      for (let b = 0; b + 1 < columns.length; b++) await region(rows[a]!, rows[a + 1]!, columns[b]!, columns[b + 1]!);
  };

  const edges = (m: number): number[] => {
    const e: number[] = [];
    for (let k = 0; k < m - 1; k += block) e.push(k);
    e.push(m - 1);
    return e;
  };
  const cuts = edges(n);
  if (n === 1) await at(0, 0);
  for (let a = 0; a + 1 < cuts.length; a++) {
    for (let b = 0; b + 1 < cuts.length; b++) await region(cuts[a]!, cuts[a + 1]!, cuts[b]!, cuts[b + 1]!);
    o.onProgress?.(known, n * n);
  }

  // Boundary passes: evaluate every filled cell bordering a different label, until none is left.
  for (;;) {
    const pending: [number, number][] = [];
    for (let i = 0; i < n; i++)
      for (let j = 0; j < n; j++) {
        if (evaluated[i]![j]) continue;
        const own = labels[i]![j];
        let borders = false;
        for (let di = -1; di <= 1 && !borders; di++)
          for (let dj = -1; dj <= 1; dj++) {
            const p = i + di;
            const q = j + dj;
            if ((di || dj) && p >= 0 && q >= 0 && p < n && q < n && labels[p]![q] !== own) {
              borders = true;
              break;
            }
          }
        if (borders) pending.push([i, j]);
      }
    if (pending.length === 0) break;
    for (const [i, j] of pending) await at(i, j);
  }
  o.onProgress?.(n * n, n * n);
  return { cells: cells as T[][], evaluated, count };
}
