import type { Assumption, CaseSI, Supply } from '../../case/types.js';
import { makeCheck, type CheckRecord, type SheetLine } from '../../core/check.js';
import { operatingPoints, pointSpeed } from '../duty.js';
import { kinematicViscosity } from '../lubricant.js';
import { lubricants, oilGrade } from '../../data/load.js';
import { boundaryDimensions, rollingFactors, type BoundaryRow, type RollingFactors } from '../../data/rolling.js';
import { aIso, estimatedFatigueLimit, ratedViscosity, KAPPA_MIN } from './aiso.js';
import { dynamicEquivalentLoad, spectrumMean, staticEquivalentLoad } from './equivalent-load.js';
import { estimateBallGeometry, estimateRollerGeometry } from './geometry.js';
import {
  basicRatingLife,
  lifeExponent,
  lifeHours,
  reliabilityFactor,
  requiredDynamicRating,
  type RollingType,
} from './life.js';
import { ballDynamicRating, ballStaticRating, rollerDynamicRating, rollerStaticRating } from './ratings.js';
import { criticalSwingAngle, frictionPower, frictionTorque, relubricationInterval, speedFactor } from './speed.js';
import type { RollingCandidate, RollingResult } from './types.js';

export type { RollingCandidate, RollingResult } from './types.js';
export * from './life.js';
export * from './aiso.js';
export * from './equivalent-load.js';
export * from './ratings.js';
export * from './geometry.js';
export * from './speed.js';

/**
 * Rolling-element bearing check of a duty case (pure: reads the data tables, no other I/O).
 *
 * For each candidate bearing — the case's own bearing when a supplier's C and C0 are
 * given, and every ISO 15 row (data/rolling-boundary-dimensions.json) whose bore is
 * the shaft diameter and that fits the space — it works:
 *   P   = f_d·(X·Fr + Y·Fa) per operating point, duty mean P = (Σ Pi^p·ni·ti/Σ ni·ti)^(1/p)
 *   L10 = (C/P)^p (10⁶ rev), L10h = 10⁶·L10/(3600·n) (n rev/s), L10mh = a1·a_ISO·L10h
 *   κ = ν/ν1, a_ISO(κ, e_C·Cu/P), s0 = C0/P0 at the peak point, n·dm, M = μ·P·d/2,
 *   grease interval t_f.
 * Symbols: Fr, Fa radial and axial load (N); f_d service factor for the shock level;
 * n speed (rev/s); ν, ν1 kinematic and rated viscosity (m²/s); e_C contamination
 * factor; Cu fatigue load limit (N); dm pitch diameter (m); d bore (m).
 * The best candidate is the smallest (outside diameter, then width) that meets the
 * modified life L10mh ≥ target, static safety, speed factor, κ ≥ 0.1 and space, and
 * is not excluded (roller under axial load, ball beyond the X/Y table).
 * Validity: radial loads on single-row deep-groove ball and cylindrical roller
 * bearings; concept-stage estimates where ratings are estimated from boundary
 * dimensions. Sources: ISO 281:2007, ISO 76, ISO 15 (see each module), common
 * practice where said.
 */
