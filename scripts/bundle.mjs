// Bundle the compiled CLI (dist/cli/main.js) into dist/bundle/, one file for start-up plus
// lazily loaded chunks for each command. Resolving and parsing hundreds of small module
// files (zod, yaml…) dominates a CLI's start-up on Node 20, which has no module compile
// cache; one minified file halves it (see bench/startup.mjs and the README).
// dist/bundle/ sits at the same depth as dist/cli/, so the runtime paths to data/, rules/
// and package.json (../../) hold in both.
import { rmSync } from 'node:fs';
import { build } from 'rolldown';

rmSync(new URL('../dist/bundle/', import.meta.url), { recursive: true, force: true });
await build({
  input: 'dist/cli/main.js',
  platform: 'node',
  external: [/^node:/],
  // Never used, so left out: json-rules-engine's default JSONPath resolver (see
  // scripts/jsonpath-stub.mjs) and inquirer's text-editor prompt (scripts/external-editor-stub.mjs).
  resolve: {
    alias: {
      'jsonpath-plus': new URL('./jsonpath-stub.mjs', import.meta.url).pathname,
      '@inquirer/external-editor': new URL('./external-editor-stub.mjs', import.meta.url).pathname,
    },
  },
  logLevel: 'warn',
  output: {
    dir: 'dist/bundle',
    format: 'esm',
    minify: true,
    entryFileNames: 'shaftwise.mjs',
    chunkFileNames: '[name]-[hash].mjs',
  },
});
import { chmodSync } from 'node:fs';
chmodSync(new URL('../dist/bundle/shaftwise.mjs', import.meta.url), 0o755);
