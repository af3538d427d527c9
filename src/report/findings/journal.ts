import type { KernelWording } from './types.js';

/** The words of the journal kernel's findings and assumptions, keyed by code. */
export const journalWording: KernelWording = {
  findings: {},
  assumptions: {},
};
