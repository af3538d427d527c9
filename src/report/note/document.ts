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
  | { kind: 'table'; head: string[]; rows: Cell[][]; caption?: string; numeric?: number[] }
  | { kind: 'sub'; title: string }
  | { kind: 'chart'; chart: NoteChart }
  /** A drawing our own code wrote as SVG (the shaft sketch), with its caption. */
  | { kind: 'figure'; id: string; title: string; svg: string; caption: string }
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
