import { escapeHtml as h } from './escape.js';
import type { Block, Cell, NoteModel } from './document.js';
import { lineChart } from './svg.js';

/**
 * The note as one self-contained HTML file: inline stylesheet, inline SVG charts, no script,
 * no external CSS, font or image, so it opens offline and archives as a single file. Every
 * model string is escaped. The print stylesheet suits A4 and Letter alike (the page size is
 * left to the printer; margins fit both), keeps table rows and charts whole, repeats table
 * headers on a new page and starts each option and the calculation sheet on a new page.
 */

const CSS = `
:root { --ink: #1a1a1a; --rule: #b8b8b8; --soft: #f3f3f0; --pass: #1d6b3a; --fail: #a4161a; --advice: #7a5c00; }
* { box-sizing: border-box; }
body { font-family: "Helvetica Neue", Helvetica, Arial, sans-serif; color: var(--ink); margin: 0 auto; max-width: 60rem; padding: 1.5rem; line-height: 1.4; font-size: 15px; }
header.note-head { border-bottom: 3px double var(--ink); margin-bottom: 1rem; }
header.note-head h1 { font-size: 1.6rem; margin: 0 0 .25rem; }
header.note-head p { margin: .2rem 0; }
.summary { font-weight: bold; font-size: 1.05rem; padding: .5rem .75rem; border-left: 5px solid var(--ink); background: var(--soft); }
h2 { font-size: 1.25rem; border-bottom: 1px solid var(--rule); margin-top: 2rem; padding-bottom: .2rem; }
h3 { font-size: 1.02rem; margin: 1.2rem 0 .4rem; }
table { border-collapse: collapse; width: 100%; margin: .5rem 0 1rem; font-size: .85rem; }
caption { text-align: left; font-style: italic; padding: .2rem 0; }
th, td { border: 1px solid var(--rule); padding: .25rem .4rem; vertical-align: top; text-align: left; overflow-wrap: anywhere; }
th { background: var(--soft); }
td.num { text-align: right; white-space: nowrap; }
.mark-pass { color: var(--pass); font-weight: bold; }
.mark-fail { color: var(--fail); font-weight: bold; text-decoration: underline; }
.mark-advice, .mark-advice-exceeded { color: var(--advice); font-style: italic; }
.mark-advice-exceeded { font-weight: bold; }
figure { margin: 1rem 0; }
figure svg { display: block; max-width: 42rem; height: auto; border: 1px solid var(--rule); }
figcaption { font-size: .85rem; margin-top: .3rem; max-width: 42rem; }
.no-chart { font-style: italic; }
table.signoff td { height: 2.6rem; }
table.signoff td:first-child { width: 7rem; font-weight: bold; }
footer { margin-top: 2rem; font-size: .8rem; border-top: 1px solid var(--rule); padding-top: .4rem; }
@page { margin: 16mm 14mm 18mm 14mm; }
@media print {
  body { max-width: none; padding: 0; font-size: 10pt; }
  table { font-size: 8.5pt; }
  thead { display: table-header-group; }
  tr, figure, .signoff, .summary { break-inside: avoid; page-break-inside: avoid; }
  h2, h3 { break-after: avoid; page-break-after: avoid; }
  section.page-break > h2 { break-before: page; page-break-before: always; }
  figure svg { max-width: 100%; }
  a { color: inherit; text-decoration: none; }
}
`;

function cell(c: Cell, numeric: boolean): string {
  const cls = numeric ? ' class="num"' : '';
  if (typeof c === 'string') return `<td${cls}>${h(c)}</td>`;
  return `<td${cls}><span class="mark-${c.mark}">${h(c.text)}</span></td>`;
}

function block(b: Block): string {
  switch (b.kind) {
    case 'p':
      return b.strong ? `<p><strong>${h(b.text)}</strong></p>` : `<p>${h(b.text)}</p>`;
    case 'sub':
      return `<h3>${h(b.title)}</h3>`;
    case 'list':
      return `<ul>${b.items.map((x) => `<li>${h(x)}</li>`).join('')}</ul>`;
    case 'table': {
      const cap = b.caption ? `<caption>${h(b.caption)}</caption>` : '';
      const head = `<thead><tr>${b.head.map((x) => `<th scope="col">${h(x)}</th>`).join('')}</tr></thead>`;
      const rows = b.rows
        .map((r) => `<tr>${r.map((c, i) => cell(c, b.numeric?.includes(i) === true)).join('')}</tr>`)
        .join('\n');
      return `<table>${cap}${head}<tbody>\n${rows}\n</tbody></table>`;
    }
    case 'chart':
      return b.chart.spec
        ? `<figure class="chart-figure" data-chart="${h(b.chart.id)}">${lineChart(b.chart.spec)}<figcaption>${h(b.chart.caption)}</figcaption></figure>`
        : `<p class="no-chart" data-chart="${h(b.chart.id)}">${h(b.chart.caption)}</p>`;
    case 'figure':
      return `<figure class="chart-figure" data-chart="${h(b.id)}">${b.svg}<figcaption>${h(b.caption)}</figcaption></figure>`;
    case 'signoff':
      return `<table class="signoff"><thead><tr><th scope="col">role</th><th scope="col">name</th><th scope="col">signature</th><th scope="col">date</th></tr></thead><tbody>${b.roles
        .map((r) => `<tr><td>${h(r)}</td><td></td><td></td><td></td></tr>`)
        .join('')}</tbody></table>`;
  }
}

export function renderHtml(n: NoteModel): string {
  const sections = n.sections
    .map(
      (s) =>
        `<section id="${h(s.id)}"${s.pageBreak ? ' class="page-break"' : ''}>\n<h2>${h(s.title)}</h2>\n${s.blocks.map(block).join('\n')}\n</section>`,
    )
    .join('\n');
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>Design-review note: ${h(n.title)}</title>
<style>${CSS}</style>
</head>
<body>
<header class="note-head">
<h1>Design-review note: ${h(n.title)}</h1>
<p>Date: <time datetime="${h(n.date)}">${h(n.date)}</time> · Units: ${h(n.units)} · Written by shaftwise</p>
</header>
<p class="summary">${h(n.summary)}</p>
${sections}
<footer>${h("Concept-stage estimate: confirm with the supplier's data and by test. Bearing failure can injure people: follow local codes, standards and licensed engineering practice.")}</footer>
</body>
</html>
`;
}
