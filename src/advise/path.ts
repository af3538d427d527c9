/**
 * Resolve a simple JSONPath ("$.a.b[0]") the way jsonpath-plus does for such paths
 * (wrap: false). Rule files may only use this form (rule-schema.ts), so the engine is given
 * this resolver instead of the general JSONPath library, which costs milliseconds per
 * condition on a cold start.
 */
export const STEP = /\.([A-Za-z0-9_]+)|\[(\d+)\]/g;

export function resolvePath(value: unknown, path: string): unknown {
  let o: unknown = value;
  for (const m of path.matchAll(STEP)) {
    if (o === null || o === undefined || typeof o !== 'object') return undefined;
    o = (o as Record<string, unknown>)[m[1] ?? m[2]!];
  }
  return o;
}
