// The note model and its charts, in-process: the injectable clock, sections, and that each
// chart draws what the kernels compute (properties and identities; not published values).
import { describe, expect, it } from 'vitest';
import { loadCaseFile } from '../../src/case/load.js';
import { advise } from '../../src/advise/engine.js';
import { buildNote, noteDate } from '../../src/report/note/model.js';
import { noteCharts } from '../../src/report/note/charts.js';
import { journalSpeedCurves } from '../../src/explore/journal-curves.js';
import { linearTicks, lineChart, logTicks } from '../../src/report/note/svg.js';
import { escapeHtml, escapeMd } from '../../src/report/note/escape.js';

const loaded = loadCaseFile('examples/sawmill-infeed-roller.yaml');
const a = await advise(loaded.case, loaded.assumed);
const clock = () => new Date('2031-07-09T23:59:00Z');
const journalCurves = journalSpeedCurves(loaded.case, a.checks.journal);

describe('note model', () => {
  it('takes its date from the injected clock, else SOURCE_DATE_EPOCH', () => {
    expect(buildNote(loaded, a, { units: 'SI', now: clock, journalCurves }).date).toBe('2031-07-09');
    const before = process.env['SOURCE_DATE_EPOCH'];
    process.env['SOURCE_DATE_EPOCH'] = '0';
    try {
      expect(noteDate()).toBe('1970-01-01');
    } finally {
      if (before === undefined) delete process.env['SOURCE_DATE_EPOCH'];
      else process.env['SOURCE_DATE_EPOCH'] = before;
    }
  });
  it('has its sections in order, one per option in rank order', () => {
    const n = buildNote(loaded, a, { units: 'SI', now: clock, journalCurves });
    expect(n.sections.map((s) => s.id)).toEqual([
      'recommendation',
      'duty',
      'assumptions',
      ...a.ranking.map((r) => `option-${r.option}`),
      'methods',
      'references',
      'cautions',
      'signoff',
      'sheet',
    ]);
  });
  it('US units change the displayed figures, not the content', () => {
    const si = buildNote(loaded, a, { units: 'SI', now: clock, journalCurves });
    const us = buildNote(loaded, a, { units: 'US', now: clock, journalCurves });
    expect(us.sections.map((s) => s.blocks.length)).toEqual(si.sections.map((s) => s.blocks.length));
    expect(JSON.stringify(us)).toContain('["shaft.diameter","40 mm","1.57 in"]'); // as given, and in inches
    expect(JSON.stringify(si)).toContain('["shaft.diameter","40 mm","40 mm (0.04 m)"]');
  });
});

describe('note charts', () => {
  const charts = noteCharts(a, loaded.case, 'SI', journalCurves);
  const chart = (id: string) => charts.find((c) => c.id === id)!.spec!;
  it('draws all five charts for the demo case, every point finite', () => {
    expect(charts.map((c) => c.id)).toEqual([
      'bushing-wear',
      'rolling-life',
      'journal-film',
      'journal-temperature',
      'journal-pressure',
    ]);
    for (const c of charts) {
      expect(c.spec, c.id).not.toBeNull();
      for (const s of c.spec!.series)
        for (const p of s.points) expect(p.every(Number.isFinite), `${c.id} ${s.name}`).toBe(true);
    }
  });
  it("bushing wear reaches the check's depth at the life target (linear in time)", () => {
    const m = a.checks.bushing.materials.find(
      (x) => x.id === a.ranking.find((r) => r.option === 'bushing')!.design['material'],
    )!;
    const s = chart('bushing-wear').series[2]!; // low wear factor: stays inside the plot to 1.5 × target
    const T = loaded.case.life.hours;
    const at =
      s.points.find((p) => Math.abs(p[0] - T) < 1e-6 * T) ??
      s.points.reduce((x, y) => (Math.abs(y[0] - T) < Math.abs(x[0] - T) ? y : x));
    expect(at[1]).toBeCloseTo((m.wearDepthBand.low * 1e6 * at[0]) / T, 6);
  });
  it("rolling life passes through the chosen candidate's L10h at the operating load", () => {
    const best = a.checks.rolling.candidates.find((k) => k.id === a.checks.rolling.best)!;
    const s = chart('rolling-life').series.find((x) => x.name.includes('(chosen): basic life'))!;
    const p = s.points.find((q) => Math.abs(q[0] - best.equivalentLoad / 1000) < 1e-6 * best.equivalentLoad)!;
    expect(p[1] / best.L10h!).toBeCloseTo(1, 6);
    // Life falls with load at the slope −p on log axes (p = 10/3 for a roller).
    const [q0, q1] = [s.points[0]!, s.points[s.points.length - 1]!];
    expect(Math.log(q1[1] / q0[1]) / Math.log(q1[0] / q0[0])).toBeCloseTo(-10 / 3, 6);
  });
  it('journal film thickens with speed, and the kernel-computed point near the operating speed is close to the check', () => {
    const s = chart('journal-film').series[0]!;
    for (let i = 1; i < s.points.length; i++) expect(s.points[i]![1]).toBeGreaterThan(s.points[i - 1]![1]);
    const j = a.checks.journal;
    const N = j.points[j.governingPoint]!.speed * 60;
    const near = s.points.reduce((x, y) => (Math.abs(Math.log(y[0] / N)) < Math.abs(Math.log(x[0] / N)) ? y : x));
    // The sweep samples 0.2–3 × N geometrically; the nearest sample is within 15 % of N.
    expect(Math.abs(Math.log(near[0] / N))).toBeLessThan(0.15);
    expect(near[1] / (j.minFilmThickness * 1e6)).toBeGreaterThan(0.8);
    expect(near[1] / (j.minFilmThickness * 1e6)).toBeLessThan(1.25);
  });
  it("the pressure chart is the kernel's pressure profile", () => {
    const s = chart('journal-pressure').series[0]!;
    expect(s.points.length).toBe(a.checks.journal.pressureProfile.length);
    expect(Math.max(...s.points.map((p) => p[1]))).toBeCloseTo(
      Math.max(...a.checks.journal.pressureProfile.map((p) => p.pressure)) / 1e6,
      6,
    ); // display values carry 9 significant figures
  });
});

describe('svg and escaping', () => {
  it('ticks: linear 1-2-5 steps; log decades, with 2 and 5 over a short span', () => {
    expect(linearTicks(0, 30000)).toEqual([0, 5000, 10000, 15000, 20000, 25000, 30000]);
    expect(logTicks(1, 1e4).major).toEqual([1, 10, 100, 1000, 10000]);
    expect(logTicks(1, 100).major).toEqual([1, 2, 5, 10, 20, 50, 100]);
  });
  it('escapes series names and titles in the SVG', () => {
    const svg = lineChart({
      id: 'x',
      title: '<i>t</i>',
      x: { label: 'a', unit: 'h' },
      y: { label: 'b', unit: 'mm' },
      series: [
        {
          name: 'a & <b>',
          points: [
            [0, 1],
            [1, 2],
          ],
        },
      ],
      refs: [],
    });
    expect(svg).not.toMatch(/<i>|<b>/);
    expect(svg).toContain('&lt;i&gt;t&lt;/i&gt;');
    expect(svg).toContain('a &amp; &lt;b&gt;');
  });
  it('escapeHtml and escapeMd neutralise markup', () => {
    expect(escapeHtml(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;');
    expect(escapeMd('*bold* | [link](x) `code` <b>')).toBe('\\*bold\\* \\| \\[link\\](x) \\`code\\` &lt;b&gt;');
  });
});
