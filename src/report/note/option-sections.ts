import { describe } from '../findings/index.js';
import { kindLeads } from '../rolling-text.js';
import type { AdviceResult, RankedOption } from '../../advise/engine.js';
import type { CheckRecord } from '../../core/check.js';
import { fmt, fmtValue, type UnitSystem } from '../units.js';
import { shownMaterial, type NoteChart } from './charts.js';
import type { Block, Cell, Mark, Section } from './document.js';
import type { References } from './references.js';

/**
 * The note's section for each option (its design, its checks, what was compared, the points
 * for and against it and why it lost), and the option texts the rest of the note shares: the
 * option's display name and the one-line description of the design found.
 */

export const OPTION_NAMES = {
  bushing: 'Plain bushing',
  rolling: 'Rolling bearing',
  journal: 'Oil-film journal bearing',
} as const;

/** A chart of the note, by its stable id. */
export type ChartById = (id: string) => NoteChart;

export const pct = (m: number) => `${m >= 0 ? '+' : ''}${(m * 100).toFixed(0)} %`;

function checkRows(checks: CheckRecord[], u: UnitSystem, refs: References): Cell[][] {
  return checks.map((k) => {
    const adv = k.advisory === true;
    const mark: Mark = adv ? (k.pass ? 'advice' : 'advice-exceeded') : k.pass ? 'pass' : 'fail';
    const label = { pass: 'pass', fail: 'FAIL', advice: 'advice: ok', 'advice-exceeded': 'advice: exceeded' }[mark];
    return [
      k.label,
      fmt(k.value, k.unit, u),
      `${k.sense === 'max' ? '≤' : '≥'} ${fmt(k.limit, k.unit, u)}`,
      pct(k.margin),
      { text: label, mark },
      refs.cite(k.source),
    ];
  });
}

/** A check table: the label wraps, every number, the result and the citation stay on one line. */
function checkTable(checks: CheckRecord[], u: UnitSystem, refs: References, caption: string): Block {
  return {
    kind: 'table',
    head: ['check', 'value', 'limit', 'margin', 'result', 'source'],
    numeric: [1, 2, 3, 4, 5],
    widths: [38, 15, 17, 9, 13, 8],
    rows: checkRows(checks, u, refs),
    caption,
  };
}

/** The checks the note shows for an option: the chosen material, bearing or journal design. */
export function optionChecks(r: RankedOption, a: AdviceResult): CheckRecord[] {
  switch (r.option) {
    case 'bushing':
      return shownMaterial(a)?.checks ?? [];
    case 'rolling':
      return a.checks.rolling.candidates.find((x) => x.id === r.design['bearing'])?.checks ?? [];
    case 'journal':
      return a.checks.journal.checks;
  }
}

/** The design an option found, in one line (also the note's summary of the winner). */
export function designText(r: RankedOption, u: UnitSystem): string {
  const d = r.design;
  const m = (k: string) => (typeof d[k] === 'number' ? fmt(d[k] as number, 'm', u) : '—');
  switch (r.option) {
    case 'bushing':
      return d['material']
        ? `${d['name']} (${d['material']}), ${m('length')} long, outside diameter ${m('outerDiameter')}`
        : 'no material could be sized';
    case 'rolling':
      return d['bearing']
        ? `${d['designation']} (${d['bearing']}), ${m('bore')} bore × ${m('outerDiameter')} outside × ${m('width')} wide, basic dynamic load rating C ${fmt(d['dynamicRating'] as number, 'N', u)} (${d['ratingSource']})`
        : 'no candidate bearing';
    case 'journal':
      return `${m('length')} long (L/D ${fmtValue(d['lengthToDiameter'] as number, '1', u)}), radial clearance ${fmt(d['radialClearance'] as number, 'm', u)}, ${d['oil']}`;
  }
}

function reasonText(reason: RankedOption['reasons'][number]): string {
  const w = reason.priority ? ` (${reason.basePoints} × ${reason.weight} for the ${reason.priority} priority)` : '';
  return `${reason.points > 0 ? '+' : '−'}${Math.abs(reason.points).toFixed(2)}: ${reason.because}${w} (rule ${reason.rule}, ${reason.file})`;
}

