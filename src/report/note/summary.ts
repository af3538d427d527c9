import { governingCheck } from '../../core/check.js';
import type { AdviceResult, RankedOption } from '../../advise/engine.js';
import { describe, describeWarning } from '../findings/index.js';
import { whatItWouldTake } from '../findings/advice.js';
import { scoreCell } from '../ranking.js';
import { fmt, type UnitSystem } from '../units.js';
import type { Block, Cell, Section } from './document.js';
import { OPTION_NAMES, optionChecks, pct } from './option-sections.js';

/**
 * The note's first section: each option in one row (feasible or not, the check that governs
 * it and its margin, life, friction power, size, and the two or three things that decided),
 * then the recommendation, what it would take to make an option feasible, and the warnings.
 */

/** The two or three things that decided an option's place, in words. */
export function decidingReasons(r: RankedOption, a: AdviceResult, u: UnitSystem): string[] {
  if (!r.feasible) {
    const out = r.failed
      .slice(0, 2)
      .map(
        (k) =>
          `${k.label}: ${fmt(k.value, k.unit, u)} against ${k.sense === 'max' ? '≤' : '≥'} ${fmt(k.limit, k.unit, u)}`,
      );
    for (const e of r.excluded) {
      const text = describe(e);
      // An exclusion that restates a failing check already listed adds nothing.
      const restates = r.failed
        .slice(0, 2)
        .some((k) => text.toLowerCase().startsWith(`fails: ${k.label.toLowerCase()}`));
      if (out.length >= 3 || restates) continue;
      out.push(text);
    }
    return out.length ? out : ['its check found no feasible design'];
  }
  const strongest = [...r.reasons]
    .filter((x) => x.points !== 0)
    .sort((x, y) => Math.abs(y.points) - Math.abs(x.points))
    .slice(0, r === a.ranking[0] ? 3 : 2)
    .map((x) => `${x.points > 0 ? '+' : '−'}${Math.abs(x.points).toFixed(2)}: ${x.because}`);
  return strongest.length ? strongest : ['no rule scored it'];
}

/** What would make an option feasible (each change verified by re-running the advice). */
function takeBlocks(advice: AdviceResult): Block[] {
  const take = whatItWouldTake(advice);
  if (!take.length) return [];
  return [
    { kind: 'sub', title: 'What it would take' },
    {
      kind: 'p',
      text: 'Each change alone, set in the case file, makes the option feasible: verified by re-running the advice on the changed case.',
    },
    { kind: 'list', items: take.map(describe) },
  ];
}

/** The summary section, first in the note. */
export function summarySection(advice: AdviceResult, units: UnitSystem, recommendation: string): Section {
  const rows: Cell[][] = advice.ranking.map((r) => {
    const gov = governingCheck(optionChecks(r, advice));
    const len = r.figures.length;
    const od = r.figures.outerDiameter;
    return [
      `${r.rank}. ${OPTION_NAMES[r.option]}`,
      r.feasible ? { text: 'yes', mark: 'pass' } : { text: 'NO', mark: 'fail' },
      scoreCell(r),
      gov ? gov.label : '—',
      gov ? { text: pct(gov.margin), mark: gov.pass ? 'pass' : 'fail' } : '—',
      r.option === 'journal' ? (r.feasible ? 'full film' : '—') : fmt(r.figures.lifeHours, 'h', units),
      fmt(r.figures.frictionPower, 'W', units),
      len === null && od === null ? '—' : `${fmt(len, 'm', units)} × ${fmt(od, 'm', units)}`,
    ];
  });
  const blocks: Block[] = [
    {
      kind: 'table',
      caption:
        'Each option at a glance. Margin: how far the governing (tightest) check is inside its limit (negative: beyond it); size: length × outside diameter.',
      head: ['option', 'feasible', 'score', 'governing check', 'margin', 'life', 'friction power', 'size'],
      numeric: [2, 4, 5, 6, 7],
      widths: [20, 8, 7, 24, 8, 11, 9, 13],
      rows,
    },
    { kind: 'sub', title: 'What decided' },
    {
      kind: 'list',
      items: advice.ranking.map(
        (r) =>
          `${OPTION_NAMES[r.option]}: ${decidingReasons(r, advice, units)
            .map((x) => x.replace(/\.+$/, ''))
            .join('; ')}.`,
      ),
    },
    { kind: 'p', text: recommendation, strong: true },
    {
      kind: 'p',
      text: 'Feasibility is decided by the checks; among feasible options the score, the sum of rule points (common practice) weighted by the case priorities (priority / 3), decides the rank.',
    },
  ];
  blocks.push(...takeBlocks(advice));
  if (advice.tieBreak) blocks.push({ kind: 'p', text: `Tie: ${describe(advice.tieBreak)}.` });
  if (advice.warnings.length)
    blocks.push({ kind: 'sub', title: 'Warnings' }, { kind: 'list', items: advice.warnings.map(describeWarning) });
  return { id: 'recommendation', title: 'Summary and recommendation', blocks };
}
