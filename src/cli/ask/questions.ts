import type { z } from 'zod';
import { caseFileSchema, CONTAMINATIONS, PRIORITIES, SHOCKS, SUPPLIES } from '../../case/schema.js';
import { KINDS, parseQuantity, type Kind } from '../../case/quantity.js';
import { lubricants } from '../../data/load.js';
import { DEFAULTS } from '../../case/defaults.js';

/**
 * The questionnaire as data. Each question names the case-file key it fills
 * (`path`, the schema keys: a contract), how its answer is checked, a one-line
 * help saying why it matters, a neutral default (pressing Enter everywhere
 * gives a valid case) and when it applies. Nothing here touches a terminal or
 * a file, so the order, the skipping and the checking are unit-testable.
 */

/** Answers by question id: quantities as the text typed, plain numbers as numbers. */
export type Answers = Record<string, string | number>;

export interface Choice {
  value: string;
  name: string;
  description?: string;
}

export type QuestionKind = 'text' | 'quantity' | 'choice' | 'number';

export interface Question {
  id: string;
  /** Case-file key path; null for an answer that only steers the questions (motion). */
  path: readonly string[] | null;
  kind: QuestionKind;
  /** For a quantity: the kind parseQuantity reads it as. */
  quantity?: Kind;
  section: string;
  message: string;
  /** Why the answer matters, one line. */
  help: string;
  default: (a: Answers) => string;
  choices?: () => readonly Choice[];
  /** Applies only when this holds for the answers so far. */
  when?: (a: Answers) => boolean;
  /** A rule involving another answer (the case loader checks it too); returns the reason or undefined. */
  check?: (value: string | number, a: Answers) => string | undefined;
}

const OIL_SUPPLIES = new Set(['oil-bath', 'oil-feed']);
const rotating = (a: Answers) => a.motion === 'rotating';
const oscillating = (a: Answers) => a.motion === 'oscillating';
const hasOil = (a: Answers) => OIL_SUPPLIES.has(String(a.supply));
const hasLubricant = (a: Answers) => a.supply !== undefined && a.supply !== 'none';

/** Text after the number of a quantity string: "40 mm" → [40, "mm"]. */
function splitQuantity(text: string): [number, string] | undefined {
  const m = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(.*?)\s*$/.exec(text);
  return m && m[2] ? [Number(m[1]), m[2]] : undefined;
}

/** A default derived from the shaft diameter, in the unit the user gave it ("40 mm" × 2 → "80 mm"). */
function fromDiameter(factor: number, fallback: string) {
  return (a: Answers): string => {
    const d = a.diameter;
    if (typeof d !== 'string') return fallback;
    const parts = splitQuantity(d);
    if (!parts) return fallback;
    return `${+(parts[0] * factor).toPrecision(4)} ${parts[1]}`;
  };
}

const fixed = (v: string) => () => v;

function oilChoices(): Choice[] {
  return lubricants().grades.map((g) => ({
    value: `ISO VG ${g.grade}`,
    name: `ISO VG ${g.grade}`,
    description: `${g.nu40} mm²/s at 40 °C`,
  }));
}

function defaultOil(): string {
  const table = lubricants();
  const grades = table.grades.map((g) => g.grade);
  // The table's default grade; a user's data folder without that row gets its middle grade.
  const g = grades.includes(table.defaultGrade.grade)
    ? table.defaultGrade.grade
    : grades[Math.floor(grades.length / 2)]!;
  return `ISO VG ${g}`;
}

const choicesOf = (values: readonly string[], described: Record<string, string>) => () =>
  values.map((v) => ({ value: v, name: v, description: described[v] }));

const PRIORITY_HELP: Record<(typeof PRIORITIES)[number], string> = {
  cost: 'how much the price of the part and its housing counts',
  friction: 'how much power lost in the support counts (running cost, heat)',
  maintenance: 'how much it counts that nobody has to lubricate or replace it',
  noise: 'how much running noise counts',
  precision: 'how much it counts that the shaft runs true with little play',
};