/** `sheet: false` skips the calculation sheet's text (sweeps evaluate thousands of points). */
export function checkRolling(c: CaseSI, opts: { sheet?: boolean } = {}): RollingResult {
  const assumed: Assumption[] = [];
  const warnings: string[] = [];
  const warn = (w: string): void => {
    if (!warnings.includes(w)) warnings.push(w);
  };
  const f = rollingFactors();
  const d = c.shaft.diameter;

  // --- operating points -------------------------------------------------------
  const rawPoints = operatingPoints(c).map((q) => ({
    Fr: Number.isFinite(q.radial) ? Math.abs(q.radial) : 0,
    Fa: Number.isFinite(q.axial) ? Math.abs(q.axial) : 0,
    n: Math.max(0, finiteOr(pointSpeed(c, q), 0)),
    t: Math.max(0, finiteOr(q.share, 0)),
  }));
  if (operatingPoints(c).some((q) => !(q.radial >= 0) || !(q.axial >= 0))) {
    warn('a load was negative or not a number: its magnitude (or 0) is used');
  }
  const meanSpeed = (() => {
    const T = rawPoints.reduce((s, q) => s + q.t, 0);
    return T > 0 ? rawPoints.reduce((s, q) => s + q.n * q.t, 0) / T : 0;
  })();
  const maxSpeed = rawPoints.reduce((m, q) => Math.max(m, q.n), 0);
  if (c.shaft.oscillation) {
    assumed.push({
      field: 'shaft.oscillation',
      value: `equivalent rotational speed ${fmt(meanSpeed * 60)} r/min`,
      reason:
        'for life, an oscillating shaft is taken as rotating at n = θ·f/π, the speed that turns the same angle per second (common practice)',
    });
  }
  if (!(meanSpeed > 0))
    warn(
      'the shaft does not turn (mean speed 0): rating lives, viscosity ratio and speed checks do not apply; only static safety is checked',
    );

  // --- shock and service factor -------------------------------------------------
  const sf = f.serviceFactors.find((s) => s.shock === c.load.shock) ?? f.serviceFactors[0]!;
  assumed.push({
    field: 'load.shock',
    value: `service factor f_d = ${sf.serviceFactor}`,
    reason: `dynamic equivalent load multiplied by f_d for shock level "${c.load.shock}" (${sf.source}); static safety uses the peak operating point without f_d, its limit already graded by shock`,
  });
  const s0Row = f.staticSafety.find((s) => s.shock === c.load.shock) ?? f.staticSafety[1]!;

  // --- lubrication: supply, temperature, viscosity --------------------------------
  let supply: Supply = c.lubrication.supply;
  const sealed = supply === 'none';
  if (sealed) {
    supply = 'grease';
    assumed.push({
      field: 'lubrication.supply',
      value: 'sealed-for-life grease',
      reason:
        'a rolling bearing needs at least grease; with no supply a sealed, greased-for-life bearing is the practical reading, and its grease life is checked against the life target (common practice)',
    });
  }
  const speedSupply: 'grease' | 'oil-bath' | 'oil-feed' = supply === 'none' ? 'grease' : supply;
  const tempRise = speedSupply === 'oil-feed' ? 10 : 20;
  const tempBase = speedSupply === 'oil-feed' ? c.lubrication.inletTemperature : c.environment.ambient;
  const temperature = finiteOr(tempBase, 20) + tempRise;
  assumed.push({
    field: 'rolling.temperature',
    value: `${fmt(temperature)} °C`,
    reason:
      speedSupply === 'oil-feed'
        ? 'operating temperature of the bearing taken as oil inlet + 10 K (common practice for circulating oil)'
        : 'operating temperature of the bearing taken as ambient + 20 K (common practice for a grease- or bath-lubricated bearing in a housing)',
  });
  const viscosity = caseViscosity(c, speedSupply, temperature, assumed, warn); // m²/s

  // --- contamination and reliability ----------------------------------------------
  const cont = f.contamination.find((x) => x.level === c.environment.contamination) ?? f.contamination[1]!;
  assumed.push({
    field: 'environment.contamination',
    value: `e_C = ${cont.eC}`,
    reason: `"${cont.level}" read as ISO 281 "${cont.isoLevel}" (e_C ${cont.low}–${cont.high} for dm < 100 mm); the middle of the range is taken (${cont.source})`,
  });
  const rel = reliabilityFactor(finiteOr(c.life.reliability, 90));
  if (rel.clamped) {
    warn(
      `reliability ${c.life.reliability} % is outside the a1 formula's range 90–99.95 % (ISO 281:2007): ${rel.reliabilityUsed} % is used`,
    );
  }
  assumed.push({
    field: 'life.criterion',
    value: 'L10mh = a1·a_ISO·L10h ≥ life target',
    reason:
      'a candidate meets the life target on the modified rating life of ISO 281:2007, which counts lubrication and contamination; the required dynamic rating is the basic rating with a1 only (a_ISO = 1)',
  });

  // --- candidate list -------------------------------------------------------------------
  const specs: CandidateSpec[] = [];
  const rows = boundaryDimensions().rows;
  const sameBore = rows.filter((r) => Math.abs(r.bore_mm / 1000 - d) <= 1e-5);
  const wantType = c.rolling?.type;
  const supplierC = c.rolling?.dynamicRating;
  const supplierC0 = c.rolling?.staticRating;
  if (!(d > 0) || !Number.isFinite(d)) {
    warn(`shaft diameter ${d} m is not a positive number: no bearing can be chosen`);
  } else if (sameBore.length === 0) {
    warn(
      `shaft diameter ${fmt(d * 1000)} mm is not a standard bore in the ISO 15 table; nearest bores: ${nearestBores(rows, d * 1000).join(' and ')} mm`,
    );
  }

  if (supplierC !== undefined || supplierC0 !== undefined) {
    if (supplierC !== undefined && supplierC0 !== undefined && supplierC > 0 && supplierC0 > 0 && d > 0) {
      specs.push(supplierSpec(c, supplierC, supplierC0, sameBore, f, assumed, warn));
    } else {
      warn(
        'a supplier bearing needs both a positive dynamic rating C and static rating C0; the supplier values given are not used',
      );
    }
  }
  let spaceExcluded = 0;
  const spaceReasons: string[] = [];
  for (const r of sameBore) {
    if (wantType !== undefined && r.type !== wantType) continue;
    const D = r.outerDiameter_mm / 1000;
    const B = r.width_mm / 1000;
    const tooWide = B > c.space.maxLength;
    const tooBig = D > c.space.maxOuterDiameter;
    if (tooWide || tooBig) {
      spaceExcluded++;
      spaceReasons.push(
        `${r.designation} (${r.outerDiameter_mm}×${r.width_mm} mm: ${[tooBig ? `D > ${fmt(c.space.maxOuterDiameter * 1000)} mm` : '', tooWide ? `B > ${fmt(c.space.maxLength * 1000)} mm` : ''].filter(Boolean).join(', ')})`,
      );
      continue;
    }
    specs.push(estimatedSpec(r, f));
  }
  if (spaceExcluded > 0)
    warn(`${spaceExcluded} ISO 15 size(s) of this bore excluded by the space available: ${spaceReasons.join('; ')}`);
  if (specs.some((s) => s.ratingSource === 'estimated')) {
    assumed.push({
      field: 'rolling.ratings',
      value: 'C and C0 estimated from ISO 15 boundary dimensions',
      reason: `internal geometry estimated (${f.geometryEstimate.source}); C by ISO 281:2007, C0 by ISO 76 from that geometry; a supplier's rating replaces the estimate`,
    });
  }
  if (specs.some((s) => s.fatigueLimitEstimated)) {
    assumed.push({
      field: 'rolling.fatigueLimit',
      value: 'Cu = C0/22 (ball), C0/8.2 (roller); above dm = 100 mm × (100/dm)^0.5 (ball), × (100/dm)^0.3 (roller)',
      reason: 'no supplier fatigue load limit; the approximation of ISO 281:2007 Annex B is taken (from memory)',
    });
  }

  // --- evaluate ------------------------------------------------------------------------
  const ctx: EvalContext = {
    c,
    f,
    points: rawPoints,
    maxSpeed,
    serviceFactor: sf.serviceFactor,
    s0Row,
    cont,
    a1: rel.a1,
    sealed,
    speedSupply,
    temperature,
    viscosity,
    warn,
  };
  const candidates = specs.map((s) => evaluate(s, ctx));

  const feasibleOnes = candidates
    .filter((k) => k.feasible)
    .sort(
      (a, b) =>
        orderNullLast(a.outerDiameter, b.outerDiameter) ||
        orderNullLast(a.width, b.width) ||
        (a.ratingSource === 'supplier' ? -1 : 0) - (b.ratingSource === 'supplier' ? -1 : 0) ||
        (a.type === 'ball' ? -1 : 0) - (b.type === 'ball' ? -1 : 0),
    );
  const best = feasibleOnes[0] ?? null;
  if (!best) {
    if (candidates.length === 0)
      warn(
        'no rolling bearing candidate: none of the ISO 15 sizes of this bore fits, and no supplier bearing is given',
      );
    for (const k of candidates) {
      const why = [
        ...k.exclusions,
        ...k.checks.filter((x) => !x.pass).map((x) => `${x.label}: ${fmt(x.value)} against ${fmt(x.limit)} ${x.unit}`),
      ];
      warn(`${k.designation} not suitable: ${why.join('; ')}`);
    }
  }

  // --- top-level figures ----------------------------------------------------------------------
  const lead = best ?? candidates[0] ?? null;
  let equivalentLoad: number | null = lead ? lead.equivalentLoad : null;
  let leadType: RollingType = lead?.type ?? wantType ?? 'ball';
  if (!lead) {
    // Upper bound over the X/Y table: every row has e ≥ 0.19 and Y ≤ 2.30.
    const bound = rawPoints.map((q) => ({
      P: sf.serviceFactor * (q.Fr > 0 && q.Fa / q.Fr <= 0.19 ? q.Fr : Math.max(q.Fr, 0.56 * q.Fr + 2.3 * q.Fa)),
      n: q.n,
      t: q.t,
    }));
    leadType = 'ball';
    equivalentLoad = spectrumMean(bound, 3).P;
    assumed.push({
      field: 'equivalentLoad',
      value: `${fmt(equivalentLoad)} N`,
      reason:
        'no candidate to read X and Y from: the upper bound of P over the deep-groove ball X/Y table is given (X = 1 when Fa/Fr ≤ 0.19, else the larger of Fr and 0.56·Fr + 2.30·Fa)',
    });
  }
  const requiredC =
    equivalentLoad !== null
      ? requiredDynamicRating(equivalentLoad, meanSpeed, c.life.hours, lifeExponent(leadType), rel.a1)
      : null;
  if (!(c.life.hours > 0)) warn('no life target (life.hours ≤ 0): the life check is left out');

  const sheet = lead && opts.sheet !== false ? sheetFor(lead, ctx, meanSpeed) : [];
  return {
    option: 'rolling',
    equivalentLoad,
    equivalentSpeed: meanSpeed,
    requiredDynamicRating: requiredC,
    requiredDynamicRatingFor: requiredC !== null ? { type: leadType, p: lifeExponent(leadType) } : null,
    candidates,
    best: best ? best.id : null,
    feasible: best !== null,
    assumed,
    warnings,
    sheet,
  };
}

