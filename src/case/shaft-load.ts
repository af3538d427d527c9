import { CaseError, type Problem } from '../core/errors.js';
import { num } from '../core/format.js';
import { parseCaseDocument, readCaseFileText, validateCase, type LoadedCase } from './load.js';
import { readingCase } from './quantity.js';
import { DEFAULTS } from './defaults.js';
import { shaftCaseSchema, type ShaftCaseFile, type ShaftLoadFile } from './shaft-schema.js';
import { diameterAt, segmentAt, shaftProblems } from './shaft-rules.js';
import type { ShaftLoadSI, ShaftSI, ShaftSupportSI } from './shaft-types.js';
import type { Assumption } from './types.js';

/** A shaft case as understood: the shaft in SI, the keys both supports share as written. */
export interface LoadedShaftCase {
  shaft: ShaftSI;
  /** The other top-level keys as written (title, life, space, lubrication, environment, priorities, bushing, rolling, journal, units). */
  common: Record<string, unknown>;
  /** What the shaft case assumed (modulus, shock, seat diameters, gear angles); each support's own case states the rest. */
  assumed: Assumption[];
  /** The case as the user wrote it (units as given). */
  given: unknown;
}

/** Either kind of case file, as loaded. */
export type AnyLoadedCase = { kind: 'single'; loaded: LoadedCase } | { kind: 'shaft'; loaded: LoadedShaftCase };

/** Steel's Young's modulus, Pa, when a shaft case gives none. */
export const STEEL_MODULUS = 210e9;

/** Keys of a shaft case that are the shaft's own (the rest is shared by both supports' cases). */
const SHAFT_KEYS = new Set(['shaft', 'load', 'duty']);

/** A shaft case is one whose `shaft` has `supports` or `loads`. */
export function isShaftCase(raw: unknown): boolean {
  const shaft = isMapping(raw) ? raw.shaft : undefined;
  return isMapping(shaft) && ('supports' in shaft || 'loads' in shaft);
}

/** Read a case file of either kind (YAML or JSON). Throws CaseError listing every problem. */
export function loadAnyCaseFile(path: string): AnyLoadedCase {
  return parseAnyCaseText(readCaseFileText(path), path);
}

/** Validate case text of either kind; `source` names it in messages. */
export function parseAnyCaseText(text: string, source = '(case)'): AnyLoadedCase {
  const raw = parseCaseDocument(text, source);
  return isShaftCase(raw)
    ? { kind: 'shaft', loaded: validateShaftCase(raw, source) }
    : { kind: 'single', loaded: validateCase(raw, source) };
}

/** Validate an already-parsed shaft case. Throws CaseError listing every problem, each naming its field. */
export function validateShaftCase(raw: unknown, source = '(case)'): LoadedShaftCase {
  if (!isMapping(raw)) {
    throw new CaseError(source, [
      { field: '(file)', message: 'is not a mapping; expected a mapping with title, shaft, life, space…' },
    ]);
  }
  const bare = raw.units === 'base' ? 'base' : 'refused';
  const parsed = readingCase(bare, () => shaftCaseSchema.safeParse(raw));
  if (!parsed.success) {
    throw new CaseError(
      source,
      parsed.error.issues.map((i) => ({ field: fieldOf(i.path), message: i.message })),
    );
  }
  const file = parsed.data;
  const common = Object.fromEntries(Object.entries(raw).filter(([k]) => !SHAFT_KEYS.has(k)));
  const problems = shaftProblems(file);
  if (!problems.length) problems.push(...commonProblems(file, raw, common, bare));
  if (problems.length) throw new CaseError(source, problems);
  const assumed: Assumption[] = [];
  const shaft = toSI(file, assumed);
  if (bare === 'base') {
    assumed.push({
      field: 'units',
      value: 'base',
      reason:
        'numbers written without a unit are read in SI base units: m, N, N*m, kg, Pa, rev/s, rad, Hz; temperatures in degC, life in hours',
    });
  }
  return { shaft, common, assumed, given: raw };
}

