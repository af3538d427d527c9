import type { AdviceResult } from '../../advise/engine.js';
import type { CaseSI } from '../../case/types.js';
import type { BushingMaterialResult } from '../../calc/bushing/index.js';
import { basicRatingLife, lifeExponent, lifeHours } from '../../calc/rolling/life.js';
import type { JournalSpeedCurves } from '../../explore/journal-curves.js';
import { displayUnit, fmt, fmtValue, type UnitSystem } from '../units.js';
import { spansDecades, type ChartSpec } from './svg.js';

/**
 * The note's charts, as chart specifications in display units. Every curve is either a
 * straight reading of a kernel result (wear depth linear in time, the pressure profile), a
 * call of a kernel function at other inputs (rolling life by ISO 281 from life.ts), or a
 * series computed beforehand (the journal design against speed, src/explore/journal-curves.ts):
 * the report draws what the kernels compute and derives no physics of its own.
 */
export interface NoteChart {
  /** Stable id (also the SVG element's id suffix). */
  id: string;
  /** Null when the chart does not apply; `caption` then says why. */
  spec: ChartSpec | null;
  caption: string;
}

/** SI value → number in display units (through the one unit table of units.ts). */
const disp = (x: number, unit: string, u: UnitSystem) => Number(fmtValue(x, unit, u, 9));
const range = (a: number, b: number, n: number, log: boolean) =>
  [...Array(n).keys()].map((i) => (log ? a * (b / a) ** (i / (n - 1)) : a + ((b - a) * i) / (n - 1)));

/** The bushing material the note shows: the best, else the nearest miss the advisor named. */
export function shownMaterial(a: AdviceResult): BushingMaterialResult | undefined {
  const id =
    a.checks.bushing.best ?? (a.ranking.find((r) => r.option === 'bushing')?.design['material'] as string | undefined);
  return a.checks.bushing.materials.find((m) => m.id === id) ?? a.checks.bushing.materials[0];
}

export function bushingWearChart(a: AdviceResult, c: CaseSI, u: UnitSystem): NoteChart {
  const m = shownMaterial(a);
  const id = 'bushing-wear';
  if (!m) return { id, spec: null, caption: 'No bushing material was checked: no wear chart.' };
  const T = c.life.hours;
  const allowance = c.life.wearAllowance;
  // Depth is linear in running time at a steady duty: rate = depth at the target / target hours.
  const lines = [
    { name: `typical wear factor (life ${fmt(m.lifeBand.typical, 'h', u)})`, depth: m.wearDepthBand.typical },
    { name: `high wear factor (life ${fmt(m.lifeBand.short, 'h', u)})`, depth: m.wearDepthBand.high },
    { name: `low wear factor (life ${fmt(m.lifeBand.long, 'h', u)})`, depth: m.wearDepthBand.low },
  ];
  const tMax = 1.5 * Math.max(T, Math.min(m.lifeHours, 3 * T));
  const yMax = Math.max(1.4 * allowance, Math.min(m.wearDepthBand.typical * (tMax / T), 3 * allowance));
  const lu = c.life.wearAllowance < 1e-3 && u === 'SI' ? 'um' : 'm';
  return {
    id,
    spec: {
      id,
      title: `Bushing wear: ${m.name}, ${fmt(m.length, 'm', u)} long`,
      x: { label: 'Running time', unit: 'h', min: 0, max: tMax },
      y: { label: 'Radial wear depth', unit: displayUnit(lu, u), min: 0, max: disp(yMax, lu, u) },
      // Each line is sampled only up to where it leaves the plot, so its markers stay visible.
      series: lines.map((l) => {
        const rate = l.depth / T;
        const tEnd = rate > 0 ? Math.min(tMax, yMax / rate) : tMax;
        return { name: l.name, points: range(0, tEnd, 11, false).map((t) => [t, disp(rate * t, lu, u)] as const) };
      }),
      refs: [
        { axis: 'y', value: disp(allowance, lu, u), label: `wear allowance ${fmt(allowance, 'm', u)}` },
        { axis: 'x', value: T, label: `life target ${fmt(T, 'h', u)}` },
      ],
    },
    caption:
      `Radial wear depth at the most loaded line against running hours for ${m.name} (${m.feasible ? 'the material chosen' : 'the nearest miss: no material passes'}). ` +
      `Archard wear is linear in time at a steady duty, so each line is depth = (h_T / T)·t with h_T the depth the bushing check computed at the life target T; ` +
      `the band lines use the high and low wear factors of the material's published scatter. The bushing meets its target where a line crosses the allowance to the right of the target line.`,
  };
}

