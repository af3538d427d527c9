import type { OptionName } from '../../core/options.js';
import { changeText, type GoverningMargin, type SensitivityResult } from '../../explore/sensitivity.js';

import { axisLabels, linearTicks } from '../note/ticks.js';
import { esc } from './format.js';

/**
 * The tornado chart of one option (an SVG element as a string): for each parameter a bar
 * from the case's governing margin to the margin at the largest decrease (plain light bar) and
 * at the largest increase (dark bar with a hatch, so it reads in greyscale), the smaller steps
 * as tick marks, the zero-margin line drawn heavy. A step where the recommendation flips is
 * marked with a ◆ at that step's margin, inside the plot.
 *
 * The margin axis covers every margin drawn (no bar is cut short); it reaches zero when the
 * limit is near the data, otherwise an arrow at the end says on which side the limit lies. Equal
 * margins everywhere still get an axis a few per cent wide, so its labels stay apart.
 */

const pct = (m: number | null) => (m === null ? '—' : `${m >= 0 ? '+' : ''}${(m * 100).toFixed(0)} %`);
/** The governing check in words, else its id. */
const checkWords = (m: GoverningMargin) => m.label || m.check;

/** Geometry: whole width, label column, plot left and width, row height, plot top, px. */
export const TORNADO = { width: 860, left: 300, plotWidth: 500, rowHeight: 26, top: 52, inset: 8 } as const;
/** Narrowest margin axis, as a fraction (5 percentage points). */
const MIN_SPAN = 0.05;

/** The margin axis: its ends (fractions), its ticks, and whether zero (the limit) is on it. */
export function marginAxis(values: number[]): { lo: number; hi: number; ticks: number[]; zero: boolean } {
  let lo = Math.min(...values);
  let hi = Math.max(...values);
  const span = Math.max(hi - lo, MIN_SPAN);
  // Reach zero when it is within one and a half data spans of the data.
  if (lo > 0 && lo <= 1.5 * span) lo = 0;
  if (hi < 0 && -hi <= 1.5 * span) hi = 0;
  if (hi - lo < MIN_SPAN) {
    const mid = (hi + lo) / 2;
    [lo, hi] = [mid - MIN_SPAN / 2, mid + MIN_SPAN / 2];
  }
  const t = linearTicks(lo, hi, 5);
  const step = t.length > 1 ? t[1]! - t[0]! : hi - lo;
  lo = +(Math.floor(lo / step + 1e-9) * step).toPrecision(12);
  hi = +(Math.ceil(hi / step - 1e-9) * step).toPrecision(12);
  return { lo, hi, ticks: linearTicks(lo, hi, 5), zero: lo <= 0 && hi >= 0 };
}

