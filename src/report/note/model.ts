import { OPTIONS } from '../../core/options.js';
import { describe, describeAssumption, describeWarning } from '../findings/index.js';
import type { AdviceResult, RankedOption } from '../../advise/engine.js';
import type { CheckRecord, SheetLine } from '../../core/check.js';
import type { LoadedCase } from '../../case/load.js';
import { fmt, fmtValue, type UnitSystem } from '../units.js';
import { noteCharts, shownMaterial, type NoteChart } from './charts.js';
import type { JournalSpeedCurves } from '../../explore/journal-curves.js';

/**
 * The design-review note as a document model: sections of blocks (paragraphs, lists,
 * tables, charts, the sign-off block). The Markdown and HTML renderers walk the same model,
 * so both formats carry the same content; strings here are raw (unescaped) and each
 * renderer escapes them for its format.
 */

export type Mark = 'pass' | 'fail' | 'advice' | 'advice-exceeded';
export type Cell = string | { text: string; mark: Mark };

export type Block =
  | { kind: 'p'; text: string; strong?: boolean }
  | { kind: 'list'; items: string[] }
  | { kind: 'table'; head: string[]; rows: Cell[][]; caption?: string; numeric?: number[] }
  | { kind: 'sub'; title: string }
  | { kind: 'chart'; chart: NoteChart }
  | { kind: 'signoff'; roles: string[] };

export interface Section {
  id: string;
  title: string;
  /** Start the section on a new printed page. */
  pageBreak?: boolean;
  blocks: Block[];
}

export interface NoteModel {
  title: string;
  /** Date of the note, YYYY-MM-DD (UTC). */
  date: string;
  units: UnitSystem;
  summary: string;
  sections: Section[];
}

export interface NoteOptions {
  units: UnitSystem;
  /** The clock; default: SOURCE_DATE_EPOCH (seconds) when set, else the system time. */
  now?: () => Date;
  /** The case file as named by the user (shown in the note). */
  caseFile?: string;
  /**
   * The journal design against speed, for its speed charts (src/explore/journal-curves.ts);
   * null when there is no film to draw. The note draws it and computes nothing itself.
   */
  journalCurves: JournalSpeedCurves | null;
}

export const OPTION_NAMES = {
  bushing: 'Plain bushing',
  rolling: 'Rolling bearing',
  journal: 'Oil-film journal bearing',
} as const;

export const CAUTIONS = [
  "This note is a concept-stage estimate, to be confirmed with the supplier's data and by test.",
  'Bearing failure can injure people: follow local codes, standards and licensed engineering practice, and have the design checked by a qualified engineer before it is built.',
  'Material rows and criteria marked "from memory" were not read in a source: confirm them before relying on them.',
];

/** The note's date: the injected clock, else SOURCE_DATE_EPOCH (reproducible builds), else now. */
export function noteDate(now?: () => Date): string {
  let d: Date;
  if (now) d = now();
  else {
    const e = process.env['SOURCE_DATE_EPOCH'];
    d = e !== undefined && /^\d+$/.test(e.trim()) ? new Date(Number(e.trim()) * 1000) : new Date();
  }
  return d.toISOString().slice(0, 10);
}

/** SI unit of a case field, from its key (the case schema's conventions; see src/case/types.ts). */
const FIELD_UNIT: Record<string, string> = {
  diameter: 'm',
  maxLength: 'm',
  maxOuterDiameter: 'm',
  wearAllowance: 'm',
  length: 'm',
  radialClearance: 'm',
  outerDiameter: 'm',
  width: 'm',
  speed: 'rev/s',
  radial: 'N',
  axial: 'N',
  dynamicRating: 'N',
  staticRating: 'N',
  fatigueLimit: 'N',
  hours: 'h',
  inletTemperature: 'degC',
  ambient: 'degC',
  maxTemperature: 'degC',
  viscosity: 'Pa*s',
  angle: 'deg',
  frequency: 'Hz',
  maxPressure: 'Pa',
  maxVelocity: 'm/s',
  maxPV: 'Pa*m/s',
  wearFactor: 'm^2/N',
  wearFactorLow: 'm^2/N',
  wearFactorHigh: 'm^2/N',
  reliability: '%',
};

