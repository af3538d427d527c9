import { OPTIONS } from '../../core/options.js';
import { describe, describeAssumption, describeWarning } from '../findings/index.js';
import { whatItWouldTake } from '../findings/advice.js';
import { firstExclusion, scoreCell } from '../ranking.js';
import type { AdviceResult } from '../../advise/engine.js';
import type { SheetLine } from '../../core/check.js';
import type { LoadedCase } from '../../case/load.js';
import { fmt, fmtValue, type UnitSystem } from '../units.js';
import { noteCharts, shownMaterial, type NoteChart } from './charts.js';
import { designText, OPTION_NAMES, optionSection } from './option-sections.js';
import type { Block, Cell, NoteModel, Section } from './document.js';
import type { JournalSpeedCurves } from '../../explore/journal-curves.js';

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

function sheetRows(lines: SheetLine[], u: UnitSystem): Cell[][] {
  return lines.map((l) => [l.label, l.formula, l.substituted, fmt(l.value, l.unit, u), l.source]);
}

const METHODS: Record<'bushing' | 'rolling' | 'journal', string[]> = {
  bushing: [
    'Mean projected pressure P = F/(D·L), peak of the parabolic distribution 4F/(π·D·L), sliding speed π·D·N (θ·D·f when oscillating) and PV, each against the material class limits (The Tribology Handbook, 2nd ed., M. J. Neale (ed.), 1995, A4–A5; each material row names its own source).',
    'Archard-type wear at the most loaded line, depth = f_m·f_e·k·p·V·t summed over the duty points, with a low / typical / high wear factor band (Archard 1953; The Tribology Handbook A5).',
    'Every material at one common length (the longest the room allows, L/D ≤ 2), the shortest passing length beside it in closed form; chosen by its governing margin; what it needs (lubricant, medium, motion) against the case.',
    'Axial load on a flange or thrust washer of the same material: face pressure, sliding speed at the mean diameter, PV and wear life; running temperature ΔT = R·μ·P·V with R from the material’s own PV and temperature limits (The Tribology Handbook A4, from memory; advisory).',
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
    'Axial load on a fixed tapered-land pad thrust bearing solved by the same finite-difference Reynolds approach (checked against the inclined slider, Reynolds 1886), or on a rubbing bronze face where no film forms; an oil bath’s temperature from one sump heat balance.',
  ],
};

/** The duty section: each case field as the user wrote it and as the calculation read it. */
function dutySection(loaded: LoadedCase, units: UnitSystem, caseFile: string | undefined): Section {
  return {
    id: 'duty',
    title: 'Duty as understood',
    blocks: [
      {
        kind: 'p',
        text: `Case file: ${caseFile ?? '(given)'}. Each field as written in the case, and as the calculation read it (${units === 'SI' ? 'SI, with the base-unit number in brackets' : 'US customary'}); "(default)" marks a value the case did not give.`,
      },
      { kind: 'table', head: ['field', 'as given', 'as understood'], rows: dutyRows(loaded, units) },
    ],
  };
}

/** The assumptions section: each default the case loader filled in, with its reason. */
function assumptionsSection(advice: AdviceResult): Section {
  return {
    id: 'assumptions',
    title: 'Assumptions and defaults',
    blocks: advice.assumed.length
      ? [
          {
            kind: 'table',
            head: ['field', 'value', 'reason'],
            rows: advice.assumed.map(describeAssumption).map((x) => [x.field, x.value, x.reason]),
          },
        ]
      : [{ kind: 'p', text: 'None: every input was given.' }],
  };
}

/** What it would take: each failing option's verified single changes, or that none was found. */
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

