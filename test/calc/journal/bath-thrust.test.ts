/**
 * The oil bath's heat balance counts the thrust face's loss beside the journal's: both run in
 * the one sump. Guards examples/packaging-worm-drive.yaml (an invented worm-shaft locating
 * support with 4 kN of thrust in a gearbox bath), where the pads' loss (about 136 W) was left
 * out of a balance that counted only the journal's (about 38 W). The balance is the
 * statement T_bath = T_amb + P/(h·A) of src/calc/sump.ts (h: its stated coefficient).
 */
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { loadCaseFile } from '../../../src/case/load.js';
import { checkJournal } from '../../../src/calc/journal/index.js';
import { BATH_TOLERANCE_K } from '../../../src/calc/sump.js';

const KERNEL = { sheet: false, pressureProfile: false } as const;
const worm = loadCaseFile(fileURLToPath(new URL('../../../examples/packaging-worm-drive.yaml', import.meta.url))).case;

describe('oil-bath balance with thrust pads (packaging-worm-drive)', () => {
  const r = checkJournal(worm, KERNEL);
  const bath = r.assumed.find((f) => f.code === 'journal.bath-temperature')!;
  const v = bath.values as Record<string, number>;

  it('the bath loss is the journal film loss plus the thrust face loss, at the bath temperature', () => {
    expect(r.thrust?.path).toBe('pad');
    const thrustLoss = r.thrust!.meanPowerLoss;
    expect(thrustLoss).toBeGreaterThan(0);
    expect(v['thrustLoss']).toBeCloseTo(thrustLoss, 6);
    // The journal's own loss at the same inlet (the bath) plus the pads' is what heats the sump.
    expect(v['loss']).toBeCloseTo(r.meanPowerLoss, -1);
    expect(Math.abs(v['loss']! - r.meanPowerLoss)).toBeLessThan(0.02 * r.meanPowerLoss);
    expect(v['loss']!).toBeGreaterThan(thrustLoss);
  });

  it('the bath temperature closes the balance T = T_amb + P/(h·A) on that loss', () => {
    const t = v['ambient']! + v['loss']! / (v['heatTransfer']! * v['area']!);
    expect(Math.abs(t - v['temperature']!)).toBeLessThan(10 * BATH_TOLERANCE_K);
  });

  it('the bath is hotter than the journal alone would make it', () => {
    const journalOnly = v['ambient']! + (v['loss']! - v['thrustLoss']!) / (v['heatTransfer']! * v['area']!);
    expect(v['temperature']!).toBeGreaterThan(journalOnly + 1);
  });
});
