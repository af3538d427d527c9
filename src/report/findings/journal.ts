import { num } from '../../core/format.js';
import type { FindingValue } from '../../core/finding.js';
import type { KernelWording } from './types.js';

/**
 * Numbers in the journal's sentences: num(), except that the exponent form keeps its
 * trailing zeros ("3.000e-5" where num writes "3e-5"), the way these sentences have always
 * printed them, so that the text is unchanged.
 */
function textNum(value: FindingValue | undefined, digits = 4): string {
  const x = Number(value);
  const size = Math.abs(x);
  return x === 0 || !Number.isFinite(x) || (size >= 1e-3 && size < 1e6) ? num(x, digits) : x.toExponential(digits - 1);
}

/** A list value as written in a sentence: "0.5, 0.6, 0.7". */
const listed = (value: FindingValue | undefined): string => (Array.isArray(value) ? value.join(', ') : String(value));

/** Cubic metres per second to litres per minute (1 m³/s = 1000 L · 60 s/min). */
const LITRES_PER_MINUTE_PER_M3_S = 6e4;

/** Why the thrust runs on a rubbing face, by the thrust path's reason code (src/calc/journal/thrust.ts). */
const THRUST_RUBBING_REASON: Record<string, string> = {
  'no-supply': 'no lubricant supply: no film can form on thrust pads',
  grease: 'grease does not feed a full film on thrust pads',
  'no-rotation':
    'the shaft does not turn continuously at every point with axial load (or the pads do not fit the radial space): no film forms',
  'pad-film-thin': 'the pads would run below the allowable film, and a rubbing face passes its checks',
};

