import type { CheckRecord } from '../core/check.js';
import type { Assumption } from '../case/types.js';
import type { AssumedFinding, Remark } from '../core/finding.js';
import { describe, describeAssumption } from './findings/index.js';
import { fmt, type UnitSystem } from './units.js';
import { WIDTH, len, table, wrapWords } from './table.js';

/** The few styles the reports use; the marks and words read the same without them. */
interface Painter {
  bold: (s: string) => string;
  green: (s: string) => string;
  yellow: (s: string) => string;
  red: { bold: (s: string) => string };
}
const plainText = (s: string) => s;
const PLAIN: Painter = { bold: plainText, green: plainText, yellow: plainText, red: { bold: plainText } };

/** Plain until useColour() finds a terminal; reports call it synchronously either way. */
export let paint: Painter = PLAIN;

/**
 * Colour only on a terminal and never under NO_COLOR. chalk is loaded only then, so piped
 * and scripted runs (and the start-up benchmark) do not pay for it.
 */
export async function useColour(stream: { isTTY?: boolean } = process.stdout): Promise<void> {
  const noColour = process.env.NO_COLOR !== undefined && process.env.NO_COLOR !== '';
  if (noColour || !stream.isTTY) {
    paint = PLAIN;
    return;
  }
  const { Chalk } = await import('chalk');
  paint = new Chalk({ level: 1 });
}

export const CAUTION =
  "Concept-stage estimate: confirm with the supplier's data and by test. Bearing failure can injure people: " +
  'follow local codes, standards and licensed engineering practice.';

export const mark = (pass: boolean, advice = false): string =>
  pass ? paint.green('ok  ') : advice ? paint.yellow('note') : paint.red.bold('FAIL');

export function heading(text: string): string {
  return paint.bold(text) + '\n' + '='.repeat(text.length);
}

/**
 * A table of check records: mark, check, value, limit, margin, source. `rowSource`, when given,
 * is a data row's source printed once below: checks citing it say so instead of repeating it.
 * `cite`, when given, turns a source into its number in a list printed elsewhere ("[3]").
 */
export function checksTable(
  checks: CheckRecord[],
  units: UnitSystem,
  rowSource?: string,
  cite?: (source: string) => string,
): string {
  return table(
    ['', 'check', 'value', 'limit', 'margin', cite ? 'source' : 'limit from'],
    checks.map((k) => [
      mark(k.pass, k.advisory),
      k.label,
      fmt(k.value, k.unit, units),
      `${k.sense === 'max' ? '≤' : '≥'} ${fmt(k.limit, k.unit, units)}`,
      `${k.margin >= 0 ? '+' : ''}${(k.margin * 100).toFixed(0)} %`,
      rowSource && k.source.startsWith(rowSource)
        ? 'material data, below' + (k.source.length > rowSource.length ? ' + heat model' : '')
        : cite
          ? cite(k.source)
          : shorten(k.source, 48),
    ]),
  );
}

/** Sources numbered in the order first cited: `cite` gives "[n]", `list` the numbered list. */
export class SourceList {
  private readonly order = new Map<string, number>();
  readonly cite = (source: string): string => {
    let n = this.order.get(source);
    if (n === undefined) this.order.set(source, (n = this.order.size + 1));
    return `[${n}]`;
  };
  get size(): number {
    return this.order.size;
  }
  list(): string {
    if (!this.order.size) return '';
    return ['Sources:', ...[...this.order].map(([s, n]) => `  [${n}] ${s}`)].join('\n');
  }
}

/**
 * Every line of `text` within `width` columns: a longer line breaks between words and its
 * continuation lines start under the text after the line's own indent and marker
 * ("  - ", "  ! ", "  + 1.33  ", "  [4] ", "  (b) ", "  excluded: "), so a list reads as a list.
 */
export function fitWidth(text: string, width = WIDTH): string {
  return text
    .split('\n')
    .flatMap((line) => {
      if (len(line) <= width) return [line];
      const lead = /^(\s*(?:[-!*+−] (?:[\d.]+ {2})?|\[\d+\] |\([a-z\d]+\) |\d+\. |[a-z ]{1,20}: )?)/.exec(line)![1]!;
      const hang = len(lead) <= width / 2 ? len(lead) : 4;
      const body = wrapWords(line.slice(lead.length), width - hang);
      return body.map((b, i) => (i === 0 ? lead : ' '.repeat(hang)) + b);
    })
    .join('\n');
}

export function assumptionsBlock(assumed: readonly (Assumption | AssumedFinding)[]): string {
  if (!assumed.length) return '';
  // One line per field and value: a value two kernels assume alike (the grease base oil) is said once.
  const seen = new Set<string>();
  const lines = assumed.map(describeAssumption).filter((a) => {
    const key = `${a.field}=${a.value.replace(/\s*\([^)]*\)/g, '').trim()}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
  return 'Assumed:\n' + lines.map((a) => `  - ${a.field} = ${a.value}: ${a.reason}`).join('\n');
}

export function warningsBlock(warnings: readonly Remark[], worded: (w: Remark) => string = describe): string {
  if (!warnings.length) return '';
  return 'Warnings:\n' + warnings.map((w) => `  ! ${worded(w)}`).join('\n');
}

export function shorten(s: string, n: number): string {
  return s.length <= n ? s : s.slice(0, n - 1) + '…';
}