export function tornadoSvg(r: SensitivityResult, o: OptionName): string {
  const base = r.margins[o].margin;
  const { width: W, left: L, plotWidth: P, rowHeight: rowH, top, inset } = TORNADO;
  const ps = r.parameters;
  const vals = ps.flatMap((p) => p.variations.map((v) => v.margins[o].margin)).filter((x): x is number => x !== null);
  if (base === null || !vals.length) return `<p>${esc(o)}: no governing margin (no design found).</p>`;
  const axis = marginAxis([base, ...vals]);
  const x = (m: number) => L + inset + ((m - axis.lo) / (axis.hi - axis.lo)) * (P - 2 * inset);
  const y1 = top + ps.length * rowH;
  const H = y1 + 48;
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" class="tornado" data-option="${o}" role="img" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}" font-family="Helvetica, Arial, sans-serif" font-size="12">`,
  );
  out.push(
    `<defs><pattern id="hatch-${o}" width="5" height="5" patternUnits="userSpaceOnUse"><rect width="5" height="5" fill="#3a3a58"/><path d="M0 5 L5 0" stroke="#ffffff" stroke-width="0.9"/></pattern></defs>`,
  );
  out.push(
    `<text x="10" y="20" font-size="14" font-weight="bold">${esc(`${o}: governing margin ${pct(base)} (${checkWords(r.margins[o])})`)}</text>`,
  );
  out.push(
    `<text class="key" x="10" y="38" fill="#333">light bar: largest decrease; hatched bar: largest increase; ticks: the smaller steps; ◆ the recommendation flips at that step</text>`,
  );
  out.push(
    `<rect class="plot-box" x="${L}" y="${top - 6}" width="${P}" height="${y1 - top + 6}" fill="none" stroke="#bbb"/>`,
  );
  ps.forEach((p, k) => {
    const y = top + k * rowH;
    const steps = [...p.variations].sort((a, b) => a.step - b.step);
    const lowest = steps[0];
    const highest = steps[steps.length - 1];
    const flipped = steps.filter((q) => q.flip).map((q) => changeText(q, p.changeUnit));
    const name = p.label.length > 44 ? p.label.slice(0, 43) + '…' : p.label;
    // A row whose step flips the advice says so under its name, in the label column.
    out.push(
      `<text class="param" x="${L - 8}" y="${y + (flipped.length ? 11 : 16)}" text-anchor="end">${esc(name)}</text>`,
    );
    if (flipped.length)
      out.push(
        `<text class="flip-note" x="${L - 8}" y="${y + 23}" text-anchor="end" font-size="10" fill="#b03a2e">${esc(`◆ flips at ${flipped.join(', ')}`)}</text>`,
      );
    for (const [v, fill, dy] of [
      [lowest, '#c6c6d6', 3],
      [highest, `url(#hatch-${o})`, 12],
    ] as const) {
      const m = v?.margins[o].margin;
      if (m === null || m === undefined) continue;
      const a = x(base),
        b = x(m);
      out.push(
        `<rect class="bar" x="${Math.min(a, b).toFixed(1)}" y="${y + dy}" width="${Math.max(1, Math.abs(b - a)).toFixed(1)}" height="9" fill="${fill}" stroke="#222" stroke-width="0.5"/>`,
      );
    }
    for (const v of steps.slice(1, -1)) {
      const m = v.margins[o].margin;
      const dy = v.step < 0 ? 3 : 12;
      if (m !== null)
        out.push(
          `<line class="step" x1="${x(m).toFixed(1)}" y1="${y + dy - 1}" x2="${x(m).toFixed(1)}" y2="${y + dy + 10}" stroke="#000" stroke-width="1.5"/>`,
        );
    }
    for (const v of steps.filter((q) => q.flip)) {
      const m = v.margins[o].margin ?? base;
      const cy = y + (v.step < 0 ? 7.5 : 16.5);
      out.push(
        `<path class="flip" d="M${x(m).toFixed(1)} ${cy - 6}L${(x(m) + 5).toFixed(1)} ${cy}L${x(m).toFixed(1)} ${cy + 6}L${(x(m) - 5).toFixed(1)} ${cy}Z" fill="#b03a2e" stroke="#fff" stroke-width="0.8"/>`,
      );
    }
  });
  if (axis.zero)
    out.push(
      `<line class="zero" x1="${x(0).toFixed(1)}" y1="${top - 6}" x2="${x(0).toFixed(1)}" y2="${y1}" stroke="#000" stroke-width="2.2"/>`,
    );
  out.push(
    `<line class="base" x1="${x(base).toFixed(1)}" y1="${top - 6}" x2="${x(base).toFixed(1)}" y2="${y1}" stroke="#555" stroke-dasharray="3 2"/>`,
  );
  const labels = axisLabels(axis.ticks, axis.lo, axis.hi, x, true, pct);
  for (const l of labels) {
    out.push(`<line x1="${l.pos.toFixed(1)}" y1="${y1}" x2="${l.pos.toFixed(1)}" y2="${y1 + 4}" stroke="#222"/>`);
    out.push(`<text class="tick" x="${l.pos.toFixed(1)}" y="${y1 + 17}" text-anchor="middle">${esc(l.text)}</text>`);
  }
  const where = axis.zero
    ? '0 = at the limit; heavy line'
    : axis.lo > 0
      ? 'the limit, 0, lies off to the left ←'
      : 'the limit, 0, lies off to the right →';
  out.push(
    `<text x="${L + P / 2}" y="${y1 + 36}" text-anchor="middle">${esc(`governing margin (${where}; dashed: the case)`)}</text>`,
  );
  out.push('</svg>');
  return out.join('\n');
}
