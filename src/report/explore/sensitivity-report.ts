import { OPTIONS, type OptionName } from '../../core/options.js';
import { changeText, type GoverningMargin, type SensitivityResult } from '../../explore/sensitivity.js';

import { fmt, type UnitSystem } from '../units.js';
import { table } from '../table.js';
import { fitWidth } from '../text.js';
import { esc } from './format.js';
import { tornadoSvg } from './tornado-svg.js';

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
 * A tornado chart per option (tornado-svg.ts) inside a self-contained HTML page: for each
 * parameter bars from the case's governing margin to the margins at its largest decrease and
 * increase, the zero-margin line heavy, a flip marked with a ◆ in the plot and named in the list below.
 */
export function sensitivityHtml(r: SensitivityResult, units: UnitSystem = 'SI'): string {
  const svg = OPTIONS.map((o) => tornadoSvg(r, o)).join('\n');
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
