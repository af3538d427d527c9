import { Option } from 'commander';

/** Options shared by several commands; each command's flags turn into the options object its library call takes. */
export const formatOption = (formats: readonly string[] = ['text', 'json']) =>
  new Option('--format <format>', `output format: ${formats.join(', ')}`).default('text');
export const unitsOption = () =>
  new Option('--units <system>', 'units for text output: SI or US (JSON is always SI)').default('SI');
