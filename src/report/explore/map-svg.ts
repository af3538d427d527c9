import { OPTIONS, type OptionName } from '../../core/options.js';
import type { MapResult } from '../../explore/map.js';

import { logTicks } from '../../explore/axes.js';
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

/** The map as a standalone SVG document (no scripts, no external references). */
export function mapSvg(m: MapResult): string {
  const X0 = 86,
    Y0 = 48,
    W = 480,
    H = 480;
  const nx = m.speeds.length,
    ny = m.loads.length;
  const cw = W / nx,
    ch = H / ny;
  const lx = (v: number) =>
    X0 +
    ((Math.log(v) - Math.log(m.speeds[0]!)) / (Math.log(m.speeds[nx - 1]!) - Math.log(m.speeds[0]!))) * (W - cw) +
    cw / 2;
  const ly = (v: number) =>
    Y0 +
    H -
    ch / 2 -
    ((Math.log(v) - Math.log(m.loads[0]!)) / (Math.log(m.loads[ny - 1]!) - Math.log(m.loads[0]!))) * (H - ch);
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="820" height="${Y0 + H + 150}" viewBox="0 0 820 ${Y0 + H + 150}" font-family="Helvetica, Arial, sans-serif" font-size="12">`,
  );
  out.push(`<title>${esc(`Selection map: ${m.title}`)}</title>`);
  out.push(defs());
  out.push(`<rect width="820" height="${Y0 + H + 150}" fill="#ffffff"/>`);
  out.push(
    `<text x="${X0}" y="22" font-size="15" font-weight="bold">${esc(`Where each option wins: ${m.title}`)}</text>`,
  );
  // Cells.
  const letters = cw >= 14 && ch >= 14;
  for (let i = 0; i < ny; i++) {
    for (let j = 0; j < nx; j++) {
      const c = m.cells[i]![j]!;
      const k = c.winner ?? 'none';
      const x = X0 + j * cw,
        y = Y0 + H - (i + 1) * ch;
      out.push(
        `<rect x="${n3(x)}" y="${n3(y)}" width="${n3(cw + 0.05)}" height="${n3(ch + 0.05)}" fill="url(#f-${k})"/>`,
      );
      if (letters && c.winner)
        out.push(
          `<text x="${n3(x + cw / 2)}" y="${n3(y + ch / 2 + 4)}" text-anchor="middle" font-size="10" fill="${STYLE[c.winner].ink}">${LETTER[c.winner]}</text>`,
        );
    }
  }
  // Feasible-region borders: an edge wherever feasibility changes between neighbours.
  OPTIONS.forEach((o, k) => {
    let d = '';
    const f = (i: number, j: number) => (i >= 0 && j >= 0 && i < ny && j < nx ? m.cells[i]![j]!.feasible[k] : false);
    for (let i = 0; i < ny; i++)
      for (let j = 0; j < nx; j++) {
        if (!f(i, j)) continue;
        const x = X0 + j * cw,
          y = Y0 + H - (i + 1) * ch;
        if (!f(i + 1, j)) d += `M${n3(x)} ${n3(y)}H${n3(x + cw)}`;
        if (!f(i - 1, j)) d += `M${n3(x)} ${n3(y + ch)}H${n3(x + cw)}`;
        if (!f(i, j - 1)) d += `M${n3(x)} ${n3(y)}V${n3(y + ch)}`;
        if (!f(i, j + 1)) d += `M${n3(x + cw)} ${n3(y)}V${n3(y + ch)}`;
      }
    if (d) {
      out.push(`<path d="${d}" fill="none" stroke="#ffffff" stroke-width="3.2" stroke-linecap="square"/>`);
      out.push(
        `<path d="${d}" fill="none" stroke="#111111" stroke-width="1.6"${DASH[o] ? ` stroke-dasharray="${DASH[o]}"` : ''}/>`,
      );
    }
  });
  out.push(`<rect x="${X0}" y="${Y0}" width="${W}" height="${H}" fill="none" stroke="#222" stroke-width="1"/>`);
  // Axes with log ticks.
  for (const t of logTicks(m.speeds[0]! * 60, m.speeds[nx - 1]! * 60)) {
    const x = n3(lx(t.value / 60));
    out.push(`<line x1="${x}" y1="${Y0 + H}" x2="${x}" y2="${Y0 + H + (t.major ? 7 : 4)}" stroke="#222"/>`);
    out.push(`<text x="${x}" y="${Y0 + H + 20}" text-anchor="middle">${esc(String(t.value))}</text>`);
  }
  out.push(
    `<text x="${X0 + W / 2}" y="${Y0 + H + 40}" text-anchor="middle">speed of the governing point, r/min (log scale)</text>`,
  );
  for (const t of logTicks(m.loads[0]!, m.loads[ny - 1]!)) {
    const y = n3(ly(t.value));
    out.push(`<line x1="${X0 - (t.major ? 7 : 4)}" y1="${y}" x2="${X0}" y2="${y}" stroke="#222"/>`);
    out.push(`<text x="${X0 - 10}" y="${n3(y + 4)}" text-anchor="end">${esc(fmtLoad(t.value))}</text>`);
  }
  out.push(
    `<text transform="translate(20 ${Y0 + H / 2}) rotate(-90)" text-anchor="middle">radial load of the governing point (log scale)</text>`,
  );
  // The case.
  const inRange = caseCell(m) !== null;
  if (inRange) {
    const cx = n3(lx(m.reference.speed)),
      cy = n3(ly(m.reference.load));
    out.push(
      `<circle cx="${cx}" cy="${cy}" r="8" fill="#ffffff" stroke="#000" stroke-width="2"/><path d="M${cx - 5} ${cy}H${cx + 5}M${cx} ${cy - 5}V${cy + 5}" stroke="#000" stroke-width="2"/>`,
    );
  }
  // Legend.
  const LX = X0 + W + 24;
  let y = Y0 + 6;
  out.push(`<text x="${LX}" y="${y}" font-weight="bold">Winner (fill)</text>`);
  for (const k of [...OPTIONS, 'none'] as const) {
    y += 24;
    out.push(
      `<rect x="${LX}" y="${y - 13}" width="22" height="16" fill="url(#f-${k})" stroke="#222" stroke-width="0.6"/>`,
    );
    out.push(`<text x="${LX + 30}" y="${y}">${k === 'none' ? '' : `${LETTER[k]} `}${esc(STYLE[k].label)}</text>`);
  }
  y += 34;
  out.push(`<text x="${LX}" y="${y}" font-weight="bold">Feasible region (border)</text>`);
  for (const o of OPTIONS) {
    y += 22;
    out.push(
      `<line x1="${LX}" y1="${y - 4}" x2="${LX + 22}" y2="${y - 4}" stroke="#111" stroke-width="1.6"${DASH[o] ? ` stroke-dasharray="${DASH[o]}"` : ''}/>`,
    );
    out.push(`<text x="${LX + 30}" y="${y}">${o}</text>`);
  }
  y += 34;
  out.push(
    `<circle cx="${LX + 11}" cy="${y - 4}" r="7" fill="#fff" stroke="#000" stroke-width="2"/><path d="M${LX + 7} ${y - 4}H${LX + 15}M${LX + 11} ${y - 8}V${y}" stroke="#000" stroke-width="2"/>`,
  );
  out.push(`<text x="${LX + 30}" y="${y}">the case${inRange ? '' : ' (outside the map)'}</text>`);
  out.push(
    `<text x="${LX + 30}" y="${y + 16}">${esc(`${fmtLoad(m.reference.load)}, ${fmtSpeed(m.reference.speed)}`)}</text>`,
  );
  out.push(
    `<text x="${LX + 30}" y="${y + 32}">${esc(`full advice: ${m.atCase.recommendation ?? 'none feasible'}`)}</text>`,
  );
  // Notes under the plot.
  let ny0 = Y0 + H + 62;
  for (const note of m.notes) {
    for (const line of wrap(note, 120)) {
      out.push(`<text x="${X0 - 60}" y="${ny0}" font-size="10.5" fill="#333">${esc(line)}</text>`);
      ny0 += 13;
    }
  }
  out.push('</svg>');
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
