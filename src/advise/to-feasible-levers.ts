import { parseQuantity, type Kind } from '../case/quantity.js';
import { CONTAMINATIONS, SUPPLIES } from '../case/schema.js';
import type { Assumption, CaseSI } from '../case/types.js';
import type { CheckRecord } from '../core/check.js';
import type { OptionName } from '../core/options.js';
import { ROLLING_KINDS } from '../core/rolling-kinds.js';
import { entriesForShaft } from '../calc/rolling/catalogue.js';
import { kindType } from '../calc/rolling/kinds.js';
import { bushingMaterials } from '../data/bushing.js';
import { lubricants } from '../data/load.js';
import { copyData } from './copy.js';

/**
 * The single case inputs a designer can change to make an option feasible, each as the values
 * a case file would carry, the smallest change first. A continuous input (a room, a life
 * target, an allowance, a length) is a grid of values a drawing would carry (whole mm, hours to
 * two significant figures) and is searched by bisection: feasibility is taken to grow along
 * it, and the value found is verified on its own. A discrete input (supply, oil grade,
 * cleanliness, material, rolling kind or series) is a short list tried in order.
 */
export interface Lever {
  /** Case path. */
  field: string;
  /** The value now, as the case file wrote it or as a case file would write its default. */
  from: string | null;
  /** Candidate values as written in a case file, smallest change first. */
  steps: string[];
  /** true: feasibility grows along the steps (bisect); false: try each in turn. */
  monotone: boolean;
  /**
   * A discrete input's strongest value: when the option fails with it, no value of this input
   * is tried further (pumped oil feeds a film or a rolling bearing at least as well as a bath,
   * common practice).
   */
  probe?: string;
}

/** Largest housing bore tried, as a multiple of the shaft diameter (common practice: a sane upper bound). */
export const MAX_OD_PER_D = 4;
/** Largest axial room tried, as a multiple of the shaft diameter (L/D ≤ 2 for a bushing, common practice). */
export const MAX_LENGTH_PER_D = 2;
/** Smallest life target tried, as a share of the one given. */
export const MIN_LIFE_SHARE = 0.1;
/** Largest wear allowance tried, as a multiple of the one given. */
export const MAX_WEAR_MULTIPLE = 4;
/** Oil grades tried above the present one, and below it. */
const OIL_UP = 5;
const OIL_DOWN = 2;

/** The value at a dotted case path of a document, or undefined. */
export function getPath(doc: unknown, path: string): unknown {
  let o: unknown = doc;
  for (const k of path.split('.')) {
    if (o === null || typeof o !== 'object' || Array.isArray(o)) return undefined;
    o = (o as Record<string, unknown>)[k];
  }
  return o;
}

/** A deep copy of the document with `path` set to `value` (parents made as needed). */
export function withPath(doc: unknown, path: string, value: unknown): Record<string, unknown> {
  const copy = copyData(doc) as Record<string, unknown>;
  const keys = path.split('.');
  let o = copy;
  for (const k of keys.slice(0, -1)) {
    const next = o[k];
    if (next === null || typeof next !== 'object' || Array.isArray(next)) o[k] = {};
    o = o[k] as Record<string, unknown>;
  }
  o[keys[keys.length - 1]!] = value;
  return copy;
}

/** A number as a drawing writes it: no float noise, no exponent for ordinary sizes. */
export function plainNumber(x: number): string {
  return String(Number(x.toPrecision(10)));
}

