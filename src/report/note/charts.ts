import type { AdviceResult } from '../../advise/engine.js';
import type { CaseSI } from '../../case/types.js';
import type { BushingMaterialResult } from '../../calc/bushing/index.js';
import { basicRatingLife, lifeExponent, lifeHours } from '../../calc/rolling/life.js';
import type { JournalSpeedCurves } from '../../explore/journal-curves.js';
import { displayUnit, fmt, fmtValue, type UnitSystem } from '../units.js';
import { nice125, spansDecades, type ChartSpec } from './svg.js';

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
  const lives = [m.lifeBand.short, m.lifeBand.typical, m.lifeBand.long].filter((x) => Number.isFinite(x) && x > 0);
  const tShown = Math.max(T, Math.min(m.lifeHours, 3 * T));
  // Lives that span a decade or more (a short life against a long target) are read on a log time axis.
  const logTime = spansDecades(Math.min(...lives, T), Math.max(tShown, Math.min(Math.max(...lives, T), 3 * T)));
  const tMin = logTime ? nice125(0.5 * Math.min(...lives.filter((x) => x >= T / 1000), T), 'down') : 0;
  const tMax = logTime ? nice125(1.5 * tShown, 'up') : 1.5 * tShown;
  const yMax = Math.max(1.4 * allowance, Math.min(m.wearDepthBand.typical * (tMax / T), 3 * allowance));
  const lu = c.life.wearAllowance < 1e-3 && u === 'SI' ? 'um' : 'm';
  return {
    id,
    spec: {
      id,
      title: `Bushing wear: ${m.name}, ${fmt(m.length, 'm', u)} long`,
      x: { label: 'Running time', unit: 'h', min: tMin, max: tMax, log: logTime },
      y: { label: 'Radial wear depth', unit: displayUnit(lu, u), min: 0, max: disp(yMax, lu, u) },
      // Each line is sampled only up to where it reaches the top of the plot, so its markers stay inside.
      series: lines.map((l) => {
        const rate = l.depth / T;
        const tEnd = rate > 0 ? Math.max(tMin, Math.min(tMax, yMax / rate)) : tMax;
        const times = logTime && tEnd > tMin ? range(tMin, tEnd, 11, true) : range(tMin, tEnd, 11, false);
        return { name: l.name, points: times.map((t) => [t, disp(rate * t, lu, u)] as const) };
      }),
      refs: [
        { axis: 'y', value: disp(allowance, lu, u), label: `wear allowance ${fmt(allowance, lu, u)}` },
        { axis: 'x', value: T, label: `life target ${fmt(T, 'h', u)}` },
      ],
    },
    caption:
      `Radial wear depth at the most loaded line against running hours for ${m.name} (${m.feasible ? 'the material chosen' : 'the nearest miss: no material passes'}). ` +
      `Archard wear is linear in time at a steady duty, so each line is depth = (h_T / T)·t with h_T the depth the bushing check computed at the life target T; ` +
      `the band lines use the high and low wear factors of the material's published scatter.${logTime ? ' The time axis is logarithmic because the lives span a decade or more, so the straight lines of depth against time appear curved.' : ''} ` +
      `The bushing meets its target where a line crosses the allowance to the right of the target line.`,
  };
}

/**
 * Rolling life against load. The life that decides pass or fail is the modified life
 * L10mh = a1·a_ISO·L10h: for each candidate its line is the basic life scaled by the candidate's
 * own a1·a_ISO at the operating point (L10mh/L10h as the kernel computed them), so it passes
 * through the kernel's L10mh at the operating load; the chosen bearing's basic life is drawn
 * beside it for comparison.
 */
