import type { AdviceResult } from '../../advise/engine.js';
import type { LoadedCase } from '../../case/load.js';
import { buildNote, type NoteOptions } from './model.js';

export type NoteFormat = 'md' | 'html';
export const NOTE_FORMATS: readonly NoteFormat[] = ['md', 'html'];

/**
 * The design-review note of an advised case, as Markdown or self-contained HTML. Renderers
 * load on demand (the HTML one brings the SVG chart writer with it).
 */
export async function renderNote(
  loaded: LoadedCase,
  advice: AdviceResult,
  format: NoteFormat,
  opts: NoteOptions,
): Promise<string> {
  const model = buildNote(loaded, advice, opts);
  if (format === 'md') return (await import('./markdown.js')).renderMarkdown(model);
  return (await import('./html.js')).renderHtml(model);
}

export { buildNote, noteDate, type NoteOptions } from './model.js';
export type { NoteModel } from './document.js';
