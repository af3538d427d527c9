import type { UnitSystem } from '../units.js';
import type { NoteChart } from './charts.js';

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
  /**
   * A table. `numeric` columns are right-aligned and never wrap (a number with its unit, a
   * margin, a citation); `widths` are suggested column widths in percent of the table.
   */
  | {
      kind: 'table';
      head: string[];
      rows: Cell[][];
      caption?: string;
      numeric?: number[];
      widths?: number[];
      /** A long, narrow table that prints in two columns side by side (HTML print only). */
      twoUp?: boolean;
    }
  /** The numbered reference list; entry i is cited as [i + 1]. */
  | { kind: 'refs'; items: string[] }
  | { kind: 'sub'; title: string }
  | { kind: 'chart'; chart: NoteChart }
  /** A drawing our own code wrote as SVG (the shaft sketch), with its caption. */
  | { kind: 'figure'; id: string; title: string; svg: string; caption: string }
  | { kind: 'signoff'; roles: string[] };

export interface Section {
  id: string;
  title: string;
  /** Start the section on a new printed page (the single note forces none: no near-empty pages). */
  pageBreak?: boolean;
  blocks: Block[];
}

/** Document control: what identifies this note and its issue. */
export interface DocumentControl {
  /** The case's document.number, else derived from the title and the date. */
  number: string;
  revision: string;
  /** The case's document.project, else null. */
  project: string | null;
}

export interface NoteModel {
  title: string;
  /** Date of the note, YYYY-MM-DD (UTC). */
  date: string;
  control: DocumentControl;
  units: UnitSystem;
  summary: string;
  sections: Section[];
}

/** A note that opens with its summary section states the recommendation there, not again above it. */
export const summaryFirst = (n: NoteModel): boolean => n.sections[0]?.id === 'recommendation';
