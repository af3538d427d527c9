import { OPTIONS } from '../../core/options.js';
import type { MapResult } from '../../explore/map.js';

import { logTicks } from '../../explore/axes.js';
import { LBF, fmtLoad, fmtSpeed } from './format.js';
import { fitWidth } from '../text.js';
import type { UnitSystem } from '../units.js';

export const LETTER = { bushing: 'B', rolling: 'R', journal: 'J' } as const;
export const NONE = '.';
export const CASE_MARK = '@';

/** Row and column of the cell nearest (in log distance) to the case's own point, or null when outside the map. */
export function caseCell(m: MapResult): { i: number; j: number } | null {
  const near = (xs: number[], x: number) => {
    if (x < xs[0]! * 0.999 || x > xs[xs.length - 1]! * 1.001) return -1;
    let best = 0;
    for (let k = 1; k < xs.length; k++)
      if (Math.abs(Math.log(xs[k]! / x)) < Math.abs(Math.log(xs[best]! / x))) best = k;
    return best;
  };
  const i = near(m.loads, m.reference.load);
  const j = near(m.speeds, m.reference.speed);
  return i < 0 || j < 0 ? null : { i, j };
}

/** Index of the cell nearest each tick of a log axis (first cell wins a tie). */
function tickCells(xs: number[], scale = 1): Map<number, number> {
  const out = new Map<number, number>();
  const t = logTicks(xs[0]! * scale, xs[xs.length - 1]! * scale);
  for (const { value } of t) {
    let best = 0;
    const v = value / scale;
    for (let k = 1; k < xs.length; k++)
      if (Math.abs(Math.log(xs[k]! / v)) < Math.abs(Math.log(xs[best]! / v))) best = k;
    if (!out.has(best)) out.set(best, value);
  }
  return out;
}

/**
 * The map as characters: one character per cell (two for a squarer look when the grid is
 * 40 or fewer), load up the page, speed across; B/R/J the winner, '.' none feasible, '@'
 * the case's own point. Below it, where each option is feasible ('#'), at half width.
 */
export function mapText(m: MapResult, units: UnitSystem = 'SI'): string {
  const n = m.speeds.length;
  const w = n <= 40 ? 2 : 1;
  const at = caseCell(m);
  const k = m.loadScale?.reference;
  // Load ticks fall on round numbers of the unit shown (N or lbf); a shaft map's on round factors k.
  const yTicks = tickCells(m.loads, k ? 1 / k : units === 'US' ? 1 / LBF : 1);
  const yLabel = (v: number) => (k ? `${v}×` : fmtLoad(units === 'US' ? v * LBF : v, units));
  const load = (n: number) => fmtLoad(n, units);
  const pad = Math.max(...[...yTicks.values()].map((v) => yLabel(v).length), 6) + 1;
  const lines: string[] = [];
  lines.push(`Selection map: ${m.title}`);
  lines.push(
    k
      ? `load scale k of every load on the shaft (up; k = 1: ${load(k)} at this support) × speed (across), log scales`
      : `radial load of the governing point (up) × speed (across), log scales`,
  );
  lines.push('');
  for (let i = m.loads.length - 1; i >= 0; i--) {
    const label = yTicks.has(i) ? yLabel(yTicks.get(i)!) : '';
    let row = '';
    for (let j = 0; j < n; j++) {
      const c = m.cells[i]![j]!;
      const ch = at && at.i === i && at.j === j ? CASE_MARK : c.winner ? LETTER[c.winner] : NONE;
      row += ch.repeat(w);
    }
    lines.push(`${label.padStart(pad)} |${row}`);
  }
  // x axis: tick marks and labels placed under their cells, never overlapping.
  const xTicks = tickCells(m.speeds, 60); // ticks in r/min
  let marks = '';
  let text = '';
  for (let j = 0; j < n; j++) marks += (xTicks.has(j) ? '^' : '-') + '-'.repeat(w - 1);
  for (const [j, v] of [...xTicks.entries()].sort((a, b) => a[0] - b[0])) {
    const s = String(v);
    const col = j * w;
    if (col >= text.length + (text.length ? 1 : 0)) text = text.padEnd(col) + s;
  }
  lines.push(`${''.padStart(pad)} +${marks}`);
  lines.push(`${''.padStart(pad)}  ${text}  r/min`);
  lines.push('');
  const winner = at ? m.cells[at.i]![at.j]!.winner : null;
  lines.push(
    `Legend: B bushing wins, R rolling bearing wins, J journal bearing wins, ${NONE} none feasible, ${CASE_MARK} the case (${k ? 'k = 1, ' : ''}${load(m.reference.load)}, ${fmtSpeed(m.reference.speed)}; ` +
      (at ? `map cell: ${winner ?? 'none'}; ` : 'outside the map; ') +
      `full advice: ${m.atCase.recommendation ?? 'none feasible'})`,
  );
  lines.push('');
  // Feasibility: one small map per option, every other column.
  const cols = [...Array(n).keys()].filter((j) => n <= 40 || j % 2 === 0);
  const share = OPTIONS.map((_, k) => m.cells.flat().filter((c) => c.feasible[k]).length / (n * m.loads.length));
  lines.push('Where each option is feasible (#), same axes:');
  lines.push(
    OPTIONS.map((o, k) => `${o} ${Math.round(share[k]! * 100)} %`.padEnd(cols.length))
      .join('   ')
      .trimEnd(),
  );
  for (let i = m.loads.length - 1; i >= 0; i--) {
    lines.push(OPTIONS.map((_, k) => cols.map((j) => (m.cells[i]![j]!.feasible[k] ? '#' : '.')).join('')).join('   '));
  }
  lines.push('');
  lines.push(
    `Ranges: ${k ? `load scale ${+(m.ranges.load[0] / k).toPrecision(3)}× to ${+(m.ranges.load[1] / k).toPrecision(3)}× (` : 'load '}${load(m.ranges.load[0])} to ${load(m.ranges.load[1])}${k ? ' at this support)' : m.ranges.loadGiven ? '' : ' (0.1× to 10× the case)'}, speed ${fmtSpeed(m.ranges.speed[0])} to ${fmtSpeed(m.ranges.speed[1])}${m.ranges.speedGiven ? '' : ' (0.1× to 10× the case)'}; ${m.loads.length} × ${n} cells.`,
  );
  for (const note of m.notes) lines.push(`- ${note}`);
  lines.push(`- Journal designs used: ${m.journal.designs.map((d) => d.label).join('; ')}.`);
  return fitWidth(lines.join('\n'));
}