/** Why an option lost: its exclusions, failed checks, and the points that separate it from the winner. */
function whyLost(r: RankedOption, winner: RankedOption, a: AdviceResult, u: UnitSystem, refs: References): string[] {
  const out: string[] = [];
  if (!r.feasible) {
    for (const e of r.excluded) out.push(`Excluded: ${describe(e)}`);
    for (const k of r.failed)
      out.push(
        `Fails: ${k.label}: ${fmt(k.value, k.unit, u)} against ${k.sense === 'max' ? '≤' : '≥'} ${fmt(k.limit, k.unit, u)} (margin ${pct(k.margin)}) ${refs.cite(k.source)}.`,
      );
    return out;
  }
  if (r === winner) return out;
  out.push(
    `Feasible, but scores ${r.score.toFixed(2)} against ${winner.score.toFixed(2)} for the ${OPTION_NAMES[winner.option].toLowerCase()}.`,
  );
  if (a.tieBreak && r.score === winner.score) out.push(`Tie: ${a.tieBreak}.`);
  const cons = r.reasons.filter((x) => x.points < 0);
  if (cons.length) out.push(...cons.map((x) => `Counts against it: ${reasonText(x)}`));
  return out;
}

/** The bushing's checks, every material class the kernel checked, and the wear chart. */
function bushingBlocks(advice: AdviceResult, units: UnitSystem, chartById: ChartById, refs: References): Block[] {
  const blocks: Block[] = [];
  const shown = shownMaterial(advice);
  blocks.push({ kind: 'sub', title: 'Checks' });
  if (shown)
    blocks.push(
      checkTable(shown.checks, units, refs, `Checks of ${shown.name} at ${fmt(shown.length, 'm', units)} long`),
    );
  blocks.push({ kind: 'sub', title: 'Every material class checked' });
  blocks.push({
    kind: 'table',
    head: [
      'material',
      'needs',
      'length',
      'shortest passing',
      'mean pressure',
      'PV',
      'wear life, short',
      'typical',
      'long',
      'feasible',
      'failing checks',
    ],
    numeric: [2, 3, 4, 5, 6, 7, 8],
    widths: [16, 9, 6, 7, 7, 10, 6, 6, 7, 6, 20],
    rows: advice.checks.bushing.materials.map((x) => [
      `${x.name} (${x.id})`,
      x.needs,
      fmt(x.length, 'm', units),
      fmt(x.minLength, 'm', units),
      fmt(x.pressure, 'Pa', units),
      fmt(x.pv, 'Pa*m/s', units),
      fmt(x.lifeBand.short, 'h', units),
      fmt(x.lifeBand.typical, 'h', units),
      fmt(x.lifeBand.long, 'h', units),
      x.feasible ? { text: 'yes', mark: 'pass' } : { text: 'NO', mark: 'fail' },
      x.checks
        .filter((k) => !k.pass && !k.advisory)
        .map((k) => k.label)
        .join('; ') || '—',
    ]),
  });
  if (shown?.thrust)
    blocks.push({
      kind: 'p',
      text: `Axial load on a flange or thrust washer of ${shown.name}, ${fmt(shown.thrust.face.inner, 'm', units)} / ${fmt(shown.thrust.face.outer, 'm', units)}, ${fmt(shown.thrust.thickness, 'm', units)} thick (taken from the axial space): face pressure ${fmt(shown.thrust.pressure, 'Pa', units)}, PV ${fmt(shown.thrust.pv, 'Pa*m/s', units)}, wear life ${fmt(shown.thrust.lifeHours, 'h', units)}; its checks are in the table above.`,
    });
  blocks.push({ kind: 'p', text: describe(advice.checks.bushing.bestReason) });
  blocks.push({ kind: 'chart', chart: chartById('bushing-wear') });
  return blocks;
}

