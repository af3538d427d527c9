// The note's charts as drawn for the examples, read back from the SVG text: every marker and
// limit line inside the frame, both ends of each axis labelled and no tick labels touching,
// the rolling chart's decisive (modified) life where the check puts it, the wear chart's log
// time axis with 1-2-5 ticks and its legend in the axis units.
import { describe, expect, it } from 'vitest';
import { loadCaseFile } from '../../src/case/load.js';
import { advise } from '../../src/advise/engine.js';
import { noteCharts } from '../../src/report/note/charts.js';
import { journalSpeedCurves } from '../../src/explore/journal-curves.js';
import { INSET, lineChart, type ChartSpec } from '../../src/report/note/svg.js';
import { shaftDeflectionChart, shaftMomentChart } from '../../src/report/note/shaft-svg.js';
import { resolveLoads, shaftBeam, shaftStatics } from '../../src/calc/shaft/index.js';
import type { ShaftSI } from '../../src/case/shaft-types.js';
import type { ShaftAdviceView } from '../../src/report/shaft-text.js';
import {
  byClass,
  groups,
  inside,
  markerExtents,
  num,
  overlapsAcross,
  overlapsDown,
  pathPoints,
  textOf,
  type Box,
} from './svg-parse.js';

const EXAMPLES = ['sawmill-infeed-roller', 'irrigation-pump-lineshaft', 'packaging-worm-drive'];
const drawn = await Promise.all(
  EXAMPLES.map(async (name) => {
    const loaded = loadCaseFile(`examples/${name}.yaml`);
    const a = await advise(loaded.case, loaded.assumed);
    const charts = noteCharts(a, loaded.case, 'SI', journalSpeedCurves(loaded.case, a.checks.journal));
    return { name, loaded, a, charts: charts.filter((c) => c.spec).map((c) => ({ ...c, svg: lineChart(c.spec!) })) };
  }),
);

/** The plot frame, the tick labels under it (x) and beside it (y). */
function read(svg: string) {
  const f = byClass(svg, 'frame')[0]!;
  const frame: Box = { x: num(f, 'x'), y: num(f, 'y'), width: num(f, 'width'), height: num(f, 'height') };
  const ticks = [...groups(svg, 'ticks')[0]!.matchAll(/<text [^>]*>[^<]*<\/text>/g)].map((m) => m[0]);
  const xs = ticks
    .filter((t) => t.includes('text-anchor="middle"'))
    .map((t) => ({ x: num(t, 'x'), y: num(t, 'y'), text: textOf(t) }));
  const ys = ticks
    .filter((t) => t.includes('text-anchor="end"'))
    .map((t) => ({ x: num(t, 'x'), y: num(t, 'y') - 4, text: textOf(t) }));
  return { frame, xs, ys };
}

describe('note charts of the examples, read back from the SVG', () => {
  const all = drawn.flatMap((d) => d.charts.map((c) => ({ label: `${d.name} ${c.id}`, svg: c.svg })));
  it('draws charts for every example', () => expect(all.length).toBeGreaterThanOrEqual(12));

  it.each(all)('$label: every marker lies wholly inside the frame', ({ svg }) => {
    const { frame } = read(svg);
    const pts = groups(svg, 'markers').flatMap(markerExtents);
    expect(pts.length).toBeGreaterThan(0);
    for (const [x, y] of pts) expect(inside(frame, x, y, 0.5), `marker reaching ${x}, ${y}`).toBe(true);
  });

  it.each(all)('$label: limit lines drawn inside the frame, clear of its edges', ({ svg }) => {
    const { frame } = read(svg);
    for (const l of byClass(svg, 'ref')) {
      const [x1, y1, x2] = ['x1', 'y1', 'x2'].map((k) => num(l, k)) as [number, number, number];
      const at = x1 === x2 ? x1 : y1;
      const [lo, hi] = x1 === x2 ? [frame.x, frame.x + frame.width] : [frame.y, frame.y + frame.height];
      expect(at - lo, l).toBeGreaterThanOrEqual(INSET - 0.1);
      expect(hi - at, l).toBeGreaterThanOrEqual(INSET - 0.1);
    }
  });

  it.each(all)('$label: both ends of each axis labelled, at least three labels, none touching', ({ svg }) => {
    const { frame, xs, ys } = read(svg);
    expect(xs.length).toBeGreaterThanOrEqual(3);
    expect(ys.length).toBeGreaterThanOrEqual(3);
    const xPos = xs.map((l) => l.x);
    const yPos = ys.map((l) => l.y);
    expect(Math.min(...xPos)).toBeCloseTo(frame.x + INSET, 0);
    expect(Math.max(...xPos)).toBeCloseTo(frame.x + frame.width - INSET, 0);
    expect(Math.min(...yPos)).toBeCloseTo(frame.y + INSET, 0);
    expect(Math.max(...yPos)).toBeCloseTo(frame.y + frame.height - INSET, 0);
    expect(overlapsAcross(xs)).toEqual([]);
    expect(overlapsDown(ys)).toEqual([]);
  });
});

