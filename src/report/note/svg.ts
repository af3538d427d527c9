import { escapeHtml } from './escape.js';
import { axisLabels, linearTicks, logTicks, nice125 } from './ticks.js';

export { axisLabels, linearTicks, logTicks, nice125, spansDecades } from './ticks.js';

/**
 * A small SVG line-chart writer for the design-review note: axes with ticks and unit labels
 * (linear or logarithmic), polylines, dashed limit lines, point markers and a legend.
 * Series are told apart by dash pattern and marker shape as well as by colour, so the chart
 * reads in greyscale and on a monochrome printer. Output is plain SVG text with no script,
 * no external reference and no font file: it renders offline in any browser.
 */

export interface Axis {
  /** Quantity name, e.g. "Running time". */
  label: string;
  /** Display unit, e.g. "h" (shown in brackets). */
  unit: string;
  log?: boolean;
  /** Fixed range; otherwise taken from the data and the reference lines. */
  min?: number;
  max?: number;
  /** Fixed tick values (linear axes), e.g. every 60° for an angle. */
  ticks?: number[];
}

export interface Series {
  name: string;
  points: ReadonlyArray<readonly [number, number]>;
  /** Draw the point markers (default true). */
  markers?: boolean;
}

export interface RefLine {
  /** "x": a vertical line at x = value; "y": a horizontal line at y = value. */
  axis: 'x' | 'y';
  value: number;
  label: string;
}

export interface ChartSpec {
  /** Used for element ids; letters, digits and dashes. */
  id: string;
  title: string;
  x: Axis;
  y: Axis;
  series: Series[];
  refs: RefLine[];
}

/** Line styles in order: colour (distinct in hue and lightness), dash pattern, marker. */
const STYLES = [
  { colour: '#1b4f72', dash: '', marker: 'circle' },
  { colour: '#b9770e', dash: '7 4', marker: 'square' },
  { colour: '#117a65', dash: '2 3', marker: 'triangle' },
  { colour: '#7d3c98', dash: '10 3 2 3', marker: 'diamond' },
  { colour: '#5d6d7e', dash: '4 2', marker: 'cross' },
  { colour: '#a04000', dash: '1 2', marker: 'circle-open' },
] as const;
const REF_COLOUR = '#922b21';
const REF_DASHES = ['9 4', '3 3', '12 3 3 3'] as const;

const W = 640;
const H = 340;
const M = { left: 70, right: 18, top: 34, bottom: 52 };
const PW = W - M.left - M.right;
const PH = H - M.top - M.bottom;
const LEGEND_ROW = 18;
/** Gap between the frame and the ends of each axis range, px: markers and limit lines at an end stay whole. */
export const INSET = 7;

interface Scale {
  min: number;
  max: number;
  log: boolean;
  to: (v: number) => number;
}

/**
 * The scale of one axis. A range taken from the data ends on a tick: a log axis at 1–2–5 × 10^k
 * values, a linear one on its 1–2–5 step (from zero when the data start near it). The range
 * maps to the frame less INSET at each end, so a point or a limit line at an end of the range
 * is drawn whole inside the frame, never on it.
 */
function makeScale(axis: Axis, values: number[], length: number, flip: boolean, n: number): Scale {
  const finite = values.filter((v) => Number.isFinite(v) && (!axis.log || v > 0));
  let min = axis.min ?? Math.min(...finite);
  let max = axis.max ?? Math.max(...finite);
  if (!Number.isFinite(min) || !Number.isFinite(max)) [min, max] = axis.log ? [1, 10] : [0, 1];
  if (axis.log) {
    if (!(max > min)) [min, max] = [min / 2, min * 2];
    if (axis.min === undefined) min = nice125(min, 'down', true);
    if (axis.max === undefined) max = nice125(max, 'up', true);
  } else {
    if (!(max > min)) [min, max] = [min - 1, max + 1];
    if (axis.min === undefined && min > 0 && min < (max - min) * 0.5) min = 0;
    const ticks = linearTicks(min, max, n);
    const step = ticks.length > 1 ? ticks[1]! - ticks[0]! : max - min;
    if (axis.min === undefined) min = +(Math.floor(min / step + 1e-9) * step).toPrecision(12);
    if (axis.max === undefined) max = +(Math.ceil(max / step - 1e-9) * step).toPrecision(12);
  }
  const f = axis.log ? Math.log10 : (v: number) => v;
  const a = f(min);
  const b = f(max);
  const inner = length - 2 * INSET;
  const to = (v: number) => {
    const t = (f(v) - a) / (b - a);
    return INSET + (flip ? inner * (1 - t) : inner * t);
  };
  return { min, max, log: axis.log === true, to };
}