/** The unit the document wrote a quantity in (if it is one this tool reads), else the usual one. */
function docUnit(v: unknown, kind: Kind, usual: string): { unit: string; perUnit: number } {
  const m = typeof v === 'string' ? /^\s*[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?\s*(\S.*?)\s*$/.exec(v) : null;
  if (m) {
    try {
      const perUnit = parseQuantity(`1 ${m[1]}`, kind);
      if (perUnit > 0) return { unit: m[1]!, perUnit };
    } catch {
      // not a unit of this kind: the usual one
    }
  }
  return { unit: usual, perUnit: parseQuantity(`1 ${usual}`, kind) };
}

/** The smallest of 1, 2, 5 × 10^k at least x. */
function niceStep(x: number): number {
  const e = 10 ** Math.floor(Math.log10(x));
  for (const f of [1, 2, 5, 10]) if (f * e >= x * (1 - 1e-9)) return f * e;
  return 10 * e;
}

/** A value written as the case file would: the given text, else the default assumed, else null. */
function fromOf(doc: unknown, field: string, assumed: readonly Assumption[]): string | null {
  const v = getPath(doc, field);
  if (typeof v === 'string') return v;
  if (typeof v === 'number') return String(v);
  if (v !== null && typeof v === 'object' && 'id' in v) return String((v as { id: unknown }).id);
  const a = assumed.find((x) => x.field === field);
  return a ? a.value : null;
}

/**
 * Length values upward from `now` (m) to `max` (m), on a grid of `stepSI` in the document's
 * unit (whole mm when the file writes mm), the first value above `now` first.
 */
function lengthsUp(docValue: unknown, now: number, max: number, stepSI: number): string[] {
  const { unit, perUnit } = docUnit(docValue, 'length', 'mm');
  const step = niceStep(stepSI / perUnit);
  const out: string[] = [];
  const first = Math.floor(now / perUnit / step + 1e-9) + 1;
  for (let k = first; k * step * perUnit <= max * (1 + 1e-9); k++) out.push(`${plainNumber(k * step)} ${unit}`);
  return out;
}

/**
 * Durations downward from `now` h, two significant figures, largest first, in the document's
 * unit: to MIN_LIFE_SHARE of `now` (a life target), or to `least` h rounded down to two
 * significant figures (a regreasing plan: the interval the bearing needs, as a plan carries it).
 */
function hoursDown(docValue: unknown, now: number, least?: number): string[] {
  const { unit, perUnit } = docUnit(docValue, 'time', 'h');
  const cur = now / perUnit;
  const low = (least ?? now * MIN_LIFE_SHARE) / perUnit;
  const e0 = Math.floor(Math.log10(low)) - 1;
  const floor = least === undefined ? low : Math.floor(low * 10 ** -e0 * (1 + 1e-9)) * 10 ** e0;
  const values = new Set<number>();
  for (let e = Math.floor(Math.log10(cur)); e >= e0; e--) {
    const step = 10 ** (e - 1);
    for (let m = 99; m >= 10; m--) {
      const v = Number((m * step).toPrecision(2));
      if (v < cur * (1 - 1e-9) && v >= floor * (1 - 1e-9)) values.add(v);
    }
  }
  return [...values].sort((a, b) => b - a).map((v) => `${plainNumber(v)} ${unit}`);
}

/**
 * The other dimension series with a bearing for the shaft of the case's type, kind, form and
 * arrangement that fits its space, the nearest in size (smallest outside diameter of the
 * series) to the present one first, ties the larger first.
 */
function seriesSteps(c: CaseSI, now: string): string[] {
  const r = c.rolling ?? {};
  const smallest = new Map<string, number>();
  for (const e of entriesForShaft(c.shaft.diameter)) {
    const wanted =
      (r.type === undefined || kindType(e.kind) === r.type) &&
      (r.kind === undefined || e.kind === r.kind) &&
      (r.form === undefined || e.form === r.form) &&
      (r.arrangement === undefined || e.arrangement === r.arrangement);
    const fits = e.outerDiameter <= c.space.maxOuterDiameter && e.width <= c.space.maxLength;
    if (wanted) smallest.set(e.series, Math.min(smallest.get(e.series) ?? Infinity, fits ? e.outerDiameter : Infinity));
  }
  const D0 = smallest.get(now) ?? Infinity;
  const gap = (s: string) => (Number.isFinite(D0) ? Math.abs(smallest.get(s)! - D0) : smallest.get(s)!);
  return [...smallest.keys()]
    .filter((s) => s !== now && Number.isFinite(smallest.get(s)))
    .sort((a, b) => gap(a) - gap(b) || smallest.get(b)! - smallest.get(a)!);
}

/** The discrete values of an ordered scale, nearest to `now` first (ties: later in the scale first). */
function nearestFirst<T extends string>(scale: readonly T[], now: T, allowed: (i: number) => boolean): T[] {
  const i0 = scale.indexOf(now);
  return scale
    .map((v, i) => ({ v, i }))
    .filter(({ i }) => i !== i0 && allowed(i))
    .sort((a, b) => Math.abs(a.i - i0) - Math.abs(b.i - i0) || b.i - a.i)
    .map(({ v }) => v);
}

/**
 * The inputs worth changing for a failing option, each with its candidate values. `failed`
 * are the option's failing limit checks: a life target is lowered only when a check held in
 * hours fails, a wear allowance raised only for a failing bushing life. `candidates` (rolling)
 * are the ids of the failing limit checks of every bearing considered: an input that leaves
 * the set of bearings as it is is tried only where it can move every failing check of one of
 * them (ROLLING_CHECK_INPUTS).
 */
export function leversFor(
  option: OptionName,
  doc: unknown,
  c: CaseSI,
  assumed: readonly Assumption[],
  failed: readonly CheckRecord[],
  candidates?: readonly (readonly string[])[],
): Lever[] {
  const d = c.shaft.diameter;
  const out: Lever[] = [];
  const lifeFails = failed.some((k) => k.unit === 'h' && k.id !== 'regrease-interval');
  const add = (field: string, steps: string[], monotone: boolean, from = fromOf(doc, field, assumed)) => {
    if (steps.length) out.push({ field, from, steps, monotone });
  };
  const lengthLever = (field: string, now: number, max: number) =>
    add(field, lengthsUp(getPath(doc, field), now, max, 1e-3), true);

  if (option === 'bushing') {
    const named = getPath(doc, 'bushing.material');
    if (named !== undefined) {
      const id = typeof named === 'string' ? named : String((named as { id?: unknown }).id);
      add(
        'bushing.material',
        bushingMaterials()
          .map((m) => m.id)
          .filter((m) => m !== id),
        false,
      );
    }
    const len = c.bushing?.length;
    if (len !== undefined) lengthLever('bushing.length', len, Math.min(c.space.maxLength, MAX_LENGTH_PER_D * d));
  }
  if (option === 'rolling') {
    const kind = c.rolling?.kind;
    if (kind !== undefined)
      add(
        'rolling.kind',
        ROLLING_KINDS.filter((k) => k !== kind),
        false,
      );
    const series = c.rolling?.series;
    if (series !== undefined) add('rolling.series', seriesSteps(c, series), false);
    // A plan that regreases too seldom: its interval down to the one the bearing needs (2 significant figures).
    const needed = failed.filter((k) => k.id === 'regrease-interval').map((k) => k.value);
    const plan = c.lubrication.regreaseInterval;
    if (needed.length && plan !== undefined)
      add(
        'lubrication.regreaseInterval',
        hoursDown(getPath(doc, 'lubrication.regreaseInterval'), plan, Math.min(...needed)),
        true,
      );
  }
  const oil = c.lubrication.supply === 'oil-bath' || c.lubrication.supply === 'oil-feed';
  const grease = c.lubrication.supply === 'grease';
  // A journal bearing without oil fails on its supply whatever else changes: only the supply can help.
  // With oil, its radial room matters only through the bath's housing; cleanliness not at all.
  const journal = option === 'journal';
  if (!journal || c.lubrication.supply === 'oil-bath')
    lengthLever('space.maxOuterDiameter', c.space.maxOuterDiameter, MAX_OD_PER_D * d);
  if (!journal || oil) lengthLever('space.maxLength', c.space.maxLength, MAX_LENGTH_PER_D * d);
  if (lifeFails && option !== 'journal') add('life.hours', hoursDown(getPath(doc, 'life.hours'), c.life.hours), true);
  if (lifeFails && option === 'bushing') {
    const now = c.life.wearAllowance;
    add('life.wearAllowance', lengthsUp(getPath(doc, 'life.wearAllowance'), now, now * MAX_WEAR_MULTIPLE, 1e-5), true);
  }
  // A bushing may need another supply than it has (its material's need); the others only more,
  // pumped oil tried first as the probe.
  const supply = SUPPLIES.indexOf(c.lubrication.supply);
  const supplies = nearestFirst(SUPPLIES, c.lubrication.supply, (i) => option === 'bushing' || i > supply);
  add('lubrication.supply', supplies, false);
  if (option !== 'bushing' && supplies.includes('oil-feed') && out.at(-1)?.field === 'lubrication.supply')
    out.at(-1)!.probe = 'oil-feed';
  if (option !== 'bushing' && (!journal || oil) && c.lubrication.viscosity === undefined)
    add(
      'lubrication.oil',
      oilSteps(c),
      false,
      fromOf(doc, 'lubrication.oil', assumed) ?? (oil || grease ? `ISO VG ${presentGrade(c)}` : null),
    );
  const dirt = c.environment.contamination;
  if (!journal)
    add(
      'environment.contamination',
      nearestFirst(CONTAMINATIONS, dirt, (i) => i < CONTAMINATIONS.indexOf(dirt)),
      false,
    );
  if (journal) return out.filter((l) => canHelp(l.field, failed));
  if (option === 'rolling' && candidates)
    return out.filter((l) => {
      const moves = rollingMoves(l.field, c);
      return moves === null || candidates.some((ids) => ids.every((id) => moves.includes(id)));
    });
  return out;
}

/**
 * The rolling bearing's checks an input can move without changing which bearings are
 * considered (null: any, or it changes them: room, kind, series, supply). The oil grade moves
 * the life (through κ and a_ISO), and on an oil bath the bath's temperature too; on grease or
 * fed oil the operating temperature is the ambient's or the inlet's plus a fixed rise
 * (src/calc/rolling/lubrication.ts), which no grade moves. Cleanliness moves the life only
 * (e_C), the life target the checks held against it, the plan's interval its own check.
 */
const ROLLING_CHECK_INPUTS: Record<string, (c: CaseSI) => readonly string[] | null> = {
  'lubrication.oil': (c) => (c.lubrication.supply === 'oil-bath' ? null : ['rolling-life']),
  'environment.contamination': () => ['rolling-life'],
  'life.hours': () => ['rolling-life', 'grease-life'],
  'lubrication.regreaseInterval': () => ['regrease-interval'],
};

function rollingMoves(field: string, c: CaseSI): readonly string[] | null {
  return ROLLING_CHECK_INPUTS[field]?.(c) ?? null;
}

/**
 * Journal checks whose outcome only some inputs can change: the start-up unit load W/(L·D) only
 * the axial room (through L), the supply check only the supply, continuous rotation none of
 * them. A single change must clear every failing check, so an input that cannot change one of
 * them is not tried (the journal's kernel is the costly one to re-run).
 */
const JOURNAL_CHECK_INPUTS: Record<string, readonly string[]> = {
  'start-unit-load': ['space.maxLength'],
  supply: ['lubrication.supply'],
  motion: [],
};

function canHelp(field: string, failed: readonly CheckRecord[]): boolean {
  return failed.every((k) => JOURNAL_CHECK_INPUTS[k.id]?.includes(field) ?? true);
}

/** The grade in use: the case's, else the grease's base oil on grease, else the table's default for oil. */
function presentGrade(c: CaseSI): number {
  const table = lubricants();
  return (
    c.lubrication.oilGrade ?? (c.lubrication.supply === 'grease' ? table.greaseBaseOil.grade : table.defaultGrade.grade)
  );
}

/** Oil grades to try: the grades above the present one (nearest first), then a few below. */
function oilSteps(c: CaseSI): string[] {
  const table = lubricants();
  const grades = table.grades.map((g) => g.grade).sort((a, b) => a - b);
  const now = presentGrade(c);
  const up = grades.filter((g) => g > now).slice(0, OIL_UP);
  const down = grades
    .filter((g) => g < now)
    .reverse()
    .slice(0, OIL_DOWN);
  const named = c.lubrication.oilGrade === undefined ? [now] : [];
  return [...named, ...up, ...down].map((g) => `ISO VG ${g}`);
}
