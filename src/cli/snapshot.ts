// The entry of the start-up snapshot (scripts/bundle.mjs bundles it into one CommonJS script,
// bin/build-snapshot.mjs runs it under `node --build-snapshot`). Building the snapshot evaluates
// every module, reads the data tables and rules into their caches and runs the examples once,
// so their code is compiled; the process started from the snapshot then only parses its
// arguments and does the work. Imported first: zod's jitless setting, before any schema.
import './jitless.js';
import { readdirSync } from 'node:fs';
import { startupSnapshot } from 'node:v8';
import { buildProgram, runProgram } from './program.js';
import { runAdvise } from './advise.js';
import { runCheck, CHECKS } from './check.js';
import { loadCaseFile } from '../case/load.js';
import { computeMap } from '../explore/map.js';
import { mapText } from '../report/explore/map-text.js';
import { mapSvg } from '../report/explore/map-svg.js';

const ROOT = new URL('../../', import.meta.url);
const PACKAGE_JSON = new URL('package.json', ROOT);

/** The case files advised while the snapshot is built: examples/*.yaml and examples/shaft/*.yaml. */
function warmingCases(): string[] {
  const files: string[] = [];
  for (const sub of ['examples/', 'examples/shaft/']) {
    const dir = new URL(sub, ROOT);
    for (const f of readdirSync(dir).sort()) if (f.endsWith('.yaml')) files.push(new URL(f, dir).pathname);
  }
  return files;
}

/** Cells a side of the map drawn while warming (the first example, a single-support case). */
const MAP_WARMING_GRID = 12;

/**
 * Advise every example and run each check on the single-support ones, in the default text
 * format; draw a small map of the first single-support example, as text and SVG. Output is
 * discarded; a case that fails is skipped (the snapshot still holds what ran before it).
 * The other formats (JSON, the note) compile when first used: warming them too made the blob
 * 0.17 MB larger, and every start reads it (`check bushing` about 3 ms sooner without them,
 * `advise` the same within noise, `--format html` about 2 ms later; bench/startup.mjs).
 */
async function warm(): Promise<void> {
  const skip = () => '';
  const files = warmingCases();
  for (const file of files) {
    await runAdvise(file, { format: 'text', units: 'SI', explain: false, now: () => new Date(0) }).catch(skip);
    for (const name of CHECKS) await runCheck(name, file, { format: 'text', units: 'SI' }).catch(skip);
  }
  try {
    const loaded = loadCaseFile(files[0]!);
    const m = await computeMap(loaded.case, loaded.assumed, { grid: MAP_WARMING_GRID });
    mapText(m);
    mapSvg(m);
  } catch {
    // A map that cannot be drawn leaves its code cold, nothing else.
  }
}

// No top-level await: the bundle of this entry is a CommonJS script.
if (startupSnapshot.isBuildingSnapshot()) {
  void warm().then(() => {
    // The command-line program is built here, once, and parses the command line of the process
    // started from the snapshot (its version read from package.json now).
    const program = buildProgram(PACKAGE_JSON);
    // Started from the snapshot, node gives the arguments after its own: [node, ...args].
    startupSnapshot.setDeserializeMainFunction(() => {
      void runProgram([process.argv[0]!, 'shaftwise', ...process.argv.slice(1)], PACKAGE_JSON, program);
    });
  });
} else {
  // Run as a plain script (node dist/snapshot/shaftwise.cjs ARGS): the same program.
  void runProgram(process.argv, PACKAGE_JSON);
}