export function rollingLifeChart(a: AdviceResult, c: CaseSI, u: UnitSystem): NoteChart {
  const r = a.checks.rolling;
  const id = 'rolling-life';
  const n = r.equivalentSpeed;
  const cands = [...r.candidates].sort((x, y) => Number(y.id === r.best) - Number(x.id === r.best)).slice(0, 4);
  if (!(n > 0) || cands.length === 0 || r.equivalentLoad === null || !(r.equivalentLoad > 0))
    return {
      id,
      spec: null,
      caption:
        'No rotation, no load or no candidate bearing: the basic rating life is not defined, so there is no life chart.',
    };
  const Pop = r.equivalentLoad;
  // 25 loads from 0.2 to 5 × P, equal ratios: the middle one (index 12) is P itself.
  const loads = range(0.2 * Pop, 5 * Pop, 25, true);
  loads[12] = Pop;
  const lifeLine = (k: (typeof cands)[number], factor: number) =>
    loads.flatMap((P) => {
      const L10 = basicRatingLife(k.dynamicRating, P, lifeExponent(k.type));
      const h = L10 === null ? null : lifeHours(L10, n);
      return h === null ? [] : [[disp(P, 'N', u), factor * h] as const];
    });
  const about = (k: (typeof cands)[number]) =>
    `${k.id}, ${k.type}, C ${fmt(k.dynamicRating, 'N', u)}${k.id === r.best ? ' (chosen)' : ''}`;
  const series = cands.flatMap((k) => {
    const factor = k.L10mh !== null && k.L10h !== null && k.L10h > 0 ? k.L10mh / k.L10h : null;
    const modified =
      factor === null
        ? []
        : [
            {
              name: `${about(k)}: modified life L10mh, a1·a_ISO = ${fmtValue(factor, '1', u)}`,
              points: lifeLine(k, factor),
            },
          ];
    const basic =
      k.id === (r.best ?? cands[0]!.id) ? [{ name: `${about(k)}: basic life L10h`, points: lifeLine(k, 1) }] : [];
    return [...modified, ...basic];
  });
  const allH = series.flatMap((s) => s.points.map((p) => p[1]));
  const hMin = Math.min(...allH, c.life.hours);
  const hMax = Math.max(...allH, c.life.hours);
  return {
    id,
    spec: {
      id,
      title: 'Rolling bearing: modified and basic rating life against load',
      x: { label: 'Dynamic equivalent load P', unit: displayUnit('N', u), log: true },
      y: { label: 'Rating life', unit: 'h', log: spansDecades(hMin, hMax) },
      series,
      refs: [
        { axis: 'y', value: c.life.hours, label: `life target ${fmt(c.life.hours, 'h', u)}` },
        { axis: 'x', value: disp(Pop, 'N', u), label: `operating load P = ${fmt(Pop, 'N', u)}` },
      ],
    },
    caption:
      `Rating life against load for the chosen bearing and up to three other candidates, at the equivalent speed n = ${fmt(n, 'rev/s', u)}. ` +
      `Basic rating life L10h = 10^6·(C/P)^p / (3600·n) (ISO 281), p = 3 for ball and 10/3 for roller bearings, drawn with the same life functions the check uses. ` +
      `The check holds the modified life L10mh = a1·a_ISO·L10h against the target: each modified-life line is the basic life times the candidate's own a1·a_ISO at the operating point, ` +
      `so it meets the checked life at the operating load; away from that load a_ISO would change with P, so the lines are a guide there, not a check.`,
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
    ? ' Points marked as thermal runaway carry temperatures that are lower bounds.'
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
        refs: [{ axis: 'y', value: disp(hAllow, hu, u), label: `allowable h0 ${fmt(hAllow, hu, u)}` }, opLine],
      },
      caption: `Minimum film thickness of ${where}, from ${curves.lowFactor} to ${curves.highFactor} times the operating speed, each point computed for this design with the load matched and the thermal balance solved. The film is adequate above the allowable line.`,
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
      caption: `Effective and maximum film temperature of ${where}, from the thermal balance at each speed. The allowable line applies to the maximum temperature (${curves.maxTemperatureSource}).${runaway}`,
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
      'Pressure of the oil film at mid-length around the journal at the governing operating point, as solved for this design (finite-difference Reynolds equation with the Reynolds cavitation condition: zero gauge pressure where the film ruptures).',
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
