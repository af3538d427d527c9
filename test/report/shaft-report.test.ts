// The shaft's reports (text, JSON, note) on a shaft advice assembled in the test from the real
// statics and beam kernels and the real single-support advisor: structure and contract keys,
// not physics. Invented setting: a belt-driven jackshaft of a sawdust extraction fan, a plain
// 40 mm shaft on two supports 500 mm apart, a spur gear between them and the pulley overhung.
import { describe, expect, it } from 'vitest';
import { resolveLoads, shaftBeam, shaftStatics } from '../../src/calc/shaft/index.js';
import type { ShaftSI } from '../../src/case/shaft-types.js';
import { validateCase, type LoadedCase } from '../../src/case/load.js';
import { advise } from '../../src/advise/engine.js';
import { loadRules } from '../../src/advise/load-rules.js';
import { shaftAdviceText, shaftSketch, shaftSummaryLines, type ShaftAdviceView } from '../../src/report/shaft-text.js';
import { shaftAdviceJson } from '../../src/report/json.js';
import { buildShaftNote } from '../../src/report/note/shaft.js';
import { renderHtml } from '../../src/report/note/html.js';
import { renderMarkdown } from '../../src/report/note/markdown.js';

const shaft: ShaftSI = {
  speed: 1200 / 60,
  diameter: 0.04,
  modulus: 210e9,
  segments: [],
  supports: [
    { name: 'motor side', at: 0, diameter: 0.04, locates: 'both' },
    { name: 'outboard', at: 0.5, diameter: 0.04, locates: 'none' },
  ],
  loads: [
    {
      at: 0.2,
      gear: { pitchDiameter: 0.16, torque: 120, pressureAngle: (20 * Math.PI) / 180, helixAngle: 0, mesh: 0 },
    },
    { at: -0.12, belt: { pitchDiameter: 0.2, torque: -120, pullFactor: 2.5, direction: Math.PI } },
    { at: 0.35, weight: { mass: 12 } },
  ],
  shock: 'light',
};

const given = { title: 'Sawdust fan jackshaft', shaft: { speed: '1200 rpm', diameter: '40 mm' } };

async function build(): Promise<{
  view: ShaftAdviceView;
  cases: LoadedCase[];
  resolved: ReturnType<typeof resolveLoads>;
}> {
  const resolved = resolveLoads(shaft.loads);
  const statics = shaftStatics(shaft, resolved);
  const beam = shaftBeam(shaft, resolved, statics);
  const rules = loadRules();
  const cases = statics.supports.map((r, i) =>
    validateCase({
      title: `Sawdust fan jackshaft: ${shaft.supports[i]!.name}`,
      shaft: { diameter: '40 mm', speed: '1200 rpm' },
      load: { radial: `${r.radial.toFixed(1)} N`, axial: `${Math.abs(r.axial).toFixed(1)} N`, shock: 'light' },
      life: { hours: '30000 h' },
      space: { maxLength: '40 mm', maxOuterDiameter: '90 mm' },
      lubrication: { supply: 'grease' },
      environment: { contamination: 'dirty' },
    }),
  );
  const advices = await Promise.all(cases.map((c) => advise(c.case, c.assumed, rules)));
  const view: ShaftAdviceView = {
    shaft: { maxDeflection: beam.maxDeflection, maxMoment: beam.maxMoment, diagram: beam.diagram },
    supports: shaft.supports.map((s, i) => ({
      name: s.name,
      at: s.at,
      diameter: s.diameter,
      reaction: statics.supports[i]!,
      slope: beam.slopes[i]!,
      advice: advices[i]!,
    })),
    arrangement: { locating: 'motor side', summary: 'A locating and a floating support.', reasons: ['one reason'] },
    assumed: [{ field: 'shaft.modulus', value: '210 GPa', reason: 'steel' }],
    warnings: [],
  };
  return { view, cases, resolved };
}

