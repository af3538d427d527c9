// The bushing tables' contract keys and the classes issue 14 asked for (data/bushing-materials.json, data/bushing-factors.json).
import { describe, expect, it } from 'vitest';
import { bushingFactors, bushingMaterials, NEEDS, RATINGS } from '../../src/data/bushing.js';

describe('bushing material table', () => {
  const rows = bushingMaterials();

  it('every row says what lubricant it needs, with a source, and rates water and chemical service', () => {
    for (const m of rows) {
      expect(NEEDS, m.id).toContain(m.needs);
      expect(m.needsSource.length, m.id).toBeGreaterThan(10);
      expect(RATINGS, m.id).toContain(m.water);
      expect(RATINGS, m.id).toContain(m.chemical);
      expect(m.mediaSource.length, m.id).toBeGreaterThan(10);
    }
  });

  it('periodically greased classes need grease; self-lubricating and oil-impregnated classes need none', () => {
    for (const m of rows) {
      const greased = /greased|grease-grooved/i.test(m.name);
      const wet = /water-lubricated/i.test(m.name);
      expect(m.needs, m.id).toBe(greased ? 'grease' : wet ? 'water' : 'none');
    }
    expect(rows.find((m) => m.id === 'sintered-bronze')!.needsSource).toMatch(/pores/);
  });

  it('holds the classes practice uses for slow, heavy, oscillating pins under shock', () => {
    const steel = rows.find((m) => m.id === 'greased-hardened-steel')!;
    const pin = rows.find((m) => m.id === 'greased-bronze-pin')!;
    const bronze = rows.find((m) => m.id === 'greased-bronze')!;
    // Both carry more pressure than the rotating greased bronze, steel on steel the most.
    expect(pin.maxPressure).toBeGreaterThan(bronze.maxPressure);
    expect(steel.maxPressure).toBeGreaterThan(pin.maxPressure);
    // Converted to SI: 150 MPa, 3e-9 mm³/(N·m) = 3e-18 m²/N.
    expect(steel.maxPressure).toBeCloseTo(150e6, 0);
    expect(steel.wearFactor).toBeCloseTo(3e-18, 30);
    for (const m of [steel, pin]) {
      expect(m.source).toMatch(/seen|from memory/);
      expect(m.motion).toBe('oscillating');
      expect(m.motionSource).toMatch(/common practice/);
    }
    expect(rows.filter((m) => m.motion === 'oscillating').map((m) => m.id)).toEqual([steel.id, pin.id]);
  });
});

describe('bushing factors', () => {
  it('the heat balance names its reference room temperature and its source', () => {
    const h = bushingFactors().heat;
    expect(h.referenceAmbient).toBe(20);
    expect(h.source).toMatch(/Tribology Handbook/);
  });
});
