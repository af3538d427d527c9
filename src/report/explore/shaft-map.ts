import type { ShaftMapResult } from '../../explore/shaft-map.js';

import { mapSvg } from './map-svg.js';
import { mapText } from './map-text.js';
import { esc, fmtLoad } from './format.js';
import { fmt, type UnitSystem } from '../units.js';
import { fitWidth } from '../text.js';

const letter = (i: number) => String.fromCharCode(65 + i);
const deg = (rad: number) => `${+((rad * 180) / Math.PI).toPrecision(3)}°`;

/** One line per support: its position, radial load and slope at k = 1, and the whole-shaft advice. */
function supportLines(r: ShaftMapResult, units: UnitSystem = 'SI'): string[] {
  return r.supports.map(
    (s, i) =>
      `support ${letter(i)} "${s.name}" at ${fmt(s.at, 'm', units, 4)}: radial load ${fmtLoad(s.radial, units)} and slope ${deg(s.slope)} at k = 1; advised: ${s.recommendation ?? 'none feasible'}`,
  );
}

/** The maps of a whole shaft as text: a heading, then each support's map under its name. */
export function shaftMapText(r: ShaftMapResult, units: UnitSystem = 'SI'): string {
  const head = [
    `Selection maps of a whole shaft: ${r.title}`,
    `Every load on the shaft scaled together by k (${r.loadScale[0]}× to ${r.loadScale[1]}×) against shaft speed; one map per support.`,
    ...supportLines(r, units).map((l) => `  ${l}`),
  ];
  const maps = r.supports.map((s, i) => {
    const title = `Support ${letter(i)}: ${s.name}`;
    return [title, '='.repeat(title.length), mapText(s.map, units)].join('\n');
  });
  return fitWidth([head.join('\n'), ...maps].join('\n\n'));
}

/** Each support's SVG, its outer tag turned into a nested svg at (0, y); the pattern definitions kept once. */
function nested(r: ShaftMapResult): { body: string[]; height: number } {
  const body: string[] = [];
  let y = 0;
  r.supports.forEach((s, i) => {
    const svg = mapSvg(s.map);
    const h = Number(/height="(\d+(?:\.\d+)?)"/.exec(svg)![1]);
    let lines = svg.trimEnd().split('\n');
    // The fills' pattern ids are the same in every map: defined by the first only.
    if (i > 0) lines = lines.filter((l) => !l.startsWith('<defs>'));
    lines[0] = lines[0]!.replace(/^<svg xmlns="http:\/\/www.w3.org\/2000\/svg" /, `<svg x="0" y="${y}" `);
    body.push(...lines);
    y += h;
  });
  return { body, height: y };
}

/** The maps of a whole shaft as one SVG document: each support's map below the other, each titled with its support. */
export function shaftMapSvg(r: ShaftMapResult): string {
  const { body, height } = nested(r);
  return (
    [
      `<svg xmlns="http://www.w3.org/2000/svg" width="820" height="${height}" viewBox="0 0 820 ${height}">`,
      `<title>${esc(`Selection maps: ${r.title}`)}</title>`,
      ...body,
      '</svg>',
    ].join('\n') + '\n'
  );
}

/** A self-contained HTML page: per support its map (SVG inline) and how it was made. */
export function shaftMapHtml(r: ShaftMapResult): string {
  const sections = r.supports.flatMap((s, i) => {
    let svg = mapSvg(s.map).trimEnd();
    if (i > 0) svg = svg.replace(/\n<defs>.*<\/defs>/, '');
    return [
      `<h2>${esc(`Support ${letter(i)}: ${s.name}`)}</h2>`,
      svg.replace(/^<svg /, '<svg role="img" '),
      '<h3>How the map was made</h3><ul class="small">',
      ...s.map.notes.map((n) => `<li>${esc(n)}</li>`),
      `<li>${esc(`Journal designs used: ${s.map.journal.designs.map((d) => d.label).join('; ')}.`)}</li>`,
      '</ul>',
    ];
  });
  return [
    '<!doctype html>',
    '<html lang="en"><head><meta charset="utf-8">',
    `<title>${esc(`Selection maps: ${r.title}`)}</title>`,
    '<style>body{font-family:Helvetica,Arial,sans-serif;max-width:860px;margin:24px auto;color:#111}li{margin:4px 0}.small{font-size:13px;color:#333}</style>',
    '</head><body>',
    `<h1>Where each option wins, support by support</h1><p>${esc(r.title)}: every load on the shaft scaled together by k (${r.loadScale[0]}× to ${r.loadScale[1]}×) against shaft speed.</p>`,
    `<ul class="small">${supportLines(r)
      .map((l) => `<li>${esc(l)}</li>`)
      .join('')}</ul>`,
    ...sections,
    '<p class="small">Concept-stage estimate: confirm with the supplier\'s data and by test.</p>',
    '</body></html>',
    '',
  ].join('\n');
}
