import { describe, expect, it } from 'vitest';
import { validateCase } from '../../src/case/load.js';
import { CaseError } from '../../src/core/errors.js';

const doc = (misalignment?: string) => ({
  title: 'Misaligned conveyor idler (invented)',
  shaft: { diameter: '40 mm', speed: '300 rpm', ...(misalignment === undefined ? {} : { misalignment }) },
  load: { radial: '2 kN' },
  life: { hours: '20000 h' },
  space: { maxLength: '40 mm', maxOuterDiameter: '100 mm' },
});

describe('case key shaft.misalignment', () => {
  it('is read as an angle in rad, absent when not written', () => {
    expect(validateCase(doc('0.1 deg')).case.shaft.misalignment).toBeCloseTo((0.1 * Math.PI) / 180, 12);
    expect(validateCase(doc('0.002 rad')).case.shaft.misalignment).toBeCloseTo(0.002, 12);
    expect(validateCase(doc()).case.shaft.misalignment).toBeUndefined();
  });
  it('refuses an angle beyond 5 deg, naming the field', () => {
    expect(() => validateCase(doc('10 deg'))).toThrow(CaseError);
    expect(() => validateCase(doc('10 deg'))).toThrow(/shaft\.misalignment/);
  });
});
