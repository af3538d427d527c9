// The selection map and the sensitivity tornado as drawn, read back from the SVG text: ticks
// and labelled range ends, labels apart, the whole caption inside the drawing, bars and flip
// markers inside the plot, and an axis that still spreads its labels when every margin is equal.
import { describe, expect, it } from 'vitest';
import { loadCaseFile } from '../../src/case/load.js';
import { computeMap } from '../../src/explore/map.js';
import { computeSensitivity, type SensitivityResult } from '../../src/explore/sensitivity.js';
import { mapSvg } from '../../src/report/explore/map-svg.js';
import { tornadoSvg } from '../../src/report/explore/tornado-svg.js';
import { OPTIONS } from '../../src/core/options.js';
import { byClass, inside, markerExtents, num, overlapsAcross, overlapsDown, textOf, type Box } from './svg-parse.js';

const EXAMPLES = ['sawmill-infeed-roller', 'irrigation-pump-lineshaft', 'packaging-worm-drive'];
const loaded = EXAMPLES.map((name) => ({ name, l: loadCaseFile(`examples/${name}.yaml`) }));

const GRID = 10;
const maps = await Promise.all(
  loaded.map(async ({ name, l }) => {
    const m = await computeMap(l.case, l.assumed, { grid: GRID });
    return { name, m, svg: mapSvg(m) };
  }),
);
const results = await Promise.all(
  loaded.map(async ({ name, l }) => ({ name, r: await computeSensitivity(l.case, l.assumed) })),
);

describe('selection map', () => {
  it.each(maps)('$name: more than two labelled ticks per axis, the range ends labelled, none touching', ({ svg }) => {
    const xs = byClass(svg, 'tick-x').map((t) => ({ x: num(t, 'x'), text: textOf(t) }));
    const ys = byClass(svg, 'tick-y').map((t) => ({ y: num(t, 'y'), text: textOf(t) }));
    expect(xs.length).toBeGreaterThan(2);
    expect(ys.length).toBeGreaterThan(2);
    // Plot 86 to 566 px across and 48 to 528 px down; the ends are the end cells' centres.
    const cell = 480 / GRID;
    expect(Math.min(...xs.map((l) => l.x))).toBeCloseTo(86 + cell / 2, 1);
    expect(Math.max(...xs.map((l) => l.x))).toBeCloseTo(566 - cell / 2, 1);
    expect(Math.max(...ys.map((l) => l.y - 4))).toBeCloseTo(528 - cell / 2, 1);
    expect(Math.min(...ys.map((l) => l.y - 4))).toBeCloseTo(48 + cell / 2, 1);
    expect(overlapsAcross(xs)).toEqual([]);
    expect(overlapsDown(ys)).toEqual([]);
  });
  it.each(maps)('$name: the whole caption is inside the drawing', ({ m, svg }) => {
    const notes = byClass(svg, 'note');
    const height = num(/<svg [^>]*>/.exec(svg)![0], 'height');
    const words = notes.map(textOf).join(' ');
    for (const n of m.notes)
      expect(words).toContain(n.replace(/&/g, '&amp;').replace(/</g, '&lt;').split(' ').slice(-3).join(' '));
    expect(words.split(' ').length).toBe(m.notes.join(' ').split(' ').length);
    expect(Math.max(...notes.map((t) => num(t, 'y')))).toBeLessThanOrEqual(height - 4);
  });
});

/** The plot box of a tornado. */
function plotBox(svg: string): Box {
  const b = byClass(svg, 'plot-box')[0]!;
  return { x: num(b, 'x'), y: num(b, 'y'), width: num(b, 'width'), height: num(b, 'height') };
}

/** Tornado checks for one option's SVG: bars and flips inside, tick labels apart. */
function checkTornado(svg: string, flips: number) {
  const box = plotBox(svg);
  for (const bar of byClass(svg, 'bar')) {
    const [x, w] = [num(bar, 'x'), num(bar, 'width')];
    expect(x, bar).toBeGreaterThanOrEqual(box.x);
    expect(x + w, bar).toBeLessThanOrEqual(box.x + box.width);
  }
  const flipMarks = byClass(svg, 'flip');
  expect(flipMarks.length).toBe(flips);
  for (const [x, y] of flipMarks.flatMap(markerExtents)) expect(inside(box, x, y)).toBe(true);
  const ticks = byClass(svg, 'tick').map((t) => ({ x: num(t, 'x'), text: textOf(t) }));
  expect(ticks.length).toBeGreaterThanOrEqual(3);
  expect(new Set(ticks.map((t) => t.text)).size).toBe(ticks.length);
  expect(overlapsAcross(ticks)).toEqual([]);
}

describe('sensitivity tornado', () => {
  it.each(results)('$name: bars and flip markers inside the plot, axis labels apart', ({ r }) => {
    const flips = r.parameters.flatMap((p) => p.variations.filter((v) => v.flip)).length;
    for (const o of OPTIONS) {
      if (r.margins[o].margin === null) continue;
      checkTornado(tornadoSvg(r, o), flips);
    }
  });
  it('an example with flips marks each of them', () => {
    expect(results.some(({ r }) => r.parameters.some((p) => p.variations.some((v) => v.flip)))).toBe(true);
  });

  // Invented result: every margin the same, and one flip far outside the others.
  const margins = (m: number) =>
    Object.fromEntries(OPTIONS.map((o) => [o, { check: 'wear-life', label: 'wear life', margin: m }]));
  const equal = (flipAt: number | null) =>
    ({
      title: 'equal margins',
      recommendation: 'rolling',
      margins: margins(0.43),
      fixed: { bushing: [], rolling: [], journal: [] },
      parameters: ['load', 'speed'].map((id) => ({
        id,
        label: id,
        unit: '1',
        base: 1,
        changeUnit: '1',
        swing: 0,
        variations: [-0.25, -0.1, 0.1, 0.25].map((step) => ({
          step,
          change: step,
          value: 1 + step,
          recommendation: 'rolling',
          flip: flipAt === step && id === 'load',
          margins: margins(flipAt === step && id === 'load' ? 4.2 : 0.43),
        })),
      })),
      flips: [],
      notes: [],
    }) as unknown as SensitivityResult;
  it('spreads its tick labels when every margin is equal', () => {
    for (const o of OPTIONS) checkTornado(tornadoSvg(equal(null), o), 0);
  });
  it('covers a margin far from the rest, the flip marker inside', () => {
    const svg = tornadoSvg(equal(0.25), 'bushing');
    checkTornado(svg, 1);
    const box = plotBox(svg);
    const end = Math.max(...byClass(svg, 'bar').map((b) => num(b, 'x') + num(b, 'width')));
    expect(end).toBeLessThan(box.x + box.width); // +420 % is on the axis, not cut at its end
    expect(Math.max(...byClass(svg, 'tick').map((t) => parseFloat(textOf(t))))).toBeGreaterThanOrEqual(420);
  });
});
