import type { ShaftSensitivityResult } from '../../explore/shaft-sensitivity.js';

import { sensitivityHtml, sensitivityText } from './sensitivity-report.js';
import { esc } from './format.js';
import { fitWidth } from '../text.js';
import type { UnitSystem } from '../units.js';

const letter = (i: number) => String.fromCharCode(65 + i);

/** A whole shaft's sensitivity as text: what the inputs are, then each support's table under its name. */
export function shaftSensitivityText(r: ShaftSensitivityResult, units: UnitSystem = 'SI'): string {
  const head = [`Sensitivity of a whole shaft: ${r.title}`, ...r.notes.map((n) => `- ${n}`)].join('\n');
  const parts = r.supports.map((s, i) => {
    const title = `Support ${letter(i)}: ${s.name} (the support's own inputs)`;
    return [title, '='.repeat(title.length), sensitivityText(s.sensitivity, units)].join('\n');
  });
  return fitWidth([head, ...parts].join('\n\n'));
}

/** JSON: { title, notes, supports: [{ name, at (m), sensitivity }] }, SI numbers, margins as fractions. */
export function shaftSensitivityJson(r: ShaftSensitivityResult): string {
  return JSON.stringify(r, null, 2);
}

/** One HTML page: the notes, then each support's tornado charts and table (ids made distinct per support). */
export function shaftSensitivityHtml(r: ShaftSensitivityResult): string {
  const sections = r.supports.map((s, i) => {
    const page = sensitivityHtml(s.sensitivity);
    const body = page
      .slice(page.indexOf('<body>') + '<body>'.length, page.lastIndexOf('</body>'))
      .replace(/<h1>Sensitivity of the advice<\/h1>/, '')
      .replace(/<h2>/g, '<h3>')
      .replace(/<\/h2>/g, '</h3>')
      .replace(/id="hatch-/g, `id="s${i}-hatch-`)
      .replace(/url\(#hatch-/g, `url(#s${i}-hatch-`)
      .replace(/<p class="small">Concept-stage estimate[^\n]*<\/p>/, '');
    return `<h2>${esc(`Support ${letter(i)}: ${s.name}`)} (the support's own inputs)</h2>\n${body}`;
  });
  return [
    '<!doctype html>',
    '<html lang="en"><head><meta charset="utf-8">',
    `<title>${esc(`Sensitivity: ${r.title}`)}</title>`,
    '<style>body{font-family:Helvetica,Arial,sans-serif;max-width:900px;margin:24px auto;color:#111}table{border-collapse:collapse;font-size:13px}td,th{border:1px solid #bbb;padding:3px 6px;text-align:left}.small{font-size:13px;color:#333}</style>',
    '</head><body>',
    `<h1>Sensitivity of the advice, support by support</h1><p>${esc(r.title)}</p>`,
    `<ul class="small">${r.notes.map((n) => `<li>${esc(n)}</li>`).join('')}</ul>`,
    ...sections,
    '<p class="small">Concept-stage estimate: confirm with the supplier\'s data and by test.</p>',
    '</body></html>',
    '',
  ].join('\n');
}
