import { num } from '../core/format.js';
import { governingMargin } from '../core/check.js';
import type { CaseSI } from '../case/types.js';
import { checkJournal, type JournalResult } from '../calc/journal/index.js';

/**
 * A journal bearing geometry and oil found by checkJournal's design sweep, to be evaluated
 * elsewhere (at other loads and speeds) without sweeping again.
 */
export interface JournalDesign {
  length: number;
  radialClearance: number;
  /** ISO VG grade, when the sweep chose it (the case named no oil and no viscosity). */
  grade?: number;
  /** "L 60 mm, c 60 µm, ISO VG 46". */
  label: string;
}

const mm = (m: number) => `${num(m * 1e3, 3)} mm`;
const um = (m: number) => `${num(m * 1e6, 3)} µm`;

/** The design a journal check found (or the one the case fixed). */
export function designOf(r: JournalResult, c: CaseSI): JournalDesign {
  const d: JournalDesign = {
    length: r.length,
    radialClearance: r.radialClearance,
    label: `L ${mm(r.length)}, c ${um(r.radialClearance)}, ${r.oil}`,
  };
  const sweptOil =
    c.lubrication.viscosity === undefined &&
    c.lubrication.oilGrade === undefined &&
    (c.lubrication.supply === 'oil-bath' || c.lubrication.supply === 'oil-feed');
  if (sweptOil && r.oilGrade !== null) d.grade = r.oilGrade;
  return d;
}

/** The case with the journal geometry (and a swept oil grade) fixed to `d`; for the journal check only. */
export function withDesign(c: CaseSI, d: JournalDesign): CaseSI {
  const out: CaseSI = { ...c, journal: { length: d.length, radialClearance: d.radialClearance } };
  if (d.grade !== undefined) out.lubrication = { ...c.lubrication, oilGrade: d.grade };
  return out;
}

/** Journal check of a fixed design, without the pressure profile (a sweep never shows it). */
export function checkDesign(c: CaseSI, d: JournalDesign): JournalResult {
  return checkJournal(withDesign(c, d), { pressureProfile: false, sheet: false });
}

/**
 * The better of several fixed designs at one case: a feasible one first, then the larger
 * minimum-film margin (the sweep's own figure of merit, design.ts); with none feasible,
 * the larger governing margin. Ties keep the earlier design (deterministic).
 */
export function bestOf(c: CaseSI, designs: readonly JournalDesign[]): { design: JournalDesign; result: JournalResult } {
  let best: { design: JournalDesign; result: JournalResult; rank: number } | undefined;
  for (const d of designs) {
    const result = checkDesign(c, d);
    const film = result.checks.find((k) => k.id === 'min-film')?.margin ?? -Infinity;
    const rank = result.feasible ? 1e6 + film : governingMargin(result.checks);
    if (!best || rank > best.rank) best = { design: d, result, rank };
  }
  if (!best) throw new Error('map: no journal design to evaluate');
  return best;
}
