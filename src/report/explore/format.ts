/** Newtons in one pound-force. */
export const LBF = 4.4482216152605;

/**
 * Axis and legend numbers for the explore reports, 3 figures: SI with an engineering
 * multiple, or pound-force for US units.
 */
export function fmtLoad(n: number, units: 'SI' | 'US' = 'SI'): string {
  if (units === 'US') return `${+(n / LBF).toPrecision(3)} lbf`;
  return n >= 1e6
    ? `${+(n / 1e6).toPrecision(3)} MN`
    : n >= 1e3
      ? `${+(n / 1e3).toPrecision(3)} kN`
      : `${+n.toPrecision(3)} N`;
}

/** Speed from rev/s to r/min. */
export function fmtSpeed(revPerSecond: number): string {
  const r = revPerSecond * 60;
  return `${r >= 1e4 ? Math.round(r) : +r.toPrecision(3)} r/min`;
}

/** XML/HTML text escape. */
export function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}
