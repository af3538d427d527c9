// The text of each page of a PDF as Chromium (Skia) writes it, read without a PDF library:
// objects are found by "N 0 obj … endobj", Flate streams inflated with node:zlib, pages
// taken in the order of the page tree, and each page's shown strings (Tj, TJ, ', ") mapped
// to Unicode through its fonts' ToUnicode CMaps (two-byte codes for Type0 fonts, one byte
// otherwise). Enough to find printed words such as "page 2 of 9"; not a general PDF reader
// (no object streams, no cross-reference streams, no encryption).
import { inflateSync } from 'node:zlib';

interface Obj {
  dict: string;
  stream: Buffer | null;
}

function objects(pdf: Buffer): Map<number, Obj> {
  const text = pdf.toString('latin1');
  const out = new Map<number, Obj>();
  const re = /(\d+) 0 obj\b/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(text))) {
    const start = m.index + m[0].length;
    const end = text.indexOf('endobj', start);
    if (end < 0) break;
    const body = text.slice(start, end);
    const s = body.indexOf('stream');
    let stream: Buffer | null = null;
    let dict = body;
    if (s >= 0 && /^\s*<</.test(body)) {
      dict = body.slice(0, s);
      let from = start + s + 'stream'.length;
      if (text[from] === '\r') from++;
      if (text[from] === '\n') from++;
      const len = /\/Length (\d+)(?! \d+ R)/.exec(dict);
      const to = len ? from + Number(len[1]) : start + body.lastIndexOf('endstream');
      const raw = pdf.subarray(from, to);
      stream = dict.includes('/FlateDecode') ? inflateSync(raw) : raw;
    }
    out.set(Number(m[1]), { dict, stream });
    re.lastIndex = end;
  }
  return out;
}

const refs = (s: string) => [...s.matchAll(/(\d+) 0 R/g)].map((x) => Number(x[1]));
const refOf = (dict: string, key: string) => {
  const m = new RegExp(`/${key}\\s+(\\d+) 0 R`).exec(dict);
  return m ? Number(m[1]) : null;
};

/** The inside of the dictionary that follows /key (inline), or of the object it refers to. */
function subDict(objs: Map<number, Obj>, dict: string, key: string): string {
  const r = refOf(dict, key);
  if (r !== null) return objs.get(r)?.dict ?? '';
  const at = dict.indexOf(`/${key}`);
  if (at < 0) return '';
  let i = dict.indexOf('<<', at);
  if (i < 0) return '';
  const from = i;
  let depth = 0;
  for (; i < dict.length - 1; i++) {
    if (dict[i] === '<' && dict[i + 1] === '<') {
      depth++;
      i++;
    } else if (dict[i] === '>' && dict[i + 1] === '>') {
      depth--;
      i++;
      if (depth === 0) break;
    }
  }
  return dict.slice(from, i + 1);
}

interface Font {
  bytes: 1 | 2;
  map: Map<number, string>;
}

function cmap(stream: Buffer | null): Map<number, string> {
  const map = new Map<number, string>();
  if (!stream) return map;
  const t = stream.toString('latin1');
  const uni = (hex: string) => {
    let s = '';
    for (let i = 0; i + 4 <= hex.length; i += 4) s += String.fromCharCode(parseInt(hex.slice(i, i + 4), 16));
    return s;
  };
  for (const block of t.matchAll(/beginbfchar([\s\S]*?)endbfchar/g))
    for (const p of block[1]!.matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>/g))
      map.set(parseInt(p[1]!, 16), uni(p[2]!));
  for (const block of t.matchAll(/beginbfrange([\s\S]*?)endbfrange/g))
    for (const p of block[1]!.matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>\s*(<[0-9a-fA-F]+>|\[[^\]]*\])/g)) {
      const lo = parseInt(p[1]!, 16);
      const hi = parseInt(p[2]!, 16);
      const dst = p[3]!;
      if (dst.startsWith('[')) {
        [...dst.matchAll(/<([0-9a-fA-F]+)>/g)].forEach((d, k) => map.set(lo + k, uni(d[1]!)));
      } else {
        const base = parseInt(dst.slice(1, -1), 16);
        for (let c = lo; c <= hi; c++) map.set(c, String.fromCharCode(base + c - lo));
      }
    }
  return map;
}

