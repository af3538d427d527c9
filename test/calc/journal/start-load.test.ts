/**
 * The start-up unit load is checked at the load the bearing carries when the shaft starts
 * and stops (load.atStart), not at the running load. Guards the practice-matrix duty
 * `air-separation-gear-pinion` (test/advise/matrix/duties-fast.ts): a high-speed gear pinion
 * whose tooth load (18 kN) is absent at rest, where the start-up check at the full gear load
 * (about 2.2 MPa against Trumpler's 300 psi, Trumpler 1966, from memory) excluded the journal.
 */
import { describe, expect, it } from 'vitest';
import { parse as parseYaml, stringify } from 'yaml';
import { checkJournal } from '../../../src/calc/journal/index.js';
import { parseCaseText } from '../../../src/case/load.js';
import { DUTIES } from '../../advise/matrix/duties.js';

const KERNEL = { sheet: false, pressureProfile: false } as const;
const duty = DUTIES.find((d) => d.id === 'air-separation-gear-pinion')!;

/** The duty's case with load.atStart set to `atStart` (a case-file string such as "1.5 kN"), or left out. */
function pinion(atStart?: string) {
  const file = parseYaml(duty.yaml) as { load: Record<string, unknown> };
  delete file.load['atStart'];
  if (atStart !== undefined) file.load['atStart'] = atStart;
  return parseCaseText(stringify(file), duty.id).case;
}

describe('journal start-up load (air-separation-gear-pinion)', () => {
  it('without load.atStart the start-up load is the running load, stated as an assumption', () => {
    const c = pinion();
    const r = checkJournal(c, KERNEL);
    const start = r.checks.find((k) => k.id === 'start-unit-load')!;
    expect(start.value).toBeCloseTo(c.load.radial / (r.length * c.shaft.diameter), 6);
    const a = r.assumed.find((f) => f.code === 'journal.start-load-running');
    expect(a?.field).toBe('load.atStart');
    expect(a?.values['load']).toBe(c.load.radial);
  });

  it('with load.atStart the check uses that load, and the dead weight alone lets the journal pass', () => {
    const c = pinion('1.5 kN');
    expect(c.load.atStart).toBe(1500);
    const r = checkJournal(c, KERNEL);
    const start = r.checks.find((k) => k.id === 'start-unit-load')!;
    expect(start.value).toBeCloseTo(1500 / (r.length * c.shaft.diameter), 6);
    expect(start.pass).toBe(true);
    expect(r.assumed.map((f) => f.code)).not.toContain('journal.start-load-running');
    expect(r.feasible).toBe(true);
  });

  it('a start under a load above the running one is checked at it (the start load is not capped)', () => {
    const c = pinion('60 kN');
    const r = checkJournal(c, KERNEL);
    const start = r.checks.find((k) => k.id === 'start-unit-load')!;
    expect(start.value).toBeCloseTo(60000 / (r.length * c.shaft.diameter), 6);
    expect(start.pass).toBe(false);
  });
});