// ---------------------------------------------------------------------------------------------
interface CandidateSpec {
  id: string;
  type: RollingType;
  kind: string;
  series: string;
  designation: string;
  bore: number;
  outerDiameter: number | null;
  width: number | null;
  C: number;
  C0: number;
  Cu: number;
  fatigueLimitEstimated: boolean;
  ratingSource: 'supplier' | 'estimated';
  dm: number;
  Dw: number;
  Z: number;
}

interface EvalContext {
  c: CaseSI;
  f: RollingFactors;
  points: { Fr: number; Fa: number; n: number; t: number }[];
  maxSpeed: number;
  serviceFactor: number;
  s0Row: RollingFactors['staticSafety'][number];
  cont: RollingFactors['contamination'][number];
  a1: number;
  sealed: boolean;
  speedSupply: 'grease' | 'oil-bath' | 'oil-feed';
  temperature: number;
  viscosity: number;
  warn: (w: string) => void;
}

const KIND = { ball: 'deep-groove ball', roller: 'cylindrical roller' } as const;

function estimatedSpec(r: BoundaryRow, f: RollingFactors): CandidateSpec {
  const d = r.bore_mm / 1000;
  const D = r.outerDiameter_mm / 1000;
  const B = r.width_mm / 1000;
  const base = {
    id: r.id,
    type: r.type,
    kind: r.kind,
    series: r.series,
    designation: r.designation,
    bore: d,
    outerDiameter: D,
    width: B,
    ratingSource: 'estimated' as const,
    fatigueLimitEstimated: true,
  };
  if (r.type === 'ball') {
    const g = estimateBallGeometry(d, D, f.geometryEstimate);
    const C = ballDynamicRating(g, f.ratingFactors.fcBall).value;
    const C0 = ballStaticRating(g, f.ratingFactors.f0Ball).value;
    return { ...base, C, C0, Cu: estimatedFatigueLimit('ball', C0, g.Dpw), dm: g.Dpw, Dw: g.Dw, Z: g.Z };
  }
  const g = estimateRollerGeometry(d, D, B, f.geometryEstimate);
  const C = rollerDynamicRating(g, f.ratingFactors.fcRoller).value;
  const C0 = rollerStaticRating(g).value;
  return { ...base, C, C0, Cu: estimatedFatigueLimit('roller', C0, g.Dpw), dm: g.Dpw, Dw: g.Dwe, Z: g.Z };
}