describe('rolling life chart: the decisive life', () => {
  const cases = drawn.filter((d) => d.charts.some((c) => c.id === 'rolling-life'));
  it.each(cases)("$name: each candidate's modified life meets the kernel's L10mh at its load", ({ a, charts }) => {
    const spec = charts.find((c) => c.id === 'rolling-life')!.spec!;
    const r = a.checks.rolling;
    const chosen = r.candidates.find((k) => k.id === (r.best ?? r.candidates[0]!.id))!;
    const mod = spec.series.filter((s) => s.name.includes('modified life L10mh'));
    expect(mod.length).toBeGreaterThanOrEqual(1);
    expect(mod[0]!.name).toContain(chosen.id);
    expect(spec.series.some((s) => s.name.includes(`${chosen.id}`) && s.name.includes('basic life L10h'))).toBe(true);
    const P = r.equivalentLoad! / 1000; // kN on the axis
    const at = mod[0]!.points.find((p) => Math.abs(p[0] / P - 1) < 1e-6)!;
    expect(at[1] / chosen.L10mh!).toBeCloseTo(1, 6);
  });
  it.each(cases)(
    '$name: the chosen bearing sits on the side of the target line its life check says',
    ({ a, loaded, charts }) => {
      const c = charts.find((x) => x.id === 'rolling-life')!;
      const r = a.checks.rolling;
      const chosen = r.candidates.find((k) => k.id === (r.best ?? r.candidates[0]!.id))!;
      const passes = chosen.L10mh! >= loaded.case.life.hours;
      // The first series is the chosen bearing's modified life; its point 12 is the operating load.
      const line = byClass(c.svg, 'series').find((s) => s.includes('data-series="0"'))!;
      const [, yPoint] = pathPoints(line)[12]!;
      const target = byClass(c.svg, 'ref')[0]!; // the life target (a horizontal line)
      expect(num(target, 'y1')).toBe(num(target, 'y2'));
      expect(yPoint < num(target, 'y1')).toBe(passes); // up the page is longer life
    },
  );
  it('the demo bearing passes and its decisive life is drawn above the target', () => {
    const d = drawn[0]!;
    const r = d.a.checks.rolling;
    const chosen = r.candidates.find((k) => k.id === r.best)!;
    expect(chosen.feasible).toBe(true);
    expect(chosen.L10mh!).toBeGreaterThan(d.loaded.case.life.hours);
  });
});

describe('bushing wear chart', () => {
  const d = drawn[0]!; // the demo: lives from a few hundred hours to the 20 000 h target
  const c = d.charts.find((x) => x.id === 'bushing-wear')!;
  it('uses a log time axis when the lives span a decade or more, with 1-2-5 ticks', () => {
    expect(c.spec!.x.log).toBe(true);
    const { xs } = read(c.svg);
    const inner = xs.slice(1, -1).map((l) => Number(l.text));
    expect(inner.length).toBeGreaterThanOrEqual(3);
    for (const v of inner) expect([1, 2, 5]).toContain(+(v / 10 ** Math.floor(Math.log10(v))).toPrecision(6));
  });
  it('states the legend values in the axis units', () => {
    const allowance = c.spec!.refs.find((r) => r.axis === 'y')!;
    expect(allowance.label.endsWith(` ${c.spec!.y.unit}`)).toBe(true);
    expect(c.spec!.refs.find((r) => r.axis === 'x')!.label.endsWith(' h')).toBe(true);
  });
});

