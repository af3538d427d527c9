/** Columns a line of the questionnaire's own text fills at most (the narrowest common terminal). */
export const WIDTH = 80;

/**
 * `text` broken between words into lines of at most `width` columns, each starting with
 * `indent`. A word longer than a line is left whole on its own line (never cut inside).
 * Existing line breaks are kept.
 */
export function wrapWords(text: string, width = WIDTH, indent = ''): string {
  const out: string[] = [];
  for (const para of text.split('\n')) {
    let line = '';
    for (const word of para.split(/ +/).filter((w) => w !== '')) {
      if (line !== '' && indent.length + line.length + 1 + word.length > width) {
        out.push(indent + line);
        line = word;
      } else line = line === '' ? word : `${line} ${word}`;
    }
    out.push(line === '' ? '' : indent + line);
  }
  return out.join('\n');
}
