import { num } from '../../core/format.js';
import {
  boundaryDimensions,
  needleDimensions,
  taperedDimensions,
  type BoundaryRow,
  type NeedleRow,
  type TaperedRow,
} from '../../data/rolling.js';
import type { Arrangement, KindForm, RollingKind } from './kinds.js';
import { usualContactAngle } from './ratings.js';

/**
 * The bearings that exist for a shaft: every kind in every dimension series practice builds it
 * in, from the tables of boundary dimensions, as entries with our own generic ids and
 * designations (never a maker's code).
 *
 * Which kinds come in which series (common practice): series 10, 02 and 03 carry deep-groove
 * ball bearings; 02 and 03 also angular-contact ball bearings (single row at 40° and 25°, and
 * 40° pairs back-to-back, face-to-face and in tandem), self-aligning ball bearings and
 * cylindrical roller bearings in their three rib forms; 10 a cylindrical roller bearing with
 * ribs on one ring; 22 and 23 spherical roller bearings, self-aligning ball bearings and
 * cylindrical roller bearings with ribs on one ring. Tapered roller bearings come from the
 * ISO 355 table, single and as pairs back-to-back and face-to-face; needle roller bearings
 * from the drawn-cup and machined tables. The self-aligning ball and spherical roller bearings
 * take the usual contact angle of their kind (data/rolling-ratings.json).
 *
 * References
 * [1] ISO 15, radial bearings, boundary dimensions (data/rolling-boundary-dimensions.json).
 * [2] ISO 355, metric tapered roller bearings (data/rolling-tapered-dimensions.json).
 * [3] ISO 3245 drawn cups and ISO 1206 machined needle roller bearings
 *     (data/rolling-needle-dimensions.json).
 */

/** One bearing as it can be bought for a shaft: its identity, its size for the space check, its geometry for the ratings. */
export interface CatalogueEntry {
  id: string;
  kind: RollingKind;
  form: KindForm | null;
  arrangement: Arrangement;
  /** Nominal contact angle, degrees (0 for the radial kinds). */
  contactAngle: number;
  /** Dimension series ("02", "302", "drawn cup" …). */
  series: string;
  designation: string;
  /** Shaft diameter the bearing sits on, m (its bore; for a bearing without inner ring, the roller set bore). */
  bore: number;
  /** Outside diameter D and axial width taken by the support (both bearings of a pair), m. */
  outerDiameter: number;
  width: number;
  /** One bearing's bore d, outside diameter D and width B (tapered: total width T), m, for the ratings. */
  d: number;
  D: number;
  B: number;
  /** Needle roller bearings: the roller set bore Fw, m. */
  rollerSetBore?: number;
}

/** Bores equal within this, m: the tables hold whole millimetres, a case is converted from its unit. */
const BORE_TOLERANCE = 1e-5;

/** Nominal contact angles of the angular-contact ball bearings offered, degrees (common practice: the two usual series). */
const ANGULAR_CONTACT_ANGLES = [40, 25] as const;

const PAIRS: ReadonlyArray<[Arrangement, string]> = [
  ['pair back-to-back', 'bb'],
  ['pair face-to-face', 'ff'],
  ['pair tandem', 'tt'],
];

const CYLINDRICAL_FORMS: ReadonlyArray<[KindForm, string]> = [
  ['ribs on one ring', 'cyl'],
  ['ribs on both rings', 'cylr'],
  ['ribs on both rings and a loose rib', 'cyll'],
];

/** Kinds by ISO 15 dimension series (see the module comment). */
const SERIES_KINDS: Record<string, ReadonlyArray<RollingKind>> = {
  '10': ['deep-groove ball', 'cylindrical roller'],
  '02': ['deep-groove ball', 'angular-contact ball', 'self-aligning ball', 'cylindrical roller'],
  '03': ['deep-groove ball', 'angular-contact ball', 'self-aligning ball', 'cylindrical roller'],
  '22': ['spherical roller', 'self-aligning ball', 'cylindrical roller'],
  '23': ['spherical roller', 'self-aligning ball', 'cylindrical roller'],
};

const mm = (v: number): string => num(v, 4, { exponentZeros: 'keep' });

function entry(
  base: Omit<CatalogueEntry, 'designation' | 'outerDiameter' | 'width' | 'bore'> & { bore?: number },
  what: string,
): CatalogueEntry {
  const pair = base.arrangement !== 'single';
  const bore = base.bore ?? base.d;
  return {
    ...base,
    bore,
    outerDiameter: base.D,
    width: pair ? 2 * base.B : base.B,
    designation: `${what}, bore ${mm(bore * 1000)}${pair ? `, ${base.arrangement}` : ''}`,
  };
}

