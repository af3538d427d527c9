import { isDeepStrictEqual } from 'node:util';
import { isMap, isScalar, parseDocument, stringify, type Document, type Pair, type YAMLMap } from 'yaml';

/**
 * Set one key of a YAML text by splicing the text itself, so everything else in the file —
 * comments, blank lines, indentation, quoting, flow mappings, long lines — stays byte for
 * byte as the person wrote it. The yaml package's parsed document gives the place (each
 * node's source range); only the value, or the new `key: value` line, is written.
 *
 * Every splice is checked by parsing the result: it must hold exactly the old data with the
 * one key set. A shape the splice does not handle (a scalar where a mapping belongs, a
 * sequence on the path, a document the parser complains about) falls back to the yaml
 * document's own edit (`setIn`, then `toString`), which keeps comments but may re-indent.
 */
export function setInText(text: string, path: readonly string[], value: string | number): string {
  const doc = parseDocument(text);
  const expected = withValue(doc, path, value);
  if (doc.errors.length === 0) {
    const spliced = splice(text, doc, path, value);
    if (spliced !== undefined && holds(spliced, expected)) return spliced;
  }
  for (let i = 1; i < path.length; i++) {
    const node = doc.getIn(path.slice(0, i), true);
    // A scalar where a mapping belongs (hand-edited "shaft: 40") gives way to the mapping.
    if (node !== undefined && !isMap(node)) doc.setIn(path.slice(0, i), doc.createNode({}));
  }
  doc.setIn(path, value);
  return doc.toString({ lineWidth: 0 });
}

/** The document's plain data with `path` set to `value`: what the edited text must hold. */
function withValue(doc: Document, path: readonly string[], value: string | number): unknown {
  const d = doc.clone();
  if (d.contents === null) d.contents = d.createNode({}) as never;
  for (let i = 1; i < path.length; i++) {
    const node = d.getIn(path.slice(0, i), true);
    if (node !== undefined && !isMap(node)) d.setIn(path.slice(0, i), d.createNode({}));
  }
  d.setIn(path, value);
  return d.toJS({ maxAliasCount: 50 });
}

function holds(text: string, expected: unknown): boolean {
  const d = parseDocument(text);
  return d.errors.length === 0 && isDeepStrictEqual(d.toJS({ maxAliasCount: 50 }), expected);
}

function splice(text: string, doc: Document, path: readonly string[], value: string | number): string | undefined {
  let node: unknown = doc.contents;
  if (node === null) return appendAtEnd(text, block(path, 0, 2, value));
  for (let i = 0; i < path.length; i++) {
    if (!isMap(node)) return undefined;
    const map = node as YAMLMap;
    const pair = map.items.find((p) => isScalar(p.key) && p.key.value === path[i]) as Pair | undefined;
    if (!pair) return insertInto(text, doc, map, path.slice(i), value);
    if (i === path.length - 1) return replaceValue(text, pair, value, map.flow === true);
    node = pair.value;
  }
  return undefined;
}

/** The existing value of `pair` replaced, in the quoting style it had. */
function replaceValue(text: string, pair: Pair, value: string | number, inFlow: boolean): string | undefined {
  const v = pair.value;
  if (!isScalar(v) || !v.range) return undefined;
  const [start, end] = v.range;
  let out = scalarText(value, inFlow, v.type);
  if (start === end && text[start - 1] === ':') out = ' ' + out; // "speed:" with nothing after it
  return text.slice(0, start) + out + text.slice(end);
}

/** `rest` (the keys missing under `map`, then the value) added as the map's last entry. */
function insertInto(
  text: string,
  doc: Document,
  map: YAMLMap,
  rest: readonly string[],
  value: string | number,
): string | undefined {
  if (!map.range) return undefined;
  if (map.flow) {
    const close = text.lastIndexOf('}', map.range[1]);
    if (close < map.range[0]) return undefined;
    let at = close;
    while (at > map.range[0] && /[ \t]/.test(text[at - 1]!)) at--;
    const entry = flowEntry(rest, value);
    const piece = map.items.length ? `, ${entry}` : ` ${entry} `;
    return text.slice(0, at) + piece + text.slice(at);
  }
  const first = map.items[0]?.key as { range?: [number, number, number] } | undefined;
  if (!first?.range) return undefined;
  const indent = first.range[0] - (text.lastIndexOf('\n', first.range[0] - 1) + 1);
  const lines = block(rest, indent, indentUnit(text, doc), value);
  // The map's text ends on its last value; the new lines start on the line after it.
  const end = map.range[1];
  const nl = text.indexOf('\n', end > 0 && text[end - 1] === '\n' ? end - 1 : end);
  const at = nl === -1 ? text.length : nl + 1;
  const before = text.slice(0, at);
  return (before === '' || before.endsWith('\n') ? before : before + '\n') + lines + text.slice(at);
}

function appendAtEnd(text: string, lines: string): string {
  return text === '' || text.endsWith('\n') ? text + lines : text + '\n' + lines;
}

/** Block lines for keys `rest` ending in the value, the first at `indent` columns. */
function block(rest: readonly string[], indent: number, unit: number, value: string | number): string {
  return rest
    .map((k, j) => {
      const pad = ' '.repeat(indent + j * unit);
      return j === rest.length - 1 ? `${pad}${k}: ${scalarText(value, false)}\n` : `${pad}${k}:\n`;
    })
    .join('');
}

function flowEntry(rest: readonly string[], value: string | number): string {
  const [k, ...more] = rest;
  return more.length ? `${k}: { ${flowEntry(more, value)} }` : `${k}: ${scalarText(value, true)}`;
}

/** The file's own indent step: the column of the first nested block key (2 when there is none). */
function indentUnit(text: string, doc: Document): number {
  const root = doc.contents;
  if (!isMap(root)) return 2;
  for (const p of root.items) {
    const v = p.value;
    if (isMap(v) && !v.flow && v.items.length) {
      const key = v.items[0]!.key as { range?: [number, number, number] };
      if (key.range) return key.range[0] - (text.lastIndexOf('\n', key.range[0] - 1) + 1) || 2;
    }
  }
  return 2;
}

/** A value as YAML source: plain where YAML reads it back as the same string, quoted otherwise. */
function scalarText(value: string | number, inFlow: boolean, style?: string): string {
  if (typeof value === 'number') return String(value);
  if (style === 'QUOTE_DOUBLE') return JSON.stringify(value);
  if (style === 'QUOTE_SINGLE') return `'${value.replace(/'/g, "''")}'`;
  const plain = stringify(value, { lineWidth: 0 }).trimEnd();
  if (plain.includes('\n') || (inFlow && /[,[\]{}]/.test(plain))) return JSON.stringify(value);
  return plain;
}
