import type { ShaftLoadSI } from '../../case/shaft-types.js';
import type { PointLoad } from './types.js';

/** Standard acceleration of gravity, m/s² (ISO 80000-3:2019, item 3-9.1, conventional value). */
export const STANDARD_GRAVITY = 9.80665;

/**
 * Unit vector across the shaft at angle φ (rad) around it: 0 = +y, increasing towards +z,
 * u = (0, cos φ, sin φ).
 */
function across(phi: number): { y: number; z: number } {
  return { y: Math.cos(phi), z: Math.sin(phi) };
}

/**
 * Forces of a gear mesh on the shaft, reduced to the shaft axis.
 *
 *   Ft = 2T/d            tangential force, N
 *   Fr = |Ft|·tan αn / cos β   separating (radial) force, N
 *   Fa = Ft·tan β        axial force, N
 *
 * T torque N·m, d pitch diameter m, αn normal pressure angle rad, β helix angle rad; these are
 * the usual spur and helical force relations (from memory: ISO 6336-1:2019, cl. 5; Juvinall &
 * Marshek, Fundamentals of Machine Component Design, 6th ed. 2017, ch. 15–16). Friction at the
 * mesh is neglected. Signs (our convention, stated here once):
 *  - the mesh point lies at radius d/2 in direction u = (0, cos φ, sin φ), φ = `mesh`;
 *  - `torque` T > 0 is the torque the shaft delivers through this gear about +x (right-hand
 *    rule): the mesh force on the shaft resists it, so the tangential force is −(2T/d)·t with
 *    t = x̂ × u = (0, −sin φ, cos φ), and its moment about x is −T. A gear that drives the
 *    shaft (power in) is given a negative torque;
 *  - the separating force points from the mesh point to the shaft axis: −Fr·u;
 *  - the axial force on the shaft is fx = (2T/d)·tan β: a positive helix angle with a positive
 *    torque pushes the shaft towards +x; the other hand (β < 0) or the other torque reverses it;
 *  - the axial force acts at the pitch point, so it bends the shaft with the couple
 *    (d/2)·u × fx·x̂ = (d/2)·fx·(0, sin φ, −cos φ), i.e. my = fx·(d/2)·sin φ, mz = −fx·(d/2)·cos φ.
 */
export function gearLoad(
  at: number,
  g: { pitchDiameter: number; torque: number; pressureAngle: number; helixAngle: number; mesh: number },
  label = 'gear',
): PointLoad {
  const r = g.pitchDiameter / 2;
  const ft = g.torque / r;
  const fr = (Math.abs(ft) * Math.tan(g.pressureAngle)) / Math.cos(g.helixAngle);
  const fx = ft * Math.tan(g.helixAngle);
  const u = across(g.mesh);
  const t = { y: -u.z, z: u.y };
  return {
    at,
    fx,
    fy: -ft * t.y - fr * u.y,
    fz: -ft * t.z - fr * u.z,
    my: fx * r * u.z,
    mz: -fx * r * u.y,
    torque: -g.torque,
    label,
  };
}

/**
 * Pull of a belt or chain on its shaft: F = k·2|T|/d in the direction ψ (0 = +y, towards +z).
 *
 * T torque N·m, d pitch diameter m, k pull factor = (F1 + F2)/(F1 − F2), the ratio of the sum
 * of the two strand tensions (tight F1, slack F2) to the effective pull F1 − F2 = 2T/d; the two
 * strands are taken as parallel, so the shaft load is F1 + F2 (an upper bound; wrap angles below
 * 180° give a little less). Pull factor by common practice (from memory): chain about 1.0–1.2,
 * V-belt about 1.5–2, flat belt 2–3. The torque's sign does not change the pull; the torque about
 * x is returned as −T, the belt resisting the torque the shaft delivers (as for a gear).
 */
export function pullLoad(
  at: number,
  p: { pitchDiameter: number; torque: number; pullFactor: number; direction: number },
  label: string,
): PointLoad {
  const f = (p.pullFactor * 2 * Math.abs(p.torque)) / p.pitchDiameter;
  const u = across(p.direction);
  return { at, fx: 0, fy: f * u.y, fz: f * u.z, my: 0, mz: 0, torque: -p.torque, label };
}

/**
 * Every load of a shaft case as point forces and couples on the shaft axis (SI).
 *  - force: (axial, y, z) as given, N;
 *  - gear: see gearLoad; belt, chain: see pullLoad;
 *  - weight: (0, −m·g, 0), m kg, g = 9.80665 m/s² (the shaft's y axis taken as up).
 * Labels are the kind and its 1-based place in the list ("gear 2").
 */
export function resolveLoads(loads: readonly ShaftLoadSI[]): PointLoad[] {
  return loads.map((l, i) => {
    const n = i + 1;
    if ('force' in l) {
      return { at: l.at, fx: l.axial, fy: l.force.y, fz: l.force.z, my: 0, mz: 0, torque: 0, label: `force ${n}` };
    }
    if ('gear' in l) return gearLoad(l.at, l.gear, `gear ${n}`);
    if ('belt' in l) return pullLoad(l.at, l.belt, `belt ${n}`);
    if ('chain' in l) return pullLoad(l.at, l.chain, `chain ${n}`);
    return {
      at: l.at,
      fx: 0,
      fy: -l.weight.mass * STANDARD_GRAVITY,
      fz: 0,
      my: 0,
      mz: 0,
      torque: 0,
      label: `weight ${n}`,
    };
  });
}