function flatten(v: unknown, path: string, out: Map<string, unknown>): void {
  if (Array.isArray(v)) v.forEach((x, i) => flatten(x, `${path}[${i}]`, out));
  else if (v !== null && typeof v === 'object')
    for (const [k, x] of Object.entries(v)) flatten(x, path ? `${path}.${k}` : k, out);
  else out.set(path, v);
}

const leafKey = (path: string) =>
  path
    .replace(/\[\d+\]$/, '')
    .split('.')
    .pop()!
    .replace(/\[\d+\]/g, '');

function siText(path: string, v: unknown, u: UnitSystem): string {
  if (typeof v !== 'number') return String(v);
  const unit = FIELD_UNIT[leafKey(path)];
  if (unit === 'deg') return `${fmtValue((v * 180) / Math.PI, 'deg', u)}° (${fmtValue(v, '1', u)} rad)`;
  if (unit === 'Hz' || unit === '%') return `${fmtValue(v, '1', u)} ${unit}`;
  if (!unit) return fmtValue(v, '1', u);
  const shown = fmt(v, unit, u);
  return u === 'SI' && unit !== 'h' && unit !== 'degC'
    ? `${shown} (${fmtValue(v, '1', u)} ${unit.replace('*', '·')})`
    : shown;
}

function dutyRows(loaded: LoadedCase, u: UnitSystem): Cell[][] {
  const si = new Map<string, unknown>();
  const given = new Map<string, unknown>();
  flatten(loaded.case, '', si);
  flatten(loaded.given, '', given);
  const rows: Cell[][] = [];
  // Keys the SI case holds under another name than the case file.
  const givenAs: Record<string, string> = { 'lubrication.oilGrade': 'lubrication.oil' };
  for (const [path, v] of si) {
    if (path === 'title') continue;
    const g = given.get(path) ?? (givenAs[path] ? given.get(givenAs[path]) : undefined);
    rows.push([path, g === undefined ? '(default)' : String(g), siText(path, v, u)]);
  }
  // Fields the user wrote that the SI case holds under another shape (e.g. "oil: ISO VG 68").
  const renamed = new Set(Object.values(givenAs));
  for (const [path, g] of given)
    if (!si.has(path) && path !== 'title' && !renamed.has(path))
      rows.push([path, String(g), 'read as described under Assumptions']);
  return rows;
}

const pct = (m: number) => `${m >= 0 ? '+' : ''}${(m * 100).toFixed(0)} %`;

function checkRows(checks: CheckRecord[], u: UnitSystem): Cell[][] {
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
      k.source,
    ];
  });
}
const CHECK_HEAD = ['check', 'value', 'limit', 'margin', 'result', 'source of the limit'];

