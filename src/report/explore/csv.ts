import type { BatchRow } from '../../explore/batch.js';

/** One CSV field per RFC 4180: quoted when it holds a comma, a quote, CR or LF; quotes doubled. */
export function csvField(v: string | number | boolean | null): string {
  const s = v === null ? '' : String(v);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Rows as CSV text, CRLF line ends (RFC 4180), a header row first. */
export function csv(head: string[], rows: (string | number | boolean | null)[][]): string {
  return [head, ...rows].map((r) => r.map(csvField).join(',')).join('\r\n') + '\r\n';
}

export const BATCH_HEAD = [
  'file',
  'title',
  'result',
  'recommendation',
  'score',
  'life_h',
  'design',
  'bushing_feasible',
  'rolling_feasible',
  'journal_feasible',
  'error',
];

const n = (x: number | null, digits = 4) => (x === null || !Number.isFinite(x) ? null : Number(x.toPrecision(digits)));

/** The batch summary: one row per case file; life in hours (empty for a journal bearing, which has no wear or fatigue life). */
export function batchCsv(rows: BatchRow[]): string {
  return csv(
    BATCH_HEAD,
    rows.map((r) => [
      r.file,
      r.title,
      r.result,
      r.recommendation,
      n(r.score),
      n(r.lifeHours),
      r.design,
      r.feasible.bushing,
      r.feasible.rolling,
      r.feasible.journal,
      r.error,
    ]),
  );
}
