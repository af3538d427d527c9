/**
 * Set one field of a case document, as a user would edit the case file: `field` is the case
 * path ("space.maxOuterDiameter", "duty[0].speed"), `to` the value as a case file writes it
 * ("32 mm", "oil-bath"). Mappings on the way are created when missing. Returns a new document.
 */
export function applyChange(doc: unknown, field: string, to: unknown): Record<string, unknown> {
  const copy = structuredClone(doc) as Record<string, unknown>;
  const steps = field
    .split('.')
    .flatMap((part) => part.split(/\[(\d+)\]/).filter((s) => s !== ''))
    .map((s) => (/^\d+$/.test(s) ? Number(s) : s));
  if (steps.length === 0) throw new Error(`empty field path "${field}"`);
  let node: Record<string | number, unknown> = copy;
  for (const [i, key] of steps.slice(0, -1).entries()) {
    const next = node[key];
    if (next === undefined || next === null) {
      node[key] = typeof steps[i + 1] === 'number' ? [] : {};
    } else if (typeof next !== 'object') {
      throw new Error(`field "${field}": "${String(key)}" holds ${JSON.stringify(next)}, not a mapping`);
    }
    node = node[key] as Record<string | number, unknown>;
  }
  node[steps.at(-1)!] = to;
  return copy;
}
