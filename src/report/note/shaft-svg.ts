import type { PointLoad } from '../../calc/shaft/types.js';
import type { ShaftSI } from '../../case/shaft-types.js';
import { SUPPORT_MARKS, shaftExtent, type ShaftAdviceView } from '../shaft-text.js';
import { displayUnit, fmt, fmtValue, type UnitSystem } from '../units.js';
import { escapeHtml as h } from './escape.js';
import { linearTicks, type ChartSpec } from './svg.js';
import type { NoteChart } from './charts.js';

/**
 * The shaft's drawings for the note: a sketch to scale along the shaft (segments by their
 * diameters, supports as triangles, loads as numbered arrows), and the bending moment and
 * deflection charts drawn from the beam kernel's diagram. Nothing is computed here but
 * positions on the page.
 */

const W = 640;
const H = 230;
const LEFT = 60;
const RIGHT = 40;
const AXIS_Y = 110;
const HALF_MAX = 18;

const r1 = (v: number) => (Math.round(v * 10) / 10).toString();

/** Diameter of the shaft over each stretch between steps: a segment's where one covers it, else the shaft's. */
function stretches(shaft: ShaftSI, lo: number, hi: number): { from: number; to: number; d: number }[] {
  const xs = [...new Set([lo, hi, ...shaft.segments.flatMap((s) => [s.from, s.to])])].sort((a, b) => a - b);
  const out: { from: number; to: number; d: number }[] = [];
  for (let i = 0; i + 1 < xs.length; i++) {
    const a = xs[i]!;
    const b = xs[i + 1]!;
    const mid = (a + b) / 2;
    const seg = shaft.segments.find((s) => s.from <= mid && mid <= s.to);
    out.push({ from: a, to: b, d: seg ? seg.diameter : shaft.diameter });
  }
  return out;
}

/** The shaft sketch as an SVG element: to scale along x, diameters to their own scale. */
export function shaftSketchSvg(shaft: ShaftSI, resolved: PointLoad[], u: UnitSystem): string {
  const [lo, hi] = shaftExtent(shaft);
  const span = hi - lo || 1;
  const X = (x: number) => LEFT + ((x - lo) / span) * (W - LEFT - RIGHT);
  const parts = stretches(shaft, lo, hi);
  const dMax = Math.max(...parts.map((p) => p.d), shaft.diameter);
  const half = (d: number) => (d / dMax) * HALF_MAX;
  const out: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" class="chart" id="chart-shaft-sketch" viewBox="0 0 ${W} ${H}" width="100%" role="img" aria-labelledby="chart-shaft-sketch-title" font-family="Helvetica, Arial, sans-serif" font-size="12">`,
    `<title id="chart-shaft-sketch-title">Shaft sketch: loads and supports</title>`,
    `<rect x="0" y="0" width="${W}" height="${H}" fill="#fff"/>`,
    `<text x="${LEFT}" y="20" font-size="14" font-weight="bold" fill="#111">Shaft: loads and supports (to scale along the shaft)</text>`,
    `<line x1="${LEFT - 20}" y1="${AXIS_Y}" x2="${W - RIGHT + 20}" y2="${AXIS_Y}" stroke="#777" stroke-dasharray="12 3 3 3"/>`,
  ];
  for (const p of parts) {
    const hh = half(p.d);
    out.push(
      `<rect class="shaft" x="${r1(X(p.from))}" y="${r1(AXIS_Y - hh)}" width="${r1(X(p.to) - X(p.from))}" height="${r1(2 * hh)}" fill="#d9d9d9" stroke="#333"/>`,
    );
  }
  shaft.supports.forEach((s, i) => {
    const x = X(s.at);
    const top = AXIS_Y + half(s.diameter);
    out.push(
      `<path class="support" d="M${r1(x)} ${r1(top)}L${r1(x + 10)} ${r1(top + 18)}L${r1(x - 10)} ${r1(top + 18)}Z" fill="#1b4f72"/>`,
      `<text x="${r1(x)}" y="${r1(top + 32)}" text-anchor="middle" fill="#111">${SUPPORT_MARKS[i]}: ${h(s.name)}</text>`,
    );
  });
  resolved.forEach((p, i) => {
    const x = X(p.at);
    const top = AXIS_Y - HALF_MAX - 4;
    const f = Math.hypot(p.fy, p.fz);
    out.push(
      `<path class="load" d="M${r1(x)} ${r1(top - 34)}L${r1(x)} ${r1(top)}M${r1(x - 4)} ${r1(top - 7)}L${r1(x)} ${r1(top)}L${r1(x + 4)} ${r1(top - 7)}" stroke="#a04000" stroke-width="2" fill="none"/>`,
      `<text x="${r1(x)}" y="${r1(top - 38 - (i % 2) * 13)}" text-anchor="middle" fill="#a04000">${i + 1}: ${h(fmt(f, 'N', u))}</text>`,
    );
  });
  const unit = displayUnit('m', u);
  const tickY = H - 40;
  out.push(`<line x1="${LEFT}" y1="${tickY}" x2="${W - RIGHT}" y2="${tickY}" stroke="#333"/>`);
  const lu = Number(fmtValue(lo, 'm', u, 9));
  const hu = Number(fmtValue(hi, 'm', u, 9));
  for (const t of linearTicks(lu, hu, 8)) {
    const x = LEFT + ((t - lu) / (hu - lu || 1)) * (W - LEFT - RIGHT);
    out.push(
      `<line x1="${r1(x)}" y1="${tickY}" x2="${r1(x)}" y2="${tickY + 5}" stroke="#333"/>`,
      `<text x="${r1(x)}" y="${tickY + 18}" text-anchor="middle" fill="#222">${t}</text>`,
    );
  }
  out.push(
    `<text x="${LEFT + (W - LEFT - RIGHT) / 2}" y="${H - 6}" text-anchor="middle" fill="#111">Position along the shaft x [${h(unit)}]</text>`,
    '</svg>',
  );
  return out.join('\n');
}