/** The recommendation section: the summary, the ranking table, what would make an option feasible, warnings. */
function recommendationSection(advice: AdviceResult, units: UnitSystem, summary: string): Section {
  const blocks: Block[] = [{ kind: 'p', text: summary, strong: true }];
  const take = takeBlocks(advice);
  // With no option feasible, what it would take comes first.
  if (!advice.recommendation && take.length) blocks.push(...take);
  if (advice.tieBreak) blocks.push({ kind: 'p', text: `Tie: ${describe(advice.tieBreak)}.` });
  const anyOut = advice.ranking.some((r) => !r.feasible);
  blocks.push({
    kind: 'table',
    head: [
      'rank',
      'option',
      'score',
      'life',
      'friction power',
      'length',
      'outside diameter',
      ...(anyOut ? ['excluded because'] : []),
    ],
    numeric: [0, 2, 3, 4, 5, 6],
    rows: advice.ranking.map((r) => [
      String(r.rank),
      OPTION_NAMES[r.option],
      r.feasible ? scoreCell(r) : { text: scoreCell(r), mark: 'fail' },
      r.option === 'journal' ? (r.feasible ? 'full film: no wear life' : '—') : fmt(r.figures.lifeHours, 'h', units),
      fmt(r.figures.frictionPower, 'W', units),
      fmt(r.figures.length, 'm', units),
      fmt(r.figures.outerDiameter, 'm', units),
      ...(anyOut ? [firstExclusion(r)] : []),
    ]),
  });
  blocks.push({
    kind: 'p',
    text: 'Feasibility is decided by the checks; among feasible options the score, the sum of rule points (rules/*.json, common practice) weighted by the case priorities (priority / 3), decides the rank.',
  });
  if (advice.recommendation && take.length) blocks.push(...take);
  if (advice.warnings.length)
    blocks.push({ kind: 'sub', title: 'Warnings' }, { kind: 'list', items: advice.warnings.map(describeWarning) });
  return { id: 'recommendation', title: 'Recommendation and ranking', blocks };
}

/** The calculation sheet: every option's calculation lines, in the fixed option order. */
function sheetSection(advice: AdviceResult, units: UnitSystem): Section {
  const blocks: Block[] = [];
  for (const o of OPTIONS) {
    const lines = advice.checks[o].sheet;
    blocks.push({ kind: 'sub', title: OPTION_NAMES[o] });
    blocks.push(
      lines.length
        ? {
            kind: 'table',
            head: ['figure', 'formula', 'with values', 'result', 'source'],
            rows: sheetRows(lines, units),
          }
        : { kind: 'p', text: 'No calculation lines (nothing could be sized).' },
    );
  }
  return { id: 'sheet', title: 'Calculation sheet', pageBreak: true, blocks };
}

/** The methods section: each option's method, and every source of a limit the note's checks name. */
function methodsSection(advice: AdviceResult): Section {
  const sources = [
    ...new Set([
      ...(shownMaterial(advice)?.checks.map((k) => k.source) ?? []),
      ...advice.checks.rolling.candidates.flatMap((k) => k.checks.map((x) => x.source)),
      ...advice.checks.journal.checks.map((k) => k.source),
    ]),
  ].sort();
  return {
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
  };
}

/** The closing sections: the cautions, and the sign-off block completed by hand. */
function closingSections(): Section[] {
  return [
    { id: 'cautions', title: 'Cautions', blocks: [{ kind: 'list', items: CAUTIONS }] },
    {
      id: 'signoff',
      title: 'Sign-off',
      blocks: [
        { kind: 'p', text: 'To be completed by hand. The note is not released until it is checked and approved.' },
        { kind: 'signoff', roles: ['Prepared', 'Checked', 'Approved'] },
      ],
    },
  ];
}

/** Build the note from a loaded case and the advice on it. */
export function buildNote(loaded: LoadedCase, advice: AdviceResult, opts: NoteOptions): NoteModel {
  const units = opts.units;
  const winner = advice.ranking[0]!;
  const summary = advice.recommendation
    ? `Recommended: ${OPTION_NAMES[advice.recommendation].toLowerCase()}: ${designText(winner, units)}.`
    : 'No option is feasible for this duty as given: see what would make one feasible.';
  const charts = noteCharts(advice, loaded.case, units, opts.journalCurves);
  const chartById = (id: string): NoteChart => charts.find((ch) => ch.id === id)!;
  const sections: Section[] = [
    dutySection(loaded, units, opts.caseFile),
    assumptionsSection(advice),
    recommendationSection(advice, units, summary),
    ...advice.ranking.map((r) => optionSection(r, advice, units, chartById)),
    sheetSection(advice, units),
    methodsSection(advice),
    ...closingSections(),
  ];
  return { title: loaded.case.title, date: noteDate(opts.now), units, summary, sections };
}