function literalBytes(s: string): number[] {
  const out: number[] = [];
  for (let i = 0; i < s.length; i++) {
    const c = s[i]!;
    if (c !== '\\') {
      out.push(c.charCodeAt(0));
      continue;
    }
    const n = s[++i]!;
    const esc: Record<string, number> = { n: 10, r: 13, t: 9, b: 8, f: 12, '(': 40, ')': 41, '\\': 92 };
    if (n in esc) out.push(esc[n]!);
    else if (/[0-7]/.test(n)) {
      let oct = n;
      while (oct.length < 3 && /[0-7]/.test(s[i + 1] ?? '')) oct += s[++i];
      out.push(parseInt(oct, 8));
    }
  }
  return out;
}

function decode(bytes: number[], font: Font | undefined): string {
  if (!font) return '';
  let s = '';
  for (let i = 0; i + font.bytes <= bytes.length; i += font.bytes) {
    const code = font.bytes === 2 ? bytes[i]! * 256 + bytes[i + 1]! : bytes[i]!;
    s += font.map.get(code) ?? '';
  }
  return s;
}

/** The text of one content stream, its shown strings joined, a space between text objects. */
function pageText(content: string, fonts: Map<string, Font>): string {
  let font: Font | undefined;
  let out = '';
  const re = /\/([^\s/<>[\]()]+)\s+[\d.]+\s+Tf|<([0-9a-fA-F\s]*)>|\((?:\\.|[^\\)])*\)|\bBT\b|\bET\b|\[|\]/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(content))) {
    const tok = m[0];
    if (m[1] !== undefined) font = fonts.get(m[1]);
    else if (tok === 'ET') out += ' ';
    else if (m[2] !== undefined) {
      const hex = m[2].replace(/\s+/g, '');
      const bytes: number[] = [];
      for (let i = 0; i + 2 <= hex.length; i += 2) bytes.push(parseInt(hex.slice(i, i + 2), 16));
      out += decode(bytes, font);
    } else if (tok.startsWith('(')) out += decode(literalBytes(tok.slice(1, -1)), font);
  }
  return out;
}

/** Each page's text, in page order. */
export function pdfPageTexts(pdf: Buffer): string[] {
  const objs = objects(pdf);
  const catalog = [...objs.values()].find((o) => /\/Type\s*\/Catalog/.test(o.dict));
  const root = catalog ? refOf(catalog.dict, 'Pages') : null;
  const pages: number[] = [];
  const walk = (n: number) => {
    const o = objs.get(n);
    if (!o) return;
    if (/\/Type\s*\/Pages/.test(o.dict)) {
      const kids = /\/Kids\s*\[([^\]]*)\]/.exec(o.dict);
      for (const k of refs(kids?.[1] ?? '')) walk(k);
    } else if (/\/Type\s*\/Page\b/.test(o.dict)) pages.push(n);
  };
  if (root !== null) walk(root);
  return pages.map((n) => {
    const page = objs.get(n)!.dict;
    const fontDict = subDict(objs, subDict(objs, page, 'Resources'), 'Font');
    const fonts = new Map<string, Font>();
    for (const f of fontDict.matchAll(/\/([^\s/<>[\]()]+)\s+(\d+) 0 R/g)) {
      const fo = objs.get(Number(f[2]));
      if (!fo) continue;
      const tu = refOf(fo.dict, 'ToUnicode');
      fonts.set(f[1]!, {
        bytes: /\/Subtype\s*\/Type0/.test(fo.dict) ? 2 : 1,
        map: cmap(tu === null ? null : (objs.get(tu)?.stream ?? null)),
      });
    }
    const contents = /\/Contents\s*\[([^\]]*)\]/.exec(page)?.[1] ?? String(refOf(page, 'Contents') ?? '');
    const ids = contents.includes('R') ? refs(contents) : [Number(contents)];
    return ids
      .map((id) => pageText(objs.get(id)?.stream?.toString('latin1') ?? '', fonts))
      .join(' ')
      .replace(/\s+/g, ' ');
  });
}
