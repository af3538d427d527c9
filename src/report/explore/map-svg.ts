import { OPTIONS, type OptionName } from '../../core/options.js';
import type { MapResult } from '../../explore/map.js';

import { axisLabels, logTicks as logTicks125 } from '../note/ticks.js';
import { caseCell, LETTER } from './map-text.js';
import { esc, fmtLoad, fmtSpeed } from './format.js';

/**
 * Fills of our own choosing, each with a pattern so that the map reads in greyscale too:
 * the three lightness steps differ (ochre light, teal middle, slate dark) and each adds a
 * texture (bushing: diagonal hatch; rolling: dots; journal: plain dark); "none feasible"
 * is white with a faint cross-hatch.
 */
const STYLE: Record<OptionName | 'none', { fill: string; ink: string; label: string }> = {
  bushing: { fill: '#edc86a', ink: '#7a5a10', label: 'bushing wins' },
  rolling: { fill: '#4f9e97', ink: '#1d4a46', label: 'rolling bearing wins' },
  journal: { fill: '#34406e', ink: '#c9cff0', label: 'journal bearing wins' },
  none: { fill: '#ffffff', ink: '#b8b8b8', label: 'none feasible' },
};
/** Outline dash per option for the feasible-region borders. */
const DASH: Record<OptionName, string> = { bushing: '', rolling: '6 3', journal: '1.5 2.5' };

function defs(): string {
  const p = (id: string, body: string, fill: string) =>
    `<pattern id="${id}" width="6" height="6" patternUnits="userSpaceOnUse"><rect width="6" height="6" fill="${fill}"/>${body}</pattern>`;
  return (
    '<defs>' +
    p('f-bushing', `<path d="M0 6 L6 0" stroke="${STYLE.bushing.ink}" stroke-width="0.8"/>`, STYLE.bushing.fill) +
    p('f-rolling', `<circle cx="3" cy="3" r="0.9" fill="${STYLE.rolling.ink}"/>`, STYLE.rolling.fill) +
    p('f-journal', '', STYLE.journal.fill) +
    p('f-none', `<path d="M0 0 L6 6 M6 0 L0 6" stroke="${STYLE.none.ink}" stroke-width="0.4"/>`, STYLE.none.fill) +
    '</defs>'
  );
}

const n3 = (x: number) => +x.toFixed(2);

/** Plot geometry: the plot's origin and size, px; cells per axis and cell size; value → position on each axis. */
interface MapLayout {
  left: number;
  top: number;
  width: number;
  height: number;
  columns: number;
  rows: number;
  cellWidth: number;
  cellHeight: number;
  /** Horizontal position of a speed, rev/s (log axis, cell centres at the ends). */
  speedX: (speed: number) => number;
  /** Vertical position of a load, N (log axis, cell centres at the ends, increasing upwards). */
  loadY: (load: number) => number;
}

/** The plot geometry of a map: a 480 × 480 px plot, one cell per speed (across) and load (up). */
function mapLayout(m: MapResult): MapLayout {
  const left = 86,
    top = 48,
    width = 480,
    height = 480;
  const columns = m.speeds.length,
    rows = m.loads.length;
  const cellWidth = width / columns,
    cellHeight = height / rows;
  const speedX = (v: number) =>
    left +
    ((Math.log(v) - Math.log(m.speeds[0]!)) / (Math.log(m.speeds[columns - 1]!) - Math.log(m.speeds[0]!))) *
      (width - cellWidth) +
    cellWidth / 2;
  const loadY = (v: number) =>
    top +
    height -
    cellHeight / 2 -
    ((Math.log(v) - Math.log(m.loads[0]!)) / (Math.log(m.loads[rows - 1]!) - Math.log(m.loads[0]!))) *
      (height - cellHeight);
  return { left, top, width, height, columns, rows, cellWidth, cellHeight, speedX, loadY };
}

/** Top-left corner of cell (load index, speed index), px. */
function cellCorner(layout: MapLayout, loadIndex: number, speedIndex: number): { x: number; y: number } {
  return {
    x: layout.left + speedIndex * layout.cellWidth,
    y: layout.top + layout.height - (loadIndex + 1) * layout.cellHeight,
  };
}

