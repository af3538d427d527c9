// Reading our own SVG text back for the chart tests: attributes, boxes and label extents.
// Text widths are estimated at 6.7 px a character for 12 px type (wider than Helvetica's
// average), so a pass here leaves a margin on the page.

export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Numeric attribute of an element's opening tag. */
export function num(tag: string, name: string): number {
  const m = new RegExp(`\\s${name}="(-?[\\d.]+)"`).exec(tag);
  if (!m) throw new Error(`no ${name} in ${tag.slice(0, 120)}`);
  return Number(m[1]);
}

/** Every element (opening tag through its text, if any) matching a class. */
export function byClass(svg: string, cls: string): string[] {
  return [...svg.matchAll(new RegExp(`<[a-z]+ [^>]*class="${cls}"[^>]*>(?:[^<]*</[a-z]+>)?`, 'g'))].map((m) => m[0]);
}

/** The inner text of a <text> element (entities left as written). */
export const textOf = (el: string) => /<text[^>]*>([^<]*)<\/text>/.exec(el)?.[1] ?? '';

/** The contents of each <g class="…"> group of that class. */
export function groups(svg: string, cls: string): string[] {
  return [...svg.matchAll(new RegExp(`<g class="${cls}"[^>]*>(.*?)</g>`, 'gs'))].map((m) => m[1]!);
}

/** Every point a marker shape reaches: circle (centre ± r), rect (corners), path (its vertices). */
export function markerExtents(markup: string): [number, number][] {
  const out: [number, number][] = [];
  for (const m of markup.matchAll(/<(circle|rect|path) [^>]*>/g)) {
    const tag = m[0];
    if (m[1] === 'circle') {
      const [cx, cy, r] = [num(tag, 'cx'), num(tag, 'cy'), num(tag, 'r')];
      out.push([cx - r, cy - r], [cx + r, cy + r]);
    } else if (m[1] === 'rect') {
      const [x, y, w, h] = [num(tag, 'x'), num(tag, 'y'), num(tag, 'width'), num(tag, 'height')];
      out.push([x, y], [x + w, y + h]);
    } else {
      const d = /\sd="([^"]*)"/.exec(tag)![1]!;
      for (const p of d.matchAll(/[ML](-?[\d.]+) (-?[\d.]+)/g)) out.push([Number(p[1]), Number(p[2])]);
    }
  }
  return out;
}

/** Vertices of a path's d attribute (M and L commands). */
export function pathPoints(tag: string): [number, number][] {
  const d = /\sd="([^"]*)"/.exec(tag)![1]!;
  return [...d.matchAll(/[ML](-?[\d.]+) (-?[\d.]+)/g)].map((p) => [Number(p[1]), Number(p[2])]);
}

export const inside = (b: Box, x: number, y: number, pad = 0) =>
  x >= b.x + pad && x <= b.x + b.width - pad && y >= b.y + pad && y <= b.y + b.height - pad;

/** Estimated width of a label at 12 px, px. */
export const labelWidth = (text: string) => text.length * 6.7;

/** Labels centred at x (text-anchor middle) that overlap a neighbour: pairs of their texts. */
export function overlapsAcross(labels: { x: number; text: string }[]): string[] {
  const s = [...labels].sort((a, b) => a.x - b.x);
  const bad: string[] = [];
  for (let i = 1; i < s.length; i++) {
    const [a, b] = [s[i - 1]!, s[i]!];
    if (b.x - a.x < (labelWidth(a.text) + labelWidth(b.text)) / 2) bad.push(`${a.text} | ${b.text}`);
  }
  return bad;
}

/** Labels stacked at y (one line each, 12 px type) closer than a line: pairs of their texts. */
export function overlapsDown(labels: { y: number; text: string }[]): string[] {
  const s = [...labels].sort((a, b) => a.y - b.y);
  const bad: string[] = [];
  for (let i = 1; i < s.length; i++) if (s[i]!.y - s[i - 1]!.y < 12) bad.push(`${s[i - 1]!.text} | ${s[i]!.text}`);
  return bad;
}
