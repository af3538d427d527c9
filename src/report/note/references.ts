/**
 * The note's numbered reference list. A check or a calculation line names its source as one
 * string, often several works joined by "; " (a method, then the source of each figure). The
 * note cites each part by number ("[2, 5]") and lists every part once, in the order first
 * cited, so a source's marks (seen, from memory, common practice) are read once, in its list
 * entry, instead of on every row that uses it.
 */

/** Split a source string at top-level "; " (never inside brackets). */
export function sourceParts(source: string): string[] {
  const out: string[] = [];
  let depth = 0;
  let start = 0;
  for (let i = 0; i < source.length; i++) {
    const c = source[i];
    if (c === '(' || c === '[') depth++;
    else if ((c === ')' || c === ']') && depth > 0) depth--;
    else if (c === ';' && depth === 0) {
      out.push(source.slice(start, i));
      start = i + 1;
    }
  }
  out.push(source.slice(start));
  return out.map((s) => s.trim()).filter((s) => s.length > 0);
}

/** A part that names a source of its own (a year 1800–2099, a standard, a mark); other parts continue the one before. */
const STANDALONE = /\b(?:1[89]|20)\d\d\b|\bISO\b|ASTM|common practice|from memory|\bseen\b|the case|definition/i;

/**
 * The works a source string names: its top-level parts, each part that does not name a source
 * of its own joined to the part before it.
 */
export function sourceEntries(source: string): string[] {
  const out: string[] = [];
  for (const p of sourceParts(source)) {
    if (out.length && !STANDALONE.test(p)) out[out.length - 1] += `; ${p}`;
    else out.push(p);
  }
  return out;
}

export class References {
  private readonly index = new Map<string, number>();
  private readonly entries: string[] = [];

  /** The citation of a source: its parts' numbers, "[1, 4]"; "—" for no source. */
  cite(source: string | undefined | null): string {
    if (!source) return '—';
    const nums = sourceEntries(source).map((whole) => {
      // "wear factor: <a source already listed>" cites that entry.
      const bare = /^[\w ]{1,24}: (.+)$/s.exec(whole)?.[1];
      const p = bare !== undefined && this.index.has(bare) ? bare : whole;
      let n = this.index.get(p);
      if (n === undefined) {
        this.entries.push(p);
        n = this.entries.length;
        this.index.set(p, n);
      }
      return n;
    });
    return `[${[...new Set(nums)].sort((a, b) => a - b).join(', ')}]`;
  }

  /** Every entry in citation order; entry n − 1 is reference [n]. */
  list(): string[] {
    return [...this.entries];
  }
}