export const QUESTIONS: readonly Question[] = [
  {
    id: 'title',
    path: ['title'],
    kind: 'text',
    section: 'The case',
    message: 'Name of this shaft support',
    help: 'Heads the advice and the review note, so a reader knows which shaft it is.',
    default: fixed('New shaft support (from shaftwise ask)'),
  },
  {
    id: 'diameter',
    path: ['shaft', 'diameter'],
    kind: 'quantity',
    quantity: 'length',
    section: 'Shaft and motion',
    message: 'Shaft diameter at the support',
    help: 'The bore of the support: sets bearing pressure, sliding speed and which standard sizes fit.',
    default: fixed('40 mm'),
  },
  {
    id: 'motion',
    path: null,
    kind: 'choice',
    section: 'Shaft and motion',
    message: 'Does the shaft turn round or swing back and forth?',
    help: 'A swinging shaft never builds an oil film and wears a bushing faster; it decides which checks apply.',
    default: fixed('rotating'),
    choices: () => [
      { value: 'rotating', name: 'rotating', description: 'turns continuously in one direction' },
      { value: 'oscillating', name: 'oscillating', description: 'swings through an angle and back' },
    ],
  },
  {
    id: 'speed',
    path: ['shaft', 'speed'],
    kind: 'quantity',
    quantity: 'speed',
    section: 'Shaft and motion',
    message: 'Shaft speed',
    help: 'Sliding speed for a bushing, life in revolutions for a rolling bearing, film build-up for an oil film.',
    default: fixed('300 rpm'),
    when: rotating,
  },
  {
    id: 'oscillationAngle',
    path: ['shaft', 'oscillation', 'angle'],
    kind: 'quantity',
    quantity: 'angle',
    section: 'Shaft and motion',
    message: 'Total swing angle (end to end)',
    help: 'With the frequency, gives the mean sliding speed and the travel per cycle.',
    default: fixed('90 deg'),
    when: oscillating,
  },
  {
    id: 'oscillationFrequency',
    path: ['shaft', 'oscillation', 'frequency'],
    kind: 'quantity',
    quantity: 'frequency',
    section: 'Shaft and motion',
    message: 'Swing frequency (full back-and-forth cycles per second)',
    help: 'How often the swing repeats: sets sliding distance, wear and heat.',
    default: fixed('1 Hz'),
    when: oscillating,
  },
  {
    id: 'radial',
    path: ['load', 'radial'],
    kind: 'quantity',
    quantity: 'force',
    section: 'Loads',
    message: 'Radial load on this support',
    help: 'The force across the shaft that the support carries: drives pressure, bearing life and film thickness.',
    default: fixed('2 kN'),
  },
  {
    id: 'axial',
    path: ['load', 'axial'],
    kind: 'quantity',
    quantity: 'force',
    section: 'Loads',
    message: 'Axial (thrust) load',
    help: 'Force along the shaft: a plain bushing needs a thrust face for it; a rolling bearing takes some.',
    default: fixed(`${DEFAULTS.axial.value} N`),
  },
  {
    id: 'shock',
    path: ['load', 'shock'],
    kind: 'choice',
    section: 'Loads',
    message: 'How much shock or knocking does the load carry?',
    help: 'Knocks raise the effective load and favour supports that tolerate peaks.',
    default: fixed(DEFAULTS.shock.value),
    choices: choicesOf(SHOCKS, {
      none: 'smooth running',
      light: 'occasional small knocks',
      moderate: 'regular knocks (conveyed parts, gear mesh)',
      heavy: 'hard impacts (crushing, hammering)',
    }),
  },
  {
    id: 'lifeHours',
    path: ['life', 'hours'],
    kind: 'quantity',
    quantity: 'time',
    section: 'Life',
    message: 'Required service life (running hours)',
    help: 'Rolling-bearing fatigue life and bushing wear life are both checked against it.',
    default: fixed('20000 h'),
  },
  {
    id: 'wearAllowance',
    path: ['life', 'wearAllowance'],
    kind: 'quantity',
    quantity: 'length',
    section: 'Life',
    message: 'Radial wear a bushing may lose before replacement',
    help: "How much play the machine tolerates; sets a plain bushing's wear life.",
    default: fixed(`${DEFAULTS.wearAllowance.value * 1000} mm`),
  },
  {
    id: 'maxLength',
    path: ['space', 'maxLength'],
    kind: 'quantity',
    quantity: 'length',
    section: 'Space',
    message: 'Axial space for the support (longest it may be)',
    help: 'Limits bushing and journal length and the width of a rolling bearing.',
    default: fromDiameter(1, '40 mm'),
  },
  {
    id: 'maxOuterDiameter',
    path: ['space', 'maxOuterDiameter'],
    kind: 'quantity',
    quantity: 'length',
    section: 'Space',
    message: 'Radial space: largest housing bore (outer diameter)',
    help: 'Limits the wall of a bushing and the outer ring of a rolling bearing.',
    // 2.5 × the bore leaves room for a standard series-02 or -03 ball bearing of that bore (ISO 15 proportions, from memory).
    default: fromDiameter(2.5, '100 mm'),
    check: (value, a) => {
      let od: number, d: number;
      try {
        od = parseQuantity(value, 'length');
        d = parseQuantity(a.diameter, 'length');
      } catch {
        return undefined; // an unreadable diameter is reported at its own question
      }
      return od > d
        ? undefined
        : `got ${show(value)}, not more than the shaft diameter ${show(a.diameter)}; expected a housing bore larger than the shaft`;
    },
  },
  {
    id: 'supply',
    path: ['lubrication', 'supply'],
    kind: 'choice',
    section: 'Lubrication',
    message: 'What lubrication can the machine supply at this support?',
    help: 'An oil-film bearing needs a steady oil supply; a bushing may run dry; a rolling bearing needs grease or oil.',
    default: fixed(DEFAULTS.supply.value),
    choices: choicesOf(SUPPLIES, {
      none: 'nothing: dry running or lubricated for life',
      grease: 'grease, by hand or a grease nipple',
      'oil-bath': 'the support sits in or is splashed by an oil sump',
      'oil-feed': 'pumped oil from a lubrication system',
    }),
  },
  {
    id: 'oil',
    path: ['lubrication', 'oil'],
    kind: 'choice',
    section: 'Lubrication',
    message: 'Which oil (ISO viscosity grade)?',
    help: 'Its viscosity at running temperature sets the film thickness and friction of an oil film.',
    default: defaultOil,
    choices: oilChoices,
    when: hasOil,
  },
  {
    id: 'inletTemperature',
    path: ['lubrication', 'inletTemperature'],
    kind: 'quantity',
    quantity: 'temperature',
    section: 'Temperatures',
    message: 'Lubricant temperature where it reaches the support',
    help: 'Viscosity falls fast with temperature: it decides film thickness and rolling-bearing lubrication quality.',
    default: fixed(`${DEFAULTS.inletTemperature.value} degC`),
    when: hasLubricant,
  },
  {
    id: 'ambient',
    path: ['environment', 'ambient'],
    kind: 'quantity',
    quantity: 'temperature',
    section: 'Temperatures',
    message: 'Ambient temperature around the support',
    help: 'A bushing sheds its friction heat to the surroundings; a hot machine leaves less margin.',
    default: fixed(`${DEFAULTS.ambient.value} degC`),
  },
  {
    id: 'contamination',
    path: ['environment', 'contamination'],
    kind: 'choice',
    section: 'Environment',
    message: 'How clean are the surroundings?',
    help: 'Dirt shortens rolling-bearing life and speeds up bushing wear.',
    default: fixed(DEFAULTS.contamination.value),
    choices: choicesOf(CONTAMINATIONS, {
      clean: 'sealed, filtered, indoor and tidy',
      normal: 'ordinary workshop or plant',
      dirty: 'dust, chips or fibres about',
      severe: 'grit, slurry or water splashing on the support',
    }),
  },
  {
    id: 'startsPerHour',
    path: ['environment', 'startsPerHour'],
    kind: 'number',
    section: 'Environment',
    message: 'Starts per hour',
    help: 'Each start runs an oil-film bearing in metal contact until the film builds up.',
    default: fixed(String(DEFAULTS.startsPerHour.value)),
  },
  ...PRIORITIES.map((p): Question => ({
    id: `priority.${p}`,
    path: ['priorities', p],
    kind: 'number',
    section: 'Priorities (1 = unimportant … 5 = essential)',
    message: `Priority: ${p} (1-5)`,
    help: `Weights the ranking: ${PRIORITY_HELP[p]}.`,
    default: fixed(String(DEFAULTS.priority.value)),
  })),
];

