import { describe } from './findings/index.js';
import { whatItWouldTake } from './findings/advice.js';
import type { AdviceResult, RankedOption } from '../advise/engine.js';
import type { CheckRecord, SheetLine } from '../core/check.js';
import { fmt, type UnitSystem } from './units.js';
import { table } from './table.js';
import { SourceList, checksTable, heading, paint, shorten } from './text.js';
import { firstExclusion, scoreCell } from './ranking.js';

const NAMES = { bushing: 'Plain bushing', rolling: 'Rolling bearing', journal: 'Journal bearing' } as const;

function designLine(r: RankedOption, units: UnitSystem): string {
  const d = r.design;
  const mm = (k: string) => (typeof d[k] === 'number' ? fmt(d[k] as number, 'm', units) : '—');
  switch (r.option) {
    case 'bushing':
      return d.material ? `${d.name} (${d.material}), ${mm('length')} long, OD ${mm('outerDiameter')}` : 'no material';
    case 'rolling':
      return d.bearing
        ? `${d.designation} (${d.bearing}), ${mm('bore')} × ${mm('outerDiameter')} × ${mm('width')}, C ${fmt(d.dynamicRating as number, 'N', units)} (${d.ratingSource})`
        : 'no candidate';
    case 'journal':
      return `${mm('length')} long (L/D ${(d.lengthToDiameter as number).toFixed(2)}), radial clearance ${fmt(d.radialClearance as number, 'm', units)}, ${d.oil}`;
  }
}

/** Every check of the option's chosen design (the material, bearing or journal design the ranking shows). */
function chosenChecks(a: AdviceResult, option: RankedOption['option']): CheckRecord[] {
  switch (option) {
    case 'bushing': {
      const b = a.checks.bushing;
      return b.materials.find((m) => m.id === b.best)?.checks ?? [];
    }
    case 'rolling': {
      const r = a.checks.rolling;
      return r.candidates.find((k) => k.id === r.best)?.checks ?? [];
    }
    case 'journal':
      return a.checks.journal.checks;
  }
}

/** The advice for a person: recommendation, ranking, reasons for and against, failed checks. */
export function adviceText(a: AdviceResult, units: UnitSystem, explain = false): string {
  const out: string[] = [heading('Advice')];
  out.push(
    a.recommendation
      ? paint.bold(`Recommended: ${NAMES[a.recommendation].toLowerCase()} — ${designLine(a.ranking[0]!, units)}.`)
      : paint.bold('No option is feasible for this duty as given.'),
  );
  const take = whatItWouldTake(a).map((f) => `  - ${describe(f)}.`);
  if (!a.recommendation && take.length)
    out.push('What it would take (each change alone, verified by re-running):', ...take);
  if (a.tieBreak) out.push(`Tie: ${describe(a.tieBreak)}.`);
  if (a.recommendation === 'rolling' && a.checks.rolling.choice)
    out.push(`Why this kind: ${describe(a.checks.rolling.choice)}.`);
  const anyOut = a.ranking.some((r) => !r.feasible);
  out.push(
    table(
      ['rank', 'option', 'score', 'life', 'friction', 'length', 'OD', ...(anyOut ? ['excluded because'] : [])],
      a.ranking.map((r) => [
        String(r.rank),
        r.option,
        scoreCell(r),
        r.option === 'journal' ? (r.feasible ? 'full film: no wear limit' : '—') : fmt(r.figures.lifeHours, 'h', units),
        fmt(r.figures.frictionPower, 'W', units),
        fmt(r.figures.length, 'm', units),
        fmt(r.figures.outerDiameter, 'm', units),
        ...(anyOut ? [explain ? firstExclusion(r) : shorten(firstExclusion(r), 35)] : []),
      ]),
    ),
  );
  // Sources are cited by number in the check tables and listed once after the ranking.
  const sources = new SourceList();
  const weighted = (x: RankedOption['reasons'][number]) =>
    `${Math.abs(x.points).toFixed(2)}  ${x.because}${x.priority ? ` (×${x.weight} for ${x.priority} priority)` : ''}`;
  for (const r of a.ranking) {
    out.push(`\n${paint.bold(`${r.rank}. ${NAMES[r.option]}`)} — ${designLine(r, units)}`);
    for (const x of r.reasons.filter((x) => x.points > 0)) out.push(`  + ${weighted(x)}`);
    for (const x of r.reasons.filter((x) => x.points < 0)) out.push(`  − ${weighted(x)}`);
    if (r.feasible && r.option === a.recommendation) {
      // The recommended design's own checks, every one, ahead of the other options' failures.
      const checks = chosenChecks(a, r.option);
      if (checks.length) out.push(checksTable(checks, units, undefined, sources.cite));
    }
    if (!r.feasible) {
      for (const e of r.excluded) out.push(`  excluded: ${describe(e)}`);
      if (r.failed.length) out.push(checksTable(r.failed, units, undefined, sources.cite));
    }
  }
  if (sources.size) out.push('\n' + sources.list());
  if (a.recommendation && take.length)
    out.push('\nWhat it would take (each change alone, verified by re-running):', ...take);
  out.push(
    '\nScores are the sum of rule points (rules/*.json, common practice), weighted by the case priorities (priority/3); the checks decide feasibility.',
  );
  if (explain) out.push(explainText(a, units));
  return out.join('\n');
}

/** --explain: every rule evaluated with the fact values it saw, and each check's calculation sheet. */
export function explainText(a: AdviceResult, units: UnitSystem): string {
  const out: string[] = ['\n' + heading('Rules evaluated')];
  out.push(
    table(
      ['fired', 'rule', 'event', 'conditions (fact value seen)'],
      a.rules.map((r) => [
        r.fired ? 'yes' : 'no',
        `${r.rule} (${r.file.replace('rules/', '')})`,
        r.event.type === 'exclude'
          ? `exclude ${r.event.option}`
          : `${r.event.points > 0 ? '+' : ''}${r.event.points} ${r.event.option}${r.event.priority ? ` ×${r.event.priority}` : ''}`,
        r.conditions
          .map(
            (c) =>
              `${c.fact}${c.path ? c.path.slice(1) : ''} ${c.operator} ${JSON.stringify(c.value)} [saw ${c.factResult === undefined ? 'not evaluated' : shorten(JSON.stringify(c.factResult), 24)}${c.result === undefined ? '' : c.result ? ': true' : ': false'}]`,
          )
          .join('; '),
      ]),
    ),
  );
  out.push('\n' + heading('Calculation sheet'));
  const sheets: [string, SheetLine[]][] = [
    ['Plain bushing', a.checks.bushing.sheet],
    ['Rolling bearing', a.checks.rolling.sheet],
    ['Journal bearing', a.checks.journal.sheet],
  ];
  for (const [name, lines] of sheets) {
    out.push(`\n${paint.bold(name)}`);
    for (const l of lines)
      out.push(
        `  ${l.label}: ${l.formula}\n      ${l.substituted} = ${fmt(l.value, l.unit, units, 4)}   [${l.source}]`,
      );
  }
  return out.join('\n');
}