describe('shaft text', () => {
  it('shows the shaft, the loads with their relations, a sketch, the reactions and each support', async () => {
    const { view, resolved } = await build();
    const text = shaftAdviceText(shaft, resolved, view, 'SI');
    for (const s of ['Shaft', 'Reactions', 'Support A: motor side', 'Support B: outboard', 'Arrangement'])
      expect(text).toContain(s);
    expect(text).toContain('Ft = 2T/d');
    expect(text).toContain('largest bending moment');
    // Each support's single-support advice, in its own layout.
    expect(text.match(/^Advice$/gm)?.length).toBe(2);
  });

  it('keeps the summary, the loads table and the sketch within 100 columns, in SI and US units', async () => {
    const { view, resolved } = await build();
    for (const u of ['SI', 'US'] as const) {
      const text = shaftAdviceText(shaft, resolved, view, u);
      const shaftPart = text.slice(0, text.indexOf('Support A:'));
      for (const line of shaftPart.split('\n')) expect([...line].length).toBeLessThanOrEqual(100);
      for (const line of shaftSummaryLines(shaft, u)) expect([...line].length).toBeLessThanOrEqual(100);
    }
  });

  it('draws the supports and loads to scale: the overhung pulley left of support A', () => {
    const lines = shaftSketch(shaft, 'SI', 62);
    const sup = lines[3]!;
    const load = lines[1]!;
    // x from -0.12 m to 0.5 m over 62 columns: support A at x = 0 sits at column 12, B at the end.
    expect(sup.indexOf('^A')).toBe(2 + 12);
    expect(load.indexOf('v')).toBe(2);
    expect(lines[4]).toMatch(/^ {2}-120 mm +500 mm$/);
  });
});

describe('shaft JSON', () => {
  it('holds the contract keys of issue 15, SI, with each support advice as adviceJson prints it', async () => {
    const { view, cases } = await build();
    // eslint-disable-next-line @typescript-eslint/no-explicit-any -- the JSON is read by key
    const j = shaftAdviceJson(given, cases, view) as Record<string, any>;
    expect(Object.keys(j)).toEqual(['shaft', 'supports', 'arrangement', 'assumed', 'warnings', 'case']);
    expect(Object.keys(j.shaft)).toEqual(['maxDeflection', 'maxMoment', 'diagram']);
    for (const k of ['x', 'shearY', 'shearZ', 'moment', 'deflection']) expect(j.shaft.diagram[0]).toHaveProperty(k);
    expect(j.supports).toHaveLength(2);
    for (const s of j.supports) {
      expect(Object.keys(s)).toEqual(['name', 'at', 'diameter', 'reaction', 'slope', 'advice']);
      expect(Object.keys(s.reaction)).toEqual(['y', 'z', 'radial', 'axial']);
      expect(s.advice).toHaveProperty('ranking');
      expect(s.advice).toHaveProperty('case');
    }
    expect(Object.keys(j.arrangement)).toEqual(['locating', 'summary', 'reasons']);
    expect(j.supports[1].at).toBe(0.5);
    expect(j.case).toEqual(given);
  });
});

describe('shaft note', () => {
  it('has the sketch, the moment and deflection charts, the reactions and each support in the note layout', async () => {
    const { view, cases, resolved } = await build();
    const model = buildShaftNote(
      { title: 'Sawdust fan jackshaft', shaft, resolved, advice: view, cases, journalCurves: [null, null] },
      { units: 'SI', now: () => new Date('2024-03-05T12:00:00Z') },
    );
    const html = renderHtml(model);
    expect(html).toContain('id="chart-shaft-sketch"');
    expect(html).toContain('id="chart-shaft-moment"');
    expect(html).toContain('id="chart-shaft-deflection"');
    expect(html).toContain('Reactions, bending and slopes');
    expect(html).toContain('A (motor side): Summary and recommendation');
    expect(html).toContain('B (outboard): Summary and recommendation');
    // Every element id once: the two supports' charts are told apart.
    const ids = [...html.matchAll(/ id="([^"]+)"/g)].map((m) => m[1]);
    expect(new Set(ids).size).toBe(ids.length);
    // Cautions and sign-off once, at the end.
    expect(model.sections.filter((s) => s.id === 'signoff')).toHaveLength(1);
    expect(model.sections.at(-1)!.id).toBe('signoff');
    const md = renderMarkdown(model);
    expect(md).toContain('Figure: Shaft: loads and supports');
    expect(md).toContain('Chart: Shaft: bending moment along the shaft');
  });
});