export function rollingLifeChart(a: AdviceResult, c: CaseSI, u: UnitSystem): NoteChart {
  const r = a.checks.rolling;
  const id = 'rolling-life';
  const n = r.equivalentSpeed;
  const cands = [...r.candidates].sort((x, y) => Number(y.id === r.best) - Number(x.id === r.best)).slice(0, 6);
  if (!(n > 0) || cands.length === 0 || r.equivalentLoad === null || !(r.equivalentLoad > 0))
    return {
      id,
      spec: null,
      caption:
        'No rotation, no load or no candidate bearing: the basic rating life is not defined, so there is no life chart.',
    };
  const Pop = r.equivalentLoad;
  const loads = range(0.2 * Pop, 5 * Pop, 25, true);
  const series = cands.map((k) => {
    const p = lifeExponent(k.type);
    const pts = loads.flatMap((P) => {
      const L10 = basicRatingLife(k.dynamicRating, P, p);
      const h = L10 === null ? null : lifeHours(L10, n);
      return h === null ? [] : [[disp(P, 'N', u), h] as const];
    });
    return {
      name: `${k.id}, ${k.type}, C ${fmt(k.dynamicRating, 'N', u)}, p = ${k.type === 'ball' ? '3' : '10/3'}${k.id === r.best ? ' (chosen)' : ''}`,
      points: pts,
    };
  });
  const allH = series.flatMap((s) => s.points.map((p) => p[1]));
  const hMin = Math.min(...allH, c.life.hours);
  const hMax = Math.max(...allH, c.life.hours);
  return {
    id,
    spec: {
      id,
      title: 'Rolling bearing: basic rating life against load',
      x: { label: 'Dynamic equivalent load P', unit: displayUnit('N', u), log: true },
      y: { label: 'Basic rating life L10h', unit: 'h', log: spansDecades(hMin, hMax) },
      series,
      refs: [
        { axis: 'y', value: c.life.hours, label: `life target ${fmt(c.life.hours, 'h', u)}` },
        { axis: 'x', value: disp(Pop, 'N', u), label: `operating load P = ${fmt(Pop, 'N', u)}` },
      ],
    },
    caption:
      `Basic rating life L10h = 10^6·(C/P)^p / (3600·n) (ISO 281), drawn with the kernel's own life functions for each candidate's basic dynamic load rating C, ` +
      `p = 3 for ball and 10/3 for roller bearings, at the equivalent speed n = ${fmt(n, 'rev/s', u)}; the same formula the check uses. ` +
      `The check holds the modified life a1·a_ISO·L10h against the target; this chart shows the basic life, before those factors.`,
  };
}

/**
 * Film thickness and temperatures of the chosen journal design against speed: draws the
 * samples src/explore/journal-curves.ts computed (null: no film, so no speed charts).
 */
