// Bundle the compiled CLI (dist/cli/main.js) into dist/bundle/, one file for start-up plus
// lazily loaded chunks for each command. Resolving and parsing hundreds of small module
// files (zod, yaml…) dominates a CLI's start-up on Node 20, which has no module compile
// cache; one minified file halves it (see bench/startup.mjs and the README).
// Then the start-up snapshot's entry (dist/cli/snapshot.js) into dist/snapshot/shaftwise.cjs:
// one CommonJS script that requires only node's built-ins, every dynamic import() inlined
// (what `node --build-snapshot` accepts), with its hash beside it in shaftwise.cjs.sha256
// (bin/build-snapshot.mjs records it with the blob; bin/shaftwise compares the two).
// dist/bundle/ and dist/snapshot/ sit at the same depth as dist/cli/, so the runtime paths to
// data/, rules/ and package.json (../../) hold in all three.
import { createHash } from 'node:crypto';
import { chmodSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { build } from 'rolldown';

// Never used, so left out: json-rules-engine's default JSONPath resolver (see
// scripts/jsonpath-stub.mjs) and inquirer's text-editor prompt (scripts/external-editor-stub.mjs).
const resolve = {
  alias: {
    'jsonpath-plus': new URL('./jsonpath-stub.mjs', import.meta.url).pathname,
    '@inquirer/external-editor': new URL('./external-editor-stub.mjs', import.meta.url).pathname,
  },
};

/**
 * Every character outside ASCII in a written script replaced by its \u escape (UTF-16 code
 * units), after minifying (the minifier writes escapes back as characters). The reports' units and
 * signs (µ, °, ·, ≤…) otherwise make the whole script a two-byte string in V8: twice the memory,
 * and 0.9 MB more start-up snapshot to read at every start. The escape means the same character
 * in a string, template, regular expression, identifier or comment; not after a backslash, nor
 * in a template read raw, so the build stops on either.
 */
function asciiOnly(url) {
  const code = readFileSync(url, 'utf8');
  const name = fileURLToPath(url);
  if (/\bString\.raw\b/.test(code)) throw new Error(`${name}: String.raw would read a \\u escape as written`);
  const out = code.replace(/[\u0080-\uffff]/g, (c, at) => {
    if (code[at - 1] === '\\') throw new Error(`${name}: a backslash before "${c}" at offset ${at}`);
    return `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`;
  });
  if (out !== code) writeFileSync(url, out);
}

rmSync(new URL('../dist/bundle/', import.meta.url), { recursive: true, force: true });
await build({
  input: 'dist/cli/main.js',
  platform: 'node',
  external: [/^node:/],
  resolve,
  logLevel: 'warn',
  output: {
    dir: 'dist/bundle',
    format: 'esm',
    minify: true,
    entryFileNames: 'shaftwise.mjs',
    chunkFileNames: '[name]-[hash].mjs',
  },
});
const bundleDir = new URL('../dist/bundle/', import.meta.url);
for (const f of readdirSync(bundleDir)) if (f.endsWith('.mjs')) asciiOnly(new URL(f, bundleDir));
chmodSync(new URL('../dist/bundle/shaftwise.mjs', import.meta.url), 0o755);

// The snapshot's script. A CommonJS script has no import.meta: its URL is the script's own.
// Every import() of the program's own modules is inlined (codeSplitting: false); one of a
// node built-in stays external, and becomes a require, which the snapshot allows.
const builtinImports = {
  name: 'builtin-imports',
  renderChunk: (code) => code.replace(/\bimport\(\s*([`'"])(node:[\w/]+)\1\s*\)/g, 'Promise.resolve(require("$2"))'),
};
const snapshotDir = new URL('../dist/snapshot/', import.meta.url);
rmSync(snapshotDir, { recursive: true, force: true });
await build({
  input: 'dist/cli/snapshot.js',
  platform: 'node',
  external: [/^node:/],
  resolve,
  transform: { define: { 'import.meta.url': '__shaftwiseUrl' } },
  logLevel: 'warn',
  plugins: [builtinImports],
  output: {
    file: 'dist/snapshot/shaftwise.cjs',
    format: 'cjs',
    minify: true,
    codeSplitting: false,
    banner: 'var __shaftwiseUrl = require("node:url").pathToFileURL(__filename).href;',
  },
});
asciiOnly(new URL('shaftwise.cjs', snapshotDir));
const script = readFileSync(new URL('shaftwise.cjs', snapshotDir));
// A dynamic import left in the script would fail in the process started from the snapshot.
const left = /\bimport\(/.exec(script.toString('utf8'));
if (left) throw new Error(`dist/snapshot/shaftwise.cjs: a dynamic import() is left at offset ${left.index}`);
writeFileSync(new URL('shaftwise.cjs.sha256', snapshotDir), createHash('sha256').update(script).digest('hex') + '\n');
