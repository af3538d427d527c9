// Unit tests (no terminal, no file): the question list as data, the answer checks and the
// choice of the next question. Scenario values are invented (a bottling-line star wheel).
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../../src/case/load.js';
import {
  answersFromCase,
  applies,
  checkAnswer,
  nextQuestion,
  progress,
  QUESTIONS,
  questionById,
  type Answers,
} from '../../../src/cli/ask/questions.js';

const q = (id: string) => {
  const found = questionById(id);
  if (!found) throw new Error(`no question ${id}`);
  return found;
};

/** Answer every question that applies with its default, in order, as Enter everywhere would. */
function allDefaults(start: Answers = {}): Answers {
  const a = { ...start };
  for (let n = nextQuestion(a); n; n = nextQuestion(a)) {
    const c = checkAnswer(n.question, n.question.default(a), a);
    if (!c.ok) throw new Error(c.message);
    a[n.question.id] = c.value;
  }
  return a;
}

/** The case object the answers make (the same nesting the saved file has). */
function toCase(a: Answers): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const question of QUESTIONS) {
    if (!question.path || a[question.id] === undefined || !applies(question, a)) continue;
    let o = out;
    for (const k of question.path.slice(0, -1)) o = (o[k] ??= {}) as Record<string, unknown>;
    o[question.path.at(-1)!] = a[question.id];
  }
  return out;
}

describe('the question list', () => {
  it('has unique ids, a message, a help line and a default for every question', () => {
    const ids = QUESTIONS.map((x) => x.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const x of QUESTIONS) {
      expect(x.message.length, x.id).toBeGreaterThan(5);
      expect(x.help.length, x.id).toBeGreaterThan(20);
      expect(x.default({}).length, x.id).toBeGreaterThan(0);
    }
  });

  it('fills only case-file schema keys (a key outside the schema would throw when checked)', () => {
    for (const x of QUESTIONS.filter((y) => y.path)) {
      expect(() => checkAnswer(x, x.default({ diameter: '40 mm' }), { diameter: '40 mm' }), x.id).not.toThrow();
    }
    expect(QUESTIONS.filter((x) => !x.path).map((x) => x.id)).toEqual(['motion']);
  });

  it('walks the duty in order: title, diameter, motion, loads, life, space, lubrication, temperatures, environment, priorities', () => {
    const order = QUESTIONS.map((x) => x.id);
    const at = (id: string) => order.indexOf(id);
    expect(at('title')).toBe(0);
    for (const [a, b] of [
      ['diameter', 'motion'],
      ['motion', 'speed'],
      ['speed', 'radial'],
      ['radial', 'axial'],
      ['shock', 'lifeHours'],
      ['wearAllowance', 'maxLength'],
      ['maxOuterDiameter', 'supply'],
      ['supply', 'oil'],
      ['oil', 'inletTemperature'],
      ['inletTemperature', 'ambient'],
      ['contamination', 'startsPerHour'],
      ['startsPerHour', 'priority.cost'],
    ]) {
      expect(at(a!), `${a} before ${b}`).toBeLessThan(at(b!));
    }
    expect(order.filter((id) => id.startsWith('priority.'))).toEqual([
      'priority.cost',
      'priority.friction',
      'priority.maintenance',
      'priority.noise',
      'priority.precision',
    ]);
  });

  it('defaults alone (Enter at every question) make a case that validateCase accepts', () => {
    const a = allDefaults();
    const loaded = validateCase(toCase(a), 'defaults');
    expect(loaded.case.shaft.diameter).toBeCloseTo(0.04, 12);
    expect(loaded.case.shaft.speed).toBeCloseTo(5, 12); // 300 rpm in rev/s
    expect(loaded.case.load.radial).toBe(2000);
  });

  it('derives the space defaults from the diameter in the unit the user gave', () => {
    expect(q('maxLength').default({ diameter: '1.5 in' })).toBe('1.5 in');
    expect(q('maxOuterDiameter').default({ diameter: '1.5 in' })).toBe('3.75 in');
    expect(q('maxOuterDiameter').default({ diameter: '55 mm' })).toBe('137.5 mm');
    // A large shaft still gets a housing bore larger than itself by default.
    const a = allDefaults({ title: 'Bottling line star wheel', diameter: '120 mm' });
    expect(validateCase(toCase(a)).case.space.maxOuterDiameter).toBeCloseTo(0.3, 12);
  });
});