export function journalSpeedCharts(a: AdviceResult, curves: JournalSpeedCurves | null, u: UnitSystem): NoteChart[] {
  const j = a.checks.journal;
  const ids = ['journal-film', 'journal-temperature'];
  const gov = j.points[j.governingPoint];
  if (!gov || !curves) {
    const why = 'No hydrodynamic film at the operating point (no rotation or no lubricant): no speed charts.';
    return ids.map((id) => ({ id, spec: null, caption: why }));
  }
  const N = gov.speed;
  const rows = curves.samples;
  const rpm = (s: number) => disp(s, 'rev/s', u);
  const hu = u === 'SI' ? 'um' : 'm';
  const h = rows.map((x) => x.minFilmThickness);
  const hAllow = j.allowableFilmThickness;
  const filmLog = spansDecades(Math.min(...h, hAllow), Math.max(...h, hAllow));
  const runaway = rows.some((x) => x.thermalRunaway)
    ? ' Points marked as thermal runaway by the kernel carry temperatures that are lower bounds.'
    : '';
  const where = `the chosen design (${fmt(j.length, 'm', u)} long, radial clearance ${fmt(j.radialClearance, 'm', u)}, ${j.oil}) at the governing load ${fmt(gov.load, 'N', u)}`;
  const opLine = { axis: 'x' as const, value: rpm(N), label: `operating speed ${fmt(N, 'rev/s', u)}` };
  return [
    {
      id: ids[0]!,
      spec: {
        id: ids[0]!,
        title: 'Journal bearing: minimum film thickness against speed',
        x: { label: 'Shaft speed', unit: displayUnit('rev/s', u), log: true },
        y: { label: 'Minimum film thickness h0', unit: displayUnit(hu, u), log: filmLog },
        series: [
          {
            name: 'h0, finite-length Reynolds solution with thermal balance',
            points: rows.map((x) => [rpm(x.speed), disp(x.minFilmThickness, hu, u)] as const),
          },
        ],
        refs: [{ axis: 'y', value: disp(hAllow, hu, u), label: `allowable h0 ${fmt(hAllow, 'm', u)}` }, opLine],
      },
      caption: `Minimum film thickness of ${where}, from ${curves.lowFactor} to ${curves.highFactor} times the operating speed, each point computed by the journal kernel (evaluateDesign: load matching and thermal balance). The film is adequate above the allowable line.`,
    },
    {
      id: ids[1]!,
      spec: {
        id: ids[1]!,
        title: 'Journal bearing: film temperature against speed',
        x: { label: 'Shaft speed', unit: displayUnit('rev/s', u), log: true },
        y: { label: 'Temperature', unit: displayUnit('degC', u) },
        series: [
          {
            name: 'effective film temperature',
            points: rows.map((x) => [rpm(x.speed), disp(x.effectiveTemperature, 'degC', u)] as const),
          },
          {
            name: 'maximum (outlet) temperature estimate',
            points: rows.map((x) => [rpm(x.speed), disp(x.maxTemperature, 'degC', u)] as const),
          },
        ],
        refs: [
          {
            axis: 'y',
            value: disp(curves.maxTemperatureLimit, 'degC', u),
            label: `allowable maximum ${fmt(curves.maxTemperatureLimit, 'degC', u)}`,
          },
          opLine,
        ],
      },
      caption: `Effective and maximum film temperature of ${where}, by the journal kernel's thermal balance at each speed. The allowable line applies to the maximum temperature (${curves.maxTemperatureSource}).${runaway}`,
    },
  ];
}

export function journalPressureChart(a: AdviceResult, u: UnitSystem): NoteChart {
  const j = a.checks.journal;
  const id = 'journal-pressure';
  if (!j.pressureProfile.length)
    return {
      id,
      spec: null,
      caption:
        'No pressure distribution: no film at the governing point, or the eccentricity is beyond the solved table.',
    };
  return {
    id,
    spec: {
      id,
      title: 'Journal bearing: film pressure around the journal',
      x: {
        label: 'Angle from the maximum film, in the direction of rotation',
        unit: '°',
        min: 0,
        max: 360,
        ticks: [0, 60, 120, 180, 240, 300, 360],
      },
      y: { label: 'Film pressure at mid-length', unit: displayUnit('Pa', u) },
      series: [
        {
          name: `pressure at ε = ${fmtValue(j.eccentricityRatio, '1', u)}`,
          points: j.pressureProfile.map((p) => [p.angleDeg, disp(p.pressure, 'Pa', u)] as const),
        },
      ],
      refs: [
        {
          axis: 'x',
          value: j.peakPressureAngle,
          label: `peak ${fmt(j.peakPressure, 'Pa', u)} at ${fmtValue(j.peakPressureAngle, 'deg', u)}°`,
        },
      ],
    },
    caption:
      'Pressure of the oil film at mid-length around the journal at the governing operating point, as solved by the journal kernel (finite-difference Reynolds equation with the Reynolds cavitation condition: zero gauge pressure where the film ruptures).',
  };
}

/** Every chart of the note, in the order they appear. */
export function noteCharts(
  a: AdviceResult,
  c: CaseSI,
  u: UnitSystem,
  journalCurves: JournalSpeedCurves | null,
): NoteChart[] {
  return [
    bushingWearChart(a, c, u),
    rollingLifeChart(a, c, u),
    ...journalSpeedCharts(a, journalCurves, u),
    journalPressureChart(a, u),
  ];
}