const disp = (x: number, unit: string, u: UnitSystem) => Number(fmtValue(x, unit, u, 9));

/** Vertical lines at the supports, for both charts. */
function supportRefs(a: ShaftAdviceView, u: UnitSystem): ChartSpec['refs'] {
  return a.supports.map((s, i) => ({
    axis: 'x' as const,
    value: disp(s.at, 'm', u),
    label: `support ${SUPPORT_MARKS[i]} (${s.name}) at ${fmt(s.at, 'm', u)}`,
  }));
}

/** Bending moment along the shaft: the resultant and its two plane components, from the beam kernel. */
export function shaftMomentChart(a: ShaftAdviceView, u: UnitSystem): NoteChart {
  const id = 'shaft-moment';
  const d = a.shaft.diagram;
  const x = (p: (typeof d)[number]) => disp(p.x, 'm', u);
  const mu = 'N*m';
  return {
    id,
    spec: {
      id,
      title: 'Shaft: bending moment along the shaft',
      x: { label: 'Position along the shaft x', unit: displayUnit('m', u) },
      y: { label: 'Bending moment', unit: displayUnit(mu, u) },
      series: [
        { name: 'resultant moment M', points: d.map((p) => [x(p), disp(p.moment, mu, u)] as const), markers: false },
        {
          name: 'Mz, in the x–y plane',
          points: d.map((p) => [x(p), disp(p.momentZ, mu, u)] as const),
          markers: false,
        },
        {
          name: 'My, in the x–z plane',
          points: d.map((p) => [x(p), disp(p.momentY, mu, u)] as const),
          markers: false,
        },
      ],
      refs: supportRefs(a, u),
    },
    caption: `Bending moment along the shaft from the statics of the shaft on its two supports (both planes and their resultant √(My² + Mz²); sagging positive in each plane). Largest resultant ${fmt(a.shaft.maxMoment, mu, u)}.`,
  };
}

/** Deflection along the shaft: the resultant and its two plane components, from the beam kernel. */
export function shaftDeflectionChart(a: ShaftAdviceView, u: UnitSystem): NoteChart {
  const id = 'shaft-deflection';
  const d = a.shaft.diagram;
  const x = (p: (typeof d)[number]) => disp(p.x, 'm', u);
  const du = u === 'SI' ? 'um' : 'm';
  return {
    id,
    spec: {
      id,
      title: 'Shaft: deflection along the shaft',
      x: { label: 'Position along the shaft x', unit: displayUnit('m', u) },
      y: { label: 'Deflection', unit: displayUnit(du, u) },
      series: [
        {
          name: 'resultant deflection',
          points: d.map((p) => [x(p), disp(p.deflection, du, u)] as const),
          markers: false,
        },
        { name: 'along y', points: d.map((p) => [x(p), disp(p.deflectionY, du, u)] as const), markers: false },
        { name: 'along z', points: d.map((p) => [x(p), disp(p.deflectionZ, du, u)] as const), markers: false },
      ],
      refs: supportRefs(a, u),
    },
    caption: `Deflection of the shaft axis as a beam (simply supported on the two supports, each segment with its own second moment of area). Largest resultant ${fmt(a.shaft.maxDeflection, 'um', u)}; the slope at each support is in the reactions table.`,
  };
}