const r1 = (v: number) => (Math.round(v * 10) / 10).toString();

function marker(kind: string, x: number, y: number, colour: string): string {
  const s = 3.6;
  switch (kind) {
    case 'circle':
      return `<circle cx="${r1(x)}" cy="${r1(y)}" r="${s}" fill="${colour}"/>`;
    case 'circle-open':
      return `<circle cx="${r1(x)}" cy="${r1(y)}" r="${s}" fill="#fff" stroke="${colour}" stroke-width="1.5"/>`;
    case 'square':
      return `<rect x="${r1(x - s)}" y="${r1(y - s)}" width="${2 * s}" height="${2 * s}" fill="#fff" stroke="${colour}" stroke-width="1.5"/>`;
    case 'triangle':
      return `<path d="M${r1(x)} ${r1(y - s - 0.8)}L${r1(x + s)} ${r1(y + s)}L${r1(x - s)} ${r1(y + s)}Z" fill="${colour}"/>`;
    case 'diamond':
      return `<path d="M${r1(x)} ${r1(y - s - 0.8)}L${r1(x + s + 0.8)} ${r1(y)}L${r1(x)} ${r1(y + s + 0.8)}L${r1(x - s - 0.8)} ${r1(y)}Z" fill="#fff" stroke="${colour}" stroke-width="1.5"/>`;
    default:
      return `<path d="M${r1(x - s)} ${r1(y - s)}L${r1(x + s)} ${r1(y + s)}M${r1(x - s)} ${r1(y + s)}L${r1(x + s)} ${r1(y - s)}" stroke="${colour}" stroke-width="1.6"/>`;
  }
}

/** Marker positions: about eight per series, so markers mark the line without hiding it. */
function markerIndices(n: number): number[] {
  if (n <= 10) return [...Array(n).keys()];
  const step = (n - 1) / 8;
  return [...Array(9).keys()].map((k) => Math.round(k * step));
}

/** Two legend columns when every entry fits in half the plot width (about 6.2 px a character), else one. */
function legendColumns(spec: ChartSpec): number {
  const longest = Math.max(0, ...spec.series.map((s) => s.name.length), ...spec.refs.map((r) => r.label.length));
  return longest * 6.2 + 44 <= PW / 2 ? 2 : 1;
}

/** A chart's scales and positions: its element id, the axis scales, and value → page position on each axis. */
interface ChartFrame {
  /** The spec's id with anything but letters, digits and dashes made a dash. */
  id: string;
  xScale: Scale;
  yScale: Scale;
  /** Horizontal page position of an x value, px. */
  toX: (value: number) => number;
  /** Vertical page position of a y value, px. */
  toY: (value: number) => number;
}

/** The scales of a chart, each axis ranging over its series' points and its reference lines. */
function chartFrame(spec: ChartSpec): ChartFrame {
  const id = spec.id.replace(/[^a-zA-Z0-9-]/g, '-');
  const xs = [
    ...spec.series.flatMap((s) => s.points.map((p) => p[0])),
    ...spec.refs.filter((r) => r.axis === 'x').map((r) => r.value),
  ];
  const ys = [
    ...spec.series.flatMap((s) => s.points.map((p) => p[1])),
    ...spec.refs.filter((r) => r.axis === 'y').map((r) => r.value),
  ];
  const xScale = makeScale(spec.x, xs, PW, false, 6);
  const yScale = makeScale(spec.y, ys, PH, true, 5);
  return {
    id,
    xScale,
    yScale,
    toX: (v: number) => M.left + xScale.to(v),
    toY: (v: number) => M.top + yScale.to(v),
  };
}

/** The opening tag (height grown by the legend rows), title, clip path, white background and heading. */
function chartHead(spec: ChartSpec, id: string): string[] {
  const legendRows = Math.ceil((spec.series.length + spec.refs.length) / legendColumns(spec));
  const totalH = H + 8 + legendRows * LEGEND_ROW;
  const title = `${spec.title}`;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" class="chart" id="chart-${id}" viewBox="0 0 ${W} ${totalH}" width="100%" role="img" aria-labelledby="chart-${id}-title" font-family="Helvetica, Arial, sans-serif" font-size="12">`,
    `<title id="chart-${id}-title">${escapeHtml(title)}</title>`,
    `<defs><clipPath id="clip-${id}"><rect x="${M.left}" y="${M.top}" width="${PW}" height="${PH}"/></clipPath></defs>`,
    `<rect x="0" y="0" width="${W}" height="${totalH}" fill="#fff"/>`,
    `<text x="${M.left}" y="20" font-size="14" font-weight="bold" fill="#111">${escapeHtml(title)}</text>`,
  ];
}

