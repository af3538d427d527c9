import { escapeMd } from './escape.js';
import { summaryFirst, type Block, type Cell, type NoteModel } from './document.js';

/**
 * The note as GitHub-flavoured Markdown: headings, pipe tables, lists. Charts are not drawn
 * in Markdown (common viewers do not render inline SVG); each chart is named with its
 * caption and a pointer to the HTML note, which carries them. Every model string is escaped.
 */
export function renderMarkdown(n: NoteModel): string {
  const out: string[] = [
    `# Design-review note: ${escapeMd(n.title)}`,
    '',
    `Document ${escapeMd(n.control.number)} · revision ${escapeMd(n.control.revision)} · project ${escapeMd(n.control.project ?? '(not given)')}`,
    '',
    `Date: ${n.date} · Units: ${n.units} · Written by shaftwise`,
    '',
    ...(summaryFirst(n) ? [] : [`**${escapeMd(n.summary)}**`, '']),
  ];
  for (const s of n.sections) {
    out.push(`## ${escapeMd(s.title)}`, '');
    for (const b of s.blocks) out.push(block(b), '');
  }
  return (
    out
      .join('\n')
      .replace(/\n{3,}/g, '\n\n')
      .trimEnd() + '\n'
  );
}

const cellText = (c: Cell) => escapeMd(typeof c === 'string' ? c : c.text);

function block(b: Block): string {
  switch (b.kind) {
    case 'p':
      return b.strong ? `**${escapeMd(b.text)}**` : escapeMd(b.text);
    case 'sub':
      return `### ${escapeMd(b.title)}`;
    case 'list':
      return b.items.map((x) => `- ${escapeMd(x)}`).join('\n');
    case 'table': {
      const head = `| ${b.head.map(escapeMd).join(' | ')} |`;
      const rule = `| ${b.head.map((_, i) => (b.numeric?.includes(i) ? '---:' : '---')).join(' | ')} |`;
      const rows = b.rows.map((r) => `| ${r.map(cellText).join(' | ')} |`);
      return [...(b.caption ? [`*${escapeMd(b.caption)}*`, ''] : []), head, rule, ...rows].join('\n');
    }
    case 'refs':
      return b.items.map((x, i) => `${i + 1}. ${escapeMd(x)}`).join('\n');
    case 'chart':
      return `> **Chart: ${escapeMd(b.chart.spec?.title ?? b.chart.id)}** (drawn in the HTML note: \`--format html\`). ${escapeMd(b.chart.caption)}`;
    case 'figure':
      return `> **Figure: ${escapeMd(b.title)}** (drawn in the HTML note: \`--format html\`). ${escapeMd(b.caption)}`;
    case 'signoff':
      return [
        '| role | name | signature | date |',
        '| --- | --- | --- | --- |',
        ...b.roles.map((r) => `| ${escapeMd(r)} | &nbsp; | &nbsp; | &nbsp; |`),
      ].join('\n');
  }
}
