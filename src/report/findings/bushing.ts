import type { KernelWording } from './types.js';

/** The words of the bushing kernel's findings and assumptions, keyed by code. */
export const bushingWording: KernelWording = {
  findings: {},
  assumptions: {},
};
