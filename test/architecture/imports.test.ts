// Kind: structure of the source tree (not physics). The imports follow the data flow
// (DEVELOPERS.md): core ← data ← case ← calc ← advise ← explore ← report ← cli, with
// src/index.ts, the library entry, on top; no import runs back up and no two files import
// each other, directly or round a loop.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, normalize, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const SRC = fileURLToPath(new URL('../../src/', import.meta.url));
const LAYERS = ['core', 'data', 'case', 'calc', 'advise', 'explore', 'report', 'cli', 'index'];

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? sources(path) : path.endsWith('.ts') ? [path] : [];
  });
}

/** Relative imports of each file (static, type-only and dynamic alike), as paths under src/. */
function importGraph(): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  for (const path of sources(SRC)) {
    const file = relative(SRC, path);
    const text = readFileSync(path, 'utf8');
    const targets = [...text.matchAll(/(?:from|import\()\s*'(\.{1,2}\/[^']+)'/g)].map((m) =>
      normalize(join(dirname(file), m[1]!.replace(/\.js$/, '.ts'))),
    );
    graph.set(file, targets);
  }
  return graph;
}

/** The layer of a file under src/: its top folder, or "index" for src/index.ts. */
const layerOf = (file: string): string => (file.includes('/') ? file.split('/')[0]! : file.replace(/\.ts$/, ''));

/** Strongly connected groups of more than one file (Tarjan): each one is an import cycle. */
function cycles(graph: Map<string, string[]>): string[][] {
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const found: string[][] = [];
  const visit = (file: string): void => {
    index.set(file, index.size);
    low.set(file, index.get(file)!);
    stack.push(file);
    for (const next of graph.get(file) ?? []) {
      if (!graph.has(next)) continue;
      if (!index.has(next)) {
        visit(next);
        low.set(file, Math.min(low.get(file)!, low.get(next)!));
      } else if (stack.includes(next)) low.set(file, Math.min(low.get(file)!, index.get(next)!));
    }
    if (low.get(file) === index.get(file)) {
      const group: string[] = [];
      let top: string;
      do {
        top = stack.pop()!;
        group.push(top);
      } while (top !== file);
      if (group.length > 1) found.push(group.sort());
    }
  };
  for (const file of graph.keys()) if (!index.has(file)) visit(file);
  return found;
}

describe('imports follow the data flow', () => {
  const graph = importGraph();

  it('reads the whole tree, every layer in it', () => {
    expect(graph.size).toBeGreaterThan(50);
    expect(new Set([...graph.keys()].map(layerOf))).toEqual(new Set(LAYERS));
  });

  it('no import runs up a layer', () => {
    const upward = [...graph].flatMap(([file, targets]) =>
      targets
        .filter((t) => LAYERS.indexOf(layerOf(t)) > LAYERS.indexOf(layerOf(file)))
        .map((t) => `${file} imports ${t}`),
    );
    expect(upward).toEqual([]);
  });

  it('no import cycle between files', () => {
    expect(cycles(graph)).toEqual([]);
  });

  it('the cycle finder finds a loop of three and passes a chain', () => {
    const loop = new Map([
      ['a.ts', ['b.ts']],
      ['b.ts', ['c.ts']],
      ['c.ts', ['a.ts']],
      ['d.ts', ['a.ts']],
    ]);
    expect(cycles(loop)).toEqual([['a.ts', 'b.ts', 'c.ts']]);
    expect(
      cycles(
        new Map([
          ['a.ts', ['b.ts']],
          ['b.ts', []],
        ]),
      ),
    ).toEqual([]);
  });
});