function toSI(file: ShaftCaseFile, assumed: Assumption[]): ShaftSI {
  const s = file.shaft;
  const supports = s.supports.map((p, i): ShaftSupportSI => {
    let diameter = p.diameter;
    if (diameter === undefined) {
      const seg = segmentAt(file, p.at);
      diameter = diameterAt(file, p.at)!;
      assumed.push({
        field: `shaft.supports[${i}].diameter`,
        value: mm(diameter),
        reason: seg
          ? `"${p.name}" gives no seat diameter: taken from the segment from ${mm(seg.from)} to ${mm(seg.to)}`
          : `"${p.name}" gives no seat diameter: taken as shaft.diameter`,
      });
    }
    const out: ShaftSupportSI = { name: p.name, at: p.at, diameter, locates: p.locates ?? 'none' };
    if (p.space) out.space = { ...p.space };
    return out;
  });
  const segments = (s.segments ?? []).map((g) => ({ ...g })).sort((a, b) => a.from - b.from);
  let modulus = s.modulus;
  if (modulus === undefined) {
    modulus = STEEL_MODULUS;
    assumed.push({
      field: 'shaft.modulus',
      value: '210 GPa',
      reason:
        "no Young's modulus given: a steel shaft (common practice; steels lie near 200 to 210 GPa, Gere & Goodno, Mechanics of Materials, 8th ed. 2013, Appendix H, from memory)",
    });
  }
  const loads = (list: ShaftLoadFile[], at: string) => list.map((l, i) => loadSI(l, `${at}[${i}]`, assumed));
  const duty = file.duty?.map((p, k) => ({
    share: p.share,
    speed: p.speed,
    own: p.loads && loads(p.loads, `duty[${k}].loads`),
  }));
  let shaftLoads: ShaftLoadSI[];
  if (s.loads) shaftLoads = loads(s.loads, 'shaft.loads');
  else {
    const k = duty!.reduce((best, p, i) => (p.share > duty![best]!.share ? i : best), 0);
    shaftLoads = duty![k]!.own!;
    assumed.push({
      field: 'shaft.loads',
      value: `the loads of duty[${k}]`,
      reason: 'no shaft.loads given: taken as the loads of the duty point with the largest share',
    });
  }
  const shock = file.load?.shock ?? DEFAULTS.shock.value;
  if (file.load?.shock === undefined)
    assumed.push({ field: 'load.shock', value: shock, reason: DEFAULTS.shock.reason });
  const shaft: ShaftSI = {
    // Without shaft.diameter the segments are the whole shaft (every position lies on one), so
    // no place takes this figure; the largest segment's is given to keep the field a diameter.
    diameter: s.diameter ?? Math.max(...segments.map((g) => g.diameter)),
    modulus,
    segments,
    supports: supports as [ShaftSupportSI, ShaftSupportSI],
    loads: shaftLoads,
    shock,
  };
  if (s.speed !== undefined) shaft.speed = s.speed;
  if (s.oscillation) shaft.oscillation = { ...s.oscillation };
  if (duty) {
    shaft.duty = duty.map((p) => ({
      share: p.share,
      ...(p.speed !== undefined ? { speed: p.speed } : {}),
      loads: p.own ?? shaftLoads,
    }));
  }
  return shaft;
}

/** Standard basic rack pressure angle, rad, when a gear gives none (ISO 53:1998, from memory). */
const PRESSURE_ANGLE = (20 * Math.PI) / 180;

function loadSI(l: ShaftLoadFile, field: string, assumed: Assumption[]): ShaftLoadSI {
  const at = l.at;
  if (l.gear) {
    const g = l.gear;
    if (g.pressureAngle === undefined)
      assumed.push({
        field: `${field}.gear.pressureAngle`,
        value: '20 deg',
        reason: 'no pressure angle given: the standard basic rack profile (ISO 53:1998, from memory)',
      });
    if (g.helixAngle === undefined)
      assumed.push({ field: `${field}.gear.helixAngle`, value: '0 deg', reason: 'no helix angle given: a spur gear' });
    return {
      at,
      gear: {
        pitchDiameter: g.pitchDiameter,
        torque: g.torque,
        pressureAngle: g.pressureAngle ?? PRESSURE_ANGLE,
        helixAngle: g.helixAngle ?? 0,
        mesh: g.mesh,
      },
    };
  }
  if (l.belt) return { at, belt: { ...l.belt } };
  if (l.chain) return { at, chain: { ...l.chain } };
  if (l.weight) return { at, weight: { mass: l.weight.mass } };
  return { at, force: { y: l.force?.y ?? 0, z: l.force?.z ?? 0 }, axial: l.axial ?? 0 };
}

/**
 * Problems of the shared keys that only a whole single-support case shows (a grade or material
 * not in the tables, a rolling bore off the seat, one supplier rating): each support's case is
 * validated as the advice will build it, with a nominal load, and its problems with the shared
 * keys are kept (once, or per support when they differ).
 */
function commonProblems(
  file: ShaftCaseFile,
  raw: Record<string, unknown>,
  common: Record<string, unknown>,
  bare: 'base' | 'refused',
): Problem[] {
  const rawSupports = (raw.shaft as { supports: { space?: unknown }[] }).supports;
  const per = file.shaft.supports.map((s, i) => {
    const d = s.diameter ?? diameterAt(file, s.at)!;
    const space = s.space ? rawSupports[i]?.space : common.space;
    const probe = {
      ...common,
      shaft: { diameter: bare === 'base' ? d : `${d} m` },
      load: { radial: bare === 'base' ? 1 : '1 N' },
      space,
    };
    try {
      validateCase(probe);
      return [];
    } catch (e) {
      if (!(e instanceof CaseError)) throw e;
      return e.problems.filter((p) => !/^(shaft|load|duty|space)\b/.test(p.field));
    }
  });
  const [a, b] = per as [Problem[], Problem[]];
  const same = (p: Problem, q: Problem) => p.field === q.field && p.message === q.message;
  const out = a.filter((p) => b.some((q) => same(p, q)));
  per.forEach((list, i) => {
    for (const p of list)
      if (!per[1 - i]!.some((q) => same(p, q)))
        out.push({ field: p.field, message: `${p.message} (for "${file.shaft.supports[i]!.name}")` });
  });
  return out;
}

function isMapping(v: unknown): v is Record<string, unknown> {
  return v !== null && typeof v === 'object' && !Array.isArray(v);
}

/** A schema issue's path as the file writes it: shaft.supports[1].at. */
function fieldOf(path: readonly PropertyKey[]): string {
  return path.length
    ? path.map((p, k) => (typeof p === 'number' ? `[${p}]` : k ? `.${String(p)}` : String(p))).join('')
    : '(file)';
}

function mm(m: number): string {
  return `${num(m * 1000)} mm`;
}
