import { escapeHtml as h } from './escape.js';
import { summaryFirst, type Block, type Cell, type DocumentControl, type NoteModel } from './document.js';
import { lineChart } from './svg.js';

/**
 * The note as one self-contained HTML file: inline stylesheet, inline SVG charts, no script,
 * no external CSS, font or image, so it opens offline and archives as a single file. Every
 * model string is escaped.
 *
 * Print: portrait on A4 or Letter (the paper is the printer's; the margins and table widths
 * fit both). Numbers with their units, margins, results and citations never wrap; table rows,
 * charts and the sign-off stay whole; table headers repeat on a new page. Only the appendix
 * (the calculation sheet) starts a new page. Each page's foot carries the document number
 * and "page x of y" as CSS page-margin boxes, which Chromium-based browsers print (with the
 * browser's own "Headers and footers" option off; with it on, the browser prints its own
 * title, date and page numbers instead). Other browsers may print no page numbers.
 */

const CSS = `
:root { --ink: #1a1a1a; --rule: #b8b8b8; --soft: #f3f3f0; --pass: #1d6b3a; --fail: #a4161a; --advice: #7a5c00; }
* { box-sizing: border-box; }
body { font-family: "Helvetica Neue", Helvetica, Arial, sans-serif; color: var(--ink); margin: 0 auto; max-width: 60rem; padding: 1.5rem; line-height: 1.4; font-size: 15px; }
header.note-head { border-bottom: 3px double var(--ink); margin-bottom: 1rem; }
header.note-head h1 { font-size: 1.6rem; margin: 0 0 .25rem; }
table.control { width: auto; margin: .3rem 0 .6rem; }
table.control th { text-align: left; font-weight: normal; }
table.control td { font-weight: bold; white-space: nowrap; }
.summary { font-weight: bold; font-size: 1.05rem; padding: .5rem .75rem; border-left: 5px solid var(--ink); background: var(--soft); }
h2 { font-size: 1.25rem; border-bottom: 1px solid var(--rule); margin-top: 2rem; padding-bottom: .2rem; }
h3 { font-size: 1.02rem; margin: 1.2rem 0 .4rem; }
table { border-collapse: collapse; width: 100%; margin: .5rem 0 1rem; font-size: .85rem; table-layout: auto; }
caption { text-align: left; font-style: italic; padding: .2rem 0; }
th, td { border: 1px solid var(--rule); padding: .25rem .4rem; vertical-align: top; text-align: left; }
td:not(.num), th { overflow-wrap: anywhere; }
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
ol.refs { padding-left: 2.2rem; font-size: .85rem; }
ol.refs li { margin: .15rem 0; overflow-wrap: anywhere; }
table.signoff td { height: 2.6rem; }
table.signoff td:first-child { width: 7rem; font-weight: bold; }
footer { margin-top: 2rem; font-size: .8rem; border-top: 1px solid var(--rule); padding-top: .4rem; }
@media print {
  body { max-width: none; padding: 0; font-size: 8.5pt; line-height: 1.3; }
  header.note-head h1 { font-size: 15pt; }
  .summary { font-size: 10pt; }
  h2 { font-size: 12pt; margin-top: 1.1rem; }
  h3 { font-size: 10pt; margin: .7rem 0 .3rem; }
  table { font-size: 7pt; line-height: 1.25; margin: .3rem 0 .6rem; }
  th, td { padding: .1rem .22rem; }
  thead { display: table-header-group; }
  tr, figure, .signoff, .summary, ol.refs li { break-inside: avoid; page-break-inside: avoid; }
  h2, h3, caption { break-after: avoid; page-break-after: avoid; }
  section.page-break > h2 { break-before: page; page-break-before: always; }
  figure { margin: .5rem 0; }
  figure svg { max-width: 100%; width: 112mm; }
  figcaption { max-width: none; font-size: 7pt; }
  ol.refs { font-size: 7pt; line-height: 1.25; columns: 2; column-gap: 6mm; }
  .two-up { columns: 2; column-gap: 5mm; }
  section[id$="sheet"] table { font-size: 6.5pt; }
  .two-up caption { column-span: none; }
  table.signoff td { height: 1.8rem; }
  footer { margin-top: 1rem; font-size: 7.5pt; }
  a { color: inherit; text-decoration: none; }
}
`;

/** A CSS string literal holding plain text (quotes, backslashes and markup escaped). */
const cssString = (t: string) => `"${t.replace(/[\\"<>\n]/g, (c) => `\\${c.charCodeAt(0).toString(16)} `)}"`;

/** The printed page's foot: the document number and revision, and page x of y. */
function pageCss(c: DocumentControl): string {
  const id = cssString(`${c.number} rev. ${c.revision}`);
  return `@page { size: portrait; margin: 12mm 11mm 14mm 11mm;
  @bottom-left { content: ${id}; font: 7.5pt Helvetica, Arial, sans-serif; color: #555; }
  @bottom-right { content: "page " counter(page) " of " counter(pages); font: 7.5pt Helvetica, Arial, sans-serif; color: #555; }
}`;
}

function cell(c: Cell, numeric: boolean): string {
  const cls = numeric || typeof c !== 'string' ? ' class="num"' : '';
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
      const cols = b.widths ? `<colgroup>${b.widths.map((w) => `<col style="width:${w}%">`).join('')}</colgroup>` : '';
      const head = `${cols}<thead><tr>${b.head.map((x) => `<th scope="col">${h(x)}</th>`).join('')}</tr></thead>`;
      const rows = b.rows
        .map((r) => `<tr>${r.map((c, i) => cell(c, b.numeric?.includes(i) === true)).join('')}</tr>`)
        .join('\n');
      const table = `<table>${cap}${head}<tbody>\n${rows}\n</tbody></table>`;
      return b.twoUp ? `<div class="two-up">${table}</div>` : table;
    }
    case 'refs':
      return `<ol class="refs">${b.items.map((x) => `<li>${h(x)}</li>`).join('')}</ol>`;
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

function controlTable(n: NoteModel): string {
  const c = n.control;
  const row = (cells: [string, string][]) =>
    `<tr>${cells.map(([k, v]) => `<th scope="row">${h(k)}</th><td>${v}</td>`).join('')}</tr>`;
  return `<table class="control">${row([
    ['Document', h(c.number)],
    ['Revision', h(c.revision)],
    ['Date', `<time datetime="${h(n.date)}">${h(n.date)}</time>`],
  ])}${row([
    ['Project', h(c.project ?? '(not given)')],
    ['Units', h(n.units)],
    ['Written by', 'shaftwise'],
  ])}</table>`;
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
<title>${h(n.control.number)} rev. ${h(n.control.revision)}: design-review note: ${h(n.title)}</title>
<style>${CSS}
${pageCss(n.control)}</style>
</head>
<body>
<header class="note-head">
<h1>Design-review note: ${h(n.title)}</h1>
${controlTable(n)}
</header>
${summaryFirst(n) ? '' : `<p class="summary">${h(n.summary)}</p>\n`}${sections}
<footer>${h("Concept-stage estimate: confirm with the supplier's data and by test. Bearing failure can injure people: follow local codes, standards and licensed engineering practice.")}</footer>
</body>
</html>
`;
}