export function questionById(id: string): Question | undefined {
  return QUESTIONS.find((q) => q.id === id);
}

export function applies(q: Question, a: Answers): boolean {
  return q.when ? q.when(a) : true;
}

/** The dotted case-file name of a question, for messages ("shaft.diameter"). */
export function fieldName(q: Question): string {
  return q.path ? q.path.join('.') : q.id;
}

function show(v: unknown): string {
  return typeof v === 'string' ? `"${v}"` : String(v);
}

/** The schema of the case-file field at `path`: the same rules and messages as a case file. */
function fieldSchema(path: readonly string[]): z.ZodType {
  let s = caseFileSchema as unknown as z.ZodType;
  for (const key of path) {
    s = unwrapOptional(s);
    const shape = (s as unknown as { shape?: Record<string, z.ZodType> }).shape;
    const next = shape?.[key];
    if (!next) throw new Error(`questionnaire path ${path.join('.')} is not a key of the case-file schema`);
    s = next;
  }
  return s;
}

function unwrapOptional(s: z.ZodType): z.ZodType {
  let t = s as unknown as { def: { type: string; innerType?: z.ZodType } };
  while (t.def.type === 'optional' && t.def.innerType) t = t.def.innerType as unknown as typeof t;
  return t as unknown as z.ZodType;
}

export type Checked = { ok: true; value: string | number } | { ok: false; message: string };

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

/**
 * Check an answer. `typed` is text from the prompt; a value read back from a
 * saved file is checked with `fromFile`, which accepts what a case file accepts
 * (a plain number in the internal unit). At the prompt a quantity must carry a
 * number and its unit: a bare "40" for a diameter would silently mean 40 m.
 * A failure message names the field, the value given and what was expected.
 */
