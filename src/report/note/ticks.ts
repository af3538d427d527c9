/**
 * Tick values and tick labels for the report's charts: 1–2–5 steps on linear and log axes,
 * round ends for a log axis, and the choice of labels so that both ends of an axis are
 * labelled and no two labels touch.
 */

/** Tick values for a linear axis: 1, 2 or 5 × 10^k steps, about `n` of them. */
export function linearTicks(min: number, max: number, n = 6): number[] {
  if (!(max > min)) return [min];
  const raw = (max - min) / n;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((k) => k * mag).find((s) => s >= raw)!;
  const out: number[] = [];
  for (let v = Math.ceil(min / step - 1e-9) * step; v <= max + step * 1e-9; v += step)
    out.push(Math.abs(v) < step * 1e-9 ? 0 : +v.toPrecision(12));
  return out;
}

/**
 * Tick values for a log axis. Over at most three decades every 1, 2 and 5 × 10^k is a major
 * (labelled) tick and the other integers minor; over more, the decades are major and 2 and 5
 * minor (so a wide axis keeps its labels apart).
 */
export function logTicks(min: number, max: number): { major: number[]; minor: number[] } {
  const lo = Math.floor(Math.log10(min) + 1e-9);
  const hi = Math.ceil(Math.log10(max) - 1e-9);
  const major: number[] = [];
  const minor: number[] = [];
  const few = Math.log10(max / min) <= 3 + 1e-9;
  for (let k = lo; k <= hi; k++) {
    for (let m = 1; m < 10; m++) {
      const v = +(m * 10 ** k).toPrecision(12);
      if (v < min * (1 - 1e-9) || v > max * (1 + 1e-9)) continue;
      if (m === 1 || (few && (m === 2 || m === 5))) major.push(v);
      else if (few || m === 2 || m === 5) minor.push(v);
    }
  }
  return { major, minor };
}

/** Round values for the ends of a log axis taken from the data: 1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8 × 10^k. */
const LOG_ENDS = [1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10];

/**
 * The round value at or below v (down) or at or above it (up), v > 0: from the 1–2–5 × 10^k
 * steps, or with `fine` from LOG_ENDS (an axis end need not be a tick: it is labelled anyway).
 */
export function nice125(v: number, dir: 'down' | 'up', fine = false): number {
  const k = Math.floor(Math.log10(v));
  const steps = (fine ? LOG_ENDS : [1, 2, 5, 10]).map((m) => +(m * 10 ** k).toPrecision(12));
  if (dir === 'down') return [...steps].reverse().find((s) => s <= v * (1 + 1e-9)) ?? steps[0]!;
  return steps.find((s) => s >= v * (1 - 1e-9)) ?? steps[steps.length - 1]!;
}

/** Whether values spanning [min, max] (all positive) are better on a log axis: more than a decade. */
export function spansDecades(min: number, max: number): boolean {
  return min > 0 && max / min >= 10;
}

export function tickText(v: number): string {
  if (v === 0) return '0';
  const a = Math.abs(v);
  if (a >= 1e5 || a < 1e-3) {
    const e = Math.floor(Math.log10(a));
    const m = +(v / 10 ** e).toPrecision(3);
    return m === 1 ? `1e${e}` : `${m}e${e}`;
  }
  return String(+v.toPrecision(4));
}

/** Approximate width of a tick label at 12 px, px (about 6.7 px a character). */
const labelWidth = (text: string) => text.length * 6.7;

/**
 * The labelled ticks of one axis: its major ticks and both ends of its range (an end that is
 * no tick gets a label of its own), interior labels dropped where they would touch a
 * neighbour; the ends are kept first. Returns value, page position and text, in order.
 */
export function axisLabels(
  majors: number[],
  min: number,
  max: number,
  at: (v: number) => number,
  horizontal: boolean,
  format: (v: number) => string = tickText,
): { value: number; pos: number; text: string }[] {
  const near = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b), 1e-300);
  const values = [...majors];
  if (!values.some((v) => near(v, min))) values.unshift(min);
  if (!values.some((v) => near(v, max))) values.push(max);
  const all = values.map((value) => ({ value, pos: at(value), text: format(value) })).sort((p, q) => p.pos - q.pos);
  const room = (p: { text: string }, q: { text: string }) =>
    horizontal ? (labelWidth(p.text) + labelWidth(q.text)) / 2 + 6 : 15;
  const ends = [all[0]!, all[all.length - 1]!];
  const kept = [...ends];
  for (const l of all.slice(1, -1)) if (kept.every((k) => Math.abs(k.pos - l.pos) >= room(k, l))) kept.push(l);
  return kept.sort((p, q) => p.pos - q.pos);
}
