import { OPTIONS, type OptionName } from '../../core/options.js';
import { changeText, type GoverningMargin, type SensitivityResult } from '../../explore/sensitivity.js';

import { fmt, type UnitSystem } from '../units.js';
import { table } from '../table.js';
import { fitWidth } from '../text.js';
import { esc } from './format.js';

const pct = (m: number | null) => (m === null ? '—' : `${m >= 0 ? '+' : ''}${(m * 100).toFixed(0)} %`);

/** Governing checks lettered a, b, c… in order of first appearance, each named in words once. */
function checkKey(): { letter: (o: OptionName, m: GoverningMargin) => string; key: string[] } {
  const letters = new Map<string, string>();
  const key: string[] = [];
  const letter = (o: OptionName, m: GoverningMargin) => {
    if (!m.check) return '';
    const id = `${o}:${m.check}`;
    let l = letters.get(id);
    if (l === undefined) {
      l =
        String.fromCharCode(97 + (letters.size % 26)) +
        (letters.size >= 26 ? String(Math.floor(letters.size / 26)) : '');
      letters.set(id, l);
      key.push(`  (${l}) ${o}: ${m.label || m.check}`);
    }
    return `(${l})`;
  };
  return { letter, key };
}

/**
 * The sensitivity as a text table: one row per parameter and step, with each option's
 * governing margin and a letter naming its governing check; the letters are keyed below in
 * words, with the checks no swept input moves (left out of the margins).
 */
export function sensitivityText(r: SensitivityResult, units: UnitSystem = 'SI'): string {
  const { letter, key } = checkKey();
  const cell = (o: OptionName, m: GoverningMargin) => `${pct(m.margin)} ${letter(o, m)}`.trim();
  const head = ['parameter', 'change', 'value', 'advised', ...OPTIONS, ''];
  const rows: string[][] = [
    ['(the case)', '', '', r.recommendation ?? 'none', ...OPTIONS.map((o) => cell(o, r.margins[o])), ''],
  ];
  for (const p of r.parameters) {
    p.variations.forEach((v, i) => {
      rows.push([
        i === 0 ? `${p.label}, ${fmt(p.base, p.unit, units)}` : '',
        changeText(v, p.changeUnit),
        fmt(v.value, p.unit, units),
        v.recommendation ?? 'none',
        ...OPTIONS.map((o) => cell(o, v.margins[o])),
        v.flip ? 'FLIP' : '',
      ]);
    });
  }
  const fixed = OPTIONS.flatMap((o) => (r.fixed?.[o] ?? []).map((f) => `${o}: ${f.label}`));
  return fitWidth(
    [
      `Sensitivity: ${r.title}`,
      `Recommended at the case's values: ${r.recommendation ?? 'none feasible'}. Parameters sorted by how far they move a margin. Columns bushing, rolling, journal: each option's governing margin, (letter) its governing check.`,
      '',
      table(head, rows),
      '',
      'Governing checks:',
      ...key,
      ...(fixed.length
        ? [
            `Left out of the governing margins: passing checks no swept input moves (the same at every step): ${fixed.join('; ')}.`,
          ]
        : []),
      '',
      r.flips.length
        ? `The recommendation flips at:\n${r.flips.map((f) => `  - ${f}`).join('\n')}`
        : 'The recommendation does not flip within the steps of any parameter.',
      '',
      ...r.notes.map((n) => `- ${n}`),
    ].join('\n'),
  );
}

/** JSON: the result as computed (SI numbers; margins as fractions). */
export function sensitivityJson(r: SensitivityResult): string {
  return JSON.stringify(r, null, 2);
}

/**
 * A tornado chart per option (SVG inside a self-contained HTML page): for each parameter a
 * bar from the case's governing margin to the margin at −25 % (plain light bar) and at +25 %
 * (dark bar with a hatch, so it reads in greyscale), ±10 % as tick marks, the zero-margin
 * line drawn heavy; a flip is marked with a ◆ and named in the list below.
 */
export function sensitivityHtml(r: SensitivityResult, units: UnitSystem = 'SI'): string {
  const svg = OPTIONS.map((o) => tornado(r, o)).join('\n');
  return [
    '<!doctype html>',
    '<html lang="en"><head><meta charset="utf-8">',
    `<title>${esc(`Sensitivity: ${r.title}`)}</title>`,
    '<style>body{font-family:Helvetica,Arial,sans-serif;max-width:900px;margin:24px auto;color:#111}table{border-collapse:collapse;font-size:13px}td,th{border:1px solid #bbb;padding:3px 6px;text-align:left}.small{font-size:13px;color:#333}</style>',
    '</head><body>',
    `<h1>Sensitivity of the advice</h1><p>${esc(r.title)} — recommended at the case's values: <b>${esc(r.recommendation ?? 'none feasible')}</b></p>`,
    svg,
    '<h2>Flips</h2>',
    r.flips.length
      ? `<ul>${r.flips.map((f) => `<li>${esc(f)}</li>`).join('')}</ul>`
      : '<p>The recommendation does not flip within ±25 % of any parameter.</p>',
    '<h2>Numbers</h2><table><tr><th>parameter</th><th>change</th><th>value</th><th>recommended</th>' +
      OPTIONS.map((o) => `<th>${o} margin</th>`).join('') +
      '</tr>',
    ...r.parameters.flatMap((p) =>
      p.variations.map(
        (v) =>
          `<tr><td>${esc(p.label)}</td><td>${esc(changeText(v, p.changeUnit))}</td><td>${esc(fmt(v.value, p.unit, units))}</td><td>${esc(v.recommendation ?? 'none')}${v.flip ? ' ◆' : ''}</td>` +
          OPTIONS.map(
            (o) => `<td>${esc(`${pct(v.margins[o].margin)} ${v.margins[o].label || v.margins[o].check}`)}</td>`,
          ).join('') +
          '</tr>',
      ),
    ),
    '</table>',
    `<ul class="small">${r.notes.map((n) => `<li>${esc(n)}</li>`).join('')}</ul>`,
    '<p class="small">Concept-stage estimate: confirm with the supplier\'s data and by test.</p>',
    '</body></html>',
    '',
  ].join('\n');
}