export function checkAnswer(q: Question, given: unknown, a: Answers, fromFile = false): Checked {
  const field = fieldName(q);
  const fail = (m: string): Checked => ({ ok: false, message: `${field}: ${m}` });
  let value: unknown = typeof given === 'string' ? given.trim() : given;
  if (q.kind === 'choice') {
    const values = q.choices!().map((c) => c.value);
    if (typeof value !== 'string' || !values.includes(value)) {
      // The oil key also accepts "VG 68" or 68 in a file; the schema normalises those.
      if (!(q.id === 'oil' && fromFile && q.path && fieldSchema(q.path).safeParse(value).success)) {
        return fail(`got ${show(value)}; expected one of: ${values.join(', ')}`);
      }
    }
  } else if (q.kind === 'number' && typeof value === 'string' && NUMBER.test(value)) {
    value = Number(value);
  } else if (q.kind === 'quantity' && typeof value === 'string' && !fromFile) {
    const info = KINDS[q.quantity!];
    if (NUMBER.test(value))
      return fail(`got "${value}" without a unit; expected ${info.noun} with its unit, such as ${info.examples}`);
    // The parser reads a lone unit as one of it ("mm" = 1 mm); typed, that is a number lost by editing.
    if (!/^[-+]?\.?\d/.test(value))
      return fail(`got "${value}" without a number; expected ${info.noun} with its unit, such as ${info.examples}`);
  }
  if (q.path) {
    const r = fieldSchema(q.path).safeParse(value);
    if (!r.success) return fail(r.error.issues[0]?.message ?? `got ${show(value)}; not accepted`);
  }
  if (q.check) {
    const why = q.check(value as string | number, a);
    if (why) return fail(why);
  }
  return { ok: true, value: value as string | number };
}

export interface Next {
  question: Question;
  /** A value found in the file that does not pass, with the reason: asked again. */
  stale?: { value: unknown; reason: string };
}

/**
 * The first question that applies and has no usable answer yet, or undefined when
 * the questionnaire is complete. Pure: the answers decide everything.
 */
export function nextQuestion(a: Answers, questions: readonly Question[] = QUESTIONS): Next | undefined {
  for (const q of questions) {
    if (!applies(q, a)) continue;
    const v = a[q.id];
    if (v === undefined) return { question: q };
    const c = checkAnswer(q, v, a, true);
    if (!c.ok) return { question: q, stale: { value: v, reason: c.message } };
  }
  return undefined;
}

/**
 * How many questions apply to these answers and how many of them have a usable answer (a
 * saved value that would be asked again does not count). The one count of questions: the
 * resume line and each question's place ("3 of 20") both come from it.
 */
export function progress(a: Answers, questions: readonly Question[] = QUESTIONS): { answered: number; total: number } {
  // A question not yet answered counts as its default would make it, so the total changes
  // only when an answer given adds or removes questions (an oil supply adds the grade).
  const assumed: Answers = { ...a };
  for (const q of questions) if (assumed[q.id] === undefined && applies(q, assumed)) assumed[q.id] = q.default(assumed);
  const live = questions.filter((q) => applies(q, assumed));
  const usable = (q: Question) => a[q.id] !== undefined && checkAnswer(q, a[q.id], a, true).ok;
  return { answered: live.filter(usable).length, total: live.length };
}

function getPath(obj: unknown, path: readonly string[]): unknown {
  let o: unknown = obj;
  for (const k of path) {
    if (o === null || typeof o !== 'object' || Array.isArray(o)) return undefined;
    o = (o as Record<string, unknown>)[k];
  }
  return o;
}

/**
 * Read the answers back from a (partial) case document. Steering answers that
 * are not case keys come from `state` (saved beside the keys), or are inferred:
 * a speed in the file means the shaft rotates, an oscillation that it swings.
 */
export function answersFromCase(
  doc: unknown,
  state: Answers = {},
  questions: readonly Question[] = QUESTIONS,
): Answers {
  const a: Answers = {};
  for (const q of questions) {
    if (!q.path) {
      if (state[q.id] !== undefined) a[q.id] = state[q.id]!;
      continue;
    }
    const v = getPath(doc, q.path);
    if (typeof v === 'string' || typeof v === 'number') a[q.id] = v;
  }
  if (a.motion === undefined) {
    if (getPath(doc, ['shaft', 'speed']) !== undefined) a.motion = 'rotating';
    else if (getPath(doc, ['shaft', 'oscillation']) !== undefined) a.motion = 'oscillating';
  }
  return a;
}

/** Steering answers (no case key) to keep beside the case keys so a resume knows them. */
export function steeringAnswers(a: Answers, questions: readonly Question[] = QUESTIONS): Answers {
  const s: Answers = {};
  for (const q of questions) if (!q.path && a[q.id] !== undefined) s[q.id] = a[q.id]!;
  return s;
}
