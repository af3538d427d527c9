/** A plain-text table: columns padded to their widest cell; numbers right-aligned. */
export function table(head: string[], rows: string[][], indent = '  '): string {
  const widths = head.map((h, i) => Math.max(len(h), ...rows.map((r) => len(r[i] ?? ''))));
  const numeric = head.map(
    // A number, "—" (none) or "excluded" (the ranking's score of an excluded option) right-aligns.
    (_, i) =>
      rows.length > 0 && rows.every((r) => /^[-+]?[\d.,]+(e[-+]?\d+)?( .*)?$|^—$|^excluded$/.test(strip(r[i] ?? ''))),
  );
  const line = (cells: string[]) =>
    indent +
    cells
      .map((c, i) => (numeric[i] ? ' '.repeat(widths[i]! - len(c)) + c : c + ' '.repeat(widths[i]! - len(c))))
      .join('  ')
      .trimEnd();
  return [line(head), indent + widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}

// Width ignores ANSI colour codes so coloured and plain output line up alike.
// eslint-disable-next-line no-control-regex -- ANSI escape codes start with ESC
const strip = (s: string) => s.replace(/\u001b\[[0-9;]*m/g, '');
const len = (s: string) => [...strip(s)].length;