/** The chosen bearing's checks, every candidate the kernel checked, and the life chart. */
function rollingBlocks(
  ranked: RankedOption,
  advice: AdviceResult,
  units: UnitSystem,
  chartById: ChartById,
  refs: References,
): Block[] {
  const blocks: Block[] = [];
  const rolling = advice.checks.rolling;
  const chosen = rolling.candidates.find((x) => x.id === ranked.design['bearing']);
  blocks.push({ kind: 'sub', title: 'Checks' });
  if (chosen) blocks.push(checkTable(chosen.checks, units, refs, `Checks of ${chosen.designation}`));
  if (rolling.choice) blocks.push({ kind: 'p', text: describe(rolling.choice) });
  blocks.push({ kind: 'sub', title: 'Each kind checked' });
  const perKind = kindLeads(rolling);
  blocks.push({
    kind: 'table',
    head: ['bearing', 'C', 'C0', 'P', 'L10h', 'L10mh', 's0', 'feasible'],
    numeric: [1, 2, 3, 4, 5, 6],
    caption: `${rolling.candidates.length} candidates of ${rolling.kinds.length} kinds fit the space; each kind's choice, or its nearest miss, is shown`,
    rows: perKind.map((x) => [
      `${x.designation} (${x.id})`,
      fmt(x.dynamicRating, 'N', units),
      fmt(x.staticRating, 'N', units),
      fmt(x.equivalentLoad, 'N', units),
      fmt(x.L10h, 'h', units),
      fmt(x.L10mh, 'h', units),
      x.s0 === null ? '—' : fmtValue(x.s0, '1', units),
      x.feasible ? { text: 'yes', mark: 'pass' } : { text: 'NO', mark: 'fail' },
    ]),
  });
  blocks.push({ kind: 'chart', chart: chartById('rolling-life') });
  return blocks;
}

/** The journal design's checks, its operating state at the governing point, and its charts. */
function journalBlocks(advice: AdviceResult, units: UnitSystem, chartById: ChartById, refs: References): Block[] {
  const j = advice.checks.journal;
  return [
    { kind: 'sub', title: 'Checks' },
    checkTable(j.checks, units, refs, 'Checks of the chosen journal design'),
    {
      kind: 'p',
      text: `Operating state at the governing point: eccentricity ratio ${fmtValue(j.eccentricityRatio, '1', units)}, minimum film ${fmt(j.minFilmThickness, 'm', units)}, attitude angle ${fmtValue(j.attitudeAngle, 'deg', units)}°, friction coefficient ${fmtValue(j.frictionCoefficient, '1', units)}, power loss ${fmt(j.powerLoss, 'W', units)}, flow ${fmt(j.flow, 'm^3/s', units)}, effective temperature ${fmt(j.effectiveTemperature, 'degC', units)}; ${j.sweep.length} designs were compared in the sweep of length, clearance and oil grade.`,
    },
    { kind: 'chart', chart: chartById('journal-film') },
    { kind: 'chart', chart: chartById('journal-temperature') },
    { kind: 'chart', chart: chartById('journal-pressure') },
  ];
}

/** The rule points for and against an option, and, below the winner or when infeasible, why it lost. */
function standingBlocks(ranked: RankedOption, advice: AdviceResult, units: UnitSystem, refs: References): Block[] {
  const blocks: Block[] = [];
  const winner = advice.ranking[0]!;
  const pro = ranked.reasons.filter((x) => x.points > 0);
  const con = ranked.reasons.filter((x) => x.points < 0);
  if (pro.length || con.length)
    blocks.push(
      { kind: 'sub', title: 'Points for and against' },
      { kind: 'list', items: [...pro, ...con].map(reasonText) },
    );
  const lost = whyLost(ranked, winner, advice, units, refs);
  if (ranked !== winner || !ranked.feasible)
    blocks.push(
      { kind: 'sub', title: 'Why it lost' },
      lost.length ? { kind: 'list', items: lost } : { kind: 'p', text: 'It ranks below the options above.' },
    );
  return blocks;
}

/** One option's section of the note (no forced page break: the print flows on). */
export function optionSection(
  ranked: RankedOption,
  advice: AdviceResult,
  units: UnitSystem,
  chartById: ChartById,
  refs: References,
): Section {
  const blocks: Block[] = [
    {
      kind: 'p',
      text: `Rank ${ranked.rank}${ranked.feasible ? '' : ', not feasible'}. Design found${ranked.feasible ? '' : ' (nearest miss)'}: ${designText(ranked, units)}.`,
    },
  ];
  if (ranked.option === 'bushing') blocks.push(...bushingBlocks(advice, units, chartById, refs));
  else if (ranked.option === 'rolling') blocks.push(...rollingBlocks(ranked, advice, units, chartById, refs));
  else blocks.push(...journalBlocks(advice, units, chartById, refs));
  blocks.push(...standingBlocks(ranked, advice, units, refs));
  return { id: `option-${ranked.option}`, title: `${ranked.rank}. ${OPTION_NAMES[ranked.option]}`, blocks };
}
