/**
 * Value of a purely numerical calculation-sheet expression as the kernels write it (the part
 * after its last "="; ·, ×, ^, ², ½, π, √, ln, brackets and unit names), or null when it holds
 * a named function or symbol (e.g. "a_ISO(κ = …)", "ε(L/D = 0.7, S = 0.39)"). Reports print
 * `substituted = value unit`, so sheet tests compare this with the line's value.
 */
export function evaluate(expr: string): number | null {
  const t = expr.trim();
  if (/^[^\s=(]+\(.*\)$/.test(t) || /^min\(/.test(t)) return null;
  let e = t.slice(t.lastIndexOf('=') + 1);
  e = e
    .replace(
      /J\/\(kg·K\)|kg\/m³|mm²\/s|m³\/s|Pa·s|N·m|r\/min|rev\/s|°C|\bmm\b|\bPa\b|\bK\b|\bN\b|\bm\b|\bh\b|\bW\b/g,
      '',
    )
    .replace(/−/g, '-')
    .replace(/½/g, '0.5')
    .replace(/²/g, '**2')
    .replace(/[·×]/g, '*')
    .replace(/\^/g, '**')
    .replace(/(\d)\s*π/g, '$1*Math.PI')
    .replace(/π/g, 'Math.PI')
    .replace(/√\s*([\d.e+-]+)/g, 'Math.sqrt($1)')
    .replace(/\bln\(/g, 'Math.log(')
    .replace(/\[/g, '(')
    .replace(/\]/g, ')')
    .replace(/(\d)\s*\*\*\s*-([\d.]+)/g, '$1**(-$2)');
  if (/[A-Za-z_κεφΣνμ]/.test(e.replace(/Math\.(PI|sqrt|log)/g, '').replace(/\d\.?\d*e[+-]?\d+/g, '1'))) return null;
  const v = Function(`"use strict"; return (${e});`)() as unknown;
  return typeof v === 'number' && Number.isFinite(v) ? v : null;
}