function supplierSpec(
  c: CaseSI,
  C: number,
  C0: number,
  sameBore: BoundaryRow[],
  f: RollingFactors,
  assumed: Assumption[],
  warn: (w: string) => void,
): CandidateSpec {
  const d = c.shaft.diameter;
  const type: RollingType = c.rolling?.type ?? 'ball';
  if (c.rolling?.type === undefined) {
    assumed.push({
      field: 'rolling.type',
      value: 'ball',
      reason: 'the supplier bearing has no type given: a deep-groove ball bearing is taken',
    });
  }
  const row = sameBore.filter((r) => r.type === type).sort((a, b) => a.outerDiameter_mm - b.outerDiameter_mm)[0];
  let D: number | null = c.rolling?.outerDiameter ?? null;
  let B: number | null = c.rolling?.width ?? null;
  if ((D === null || B === null) && row) {
    if (D === null) D = row.outerDiameter_mm / 1000;
    if (B === null) B = row.width_mm / 1000;
    assumed.push({
      field: 'rolling.outerDiameter/width',
      value: `${fmt(D * 1000)} × ${fmt(B * 1000)} mm`,
      reason: `supplier bearing dimensions not given: taken from the ISO 15 row "${row.designation}" of the same bore`,
    });
  }
  const Dgeom = D ?? 2 * d;
  if (D === null)
    warn(
      'supplier bearing outside diameter not given and no ISO 15 row of its bore: pitch diameter taken as 1.5·d and the space check on D is left out',
    );
  if (B === null)
    warn('supplier bearing width not given and no ISO 15 row of its bore: the space check on width is left out');
  if (type === 'ball' && C0 > 1.2 * C) {
    warn(
      `supplier ratings C0/C = ${fmt(C0 / C)}: unusual for a deep-groove ball bearing, whose C0 is normally below C (common practice); check the datasheet and the bearing type`,
    );
  }
  const g =
    type === 'ball'
      ? (() => {
          const b = estimateBallGeometry(d, Dgeom, f.geometryEstimate);
          return { dm: b.Dpw, Dw: b.Dw, Z: b.Z };
        })()
      : (() => {
          const r = estimateRollerGeometry(d, Dgeom, B ?? (Dgeom - d) / 2, f.geometryEstimate);
          return { dm: r.Dpw, Dw: r.Dwe, Z: r.Z };
        })();
  const CuGiven = c.rolling?.fatigueLimit;
  const Cu = CuGiven !== undefined && CuGiven > 0 ? CuGiven : estimatedFatigueLimit(type, C0, g.dm);
  return {
    id: 'supplier',
    type,
    kind: KIND[type],
    series: 'supplier',
    designation: `supplier ${KIND[type]} bearing, bore ${fmt(d * 1000)}`,
    bore: d,
    outerDiameter: D,
    width: B,
    C,
    C0,
    Cu,
    fatigueLimitEstimated: !(CuGiven !== undefined && CuGiven > 0),
    ratingSource: 'supplier',
    ...g,
  };
}

