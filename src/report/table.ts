/** The width of the terminal text: every line of the text reports fits in it. */
export const WIDTH = 100;

/**
 * A plain-text table: columns padded to their widest cell; numbers right-aligned. When the
 * table is wider than `width`, the widest text columns wrap between words (a cell over several
 * lines); number columns never wrap, so a value, limit or margin is always read whole.
 */
export function table(head: string[], rows: string[][], indent = '  ', width = WIDTH): string {
  // Each column's cells, heading first.
  const cols = head.map((h, i) => [h, ...rows.map((r) => r[i] ?? '')]);
  // A number, "—" (none) or "excluded" (the ranking's score of an excluded option) right-aligns.
  const numeric = cols.map((col) => rows.length > 0 && col.every((c, k) => k === 0 || NUMERIC.test(plain(c))));
  const widths = cols.map((col) => Math.max(...col.map(len)));
  fitColumns(widths, numeric, cols, width - len(indent));
  const line = (cells: string[]) =>
    indent +
    cells
      .map((c, i) => (numeric[i] ? ' '.repeat(Math.max(0, widths[i]! - len(c))) + c : pad(c, widths[i]!)))
      .join('  ')
      .trimEnd();
  const block = (cells: string[]) => {
    const wrapped = cells.map((c, i) => (numeric[i] ? [c] : wrapWords(c, widths[i]!)));
    const n = Math.max(...wrapped.map((w) => w.length));
    return Array.from({ length: n }, (_, k) => line(wrapped.map((w) => w[k] ?? '')));
  };
  return [
    ...block(head),
    (indent + widths.map((w) => '-'.repeat(w)).join('  ')).trimEnd(),
    ...rows.flatMap((r) => block(head.map((_, i) => r[i] ?? ''))),
  ].join('\n');
}

/** A cell that right-aligns: a number (with a unit after a space), "—" or "excluded". */
const NUMERIC = /^[-+]?[\d.,]+(e[-+]?\d+)?( .*)?$|^—$|^excluded$/;

/**
 * Narrow the widest text column, one character at a time, until the row fits (or nothing can
 * give). `cols` holds each column's cells, heading first.
 */
function fitColumns(widths: number[], numeric: boolean[], cols: string[][], room: number): void {
  const total = () => widths.reduce((s, w) => s + w, 0) + 2 * (widths.length - 1);
  if (total() <= room) return;
  // A text column keeps at least 8 characters and its longest word (up to 24), so words break between them.
  const longestWord = (col: string[]) => Math.max(...col.flatMap((c) => c.split(' ')).map((w) => Math.min(24, len(w))));
  const floor = cols.map((col, i) => (numeric[i] ? widths[i]! : Math.min(widths[i]!, Math.max(8, longestWord(col)))));
  while (total() > room) {
    let widest = -1;
    for (let i = 0; i < widths.length; i++)
      if (!numeric[i] && widths[i]! > floor[i]! && (widest < 0 || widths[i]! > widths[widest]!)) widest = i;
    if (widest < 0) return;
    widths[widest]!--;
  }
}

/** Text broken between words into lines of at most `width` characters; a longer word is cut. */
export function wrapWords(text: string, width: number): string[] {
  if (len(text) <= width) return [text];
  const lines: string[] = [];
  let cur = '';
  for (const word of text.split(' ')) {
    let w = word;
    while (len(w) > width) {
      if (cur) lines.push(cur);
      cur = '';
      lines.push(w.slice(0, width));
      w = w.slice(width);
    }
    if (!cur) cur = w;
    else if (len(cur) + 1 + len(w) <= width) cur += ' ' + w;
    else {
      lines.push(cur);
      cur = w;
    }
  }
  if (cur || !lines.length) lines.push(cur);
  return lines;
}

// Width ignores ANSI colour codes so coloured and plain output line up alike.
// eslint-disable-next-line no-control-regex -- ANSI escape codes start with ESC
const strip = (s: string) => s.replace(/\u001b\[[0-9;]*m/g, '');
/** The cell without colour codes (the cell itself when it has none). */
const plain = (s: string) => (s.includes('\u001b') ? strip(s) : s);
/**
 * Printed width of a cell (colour codes left out): its code points, a surrogate pair counted
 * once as the string iterator does. Called for every word of every cell while tables are
 * fitted, so it neither allocates nor strips when there is nothing to strip.
 */
export function len(s: string): number {
  const t = plain(s);
  let n = t.length;
  if (!SURROGATE.test(t)) return n;
  for (let i = 0; i < t.length - 1; i++) {
    const c = t.charCodeAt(i);
    const d = t.charCodeAt(i + 1);
    if (c >= 0xd800 && c <= 0xdbff && d >= 0xdc00 && d <= 0xdfff) {
      n--;
      i++;
    }
  }
  return n;
}
const SURROGATE = /[\ud800-\udfff]/;
const pad = (s: string, w: number) => s + ' '.repeat(Math.max(0, w - len(s)));