/** Grid lines (minor and major), the plot frame, tick marks with their values (both ends labelled), and the two axis labels. */
function gridAndAxes(spec: ChartSpec, frame: ChartFrame): string[] {
  const { xScale: sx, yScale: sy, toX: X, toY: Y } = frame;
  const grid: string[] = [];
  const ticks: string[] = [];
  const xt = sx.log
    ? logTicks(sx.min, sx.max)
    : { major: spec.x.ticks ?? linearTicks(sx.min, sx.max), minor: [] as number[] };
  const yt = sy.log
    ? logTicks(sy.min, sy.max)
    : { major: spec.y.ticks ?? linearTicks(sy.min, sy.max, 5), minor: [] as number[] };
  for (const v of xt.minor)
    grid.push(`<line x1="${r1(X(v))}" y1="${M.top}" x2="${r1(X(v))}" y2="${M.top + PH}" stroke="#eee"/>`);
  for (const v of yt.minor)
    grid.push(`<line x1="${M.left}" y1="${r1(Y(v))}" x2="${M.left + PW}" y2="${r1(Y(v))}" stroke="#eee"/>`);
  for (const v of xt.major)
    grid.push(`<line x1="${r1(X(v))}" y1="${M.top}" x2="${r1(X(v))}" y2="${M.top + PH}" stroke="#d5d5d5"/>`);
  for (const v of yt.major)
    grid.push(`<line x1="${M.left}" y1="${r1(Y(v))}" x2="${M.left + PW}" y2="${r1(Y(v))}" stroke="#d5d5d5"/>`);
  for (const l of axisLabels(xt.major, sx.min, sx.max, X, true)) {
    ticks.push(`<line x1="${r1(l.pos)}" y1="${M.top + PH}" x2="${r1(l.pos)}" y2="${M.top + PH + 5}" stroke="#333"/>`);
    ticks.push(`<text x="${r1(l.pos)}" y="${M.top + PH + 18}" text-anchor="middle" fill="#222">${l.text}</text>`);
  }
  for (const l of axisLabels(yt.major, sy.min, sy.max, Y, false)) {
    ticks.push(`<line x1="${M.left - 5}" y1="${r1(l.pos)}" x2="${M.left}" y2="${r1(l.pos)}" stroke="#333"/>`);
    ticks.push(`<text x="${M.left - 8}" y="${r1(l.pos + 4)}" text-anchor="end" fill="#222">${l.text}</text>`);
  }
  const unit = (a: Axis) => (a.unit ? ` [${escapeHtml(a.unit)}]` : '');
  return [
    `<g class="grid">${grid.join('')}</g>`,
    `<rect class="frame" x="${M.left}" y="${M.top}" width="${PW}" height="${PH}" fill="none" stroke="#333"/>`,
    `<g class="ticks">${ticks.join('')}</g>`,
    `<text class="axis-label" x="${M.left + PW / 2}" y="${H - 12}" text-anchor="middle" fill="#111">${escapeHtml(spec.x.label)}${unit(spec.x)}${sx.log ? ' (log scale)' : ''}</text>`,
    `<text class="axis-label" transform="translate(16 ${M.top + PH / 2}) rotate(-90)" text-anchor="middle" fill="#111">${escapeHtml(spec.y.label)}${unit(spec.y)}${sy.log ? ' (log scale)' : ''}</text>`,
  ];
}

/** Whether v lies within a scale's range (a hair of rounding allowed). */
const within = (sc: Scale, v: number) => {
  const tol = 1e-9 * Math.max(Math.abs(sc.min), Math.abs(sc.max));
  return v >= sc.min - tol && v <= sc.max + tol;
};

/**
 * The limit lines, then each series' line and markers (points a log axis cannot show left out),
 * clipped to the frame. A limit line outside a fixed range is left out (its legend entry stays);
 * a marker is drawn only where its point lies within both ranges, so none is cut by the frame.
 */