function tornado(r: SensitivityResult, o: OptionName): string {
  const base = r.margins[o].margin;
  const W = 860,
    L = 300,
    P = 520,
    rowH = 26,
    top = 44;
  const ps = r.parameters;
  const H = top + ps.length * rowH + 40;
  const vals = ps.flatMap((p) => p.variations.map((v) => v.margins[o].margin)).filter((x): x is number => x !== null);
  if (base === null || !vals.length) return `<p>${esc(o)}: no governing margin (no design found).</p>`;
  // Axis covers the margins seen and zero, clamped to ±300 % so one huge margin does not flatten the rest.
  const lo = Math.max(-3, Math.min(0, base, ...vals));
  const hi = Math.min(3, Math.max(0, base, ...vals));
  const span = hi - lo || 1;
  const x = (m: number) => L + ((Math.max(lo, Math.min(hi, m)) - lo) / span) * P;
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" role="img" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}" font-family="Helvetica, Arial, sans-serif" font-size="12">`,
  );
  out.push(
    `<defs><pattern id="hatch-${o}" width="5" height="5" patternUnits="userSpaceOnUse"><rect width="5" height="5" fill="#3a3a58"/><path d="M0 5 L5 0" stroke="#ffffff" stroke-width="0.9"/></pattern></defs>`,
  );
  out.push(
    `<text x="10" y="20" font-size="14" font-weight="bold">${esc(`${o}: governing margin ${pct(base)} (${r.margins[o].label || r.margins[o].check})`)}</text>`,
  );
  out.push(`<text x="${L}" y="36" fill="#333">light bar: −25 %, hatched bar: +25 %, ticks: ±10 %</text>`);
  ps.forEach((p, k) => {
    const y = top + k * rowH;
    const v = (s: number) => p.variations.find((q) => q.step === s)!;
    out.push(
      `<text x="${L - 8}" y="${y + 16}" text-anchor="end">${esc(p.label.length > 44 ? p.label.slice(0, 43) + '…' : p.label)}</text>`,
    );
    for (const [s, fill, dy] of [
      [-0.25, '#c6c6d6', 3],
      [0.25, `url(#hatch-${o})`, 12],
    ] as const) {
      const m = v(s).margins[o].margin;
      if (m === null) continue;
      const a = x(base),
        b = x(m);
      out.push(
        `<rect x="${Math.min(a, b).toFixed(1)}" y="${y + dy}" width="${Math.max(1, Math.abs(b - a)).toFixed(1)}" height="9" fill="${fill}" stroke="#222" stroke-width="0.5"/>`,
      );
    }
    for (const [s, dy] of [
      [-0.1, 3],
      [0.1, 12],
    ] as const) {
      const m = v(s).margins[o].margin;
      if (m !== null)
        out.push(
          `<line x1="${x(m).toFixed(1)}" y1="${y + dy - 1}" x2="${x(m).toFixed(1)}" y2="${y + dy + 10}" stroke="#000" stroke-width="1.5"/>`,
        );
    }
    const flipped = p.variations.filter((q) => q.flip).map((q) => changeText(q, p.changeUnit));
    if (flipped.length) out.push(`<text x="${L + P + 8}" y="${y + 16}">◆ flips at ${esc(flipped.join(', '))}</text>`);
  });
  const y1 = top + ps.length * rowH;
  out.push(
    `<line x1="${x(0).toFixed(1)}" y1="${top - 4}" x2="${x(0).toFixed(1)}" y2="${y1}" stroke="#000" stroke-width="2.2"/>`,
  );
  out.push(
    `<line x1="${x(base).toFixed(1)}" y1="${top - 4}" x2="${x(base).toFixed(1)}" y2="${y1}" stroke="#555" stroke-dasharray="3 2"/>`,
  );
  out.push(`<line x1="${L}" y1="${y1}" x2="${L + P}" y2="${y1}" stroke="#222"/>`);
  for (let t = 0; t <= 4; t++) {
    const m = lo + (span * t) / 4;
    out.push(`<text x="${x(m).toFixed(1)}" y="${y1 + 16}" text-anchor="middle">${pct(m)}</text>`);
  }
  out.push(
    `<text x="${L + P / 2}" y="${y1 + 32}" text-anchor="middle">governing margin (0 = at the limit; heavy line)</text>`,
  );
  out.push('</svg>');
  return out.join('\n');
}