/** The entries of one ISO 15 row [1]. */
function radialEntries(r: BoundaryRow): CatalogueEntry[] {
  const d = r.bore_mm / 1000;
  const D = r.outerDiameter_mm / 1000;
  const B = r.width_mm / 1000;
  const size = { d, D, B, series: r.series };
  const s = `dimension series ${r.series}`;
  const out: CatalogueEntry[] = [];
  for (const kind of SERIES_KINDS[r.series] ?? []) {
    const one = { ...size, kind, arrangement: 'single' as const, form: null, contactAngle: 0 };
    if (kind === 'deep-groove ball') out.push(entry({ ...one, id: `dgb-${r.series}-${r.bore_mm}` }, `${kind}, ${s}`));
    if (kind === 'angular-contact ball') {
      for (const a of ANGULAR_CONTACT_ANGLES) {
        const acb = { ...one, contactAngle: a };
        out.push(entry({ ...acb, id: `acb${a}-${r.series}-${r.bore_mm}` }, `${kind} ${a}°, ${s}`));
        if (a !== ANGULAR_CONTACT_ANGLES[0]) continue;
        for (const [arrangement, code] of PAIRS)
          out.push(
            entry({ ...acb, arrangement, id: `acb${a}-${r.series}-${r.bore_mm}-${code}` }, `${kind} ${a}°, ${s}`),
          );
      }
    }
    if (kind === 'self-aligning ball')
      out.push(
        entry({ ...one, contactAngle: usualContactAngle(kind), id: `sab-${r.series}-${r.bore_mm}` }, `${kind}, ${s}`),
      );
    if (kind === 'spherical roller')
      out.push(
        entry({ ...one, contactAngle: usualContactAngle(kind), id: `sph-${r.series}-${r.bore_mm}` }, `${kind}, ${s}`),
      );
    if (kind === 'cylindrical roller') {
      const forms = r.series === '02' || r.series === '03' ? CYLINDRICAL_FORMS : CYLINDRICAL_FORMS.slice(0, 1);
      for (const [form, code] of forms)
        out.push(entry({ ...one, form, id: `${code}-${r.series}-${r.bore_mm}` }, `${kind}, ${form}, ${s}`));
    }
  }
  return out;
}

/** The entries of one ISO 355 row [2]: single, and pairs back-to-back and face-to-face. */
function taperedEntries(r: TaperedRow): CatalogueEntry[] {
  const base = {
    kind: 'tapered roller' as const,
    form: null,
    contactAngle: r.contactAngle_deg,
    series: r.series,
    d: r.bore_mm / 1000,
    D: r.outerDiameter_mm / 1000,
    B: r.width_mm / 1000,
  };
  const what = `tapered roller, series ${r.series}`;
  return [
    entry({ ...base, arrangement: 'single', id: `tap-${r.series}-${r.bore_mm}` }, what),
    ...PAIRS.slice(0, 2).map(([arrangement, code]) =>
      entry({ ...base, arrangement, id: `tap-${r.series}-${r.bore_mm}-${code}` }, what),
    ),
  ];
}

/** The entries of one needle roller row [3]: a drawn cup, or a machined bearing with and without its inner ring. */
function needleEntries(r: NeedleRow): CatalogueEntry[] {
  const Fw = r.rollerSetBore_mm / 1000;
  const base = {
    kind: 'needle roller' as const,
    arrangement: 'single' as const,
    contactAngle: 0,
    series: r.series,
    D: r.outerDiameter_mm / 1000,
    B: r.width_mm / 1000,
    rollerSetBore: Fw,
  };
  if (r.form === 'drawn cup')
    return [
      entry(
        {
          ...base,
          form: 'drawn cup',
          d: Fw,
          bore: Fw,
          id: `ndc-${r.rollerSetBore_mm}-${r.outerDiameter_mm}-${r.width_mm}`,
        },
        'needle roller, drawn cup',
      ),
    ];
  const out = [
    entry(
      { ...base, form: 'machined without inner ring', d: Fw, bore: Fw, id: `ndn-${r.series}-${r.rollerSetBore_mm}` },
      `needle roller, machined without inner ring, series ${r.series}`,
    ),
  ];
  if (r.bore_mm !== null) {
    const d = r.bore_mm / 1000;
    out.push(
      entry(
        { ...base, form: 'machined with inner ring', d, bore: d, id: `ndi-${r.series}-${r.bore_mm}` },
        `needle roller, machined with inner ring, series ${r.series}`,
      ),
    );
  }
  return out;
}

let built: { key: unknown[]; entries: CatalogueEntry[] } | undefined;

/** Every entry of the three tables [1–3] (built once per set of tables: sweeps call this thousands of times). */
export function catalogue(): CatalogueEntry[] {
  const radial = boundaryDimensions().rows;
  const tapered = taperedDimensions().rows;
  const needle = needleDimensions().rows;
  const key = [radial, tapered, needle];
  if (built && built.key.every((t, i) => t === key[i])) return built.entries;
  const entries = [
    ...radial.flatMap(radialEntries),
    ...tapered.flatMap(taperedEntries),
    ...needle.flatMap(needleEntries),
  ];
  built = { key, entries };
  return entries;
}

/** The entries whose bore is the shaft diameter d, m. */
export function entriesForShaft(d: number): CatalogueEntry[] {
  return catalogue().filter((e) => Math.abs(e.bore - d) <= BORE_TOLERANCE);
}

/** Every bore the tables hold, m, ascending (for "the nearest standard bores"). */
export function standardBores(): number[] {
  return [...new Set(catalogue().map((e) => Math.round(e.bore * 1e6)))].sort((a, b) => a - b).map((b) => b / 1e6);
}