function evaluate(s: CandidateSpec, x: EvalContext): RollingCandidate {
  const { c, f } = x;
  const p = lifeExponent(s.type);
  const checks: CheckRecord[] = [];
  const exclusions: string[] = [];

  // Dynamic equivalent load per point.
  const per = x.points.map((q) => {
    const r = dynamicEquivalentLoad(s.type, q.Fr, q.Fa, s.C0, f.xyDeepGrooveBall);
    if (r.exclusion && !exclusions.includes(r.exclusion)) exclusions.push(r.exclusion);
    if (r.range === 'below' && r.faC0 !== null && r.faC0 > 0 && r.Y > 0) {
      x.warn(
        `${s.designation}: Fa/C0 = ${r.faC0.toFixed(4)} is below the first row of the ISO 281 X/Y table (0.014); e and Y of that row are used (Y would be somewhat larger): not extrapolated`,
      );
    }
    return { ...r, Pf: x.serviceFactor * r.P, n: q.n, t: q.t, Fr: q.Fr, Fa: q.Fa };
  });
  const heaviest = per.reduce((a, b) => (b.Pf > a.Pf ? b : a), per[0]!);
  const mean = spectrumMean(
    per.map((q) => ({ P: q.Pf, n: q.n, t: q.t })),
    p,
  );
  const P = mean.P;
  const n = mean.n;

  // Lives.
  const L10 = basicRatingLife(s.C, P, p);
  const L10h = L10 !== null ? lifeHours(L10, n) : null;
  const nu1 = ratedViscosity(n, s.dm);
  const kappa = nu1 !== null ? x.viscosity / nu1 : null;
  let aISO: number | null = null;
  if (kappa !== null && P > 0) {
    const a = aIso(s.type, kappa, (x.cont.eC * s.Cu) / P);
    aISO = a.aISO;
    if (a.kappaRange === 'above')
      x.warn(`${s.designation}: viscosity ratio κ = ${fmt(kappa)} > 4 is taken as 4, as ISO 281:2007 says`);
    if (a.kappaRange === 'below') {
      x.warn(
        `${s.designation}: viscosity ratio κ = ${fmt(kappa)} < 0.1 is outside the a_ISO method of ISO 281:2007; a_ISO at κ = 0.1 is shown for orientation only and the lubrication check fails`,
      );
    }
    if (a.capped) x.warn(`${s.designation}: a_ISO reached its cap of 50 (ISO 281:2007)`);
  }
  if (s.dm >= 0.1)
    x.warn(
      `${s.designation}: pitch diameter ${fmt(s.dm * 1000)} mm ≥ 100 mm; e_C is taken from the dm < 100 mm guidance, which is the lower (conservative) one`,
    );
  const L10mh = L10h !== null && aISO !== null ? x.a1 * aISO * L10h : null;

  // Static.
  const P0 = x.points.reduce((m, q) => Math.max(m, staticEquivalentLoad(s.type, q.Fr, q.Fa)), 0);
  const s0 = P0 > 0 ? s.C0 / P0 : null;
  const s0Limit = s.type === 'ball' ? x.s0Row.ball : x.s0Row.roller;

  // Speed, friction, grease.
  const ndm = speedFactor(x.maxSpeed, s.dm);
  const lim = f.speedLimits.find((l) => l.type === s.type && l.supply === x.speedSupply);
  const mu = f.friction.find((q) => q.type === s.type)!;
  let sumT = 0;
  let sumM = 0;
  let sumW = 0;
  for (const q of per) {
    const M = frictionTorque(mu.mu, q.P, s.bore);
    sumT += q.t;
    sumM += q.t * M;
    sumW += q.t * frictionPower(M, q.n);
  }
  // Time means over the duty (weights ti): the torque Σ ti·Mi/Σ ti and the power Σ ti·Mi·2π·ni/Σ ti.
  const torque = sumT > 0 ? sumM / sumT : 0;
  const power = sumT > 0 ? sumW / sumT : 0;
  let relub: number | null = null;
  if (x.speedSupply === 'grease') {
    const kf = f.relubrication.find((q) => q.type === s.type)!;
    relub = relubricationInterval(x.maxSpeed, s.bore, kf.kf, x.temperature);
    if (relub === 0)
      x.warn(
        `${s.designation}: the grease interval formula gives no positive interval at ${fmt(x.maxSpeed * 60)} r/min: too fast for grease by this rule; oil is needed`,
      );
  }

  // Oscillation.
  let swing: number | null = null;
  if (c.shaft.oscillation) {
    swing = criticalSwingAngle(s.Z, s.Dw, s.dm);
    if (c.shaft.oscillation.angle < swing) {
      x.warn(
        `${s.designation}: swing ${fmt((c.shaft.oscillation.angle * 180) / Math.PI)}° is smaller than ${fmt((swing * 180) / Math.PI)}°, the swing for each of its ${s.Z} rolling elements to roll onto its neighbour's track (720°/(Z·(1 − Dw/dm)), estimated geometry): the same track patches carry every cycle; false brinelling and fretting are the risk and the equivalent-speed life is not reliable`,
      );
    }
  }

  // Checks.
  if (L10mh !== null && c.life.hours > 0) {
    checks.push(
      makeCheck(
        'rolling-life',
        'modified rating life L10mh',
        L10mh,
        c.life.hours,
        'h',
        'min',
        'ISO 281:2007, modified rating life L10m = a1·a_ISO·L10 (cl. 9, from memory); target from the case',
      ),
    );
  }
  if (kappa !== null) {
    checks.push(
      makeCheck(
        'viscosity-ratio',
        'viscosity ratio κ = ν/ν1 within the a_ISO method',
        kappa,
        KAPPA_MIN,
        '1',
        'min',
        'ISO 281:2007, a_ISO valid for 0.1 ≤ κ ≤ 4 (from memory)',
      ),
    );
  }
  if (L10 !== null && P > 0) {
    checks.push(
      makeCheck(
        'load-ratio',
        'dynamic equivalent load P/C',
        P / s.C,
        0.5,
        '1',
        'max',
        'ISO 281:2007 (from memory): the rating-life equation is not meant for P > 0.5·C',
      ),
    );
  }
  if (s0 !== null) {
    checks.push(
      makeCheck(
        'static-safety',
        `static safety s0 = C0/P0 (${x.s0Row.guidance})`,
        s0,
        s0Limit,
        '1',
        'min',
        `ISO 76 s0 = C0/P0; limit: ${x.s0Row.source}`,
      ),
    );
  }
  if (s.type === 'ball') {
    const faC0 = x.points.reduce((m, q) => Math.max(m, q.Fa / s.C0), 0);
    if (faC0 > 0) {
      const last = f.xyDeepGrooveBall.rows[f.xyDeepGrooveBall.rows.length - 1]!.faC0;
      checks.push(
        makeCheck(
          'axial-load-table',
          'relative axial load Fa/C0 within the X/Y table',
          faC0,
          last,
          '1',
          'max',
          f.xyDeepGrooveBall.source,
        ),
      );
    }
  }
  if (ndm > 0 && lim) {
    checks.push(
      makeCheck('speed-factor', `speed factor n·dm (${x.speedSupply})`, ndm, lim.ndm, 'mm*r/min', 'max', lim.source),
    );
  }
  if (s.outerDiameter !== null && c.space.maxOuterDiameter > 0) {
    checks.push(
      makeCheck(
        'space-outer-diameter',
        'bearing outside diameter against the housing room',
        s.outerDiameter,
        c.space.maxOuterDiameter,
        'm',
        'max',
        'case space; bearing dimensions ISO 15 (from memory) or supplier',
      ),
    );
  }
  if (s.width !== null && c.space.maxLength > 0) {
    checks.push(
      makeCheck(
        'space-width',
        'bearing width against the axial room',
        s.width,
        c.space.maxLength,
        'm',
        'max',
        'case space; bearing dimensions ISO 15 (from memory) or supplier',
      ),
    );
  }
  if (x.sealed && relub !== null && c.life.hours > 0) {
    checks.push(
      makeCheck(
        'grease-life',
        'grease life of the sealed bearing (relubrication-interval formula)',
        relub,
        c.life.hours,
        'h',
        'min',
        f.relubrication.find((q) => q.type === s.type)!.source,
      ),
    );
  }

  const feasible = exclusions.length === 0 && checks.every((k) => k.pass);
  return {
    id: s.id,
    type: s.type,
    kind: s.kind,
    series: s.series,
    designation: s.designation,
    bore: s.bore,
    outerDiameter: s.outerDiameter,
    width: s.width,
    dynamicRating: s.C,
    staticRating: s.C0,
    fatigueLimit: s.Cu,
    ratingSource: s.ratingSource,
    pitchDiameter: s.dm,
    elementDiameter: s.Dw,
    elementCount: s.Z,
    X: heaviest.X,
    Y: heaviest.Y,
    equivalentLoad: P,
    staticEquivalentLoad: P0,
    L10,
    L10h,
    a1: x.a1,
    aISO,
    kappa,
    L10mh,
    s0,
    ndm,
    frictionTorque: torque,
    frictionPower: power,
    requiredDynamicRating: requiredDynamicRating(P, n, c.life.hours, p, x.a1),
    relubricationHours: relub,
    temperature: x.temperature,
    viscosity: x.viscosity,
    ratedViscosity: nu1,
    criticalSwingAngle: swing,
    exclusions,
    feasible,
    checks,
  };
}