describe('limit lines and points at the ends of a fixed range', () => {
  const spec: ChartSpec = {
    id: 'edge',
    title: 'edge',
    x: { label: 'x', unit: 'h', min: 0, max: 100 },
    y: { label: 'y', unit: 'um', min: 0, max: 10 },
    series: [
      {
        name: 'corner to corner',
        points: [
          [0, 0],
          [100, 10],
        ],
      },
    ],
    refs: [
      { axis: 'y', value: 0, label: 'limit on the bottom edge' },
      { axis: 'x', value: 100, label: 'limit on the right edge' },
    ],
  };
  const svg = lineChart(spec);
  it('draws a limit line at a range end visibly inside the frame, and the corner markers whole', () => {
    const { frame } = read(svg);
    const [bottom, right] = byClass(svg, 'ref');
    expect(frame.y + frame.height - num(bottom!, 'y1')).toBeCloseTo(INSET, 0);
    expect(frame.x + frame.width - num(right!, 'x1')).toBeCloseTo(INSET, 0);
    const pts = groups(svg, 'markers').flatMap(markerExtents);
    expect(pts.length).toBeGreaterThanOrEqual(4);
    for (const [x, y] of pts) expect(inside(frame, x, y, 0.5)).toBe(true);
  });
  it('leaves out a limit line beyond a fixed range, keeping its legend entry', () => {
    const off = lineChart({ ...spec, refs: [{ axis: 'y', value: 20, label: 'limit above the range' }] });
    expect(byClass(off, 'ref')).toEqual([]);
    expect(off).toContain('limit above the range');
  });
});

describe('shaft charts', () => {
  // Invented setting: a 30 mm conveyor idler shaft, supports at its left end and 400 mm along, one load between.
  const shaft: ShaftSI = {
    speed: 2,
    diameter: 0.03,
    modulus: 210e9,
    segments: [],
    supports: [
      { name: 'left', at: 0, diameter: 0.03, locates: 'both' },
      { name: 'right', at: 0.4, diameter: 0.03, locates: 'none' },
    ],
    loads: [{ at: 0.15, weight: { mass: 40 } }],
    shock: 'none',
  };
  const resolved = resolveLoads(shaft.loads);
  const statics = shaftStatics(shaft, resolved);
  const beam = shaftBeam(shaft, resolved, statics);
  const view = {
    shaft: { maxDeflection: beam.maxDeflection, maxMoment: beam.maxMoment, diagram: beam.diagram },
    supports: shaft.supports.map((x) => ({ name: x.name, at: x.at })),
  } as unknown as ShaftAdviceView;
  it.each([shaftMomentChart(view, 'SI'), shaftDeflectionChart(view, 'SI')])(
    '$id: a support at the end of the shaft is drawn inside the frame; both axis ends labelled',
    (c) => {
      const svg = lineChart(c.spec!);
      const { frame, xs, ys } = read(svg);
      const refs = byClass(svg, 'ref');
      expect(refs).toHaveLength(2);
      for (const l of refs) expect(num(l, 'x1') - frame.x).toBeGreaterThanOrEqual(INSET - 0.1);
      expect(Math.min(...xs.map((l) => l.x))).toBeCloseTo(frame.x + INSET, 0);
      expect(Math.max(...ys.map((l) => l.y))).toBeCloseTo(frame.y + frame.height - INSET, 0);
      expect(overlapsAcross(xs)).toEqual([]);
      expect(overlapsDown(ys)).toEqual([]);
    },
  );
});
