// Property and behaviour tests of the selection map (not physics: the checks are tested in test/calc).
import { describe, expect, it } from 'vitest';
import { computeMap, nodeIndices } from '../../src/explore/map.js';
import { mapText } from '../../src/report/explore/map-text.js';
import { mapSvg, mapHtml } from '../../src/report/explore/map-svg.js';
import { scaleCase, referencePoint } from '../../src/explore/scale.js';
import { oilFedLineShaft } from './cases.js';
import { pumpCase } from '../helpers/case.js';

const rpm = (r: number) => r / 60;
const opts = { grid: 12, load: [200, 10000] as [number, number], speed: [rpm(3), rpm(6000)] as [number, number] };

describe('selection map on an oil-fed line shaft with a long life target', async () => {
  const l = oilFedLineShaft();
  const m = await computeMap(l.case, l.assumed, opts);
  const col = (r: number) => m.speeds.findIndex((s) => s * 60 >= r * 0.999);

  it('has the asked axes, increasing, end points exact', () => {
    expect(m.loads).toHaveLength(12);
    expect(m.speeds).toHaveLength(12);
    expect(m.loads[0]).toBe(200);
    expect(m.loads[11]).toBe(10000);
    expect(m.speeds[11]! * 60).toBeCloseTo(6000, 9);
    for (let k = 1; k < 12; k++) expect(m.loads[k]!).toBeGreaterThan(m.loads[k - 1]!);
  });

  it('the journal bearing wins at high speed and high load', () => {
    // Speeds from 1500 r/min up, loads from 2 kN to 5 kN (the upper part of the journal's
    // feasible band: above it the start-up unit load limit ends it).
    const hi = m.loads
      .map((x, i) => [x, i] as const)
      .filter(([x]) => x >= 2000 && x <= 5000)
      .map(([, i]) => i);
    expect(hi.length).toBeGreaterThanOrEqual(2);
    for (const i of hi)
      for (let j = col(1500); j < 12; j++)
        expect(m.cells[i]![j]!.winner, `load ${m.loads[i]} N, ${m.speeds[j]! * 60} r/min`).toBe('journal');
  });

  it('at the lowest speeds a rubbing bushing or a rolling bearing wins, never the journal', () => {
    // 3 and 6 r/min, 280 N to 10 kN: no oil film forms at a crawl, and both a rubbing bushing and
    // a rolling bearing (running nearly static) serve there (common practice). Which of the two
    // wins turns on friction powers of a few watts, which no test here should pin down.
    for (let i = 1; i < 12; i++)
      for (const j of [0, 1]) {
        const cell = m.cells[i]![j]!;
        expect(['bushing', 'rolling'], `load ${m.loads[i]} N, column ${j}`).toContain(cell.winner);
        // Up to 7 kN the bushing itself passes at a crawl.
        if (i < 11) expect(cell.feasible[0], `bushing feasible at load ${m.loads[i]} N, column ${j}`).toBe(true);
      }
    expect(m.cells[0]![0]!.winner).toBe('bushing');
  });

  it('a winner is always feasible, and "none" only where nothing is', () => {
    for (const row of m.cells)
      for (const c of row) {
        if (c.winner) expect(c.feasible[['bushing', 'rolling', 'journal'].indexOf(c.winner)]).toBe(true);
        else expect(c.feasible).toEqual([false, false, false]);
      }
  });

  it('is deterministic: the same case gives the same map, text and SVG', async () => {
    const again = await computeMap(l.case, l.assumed, opts);
    expect(again).toEqual(m);
    expect(mapText(again)).toBe(mapText(m));
    expect(mapSvg(again)).toBe(mapSvg(m));
  });

  it('text map: legend, units on both axes, the case marked', () => {
    const t = mapText(m);
    expect(t).toContain(
      'Legend: B bushing wins, R rolling bearing wins, J journal bearing wins, . none feasible, @ the case',
    );
    expect(t).toMatch(/\d kN \|/);
    expect(t).toContain('r/min');
    expect(t).toContain('@');
  });

  it('SVG and HTML are self-contained (no scripts, no outside references) and carry the legend', () => {
    const s = mapSvg(m);
    const h = mapHtml(m);
    for (const x of [s, h]) {
      expect(x).not.toMatch(/<script|href=|src=/);
      expect(x).toContain('journal bearing wins');
      expect(x).toContain('none feasible');
    }
    expect(h.startsWith('<!doctype html>')).toBe(true);
  });
});

describe('map helpers', () => {
  it('coarse journal nodes include both ends and are increasing', () => {
    expect(nodeIndices(60, 5)).toEqual([0, 15, 30, 44, 59]);
    expect(nodeIndices(3, 5)).toEqual([0, 1, 2]);
  });

  it('scaling a duty spectrum scales every point and keeps the shares', () => {
    const c = pumpCase({
      duty: [
        { share: 0.6, radial: '1 kN', speed: '300 rpm' },
        { share: 0.4, radial: '2 kN', speed: '100 rpm' },
      ],
    });
    const s = scaleCase(c, 2, 0.5);
    expect(s.duty!.map((p) => [p.share, p.radial, p.speed])).toEqual([
      [0.6, 2000, 2.5],
      [0.4, 4000, (100 / 60) * 0.5],
    ]);
    expect(referencePoint(c)).toEqual({ load: 2000, speed: 5, spectrum: true });
  });
});