describe('checking an answer', () => {
  it('rejects a mass for the diameter, naming the field, the value and what is expected', () => {
    const c = checkAnswer(q('diameter'), '40 kg', {});
    expect(c.ok).toBe(false);
    if (!c.ok) {
      expect(c.message).toMatch(/^shaft\.diameter: /);
      expect(c.message).toContain('"40 kg"');
      expect(c.message).toMatch(/expected a length such as "40 mm" or "1\.5 in"/);
    }
  });

  it('accepts either unit system and keeps the text as typed (trimmed)', () => {
    expect(checkAnswer(q('diameter'), ' 1.5 in ', {})).toEqual({ ok: true, value: '1.5 in' });
    expect(checkAnswer(q('radial'), '720 lbf', {})).toEqual({ ok: true, value: '720 lbf' });
    expect(checkAnswer(q('ambient'), '104 degF', {})).toEqual({ ok: true, value: '104 degF' });
    expect(checkAnswer(q('speed'), '25 rev/s', {})).toEqual({ ok: true, value: '25 rev/s' });
  });

  it('applies the case-file bounds: zero speed refused, zero axial load allowed, sub-zero ambient allowed', () => {
    const speed = checkAnswer(q('speed'), '0 rpm', {});
    expect(speed.ok).toBe(false);
    if (!speed.ok) expect(speed.message).toBe('shaft.speed: got "0 rpm"; expected a value greater than zero');
    expect(checkAnswer(q('axial'), '0 N', {}).ok).toBe(true);
    expect(checkAnswer(q('axial'), '-5 N', {}).ok).toBe(false);
    expect(checkAnswer(q('ambient'), '-20 degC', {}).ok).toBe(true);
  });

  it('asks for the unit of a bare number typed at the prompt, and refuses one read from a file as a case file does', () => {
    const typed = checkAnswer(q('diameter'), '40', {});
    expect(typed.ok).toBe(false);
    if (!typed.ok)
      expect(typed.message).toMatch(
        /shaft\.diameter: got "40" without a unit; expected a length with its unit, such as "40 mm"/,
      );
    expect(checkAnswer(q('diameter'), 0.04, {}, true)).toEqual({
      ok: false,
      message: 'shaft.diameter: 0.04 has no unit; write 0.04 mm or 4e-5 m',
    });
    expect(checkAnswer(q('diameter'), '40 mm', {}, true)).toEqual({ ok: true, value: '40 mm' });
    // A lone unit (what is left after deleting the number) is not read as one of it.
    const unitOnly = checkAnswer(q('diameter'), 'mm', {});
    expect(unitOnly.ok).toBe(false);
    if (!unitOnly.ok)
      expect(unitOnly.message).toBe(
        'shaft.diameter: got "mm" without a number; expected a length with its unit, such as "40 mm" or "1.5 in"',
      );
    expect(checkAnswer(q('diameter'), '.5 in', {}).ok).toBe(true);
  });

  it("reads plain numbers for starts and priorities, with the schema's range", () => {
    expect(checkAnswer(q('startsPerHour'), '12', {})).toEqual({ ok: true, value: 12 });
    expect(checkAnswer(q('priority.noise'), '5', {})).toEqual({ ok: true, value: 5 });
    const six = checkAnswer(q('priority.noise'), '6', {});
    expect(six.ok).toBe(false);
    if (!six.ok)
      expect(six.message).toBe('priorities.noise: got 6; expected a priority from 1 (unimportant) to 5 (essential)');
    const word = checkAnswer(q('startsPerHour'), 'often', {});
    expect(word.ok).toBe(false);
    if (!word.ok)
      expect(word.message).toMatch(/^environment\.startsPerHour: got "often"; expected a number of starts per hour/);
  });

  it('refuses a housing bore not larger than the shaft, as the case loader does', () => {
    const c = checkAnswer(q('maxOuterDiameter'), '1.5 in', { diameter: '40 mm' });
    expect(c.ok).toBe(false);
    if (!c.ok)
      expect(c.message).toBe(
        'space.maxOuterDiameter: got "1.5 in", not more than the shaft diameter "40 mm"; expected a housing bore larger than the shaft',
      );
    expect(checkAnswer(q('maxOuterDiameter'), '2 in', { diameter: '40 mm' }).ok).toBe(true);
  });

  it('refuses an empty title and a choice outside the list', () => {
    expect(checkAnswer(q('title'), '   ', {}).ok).toBe(false);
    const c = checkAnswer(q('shock'), 'violent', {});
    expect(c.ok).toBe(false);
    if (!c.ok) expect(c.message).toBe('load.shock: got "violent"; expected one of: none, light, moderate, heavy');
  });

  it('offers the ISO VG grades of data/lubricants.json and accepts "VG 46" written in a file', () => {
    const values = q('oil').choices!().map((c) => c.value);
    expect(values).toContain('ISO VG 68');
    expect(q('oil').default({})).toBe('ISO VG 68');
    expect(checkAnswer(q('oil'), 'VG 46', {}, true).ok).toBe(true);
    expect(checkAnswer(q('oil'), 'VG 46', {}, false).ok).toBe(false);
  });
});