/** Kinematic viscosity of the case's oil or grease base oil at tC, m²/s. */
function caseViscosity(
  c: CaseSI,
  supply: 'grease' | 'oil-bath' | 'oil-feed',
  tC: number,
  assumed: Assumption[],
  warn: (w: string) => void,
): number {
  const RHO = 870; // kg/m³, typical mineral oil (from memory, data/lubricants.json range 865–900)
  const mu = c.lubrication.viscosity;
  if (mu !== undefined && mu > 0) {
    const nu = mu / RHO;
    assumed.push({
      field: 'lubrication.viscosity',
      value: `ν = ${fmt(nu * 1e6)} mm²/s`,
      reason: `the fixed dynamic viscosity ${mu} Pa·s is taken at the operating temperature and converted with a density of ${RHO} kg/m³ (typical mineral oil, from memory)`,
    });
    return nu;
  }
  const lub = lubricants();
  let grade = c.lubrication.oilGrade;
  if (grade !== undefined && supply === 'grease') {
    assumed.push({
      field: 'lubrication.oilGrade',
      value: `ISO VG ${grade}`,
      reason: 'with grease supply the named oil grade is taken as the grease base oil',
    });
  }
  if (grade === undefined) {
    grade = supply === 'grease' ? lub.greaseBaseOil.grade : 68;
    assumed.push({
      field: 'lubrication.oilGrade',
      value: `ISO VG ${grade}`,
      reason:
        supply === 'grease'
          ? `grease base oil (${lub.greaseBaseOil.source})`
          : 'no oil grade given: ISO VG 68, a common general-machinery grade (common practice)',
    });
  }
  let oil = oilGrade(grade);
  if (!oil) {
    warn(
      `ISO VG ${grade} is not in data/lubricants.json: the grease base oil grade ${lub.greaseBaseOil.grade} is used instead`,
    );
    oil = oilGrade(lub.greaseBaseOil.grade) ?? lub.grades[0]!;
  }
  return kinematicViscosity(oil, tC) * 1e-6;
}

/** Largest number of operating points written out term by term on the sheet; more are summed in words. */
const SHEET_TERMS_MAX = 4;

/**
 * The calculation sheet of one candidate. Each line's `substituted` ends in an expression
 * (numbers, or a function of named arguments) whose value is the line's `value`: reports
 * print `substituted = value unit`.
 */
