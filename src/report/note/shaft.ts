import type { PointLoad } from '../../calc/shaft/types.js';
import type { ShaftSI } from '../../case/shaft-types.js';
import type { LoadedCase } from '../../case/load.js';
import type { JournalSpeedCurves } from '../../explore/journal-curves.js';
import { describe, describeAssumption, describeWarning } from '../findings/index.js';
import {
  SUPPORT_MARKS,
  loadKind,
  loadRows,
  loadRelation,
  shaftSummaryLines,
  slopeText,
  type ShaftAdviceView,
} from '../shaft-text.js';
import { fmt, type UnitSystem } from '../units.js';
import type { Block, NoteModel, Section } from './document.js';
import { buildNote, documentControl, noteDate, type NoteOptions } from './model.js';
import { OPTION_NAMES } from './option-sections.js';
import { shaftDeflectionChart, shaftMomentChart, shaftSketchSvg } from './shaft-svg.js';

/**
 * The design-review note of a whole shaft: the shaft and its loads with a sketch, the
 * reactions with the bending moment and deflection charts, the arrangement; then each support
 * as a single-support note (its sections under the support's name), and the cautions and
 * sign-off once at the end.
 */

export interface ShaftNoteInput {
  title: string;
  shaft: ShaftSI;
  /** The loads as the statics kernel resolved them, in the order written. */
  resolved: PointLoad[];
  advice: ShaftAdviceView;
  /** Each support's single-support case as the advisor built and validated it, in support order. */
  cases: Pick<LoadedCase, 'case' | 'given' | 'assumed'>[];
  /** Each support's journal curves (see NoteOptions.journalCurves), in support order. */
  journalCurves: (JournalSpeedCurves | null)[];
}

const CLOSING = new Set(['cautions', 'signoff']);

/** A support's note sections, ids and chart ids prefixed so that two supports never share one. */
function supportSections(sections: Section[], prefix: string, name: string): Section[] {
  const block = (b: Block): Block =>
    b.kind === 'chart'
      ? {
          kind: 'chart',
          chart: {
            ...b.chart,
            id: `${prefix}-${b.chart.id}`,
            spec: b.chart.spec ? { ...b.chart.spec, id: `${prefix}-${b.chart.spec.id}` } : null,
          },
        }
      : b;
  return sections
    .filter((s) => !CLOSING.has(s.id))
    .map((s) => ({
      ...s,
      id: `${prefix}-${s.id}`,
      title: `${name}: ${s.title}`,
      pageBreak: s.pageBreak === true,
      blocks: s.blocks.map(block),
    }));
}

function shaftSection(n: ShaftNoteInput, u: UnitSystem): Section {
  const kinds = [...new Set(n.shaft.loads.map(loadKind))];
  return {
    id: 'shaft',
    title: 'Shaft and loads',
    blocks: [
      { kind: 'list', items: shaftSummaryLines(n.shaft, u).map((l) => l.trim()) },
      {
        kind: 'table',
        caption: 'Loads on the shaft as resolved: forces on the shaft, bending couples, the torque carried',
        head: ['#', 'load', 'at', 'Fy', 'Fz', 'Fx (axial)', 'My', 'Mz', 'torque'],
        numeric: [0, 2, 3, 4, 5, 6, 7, 8],
        rows: loadRows(n.resolved, u),
      },
      { kind: 'list', items: kinds.map((k) => `${k}: ${loadRelation(n.shaft.loads.find((l) => loadKind(l) === k)!)}`) },
      {
        kind: 'figure',
        id: 'shaft-sketch',
        title: 'Shaft: loads and supports',
        svg: shaftSketchSvg(n.shaft, n.resolved, u),
        caption:
          'The shaft to scale along its axis (diameters to their own scale): loads numbered as in the table, each arrow labelled with its force across the shaft √(Fy² + Fz²); supports A and B.',
      },
    ],
  };
}

function reactionsSection(a: ShaftAdviceView, u: UnitSystem): Section {
  return {
    id: 'reactions',
    title: 'Reactions, bending and slopes',
    blocks: [
      {
        kind: 'table',
        caption: 'The forces the supports exert on the shaft, and the slope of the shaft at each',
        head: ['support', 'at', 'Ry', 'Rz', 'radial', 'axial', 'slope'],
        numeric: [1, 2, 3, 4, 5],
        rows: a.supports.map((s, i) => [
          `${SUPPORT_MARKS[i]}: ${s.name}`,
          fmt(s.at, 'm', u),
          fmt(s.reaction.y, 'N', u),
          fmt(s.reaction.z, 'N', u),
          fmt(s.reaction.radial, 'N', u),
          fmt(s.reaction.axial, 'N', u),
          slopeText(s.slope),
        ]),
      },
      {
        kind: 'p',
        text: `Largest bending moment ${fmt(a.shaft.maxMoment, 'N*m', u)}; largest deflection ${fmt(a.shaft.maxDeflection, 'um', u)}.`,
      },
      { kind: 'chart', chart: shaftMomentChart(a, u) },
      { kind: 'chart', chart: shaftDeflectionChart(a, u) },
    ],
  };
}

function arrangementSection(a: ShaftAdviceView): Section {
  const blocks: Block[] = [{ kind: 'p', text: describe(a.arrangement.summary), strong: true }];
  if (a.arrangement.reasons.length) blocks.push({ kind: 'list', items: a.arrangement.reasons.map(describe) });
  if (a.assumed.length)
    blocks.push(
      { kind: 'sub', title: 'Assumed for the shaft' },
      {
        kind: 'table',
        head: ['field', 'value', 'reason'],
        rows: a.assumed.map(describeAssumption).map((x) => [x.field, x.value, x.reason]),
      },
    );
  if (a.warnings.length)
    blocks.push({ kind: 'sub', title: 'Warnings' }, { kind: 'list', items: a.warnings.map(describeWarning) });
  return { id: 'arrangement', title: 'Arrangement', blocks };
}

/** Build the whole shaft's note. */
export function buildShaftNote(n: ShaftNoteInput, opts: Omit<NoteOptions, 'journalCurves'>): NoteModel {
  const u = opts.units;
  const a = n.advice;
  const per = a.supports.map((s, i) => {
    const rec = s.advice.recommendation;
    return `${SUPPORT_MARKS[i]} (${s.name}): ${rec ? OPTION_NAMES[rec].toLowerCase() : 'none feasible'}`;
  });
  const summary = `${per.join('; ')}. ${describe(a.arrangement.summary)}`;
  const sections: Section[] = [shaftSection(n, u), reactionsSection(a, u), arrangementSection(a)];
  let closing: Section[] = [];
  a.supports.forEach((s, i) => {
    const note = buildNote(n.cases[i]! as LoadedCase, s.advice, {
      ...opts,
      journalCurves: n.journalCurves[i] ?? null,
    });
    const mark = SUPPORT_MARKS[i]!;
    sections.push(...supportSections(note.sections, `support-${mark.toLowerCase()}`, `${mark} (${s.name})`));
    closing = note.sections.filter((x) => CLOSING.has(x.id));
  });
  const date = noteDate(opts.now);
  const control = documentControl(null, n.title, date);
  return { title: n.title, date, control, units: u, summary, sections: [...sections, ...closing] };
}
