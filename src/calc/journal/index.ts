/**
 * The hydrodynamic journal bearing check: its entry point and the shape of its result.
 * The steps (candidates, design sweep and checks, findings, pressure profile, calculation
 * sheet) and the solver behind them (mesh, Reynolds equation, dimensionless tables,
 * operating point) are modules of their own, imported from there by whoever needs them.
 */
export { checkJournal } from './check.js';
export type { JournalOptions, JournalPointSummary, JournalResult, PressurePoint } from './types.js';
