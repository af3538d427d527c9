// data/journal-tables.json is computed by our own solver (scripts/journal-tables.mjs); this
// re-solves some of it so a solver change without regenerating the file fails here.
import { describe, expect, it } from 'vitest';
import { shippedJournalTables } from '../../../src/data/journal-tables.js';
import {
  buildTable,
  DEFAULT_MESH,
  pointAtEccentricity,
  TABLE_ECCENTRICITIES,
  tableFromRows,
} from '../../../src/calc/journal/table.js';
import { makeMesh } from '../../../src/calc/journal/mesh.js';

describe('shipped journal tables', () => {
  const shipped = shippedJournalTables();

  it('were solved at the default mesh over the current eccentricity rows', () => {
    expect(shipped.mesh).toEqual(DEFAULT_MESH);
    expect(shipped.eccentricities).toEqual([...TABLE_ECCENTRICITIES]);
    expect(shipped.tables.map((t) => t.lengthToDiameter)).toContain(1);
  });

  for (const ld of [0.25, 0.5, 1, 2]) {
    it(`match a fresh solve at L/D = ${ld} (12 significant figures stored)`, () => {
      const fresh = buildTable(ld);
      const file = shipped.tables.find((t) => t.lengthToDiameter === ld)!;
      expect(file.rows).toHaveLength(fresh.rows.length);
      fresh.rows.forEach((r, i) => {
        const s = file.rows[i]!;
        for (const k of [
          'sommerfeld',
          'attitudeDeg',
          'frictionVariable',
          'flowVariable',
          'sideFlowRatio',
          'pressureRatio',
        ] as const) {
          expect(Math.abs(s[k] / r[k] - 1), `${k} at ε=${r.eccentricity}`).toBeLessThan(1e-9);
        }
      });
      // and interpolate identically between rows
      const seeded = tableFromRows(
        ld,
        file.rows,
        makeMesh(DEFAULT_MESH.nTheta, DEFAULT_MESH.nZeta, DEFAULT_MESH.stretch),
      );
      for (const e of [0.33, 0.77, 0.955]) {
        expect(pointAtEccentricity(seeded, e).sommerfeld / pointAtEccentricity(fresh, e).sommerfeld).toBeCloseTo(1, 9);
      }
    });
  }
});
