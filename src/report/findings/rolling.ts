import type { KernelWording } from './types.js';

/** The words of the rolling kernel's findings and assumptions, keyed by code. */
export const rollingWording: KernelWording = {
  findings: {},
  assumptions: {},
};
