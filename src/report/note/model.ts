import { OPTIONS } from '../../core/options.js';
import { describeAssumption } from '../findings/index.js';
import type { AdviceResult } from '../../advise/engine.js';
import type { SheetLine } from '../../core/check.js';
import type { LoadedCase } from '../../case/load.js';
import { fmt, fmtValue, type UnitSystem } from '../units.js';
import { noteCharts, type NoteChart } from './charts.js';
import { designText, OPTION_NAMES, optionSection } from './option-sections.js';
import type { Block, Cell, DocumentControl, NoteModel, Section } from './document.js';
import { References } from './references.js';
import { summarySection } from './summary.js';
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

/** A short stable hash of a text (FNV-1a, 32 bit), as four upper-case hex digits. */
function shortHash(text: string): string {
  let x = 0x811c9dc5;
  for (const ch of text) x = Math.imul(x ^ ch.codePointAt(0)!, 0x01000193) >>> 0;
  return ((x ^ (x >>> 16)) & 0xffff).toString(16).toUpperCase().padStart(4, '0');
}

/**
 * Document control of a note: the case's `document` key (number, revision, project) where
 * given, else a number derived from the date and the title ("SW-20240305-3F2A": the same case
 * on the same day gives the same number) and revision A.
 */
export function documentControl(given: unknown, title: string, date: string): DocumentControl {
  const doc =
    given !== null && typeof given === 'object'
      ? (given as { document?: Record<string, unknown> }).document
      : undefined;
  const str = (k: string) => (typeof doc?.[k] === 'string' ? (doc[k] as string) : null);
  return {
    number: str('number') ?? `SW-${date.replace(/-/g, '')}-${shortHash(title)}`,
    revision: str('revision') ?? 'A',
    project: str('project'),
  };
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
  const plain = `${fmtValue(v, '1', u)} ${unit.replace('*', '·')}`;
  // The SI number beside the display, once: not for zero ("0 kN (0 N)") nor when both read the same.
  return u === 'SI' && unit !== 'h' && unit !== 'degC' && v !== 0 && plain !== shown ? `${shown} (${plain})` : shown;
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
    if (path === 'title' || path.startsWith('document.')) continue;
    const g = given.get(path) ?? (givenAs[path] ? given.get(givenAs[path]) : undefined);
    rows.push([path, g === undefined ? '(default)' : String(g), siText(path, v, u)]);
  }
  // Fields the user wrote that the SI case holds under another shape (e.g. "oil: ISO VG 68").
  const renamed = new Set(Object.values(givenAs));
  for (const [path, g] of given)
    if (!si.has(path) && path !== 'title' && !path.startsWith('document.') && !renamed.has(path))
      rows.push([path, String(g), 'read as described under Assumptions']);
  return rows;
}

function sheetRows(lines: SheetLine[], u: UnitSystem, refs: References): Cell[][] {
  return lines.map((l) => [l.label, l.formula, l.substituted, fmt(l.value, l.unit, u), refs.cite(l.source)]);
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
      {
        kind: 'table',
        head: ['field', 'as given', 'as understood'],
        widths: [36, 28, 36],
        twoUp: true,
        rows: dutyRows(loaded, units),
      },
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
            widths: [18, 17, 65],
            rows: advice.assumed.map(describeAssumption).map((x) => [x.field, x.value, x.reason]),
          },
        ]
      : [{ kind: 'p', text: 'None: every input was given.' }],
  };
}

/** The calculation sheet, an appendix: every option's calculation lines, in the fixed option order. */
function sheetSection(advice: AdviceResult, units: UnitSystem, refs: References): Section {
  const blocks: Block[] = [];
  for (const o of OPTIONS) {
    const lines = advice.checks[o].sheet;
    blocks.push({ kind: 'sub', title: OPTION_NAMES[o] });
    blocks.push(
      lines.length
        ? {
            kind: 'table',
            head: ['figure', 'formula', 'with values', 'result', 'source'],
            numeric: [3, 4],
            widths: [22, 26, 32, 13, 7],
            rows: sheetRows(lines, units, refs),
          }
        : { kind: 'p', text: 'No calculation lines (nothing could be sized).' },
    );
  }
  return { id: 'sheet', title: 'Appendix: calculation sheet', blocks };
}

/** The methods section: each option's method in words. */
function methodsSection(): Section {
  return {
    id: 'methods',
    title: 'Methods',
    blocks: OPTIONS.flatMap((o): Block[] => [
      { kind: 'sub', title: OPTION_NAMES[o] },
      { kind: 'list', items: METHODS[o] },
    ]),
  };
}

/** The numbered list of every source cited in the note's tables, each once with its marks. */
function referencesSection(refs: References): Section {
  return {
    id: 'references',
    title: 'References',
    blocks: [
      {
        kind: 'p',
        text: 'Cited as [n] in the check tables and the calculation sheet. Each entry says how its figures were obtained: "seen" (read in that source), "from memory" (recalled, to be confirmed) or "common practice" (a rule of thumb).',
      },
      { kind: 'refs', items: refs.list() },
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
  const refs = new References();
  const options = advice.ranking.map((r) => optionSection(r, advice, units, chartById, refs));
  // The sheet is built before the list is read, so that its citations are numbered too.
  const sheet = sheetSection(advice, units, refs);
  const sections: Section[] = [
    summarySection(advice, units, summary),
    dutySection(loaded, units, opts.caseFile),
    assumptionsSection(advice),
    ...options,
    methodsSection(),
    referencesSection(refs),
    ...closingSections(),
    sheet,
  ];
  const date = noteDate(opts.now);
  const control = documentControl(loaded.given, loaded.case.title, date);
  return { title: loaded.case.title, date, control, units, summary, sections };
}