function plotBody(spec: ChartSpec, frame: ChartFrame): string {
  const { xScale: sx, yScale: sy, toX: X, toY: Y } = frame;
  const body: string[] = [];
  spec.refs.forEach((ref, refIndex) => {
    const dash = REF_DASHES[refIndex % REF_DASHES.length];
    if (!within(ref.axis === 'y' ? sy : sx, ref.value)) return;
    if (ref.axis === 'y') {
      const y = r1(Y(ref.value));
      body.push(
        `<line class="ref" x1="${M.left}" y1="${y}" x2="${M.left + PW}" y2="${y}" stroke="${REF_COLOUR}" stroke-width="1.6" stroke-dasharray="${dash}"/>`,
      );
    } else {
      const x = r1(X(ref.value));
      body.push(
        `<line class="ref" x1="${x}" y1="${M.top}" x2="${x}" y2="${M.top + PH}" stroke="${REF_COLOUR}" stroke-width="1.6" stroke-dasharray="${dash}"/>`,
      );
    }
  });
  spec.series.forEach((series, seriesIndex) => {
    const st = STYLES[seriesIndex % STYLES.length]!;
    const pts = series.points.filter(
      (p) => Number.isFinite(p[0]) && Number.isFinite(p[1]) && (!sx.log || p[0] > 0) && (!sy.log || p[1] > 0),
    );
    if (!pts.length) return;
    const d = pts.map((p, i) => `${i ? 'L' : 'M'}${r1(X(p[0]))} ${r1(Y(p[1]))}`).join('');
    body.push(
      `<path class="series" data-series="${seriesIndex}" d="${d}" fill="none" stroke="${st.colour}" stroke-width="2.2"${st.dash ? ` stroke-dasharray="${st.dash}"` : ''}/>`,
    );
    if (series.markers !== false) {
      const shown = markerIndices(pts.length).filter((i) => within(sx, pts[i]![0]) && within(sy, pts[i]![1]));
      body.push(
        `<g class="markers" data-series="${seriesIndex}">${shown.map((i) => marker(st.marker, X(pts[i]![0]), Y(pts[i]![1]), st.colour)).join('')}</g>`,
      );
    }
  });
  return `<g class="plot" clip-path="url(#clip-${frame.id})">${body.join('')}</g>`;
}

/** The legend below the plot (it never hides a line): series, then limit lines, in one or two columns. */
function chartLegend(spec: ChartSpec): string {
  const entries: string[] = [];
  const rows = [
    ...spec.series.map((s, k) => ({ name: s.name, kind: 'series' as const, k })),
    ...spec.refs.map((r, k) => ({ name: r.label, kind: 'ref' as const, k })),
  ];
  const cols = legendColumns(spec);
  const colW = PW / cols;
  rows.forEach((row, i) => {
    const lx = M.left + (i % cols) * colW;
    const y = H + 16 + Math.floor(i / cols) * LEGEND_ROW;
    if (row.kind === 'series') {
      const st = STYLES[row.k % STYLES.length]!;
      entries.push(
        `<line x1="${r1(lx)}" y1="${y - 4}" x2="${r1(lx + 30)}" y2="${y - 4}" stroke="${st.colour}" stroke-width="2.2"${st.dash ? ` stroke-dasharray="${st.dash}"` : ''}/>`,
      );
      if (spec.series[row.k]!.markers !== false) entries.push(marker(st.marker, lx + 15, y - 4, st.colour));
    } else {
      entries.push(
        `<line x1="${r1(lx)}" y1="${y - 4}" x2="${r1(lx + 30)}" y2="${y - 4}" stroke="${REF_COLOUR}" stroke-width="1.6" stroke-dasharray="${REF_DASHES[row.k % REF_DASHES.length]}"/>`,
      );
    }
    const room = Math.floor((colW - 44) / 6.2);
    const name = row.name.length > room ? row.name.slice(0, room - 1) + '…' : row.name;
    entries.push(`<text x="${r1(lx + 36)}" y="${y}" fill="#111" font-size="11.5">${escapeHtml(name)}</text>`);
  });
  return `<g class="legend">${entries.join('')}</g>`;
}

/** The chart as an SVG element (a string). Sizes scale with the page: width 100 %, fixed aspect ratio. */
export function lineChart(spec: ChartSpec): string {
  const frame = chartFrame(spec);
  const out = [
    ...chartHead(spec, frame.id),
    ...gridAndAxes(spec, frame),
    plotBody(spec, frame),
    chartLegend(spec),
    '</svg>',
  ];
  return out.join('\n');
}
