// Stands in for jsonpath-plus inside the CLI bundle. json-rules-engine imports it for its
// default path resolver, which shaftwise never uses: every Engine is given the resolver of
// src/advise/path.ts (rule files may only hold simple paths, which their schema enforces).
// Leaving the library out saves its load time at every start; should anything call it, the
// failure is loud rather than silent.
export function JSONPath() {
  throw new Error('jsonpath-plus is not bundled: an Engine was created without the shaftwise path resolver');
}