function designText(r: RankedOption, u: UnitSystem): string {
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

function reasonText(x: RankedOption['reasons'][number]): string {
  const w = x.priority ? ` (${x.basePoints} × ${x.weight} for the ${x.priority} priority)` : '';
  return `${x.points > 0 ? '+' : '−'}${Math.abs(x.points).toFixed(2)}: ${x.because}${w} [rule ${x.rule}, ${x.file}]`;
}

/** Why an option lost: its exclusions, failed checks, and the points that separate it from the winner. */
function whyLost(r: RankedOption, winner: RankedOption, a: AdviceResult, u: UnitSystem): string[] {
  const out: string[] = [];
  if (!r.feasible) {
    for (const e of r.excluded) out.push(`Excluded: ${describe(e)}`);
    for (const k of r.failed)
      out.push(
        `Fails: ${k.label}: ${fmt(k.value, k.unit, u)} against ${k.sense === 'max' ? '≤' : '≥'} ${fmt(k.limit, k.unit, u)} (margin ${pct(k.margin)}; ${k.source}).`,
      );
    return out;
  }
  if (r === winner) return out;
  out.push(
    `Feasible, but scores ${r.score.toFixed(2)} against ${winner.score.toFixed(2)} for the ${OPTION_NAMES[winner.option].toLowerCase()}.`,
  );
  if (a.tieBreak && r.score === winner.score) out.push(`Tie: ${describe(a.tieBreak)}.`);
  const cons = r.reasons.filter((x) => x.points < 0);
  if (cons.length) out.push(...cons.map((x) => `Counts against it: ${reasonText(x)}`));
  return out;
}

function sheetRows(lines: SheetLine[], u: UnitSystem): Cell[][] {
  return lines.map((l) => [l.label, l.formula, l.substituted, fmt(l.value, l.unit, u), l.source]);
}

const METHODS: Record<'bushing' | 'rolling' | 'journal', string[]> = {
  bushing: [
    'Mean projected pressure P = F/(D·L), peak of the parabolic distribution 4F/(π·D·L), sliding speed π·D·N (θ·D·f when oscillating) and PV, each against the material class limits (The Tribology Handbook, 2nd ed., M. J. Neale (ed.), 1995, A4–A5; each material row names its own source).',
    'Archard-type wear at the most loaded line, depth = f_m·f_e·k·p·V·t summed over the duty points, with a low / typical / high wear factor band (Archard 1953; The Tribology Handbook A5).',
    'Shortest length meeting pressure, PV and wear life in closed form; frictional heat f·F·V with a one-node temperature rise (common practice, advisory); length/diameter 0.5–2 (common practice, advisory).',
  ],
  rolling: [
    'Basic rating life L10 = (C/P)^p, p = 3 ball, 10/3 roller; L10h = 10^6·L10/(60·n) (ISO 281:2007).',
    'Dynamic equivalent load with X and Y and the duty-spectrum mean; modified life a1·a_ISO·L10h with a_ISO from the viscosity ratio κ and the contamination factor e_C (ISO 281:2007).',
    'Static safety s0 = C0/P0 (ISO 76); basic ratings estimated from internal geometry where no supplier value is given (ISO 281 / ISO 76); boundary dimensions (ISO 15).',
  ],
  journal: [
    'Reynolds equation for a finite, full 360° bearing solved by finite differences with the Reynolds (Swift–Stieber) cavitation condition; load matched for the eccentricity ratio; friction, flow, side leakage and peak pressure (checked against Raimondi & Boyd 1958, ASLE Trans. 1(1)).',
    'Adiabatic thermal balance with an effective film temperature and the Walther (ASTM D341) viscosity–temperature law for ISO VG oils; Petroff friction for the light-load limit.',
    'Design criteria for minimum film thickness, maximum temperature and start-up unit load (Trumpler 1966, from memory); design ranges of L/D and clearance ratio (common practice).',
  ],
};

/** Build the note from a loaded case and the advice on it. */
export function buildNote(loaded: LoadedCase, a: AdviceResult, opts: NoteOptions): NoteModel {
  const u = opts.units;
  const c = loaded.case;
  const winner = a.ranking[0]!;
  const summary = a.recommendation
    ? `Recommended: ${OPTION_NAMES[a.recommendation].toLowerCase()}: ${designText(winner, u)}.`
    : 'No option is feasible for this duty as given: see what would make one feasible.';
  const charts = noteCharts(a, c, u, opts.journalCurves);
  const chartFor = (id: string) => charts.find((ch) => ch.id === id)!;

  const sections: Section[] = [];
  sections.push({
    id: 'duty',
    title: 'Duty as understood',
    blocks: [
      {
        kind: 'p',
        text: `Case file: ${opts.caseFile ?? '(given)'}. Each field as written in the case, and as the calculation read it (${u === 'SI' ? 'SI, with the base-unit number in brackets' : 'US customary'}); "(default)" marks a value the case did not give.`,
      },
      { kind: 'table', head: ['field', 'as given', 'as understood'], rows: dutyRows(loaded, u) },
    ],
  });
  sections.push({
    id: 'assumptions',
    title: 'Assumptions and defaults',
    blocks: a.assumed.length
      ? [
          {
            kind: 'table',
            head: ['field', 'value', 'reason'],
            rows: a.assumed.map(describeAssumption).map((x) => [x.field, x.value, x.reason]),
          },
        ]
      : [{ kind: 'p', text: 'None: every input was given.' }],
  });

  const rec: Block[] = [{ kind: 'p', text: summary, strong: true }];
  if (a.tieBreak) rec.push({ kind: 'p', text: `Tie: ${describe(a.tieBreak)}.` });
  rec.push({
    kind: 'table',
    head: ['rank', 'option', 'feasible', 'score', 'life', 'friction power', 'length', 'outside diameter'],
    numeric: [0, 3, 4, 5, 6, 7],
    rows: a.ranking.map((r) => [
      String(r.rank),
      OPTION_NAMES[r.option],
      r.feasible ? { text: 'yes', mark: 'pass' } : { text: 'NO', mark: 'fail' },
      r.score.toFixed(2),
      r.option === 'journal' ? (r.feasible ? 'full film: no wear life' : '—') : fmt(r.figures.lifeHours, 'h', u),
      fmt(r.figures.frictionPower, 'W', u),
      fmt(r.figures.length, 'm', u),
      fmt(r.figures.outerDiameter, 'm', u),
    ]),
  });
  rec.push({
    kind: 'p',
    text: 'Feasibility is decided by the checks; among feasible options the score, the sum of rule points (rules/*.json, common practice) weighted by the case priorities (priority / 3), decides the rank.',
  });
  if (a.toMakeFeasible.length)
    rec.push(
      { kind: 'sub', title: 'What would make an option feasible' },
      { kind: 'list', items: a.toMakeFeasible.map(describe) },
    );
  if (a.warnings.length)
    rec.push({ kind: 'sub', title: 'Warnings' }, { kind: 'list', items: a.warnings.map(describeWarning) });
  sections.push({ id: 'recommendation', title: 'Recommendation and ranking', blocks: rec });

  for (const r of a.ranking) {
    const blocks: Block[] = [
      {
        kind: 'p',
        text: `Rank ${r.rank}${r.feasible ? '' : ', not feasible'}. Design found${r.feasible ? '' : ' (nearest miss)'}: ${designText(r, u)}.`,
      },
    ];
    if (r.option === 'bushing') {
      const m = shownMaterial(a);
      blocks.push({ kind: 'sub', title: 'Checks' });
      if (m)
        blocks.push({
          kind: 'table',
          head: CHECK_HEAD,
          rows: checkRows(m.checks, u),
          caption: `Checks of ${m.name} at ${fmt(m.length, 'm', u)} long`,
        });
      blocks.push({ kind: 'sub', title: 'Every material class checked' });
      blocks.push({
        kind: 'table',
        head: [
          'material',
          'length',
          'mean pressure',
          'PV',
          'wear life (short – typical – long)',
          'feasible',
          'failing checks',
        ],
        rows: a.checks.bushing.materials.map((x) => [
          `${x.name} (${x.id})`,
          fmt(x.length, 'm', u),
          fmt(x.pressure, 'Pa', u),
          fmt(x.pv, 'Pa*m/s', u),
          `${fmt(x.lifeBand.short, 'h', u)} – ${fmt(x.lifeBand.typical, 'h', u)} – ${fmt(x.lifeBand.long, 'h', u)}`,
          x.feasible ? { text: 'yes', mark: 'pass' } : { text: 'NO', mark: 'fail' },
          x.checks
            .filter((k) => !k.pass && !k.advisory)
            .map((k) => k.label)
            .join('; ') || '—',
        ]),
      });
      blocks.push({ kind: 'p', text: describe(a.checks.bushing.bestReason) });
      blocks.push({ kind: 'chart', chart: chartFor('bushing-wear') });
    } else if (r.option === 'rolling') {
      const ro = a.checks.rolling;
      const k = ro.candidates.find((x) => x.id === r.design['bearing']);
      blocks.push({ kind: 'sub', title: 'Checks' });
      if (k)
        blocks.push({
          kind: 'table',
          head: CHECK_HEAD,
          rows: checkRows(k.checks, u),
          caption: `Checks of ${k.designation}`,
        });
      blocks.push({ kind: 'sub', title: 'Every candidate checked' });
      blocks.push({
        kind: 'table',
        head: ['bearing', 'C', 'C0', 'P', 'L10h', 'L10mh', 's0', 'feasible'],
        rows: ro.candidates.map((x) => [
          `${x.designation} (${x.id})`,
          fmt(x.dynamicRating, 'N', u),
          fmt(x.staticRating, 'N', u),
          fmt(x.equivalentLoad, 'N', u),
          fmt(x.L10h, 'h', u),
          fmt(x.L10mh, 'h', u),
          x.s0 === null ? '—' : fmtValue(x.s0, '1', u),
          x.feasible ? { text: 'yes', mark: 'pass' } : { text: 'NO', mark: 'fail' },
        ]),
      });
      blocks.push({ kind: 'chart', chart: chartFor('rolling-life') });
    } else {
      const j = a.checks.journal;
      blocks.push({ kind: 'sub', title: 'Checks' });
      blocks.push({
        kind: 'table',
        head: CHECK_HEAD,
        rows: checkRows(j.checks, u),
        caption: 'Checks of the chosen journal design',
      });
      blocks.push({
        kind: 'p',
        text: `Operating state at the governing point: eccentricity ratio ${fmtValue(j.eccentricityRatio, '1', u)}, minimum film ${fmt(j.minFilmThickness, 'm', u)}, attitude angle ${fmtValue(j.attitudeAngle, 'deg', u)}°, friction coefficient ${fmtValue(j.frictionCoefficient, '1', u)}, power loss ${fmt(j.powerLoss, 'W', u)}, flow ${fmt(j.flow, 'm^3/s', u)}, effective temperature ${fmt(j.effectiveTemperature, 'degC', u)}; ${j.sweep.length} designs were compared in the sweep of length, clearance and oil grade.`,
      });
      blocks.push(
        { kind: 'chart', chart: chartFor('journal-film') },
        { kind: 'chart', chart: chartFor('journal-temperature') },
        { kind: 'chart', chart: chartFor('journal-pressure') },
      );
    }
    const pro = r.reasons.filter((x) => x.points > 0);
    const con = r.reasons.filter((x) => x.points < 0);
    if (pro.length || con.length)
      blocks.push(
        { kind: 'sub', title: 'Points for and against' },
        { kind: 'list', items: [...pro, ...con].map(reasonText) },
      );
    const lost = whyLost(r, winner, a, u);
    if (r !== winner || !r.feasible)
      blocks.push(
        { kind: 'sub', title: 'Why it lost' },
        lost.length ? { kind: 'list', items: lost } : { kind: 'p', text: 'It ranks below the options above.' },
      );
    sections.push({ id: `option-${r.option}`, title: `${r.rank}. ${OPTION_NAMES[r.option]}`, pageBreak: true, blocks });
  }

  const sheet: Block[] = [];
  for (const o of OPTIONS) {
    const lines = a.checks[o].sheet;
    sheet.push({ kind: 'sub', title: OPTION_NAMES[o] });
    sheet.push(
      lines.length
        ? { kind: 'table', head: ['figure', 'formula', 'with values', 'result', 'source'], rows: sheetRows(lines, u) }
        : { kind: 'p', text: 'No calculation lines (nothing could be sized).' },
    );
  }
  sections.push({ id: 'sheet', title: 'Calculation sheet', pageBreak: true, blocks: sheet });

  const sources = [
    ...new Set([
      ...(shownMaterial(a)?.checks.map((k) => k.source) ?? []),
      ...a.checks.rolling.candidates.flatMap((k) => k.checks.map((x) => x.source)),
      ...a.checks.journal.checks.map((k) => k.source),
    ]),
  ].sort();
  sections.push({
    id: 'methods',
    title: 'Methods and references',
    blocks: [
      ...OPTIONS.flatMap((o): Block[] => [
        { kind: 'sub', title: OPTION_NAMES[o] },
        { kind: 'list', items: METHODS[o] },
      ]),
      { kind: 'sub', title: 'Sources of the limits in this note' },
      { kind: 'list', items: sources },
    ],
  });
  sections.push({ id: 'cautions', title: 'Cautions', blocks: [{ kind: 'list', items: CAUTIONS }] });
  sections.push({
    id: 'signoff',
    title: 'Sign-off',
    blocks: [
      { kind: 'p', text: 'To be completed by hand. The note is not released until it is checked and approved.' },
      { kind: 'signoff', roles: ['Prepared', 'Checked', 'Approved'] },
    ],
  });
  return { title: c.title, date: noteDate(opts.now), units: u, summary, sections };
}