function sheetFor(k: RollingCandidate, x: EvalContext, n: number): SheetLine[] {
  const lines: SheetLine[] = [];
  const pTxt = k.type === 'ball' ? '3' : '10/3';
  /** 1/p written as a plain fraction: "1/10/3" would read as 1/30. */
  const invTxt = k.type === 'ball' ? '1/3' : '3/10';
  /** p as an exponent: "^10/3" would read as (…^10)/3. */
  const powTxt = k.type === 'ball' ? '3' : '(10/3)';
  const mu = x.f.friction.find((q) => q.type === k.type)!.mu;
  // Per-point loads as evaluate() works them: Pi without f_d (friction), f_d·Pi (life).
  const per = x.points.map((q) => ({
    ...q,
    P: dynamicEquivalentLoad(k.type, q.Fr, q.Fa, k.staticRating, x.f.xyDeepGrooveBall).P,
  }));
  const many = per.length > SHEET_TERMS_MAX;
  const sumT = per.reduce((acc, q) => acc + Math.max(0, q.t), 0);
  const byRevolutions = per.some((q) => q.n > 0 && q.t > 0);
  if (per.length > 1) {
    const w = (q: (typeof per)[number]): string => (byRevolutions ? `${fmt(q.n * 60)}·${fmt(q.t)}` : fmt(q.t));
    const num = many
      ? `Σ over ${per.length} points of Pi^${powTxt}·${byRevolutions ? 'ni·ti' : 'ti'}`
      : per.map((q) => `${fmt(x.serviceFactor * q.P)}^${powTxt}·${w(q)}`).join(' + ');
    const den = many ? (byRevolutions ? 'Σ ni·ti' : 'Σ ti') : per.map(w).join(' + ');
    lines.push({
      label: `Dynamic equivalent load P (${k.designation})`,
      formula: `P = (Σ Pi^p·${byRevolutions ? 'ni·ti / Σ ni·ti' : 'ti / Σ ti'})^(1/p), Pi = f_d·(X·Fr + Y·Fa), p = ${pTxt}, f_d = ${x.serviceFactor}${byRevolutions ? ', n in r/min' : ''}`,
      substituted: `P = [(${num})/(${den})]^(${invTxt})`,
      value: k.equivalentLoad,
      unit: 'N',
      source: 'ISO 281:2007 (X, Y table; variable load); service factor common practice',
    });
  } else {
    const q = x.points[0];
    const X = q ? fmt(k.X) : '0';
    lines.push({
      label: `Dynamic equivalent load P (${k.designation})`,
      formula: 'P = f_d·(X·Fr + Y·Fa)',
      substituted: q ? `P = ${x.serviceFactor}·(${X}·${fmt(q.Fr)} N + ${fmt(k.Y)}·${fmt(q.Fa)} N)` : 'P = 0',
      value: k.equivalentLoad,
      unit: 'N',
      source: 'ISO 281:2007 (X, Y table); service factor common practice',
    });
  }
  if (k.L10 !== null) {
    lines.push({
      label: 'Basic rating life L10',
      formula: 'L10 = (C/P)^p',
      substituted: `L10 = (${fmt(k.dynamicRating)} N / ${fmt(k.equivalentLoad)} N)^${powTxt}`,
      value: k.L10,
      unit: '10^6 rev',
      source: 'ISO 281:2007',
    });
  }
  if (k.L10h !== null && k.L10 !== null) {
    lines.push({
      label: 'Basic rating life L10h',
      formula: 'L10h = 10^6·L10/(60·n)',
      substituted: `L10h = 10^6·${fmt(k.L10)}/(60·${fmt(n * 60)} r/min)`,
      value: k.L10h,
      unit: 'h',
      source: 'ISO 281:2007',
    });
  }
  if (k.requiredDynamicRating !== null && x.c.life.hours > 0) {
    lines.push({
      label: `Basic dynamic rating needed for the life target (${KIND[k.type]}, p = ${pTxt})`,
      formula: 'C_req = P·(L_req/a1)^(1/p), L_req = 60·n·h/10^6 (n in r/min)',
      substituted: `C_req = ${fmt(k.equivalentLoad)} N·(60·${fmt(n * 60)} r/min·${fmt(x.c.life.hours)} h/10^6/${fmt(k.a1)})^(${invTxt})`,
      value: k.requiredDynamicRating,
      unit: 'N',
      source: 'ISO 281:2007, from L10 = (C/P)^p with a1 (a_ISO taken as 1)',
    });
  }
  if (k.ratedViscosity !== null && k.kappa !== null) {
    const rpm = n * 60;
    lines.push({
      label: 'Rated viscosity ν1',
      formula:
        rpm < 1000 ? 'ν1 = 45000·n^-0.83·dm^-0.5 (mm²/s, r/min, mm)' : 'ν1 = 4500·n^-0.5·dm^-0.5 (mm²/s, r/min, mm)',
      substituted: `ν1 = ${rpm < 1000 ? '45000' : '4500'}·${fmt(rpm)}^${rpm < 1000 ? '-0.83' : '-0.5'}·${fmt(k.pitchDiameter * 1000)}^-0.5 mm²/s`,
      value: k.ratedViscosity,
      unit: 'm^2/s',
      source: 'ISO 281:2007 (from memory)',
    });
    lines.push({
      label: 'Viscosity ratio κ',
      formula: 'κ = ν/ν1, ν at the operating temperature',
      substituted: `κ = ν(${fmt(k.temperature)} °C)/ν1 = ${fmt(k.viscosity * 1e6)} mm²/s / ${fmt(k.ratedViscosity * 1e6)} mm²/s`,
      value: k.kappa,
      unit: '1',
      source: 'ISO 281:2007',
    });
  }
  if (k.aISO !== null) {
    const eCCuP = (x.cont.eC * k.fatigueLimit) / k.equivalentLoad;
    lines.push({
      label: 'Contamination and fatigue-limit term e_C·Cu/P',
      formula: 'e_C·Cu/P',
      substituted: `${fmt(x.cont.eC)}·${fmt(k.fatigueLimit)} N/${fmt(k.equivalentLoad)} N`,
      value: eCCuP,
      unit: '1',
      source: `ISO 281:2007 (from memory); e_C for "${x.cont.level}" (${x.cont.source})`,
    });
    const kappaUsed = Math.min(4, Math.max(0.1, k.kappa ?? 0));
    const args = `a_ISO(κ = ${fmt(kappaUsed)}, e_C·Cu/P = ${fmt(eCCuP)})`;
    lines.push({
      label: 'Life modification factor a_ISO',
      formula: `${k.type === 'ball' ? 'a_ISO = 0.1·[1 − (2.5671 − y/κ^z)^0.83·(e_C·Cu/P)^(1/3)]^-9.3' : 'a_ISO = 0.1·[1 − (1.5859 − y/κ^z)·(e_C·Cu/P)^0.4]^-9.185'}, y and z per κ band, κ held to 0.1–4, a_ISO ≤ 50`,
      substituted: k.aISO >= 50 ? `min(50, ${args})` : args,
      value: k.aISO,
      unit: '1',
      source: 'ISO 281:2007 (from memory)',
    });
  }
  const Rused = reliabilityFactor(finiteOr(x.c.life.reliability, 90)).reliabilityUsed;
  lines.push({
    label: 'Reliability factor a1',
    formula: 'a1 = 0.95·[ln(100/R)/ln(100/90)]^(2/3) + 0.05, R in %',
    substituted: `a1 = 0.95·[ln(100/${fmt(Rused)})/ln(100/90)]^(2/3) + 0.05`,
    value: k.a1,
    unit: '1',
    source: 'ISO 281:2007',
  });
  if (k.L10mh !== null && k.L10h !== null && k.aISO !== null) {
    lines.push({
      label: 'Modified rating life L10mh',
      formula: 'L10mh = a1·a_ISO·L10h',
      substituted: `L10mh = ${fmt(k.a1)}·${fmt(k.aISO)}·${fmt(k.L10h)} h`,
      value: k.L10mh,
      unit: 'h',
      source: 'ISO 281:2007',
    });
  }
  if (k.s0 !== null) {
    lines.push({
      label: 'Static safety s0',
      formula: k.type === 'ball' ? 's0 = C0/P0, P0 = max(0.6·Fr + 0.5·Fa, Fr)' : 's0 = C0/P0, P0 = Fr',
      substituted: `s0 = ${fmt(k.staticRating)} N / ${fmt(k.staticEquivalentLoad)} N`,
      value: k.s0,
      unit: '1',
      source: 'ISO 76 (from memory)',
    });
  }
  lines.push({
    label: 'Speed factor n·dm',
    formula: 'n·dm (highest point speed, r/min × mm)',
    substituted: `${fmt(x.maxSpeed * 60)} r/min × ${fmt(k.pitchDiameter * 1000)} mm`,
    value: k.ndm,
    unit: 'mm*r/min',
    source: 'common practice',
  });
  // Friction: M = μ·Pi·d/2 per point (Pi without f_d), time means over the duty.
  const pBar = sumT > 0 ? per.reduce((acc, q) => acc + Math.max(0, q.t) * Math.max(0, q.P), 0) / sumT : 0;
  lines.push({
    label: per.length > 1 ? 'Friction torque M (time mean over the duty)' : 'Friction torque M',
    formula:
      per.length > 1
        ? 'M = μ·P̄·d/2, P̄ = Σ ti·Pi/Σ ti, Pi = X·Fr + Y·Fa (without f_d)'
        : 'M = μ·P·d/2, P = X·Fr + Y·Fa (without f_d)',
    substituted: `M = ${mu}·${fmt(pBar)} N·${fmt(k.bore)} m/2`,
    value: k.frictionTorque,
    unit: 'N*m',
    source: 'common practice (from memory)',
  });
  const Mi = (q: (typeof per)[number]): number => frictionTorque(mu, q.P, k.bore);
  let powerTxt: string;
  if (per.length <= 1) {
    const q = per[0];
    powerTxt = q ? `N_R = ${fmt(Mi(q))} N·m·2π·${fmt(Math.max(0, q.n))} rev/s` : 'N_R = 0';
  } else if (many) {
    powerTxt = `N_R = (Σ over ${per.length} points of ti·Mi·2π·ni)/(Σ ti)`;
  } else {
    powerTxt = `N_R = (${per.map((q) => `${fmt(q.t)}·${fmt(Mi(q))} N·m·2π·${fmt(Math.max(0, q.n))} rev/s`).join(' + ')})/(${per.map((q) => fmt(q.t)).join(' + ')})`;
  }
  lines.push({
    label: per.length > 1 ? 'Friction power N_R (time mean over the duty)' : 'Friction power N_R',
    formula: per.length > 1 ? 'N_R = Σ ti·Mi·2π·ni/Σ ti, Mi = μ·Pi·d/2' : 'N_R = M·2π·n',
    substituted: powerTxt,
    value: k.frictionPower,
    unit: 'W',
    source: 'mechanics',
  });
  if (k.relubricationHours !== null) {
    const kf = x.f.relubrication.find((q) => q.type === k.type)!.kf;
    const rpm = x.maxSpeed * 60;
    const dMm = k.bore * 1000;
    const core = `${kf}·[14·10^6/(${fmt(rpm)}·√${fmt(dMm)}) − 4·${fmt(dMm)}]${k.temperature > 70 ? `·0.5^((${fmt(k.temperature)} − 70)/15)` : ''}`;
    lines.push({
      label: x.sealed ? 'Grease life (sealed bearing)' : 'Grease relubrication interval',
      formula:
        't_f = k_f·[14·10^6/(n·√d) − 4·d]·0.5^((T − 70)/15 if T > 70), n highest speed in r/min, d bore in mm, T in °C; no positive interval gives 0',
      substituted: `t_f = ${k.relubricationHours === 0 ? `max(0, ${core})` : core}`,
      value: k.relubricationHours,
      unit: 'h',
      source: 'bearing-maker technical guide (seen, as in the shared reference)',
    });
  }
  return lines;
}

function nearestBores(rows: BoundaryRow[], dMm: number): number[] {
  const bores = [...new Set(rows.map((r) => r.bore_mm))].sort((a, b) => a - b);
  const below = bores.filter((b) => b < dMm).pop();
  const above = bores.find((b) => b > dMm);
  return [below, above].filter((b): b is number => b !== undefined);
}

/** Ascending order with unknown sizes last (never NaN, which would upset the sort). */
function orderNullLast(a: number | null, b: number | null): number {
  if (a === null && b === null) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  return a - b;
}

function finiteOr(v: number | undefined, fallback: number): number {
  return v !== undefined && Number.isFinite(v) ? v : fallback;
}

/** Short number for messages: 4 significant figures, no exponent for ordinary sizes. */
function fmt(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  if (v === 0) return '0';
  const a = Math.abs(v);
  if (a >= 1e6 || a < 1e-3) return v.toExponential(3);
  return String(Number(v.toPrecision(4)));
}