/** The words of the journal kernel's findings and assumptions, keyed by code. Values are SI (temperatures °C). */
export const journalWording: KernelWording = {
  findings: {
    'journal.oscillating': () =>
      'Oscillating shaft: evaluated at the equivalent rotational speed θ·f/π, but the sliding speed passes through zero at every reversal, so a hydrodynamic film cannot be sustained; the figures are an upper bound on the film.',
    'journal.zero-speed': () =>
      'At least one operating point has zero speed: no hydrodynamic film forms there (film thickness taken as zero).',
    'journal.grease-upper-bound': () =>
      'Grease supply: the film figures use the base oil viscosity as if a full film were fed; grease does not sustain one, so they are an upper bound.',
    'journal.no-lubricant': () => 'No lubricant supply: no film; hydrodynamic figures are zero.',
    'journal.length-exceeds-room': (v) =>
      `journal.length ${textNum(v['length'])} m exceeds space.maxLength ${textNum(v['maxLength'])} m.`,
    'journal.short-room': (v) =>
      `Axial room ${textNum(v['maxLength'])} m gives L/D = ${textNum(v['lengthToDiameter'], 3)}, below the usual ${String(v['usualMinLengthToDiameter'])}: a short bearing with large side leakage.`,
    'journal.light-load': (v) =>
      `Lightly loaded: eccentricity ratio ${textNum(v['eccentricityRatio'], 3)} below ${String(v['limit'])}; a plain full bearing is prone to oil whirl (consider a lobed or tilting-pad bearing, or a smaller length).`,
    'journal.low-unit-load': (v) =>
      `Mean unit load ${textNum(Number(v['unitLoad']) / 1e6, 3)} MPa is below the typical ${textNum(Number(v['typicalMin']) / 1e6, 2)}–${textNum(Number(v['typicalMax']) / 1e6, 2)} MPa: the bearing could be shorter (${String(v['source'])}).`,
    'journal.frequent-starts': (v) =>
      `Frequent starts (${String(v['startsPerHour'])} per hour, above ${String(v['limit'])}): each start runs in boundary lubrication; start-up unit load and lining wear govern (${String(v['source'])}).`,
    'journal.extrapolated': (v) =>
      `Eccentricity ratio beyond ${String(v['tableEnd'])} (the end of the solved table): ε and h0 are extrapolated and order-of-magnitude only; the film is far too thin in any case.`,
    'journal.thermal-runaway': (v) =>
      `No thermal equilibrium below ${String(v['ceiling'])} °C: the film would overheat (thermal runaway); the temperatures shown are lower bounds.`,
    'journal.oil-feed-flow': (v) =>
      `Oil feed: the pump must deliver at least ${textNum(Number(v['flow']) * LITRES_PER_MINUTE_PER_M3_S, 3)} L/min per bearing at the inlet temperature (common practice: size the supply above the film's inflow).`,
    'journal.ld-unchecked': (v) =>
      `L/D = ${textNum(v['lengthToDiameter'], 3)} is outside ${String(v['checkedMin'])}–${String(v['checkedMax'])}, the range the solver was checked against published tables.`,
  },
  assumptions: {
    'journal.solver': (v) => ({
      value: `mesh ${String(v['nTheta'])}×${String(v['nZeta'])} (half length), PSOR converged when max |Δp| per sweep ≤ ${String(v['psorTolerance'])}·max p; thermal balance to ${String(v['thermalTolerance'])} K`,
      reason:
        'convergence criteria of the finite-difference Reynolds solution and the temperature iteration; a solve or balance that does not converge stops the run with an error instead of reporting unconverged numbers',
    }),
    'journal.thrust-pad': (v) => ({
      value: `${textNum(v['axial'])} N on a hydrodynamic pad thrust bearing: ${String(v['pads'])} tapered-land pads, ${textNum(Number(v['inner']) * 1e3, 3)}–${textNum(Number(v['outer']) * 1e3, 3)} mm, taper depth ${textNum(Number(v['taperDepth']) * 1e6, 3)} µm`,
      reason: `the journal's oil forms a film on the pads at every point with axial load; the thrust collar takes ${textNum(Number(v['collar']) * 1e3, 3)} mm of the axial room beside the journal (common practice)`,
    }),
    'journal.thrust-rubbing': (v) => ({
      value: `${textNum(v['axial'])} N on a rubbing thrust face of ${String(v['material'])}, ${textNum(Number(v['inner']) * 1e3, 3)}–${textNum(Number(v['outer']) * 1e3, 3)} mm`,
      reason: `${THRUST_RUBBING_REASON[String(v['reason'])] ?? String(v['reason'])}; the face runs boundary lubricated and its washer takes ${textNum(Number(v['washer']) * 1e3, 3)} mm of the axial room beside the journal (common practice)`,
    }),
    'journal.start-load-running': (v) => ({
      value: `${textNum(v['load'])} N (the largest running load)`,
      reason:
        'no load.atStart given: the start-up unit load is checked as if the shaft started under its full running load; where the machine starts unloaded (dead weight only), give that load as load.atStart',
    }),
    'journal.fixed-viscosity': (v) => ({
      value: `${textNum(v['viscosity'])} Pa·s, fixed`,
      reason: `no thermal iteration; the temperature rise uses ρ = ${String(v['density'])} kg/m³, cp = ${String(v['specificHeat'])} J/(kg·K) (${String(v['source'])})`,
    }),
    'journal.grease-base-oil': (v) => ({
      value: `ISO VG ${String(v['grade'])} (grease base oil)`,
      reason: String(v['source']),
    }),
    'journal.length-swept': (v) => ({
      value: 'chosen from the sweep',
      reason: `L/D over ${listed(v['lengthToDiameter'])} within space.maxLength (${String(v['source'])})`,
    }),
    'journal.clearance-swept': (v) => ({
      value: 'chosen from the sweep',
      reason: `c/r over ${listed(v['clearanceRatio'])} (${String(v['source'])})`,
    }),
    'journal.grade-swept': () => ({
      value: 'chosen from the sweep',
      reason:
        'the journal grades of data/lubricants.json (sweepGrades), the one giving the largest film margin within the temperature limit',
    }),
    'journal.representative-design': (v) => ({
      value: `L = ${textNum(v['length'])} m, c = ${textNum(v['radialClearance'])} m`,
      reason: `with ${v['supply'] === 'none' ? 'no lubricant supply' : 'grease'} no design keeps a full film, so the design is not optimised: the longest allowed length and the common-practice clearance ratio ${String(v['clearanceRatio'])} show the numbers`,
    }),
    'journal.bath-temperature': (v) => ({
      value: `${textNum(v['temperature'])} °C (oil bath)`,
      reason: `oil inlet taken as the bath temperature of one sump heat balance, T_bath = T_amb + P/(h·A) = ${textNum(v['ambient'])} °C + ${textNum(v['loss'])} W / (${textNum(v['heatTransfer'])} W/(m²·K) · ${textNum(v['area'])} m²), P this design's own mean friction loss at that temperature${Number(v['thrustLoss'] ?? 0) > 0 ? ` (of it ${textNum(v['thrustLoss'], 3)} W from the thrust face in the same sump)` : ''}; housing taken as a cylinder ${String(v['diameterFactor'])} × the radial room across and ${String(v['lengthFactor'])} × the axial room long, ${textNum(Number(v['dissipatingShare']) * 100)} % of its surface giving heat to still air (our assumption); h: ${String(v['source'])}${v['runaway'] === true ? '. The loss outruns the housing: no balance below this bound, cooling is needed' : ''}`,
    }),
  },
};