/** The opening tag, title, pattern definitions, white background and heading. */
function svgHead(m: MapResult, layout: MapLayout): string[] {
  const totalHeight = layout.top + layout.height + 62 + noteLines(m).length * NOTE_LINE + 8;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="820" height="${totalHeight}" viewBox="0 0 820 ${totalHeight}" font-family="Helvetica, Arial, sans-serif" font-size="12">`,
    `<title>${esc(`Selection map: ${m.title}`)}</title>`,
    defs(),
    `<rect width="820" height="${totalHeight}" fill="#ffffff"/>`,
    `<text x="${layout.left}" y="22" font-size="15" font-weight="bold">${esc(`Where each option wins: ${m.title}`)}</text>`,
  ];
}

/** Each cell filled with its winner's pattern, and the winner's letter when cells are at least 14 px. */
function cellFills(m: MapResult, layout: MapLayout): string[] {
  const out: string[] = [];
  const { cellWidth: cw, cellHeight: ch } = layout;
  const letters = cw >= 14 && ch >= 14;
  for (let i = 0; i < layout.rows; i++) {
    for (let j = 0; j < layout.columns; j++) {
      const cell = m.cells[i]![j]!;
      const fill = cell.winner ?? 'none';
      const { x, y } = cellCorner(layout, i, j);
      out.push(
        `<rect x="${n3(x)}" y="${n3(y)}" width="${n3(cw + 0.05)}" height="${n3(ch + 0.05)}" fill="url(#f-${fill})"/>`,
      );
      if (letters && cell.winner)
        out.push(
          `<text x="${n3(x + cw / 2)}" y="${n3(y + ch / 2 + 4)}" text-anchor="middle" font-size="10" fill="${STYLE[cell.winner].ink}">${LETTER[cell.winner]}</text>`,
        );
    }
  }
  return out;
}

/** Each option's feasible-region border (an edge wherever feasibility changes between neighbours), white under black. */
function feasibleBorders(m: MapResult, layout: MapLayout): string[] {
  const out: string[] = [];
  const { rows, columns, cellWidth: cw, cellHeight: ch } = layout;
  OPTIONS.forEach((option, optionIndex) => {
    let d = '';
    const feasible = (i: number, j: number) =>
      i >= 0 && j >= 0 && i < rows && j < columns ? m.cells[i]![j]!.feasible[optionIndex] : false;
    for (let i = 0; i < rows; i++)
      for (let j = 0; j < columns; j++) {
        if (!feasible(i, j)) continue;
        const { x, y } = cellCorner(layout, i, j);
        if (!feasible(i + 1, j)) d += `M${n3(x)} ${n3(y)}H${n3(x + cw)}`;
        if (!feasible(i - 1, j)) d += `M${n3(x)} ${n3(y + ch)}H${n3(x + cw)}`;
        if (!feasible(i, j - 1)) d += `M${n3(x)} ${n3(y)}V${n3(y + ch)}`;
        if (!feasible(i, j + 1)) d += `M${n3(x + cw)} ${n3(y)}V${n3(y + ch)}`;
      }
    if (d) {
      out.push(`<path d="${d}" fill="none" stroke="#ffffff" stroke-width="3.2" stroke-linecap="square"/>`);
      out.push(
        `<path d="${d}" fill="none" stroke="#111111" stroke-width="1.6"${DASH[option] ? ` stroke-dasharray="${DASH[option]}"` : ''}/>`,
      );
    }
  });
  return out;
}

/**
 * Labelled and unlabelled ticks of one log axis between the end cells' centres: 1–2–5 steps
 * over up to three decades (decades beyond), both range ends labelled with their own values,
 * interior labels dropped where they would touch a neighbour.
 */
function mapTicks(
  min: number,
  max: number,
  at: (v: number) => number,
  horizontal: boolean,
  text: (v: number) => string,
): { labelled: { pos: number; text: string }[]; marks: number[] } {
  const t = logTicks125(min, max);
  const labelled = axisLabels(t.major, min, max, at, horizontal, text).map((l) => ({ pos: l.pos, text: l.text }));
  return { labelled, marks: t.minor.map(at) };
}

/** The plot frame, the speed axis (r/min) and the load axis, each with log ticks, both ends labelled, and a title. */
function axesWithTicks(m: MapResult, layout: MapLayout): string[] {
  const { left, top, width, height } = layout;
  const out: string[] = [];
  out.push(
    `<rect x="${left}" y="${top}" width="${width}" height="${height}" fill="none" stroke="#222" stroke-width="1"/>`,
  );
  const sx = mapTicks(
    m.speeds[0]! * 60,
    m.speeds[layout.columns - 1]! * 60,
    (rpm) => layout.speedX(rpm / 60),
    true,
    (rpm) => String(rpm >= 1e4 ? Math.round(rpm) : +rpm.toPrecision(3)),
  );
  for (const x of sx.marks)
    out.push(`<line x1="${n3(x)}" y1="${top + height}" x2="${n3(x)}" y2="${top + height + 4}" stroke="#222"/>`);
  for (const l of sx.labelled) {
    out.push(`<line x1="${n3(l.pos)}" y1="${top + height}" x2="${n3(l.pos)}" y2="${top + height + 7}" stroke="#222"/>`);
    out.push(
      `<text class="tick-x" x="${n3(l.pos)}" y="${top + height + 20}" text-anchor="middle">${esc(l.text)}</text>`,
    );
  }
  out.push(
    `<text x="${left + width / 2}" y="${top + height + 40}" text-anchor="middle">speed of the governing point, r/min (log scale)</text>`,
  );
  // A whole shaft's support: ticks in the load scale k (load = k × reference).
  const k = m.loadScale?.reference ?? 1;
  const sy = mapTicks(
    m.loads[0]! / k,
    m.loads[layout.rows - 1]! / k,
    (v) => layout.loadY(v * k),
    false,
    (v) => (m.loadScale ? `${+v.toPrecision(3)}×` : fmtLoad(v)),
  );
  for (const y of sy.marks) out.push(`<line x1="${left - 4}" y1="${n3(y)}" x2="${left}" y2="${n3(y)}" stroke="#222"/>`);
  for (const l of sy.labelled) {
    out.push(`<line x1="${left - 7}" y1="${n3(l.pos)}" x2="${left}" y2="${n3(l.pos)}" stroke="#222"/>`);
    out.push(`<text class="tick-y" x="${left - 10}" y="${n3(l.pos + 4)}" text-anchor="end">${esc(l.text)}</text>`);
  }
  const yTitle = m.loadScale
    ? `load scale k, every load on the shaft (log scale; k = 1: ${fmtLoad(k)} here)`
    : 'radial load of the governing point (log scale)';
  out.push(
    `<text transform="translate(20 ${top + height / 2}) rotate(-90)" text-anchor="middle">${esc(yTitle)}</text>`,
  );
  return out;
}

/** The case's marker (circle and cross) at its governing point; none when the case is outside the map. */
function caseMarker(m: MapResult, layout: MapLayout, inRange: boolean): string[] {
  if (!inRange) return [];
  const cx = n3(layout.speedX(m.reference.speed)),
    cy = n3(layout.loadY(m.reference.load));
  return [
    `<circle cx="${cx}" cy="${cy}" r="8" fill="#ffffff" stroke="#000" stroke-width="2"/><path d="M${cx - 5} ${cy}H${cx + 5}M${cx} ${cy - 5}V${cy + 5}" stroke="#000" stroke-width="2"/>`,
  ];
}

/** The legend right of the plot: winner fills, feasible-region borders, and the case with its full advice. */
function mapLegend(m: MapResult, layout: MapLayout, inRange: boolean): string[] {
  const out: string[] = [];
  const legendX = layout.left + layout.width + 24;
  let y = layout.top + 6;
  out.push(`<text x="${legendX}" y="${y}" font-weight="bold">Winner (fill)</text>`);
  for (const k of [...OPTIONS, 'none'] as const) {
    y += 24;
    out.push(
      `<rect x="${legendX}" y="${y - 13}" width="22" height="16" fill="url(#f-${k})" stroke="#222" stroke-width="0.6"/>`,
    );
    out.push(`<text x="${legendX + 30}" y="${y}">${k === 'none' ? '' : `${LETTER[k]} `}${esc(STYLE[k].label)}</text>`);
  }
  y += 34;
  out.push(`<text x="${legendX}" y="${y}" font-weight="bold">Feasible region (border)</text>`);
  for (const o of OPTIONS) {
    y += 22;
    out.push(
      `<line x1="${legendX}" y1="${y - 4}" x2="${legendX + 22}" y2="${y - 4}" stroke="#111" stroke-width="1.6"${DASH[o] ? ` stroke-dasharray="${DASH[o]}"` : ''}/>`,
    );
    out.push(`<text x="${legendX + 30}" y="${y}">${o}</text>`);
  }
  y += 34;
  out.push(
    `<circle cx="${legendX + 11}" cy="${y - 4}" r="7" fill="#fff" stroke="#000" stroke-width="2"/><path d="M${legendX + 7} ${y - 4}H${legendX + 15}M${legendX + 11} ${y - 8}V${y}" stroke="#000" stroke-width="2"/>`,
  );
  out.push(
    `<text x="${legendX + 30}" y="${y}">the case${m.loadScale ? ' (k = 1)' : ''}${inRange ? '' : ' (outside the map)'}</text>`,
  );
  out.push(
    `<text x="${legendX + 30}" y="${y + 16}">${esc(`${fmtLoad(m.reference.load)}, ${fmtSpeed(m.reference.speed)}`)}</text>`,
  );
  out.push(
    `<text x="${legendX + 30}" y="${y + 32}">${esc(`full advice: ${m.atCase.recommendation ?? 'none feasible'}`)}</text>`,
  );
  return out;
}

/** Characters a line of the notes holds (10.5 px type across the 780 px under the plot). */
const NOTE_CHARS = 120;
const NOTE_LINE = 13;

/** The map's notes wrapped into lines. */
function noteLines(m: MapResult): string[] {
  return m.notes.flatMap((note) => wrap(note, NOTE_CHARS));
}

/** The map's notes under the plot, wrapped at NOTE_CHARS characters; the drawing is made tall enough for all of them. */
function notesUnder(m: MapResult, layout: MapLayout): string[] {
  return noteLines(m).map(
    (line, i) =>
      `<text class="note" x="${layout.left - 60}" y="${layout.top + layout.height + 62 + i * NOTE_LINE}" font-size="10.5" fill="#333">${esc(line)}</text>`,
  );
}

/** The map as a standalone SVG document (no scripts, no external references). */
export function mapSvg(m: MapResult): string {
  const layout = mapLayout(m);
  const inRange = caseCell(m) !== null;
  const out = [
    ...svgHead(m, layout),
    ...cellFills(m, layout),
    ...feasibleBorders(m, layout),
    ...axesWithTicks(m, layout),
    ...caseMarker(m, layout, inRange),
    ...mapLegend(m, layout, inRange),
    ...notesUnder(m, layout),
    '</svg>',
  ];
  return out.join('\n') + '\n';
}

function wrap(s: string, n: number): string[] {
  const out: string[] = [];
  let line = '';
  for (const w of s.split(' ')) {
    if (line && line.length + 1 + w.length > n) {
      out.push(line);
      line = w;
    } else line = line ? `${line} ${w}` : w;
  }
  if (line) out.push(line);
  return out;
}

/** A self-contained HTML page: the SVG inline, the notes, the journal designs used. */
export function mapHtml(m: MapResult): string {
  return [
    '<!doctype html>',
    '<html lang="en"><head><meta charset="utf-8">',
    `<title>${esc(`Selection map: ${m.title}`)}</title>`,
    '<style>body{font-family:Helvetica,Arial,sans-serif;max-width:860px;margin:24px auto;color:#111}li{margin:4px 0}.small{font-size:13px;color:#333}</style>',
    '</head><body>',
    `<h1>Where each option wins</h1><p>${esc(m.title)}</p>`,
    mapSvg(m).replace(/^<svg /, '<svg role="img" '),
    '<h2>How the map was made</h2><ul class="small">',
    ...m.notes.map((n) => `<li>${esc(n)}</li>`),
    `<li>${esc(`Journal designs used: ${m.journal.designs.map((d) => d.label).join('; ')}.`)}</li>`,
    '</ul>',
    '<p class="small">Concept-stage estimate: confirm with the supplier\'s data and by test.</p>',
    '</body></html>',
    '',
  ].join('\n');
}