describe('the next question', () => {
  it('starts at the title and ends (undefined) when every applicable question is answered', () => {
    expect(nextQuestion({})?.question.id).toBe('title');
    expect(nextQuestion(allDefaults())).toBeUndefined();
  });

  it('skips the speed of an oscillating shaft and asks its angle and frequency instead', () => {
    const a: Answers = { title: 'Packaging line crimper arm', diameter: '25 mm', motion: 'oscillating' };
    expect(nextQuestion(a)?.question.id).toBe('oscillationAngle');
    const done = allDefaults(a);
    expect(done.speed).toBeUndefined();
    expect(done.oscillationAngle).toBe('90 deg');
    const c = validateCase(toCase(done)).case;
    expect(c.shaft.speed).toBeUndefined();
    expect(c.shaft.oscillation?.frequency).toBe(1);
  });

  it('asks for the oil grade only with an oil bath or oil feed, and the lubricant temperature only with a lubricant', () => {
    const upTo = (supply: string) => allDefaults({ title: 'x', supply });
    expect(upTo('oil-feed').oil).toBe('ISO VG 68');
    expect(upTo('oil-bath').oil).toBe('ISO VG 68');
    expect(upTo('grease').oil).toBeUndefined();
    expect(upTo('grease').inletTemperature).toBe('40 degC');
    expect(upTo('none').inletTemperature).toBeUndefined();
    expect(validateCase(toCase(upTo('oil-feed'))).case.lubrication.oilGrade).toBe(68);
  });

  it('counts progress over the questions that apply', () => {
    const rot = progress({ motion: 'rotating', supply: 'none' });
    const osc = progress({ motion: 'oscillating', supply: 'oil-feed' });
    expect(osc.total - rot.total).toBe(1 + 2); // angle and frequency instead of speed: +1; oil grade and lubricant temperature: +2
    expect(rot.answered).toBe(2);
  });

  it('asks again for a value in a file that does not pass, giving the reason', () => {
    const n = nextQuestion({ title: 'x', diameter: '40 kg' });
    expect(n?.question.id).toBe('diameter');
    expect(n?.stale?.value).toBe('40 kg');
    expect(n?.stale?.reason).toMatch(/shaft\.diameter: "40 kg"/);
  });
});

describe('answers read back from a case document', () => {
  it('finds the case keys and infers the motion from a speed or an oscillation', () => {
    expect(answersFromCase({ title: 'Irrigation pump', shaft: { diameter: '30 mm', speed: '1450 rpm' } })).toEqual({
      title: 'Irrigation pump',
      diameter: '30 mm',
      speed: '1450 rpm',
      motion: 'rotating',
    });
    expect(answersFromCase({ shaft: { oscillation: { angle: '40 deg' } } }).motion).toBe('oscillating');
  });

  it('takes the motion from the saved state when no key shows it yet', () => {
    expect(answersFromCase({ title: 'x' }, { motion: 'oscillating' }).motion).toBe('oscillating');
    expect(answersFromCase({ title: 'x' }).motion).toBeUndefined();
  });

  it("ignores what is not a scalar at a question's key", () => {
    expect(answersFromCase({ shaft: { diameter: { value: 40 } }, priorities: { cost: 4 } })).toEqual({
      'priority.cost': 4,
    });
  });
});
