import type { Command } from 'commander';
import { unitsOption } from '../options.js';

/** `shaftwise map <case>`: where each option wins over a load × speed plane. */
export function registerMap(program: Command): void {
  program
    .command('map')
    .description('selection map: which option wins over a range of load and speed around a case')
    .argument('<case>', 'duty case file (YAML or JSON)')
    .option('--out <file>', 'write an SVG (.svg) or self-contained HTML (.html) map instead of the text map')
    .option('--force', 'replace an existing --out file')
    .addOption(unitsOption())
    .option('--grid <n>', 'cells per axis, 2 to 200 (default: 60 for --out, 30 for text)')
    .option(
      '--load <min..max>',
      'radial load range of the governing point, e.g. "100N..20kN" (default 0.1× to 10× the case)',
    )
    .option(
      '--speed <min..max>',
      'speed range of the governing point, e.g. "10rpm..5000rpm" (default 0.1× to 10× the case)',
    )
    .option('--scale <min..max>', 'a shaft case: range of the factor on every load on the shaft (default 0.25..4)')
    .option('--full', 'evaluate every cell (slower; the same map as the default adaptive fill)')
    .exitOverride()
    .action(
      async (
        file: string,
        raw: {
          out?: string;
          force?: boolean;
          grid?: string;
          load?: string;
          speed?: string;
          scale?: string;
          full?: boolean;
          units?: string;
        },
      ) => {
        const { UsageError } = await import('../../core/errors.js');
        // The map makes many short-lived objects. Started from the snapshot, node runs with the young
        // generation capped at 4 MB a semi-space (bin/build-snapshot.mjs); otherwise a young generation
        // that does not grow keeps a 60 × 60 map's peak memory near 100 MB instead of 130 MB, for a few
        // per cent more time (bench/map.mjs).
        if (!process.execArgv.some((a) => a.startsWith('--max-semi-space-size')))
          (await import('node:v8')).setFlagsFromString('--semi-space-growth-factor=1');
        const { parseGrid, parseRange } = await import('../../explore/axes.js');
        let kind: 'svg' | 'html' | 'text' = 'text';
        if (raw.out !== undefined) {
          const m = /\.(svg|html?)$/i.exec(raw.out);
          if (!m) throw new UsageError(`--out: got "${raw.out}"; expected a file name ending in .svg or .html`);
          kind = m[1]!.toLowerCase() === 'svg' ? 'svg' : 'html';
        }
        const { outputOptions } = await import('../check.js');
        const { units } = outputOptions({ units: raw.units });
        const grid = parseGrid(raw.grid, kind === 'text' ? 30 : 60);
        const load = raw.load === undefined ? undefined : parseRange('--load', raw.load, 'force', '100N..20kN');
        const speed = raw.speed === undefined ? undefined : parseRange('--speed', raw.speed, 'speed', '10rpm..5000rpm');
        const { loadAnyCaseFile } = await import('../../case/shaft-load.js');
        const any = loadAnyCaseFile(file);
        if (any.kind === 'shaft') {
          if (raw.load !== undefined)
            throw new UsageError(
              `--load: got "${raw.load}" for a shaft case; a shaft case scales every load on the shaft together: give --scale MIN..MAX, e.g. "0.25..4"`,
            );
          const { computeShaftMap, parseLoadScale } = await import('../../explore/shaft-map.js');
          const scale = raw.scale === undefined ? undefined : parseLoadScale(raw.scale);
          const { progressBar } = await import('../../report/explore/progress.js');
          const bar = progressBar('map');
          const opts: Parameters<typeof computeShaftMap>[1] = { grid, full: raw.full === true, onProgress: bar.update };
          if (scale) opts.loadScale = scale;
          if (speed) opts.speed = speed;
          let sm;
          try {
            sm = await computeShaftMap(any.loaded, opts);
          } finally {
            bar.done();
          }
          const rep = await import('../../report/explore/shaft-map.js');
          if (kind === 'text') {
            process.stdout.write(rep.shaftMapText(sm, units) + '\n');
            return;
          }
          const { writeFileSafe } = await import('../write-file.js');
          writeFileSafe(raw.out!, kind === 'svg' ? rep.shaftMapSvg(sm) : rep.shaftMapHtml(sm), {
            force: raw.force === true,
            option: '--out',
          });
          process.stdout.write(`wrote ${raw.out}\n`);
          return;
        }
        if (raw.scale !== undefined)
          throw new UsageError(
            `--scale: got "${raw.scale}"; --scale is for a shaft case (shaft.supports and shaft.loads); "${file}" is a single-support case: give --load MIN..MAX`,
          );
        const loaded = any.loaded;
        const { computeMap } = await import('../../explore/map.js');
        const { progressBar } = await import('../../report/explore/progress.js');
        const bar = progressBar('map');
        const opts: Parameters<typeof computeMap>[2] = { grid, full: raw.full === true, onProgress: bar.update };
        if (load) opts.load = load;
        if (speed) opts.speed = speed;
        let m;
        try {
          m = await computeMap(loaded.case, loaded.assumed, opts);
        } finally {
          bar.done();
        }
        if (kind === 'text') {
          const { mapText } = await import('../../report/explore/map-text.js');
          process.stdout.write(mapText(m, units) + '\n');
          return;
        }
        const { mapSvg, mapHtml } = await import('../../report/explore/map-svg.js');
        const { writeFileSafe } = await import('../write-file.js');
        writeFileSafe(raw.out!, kind === 'svg' ? mapSvg(m) : mapHtml(m), {
          force: raw.force === true,
          option: '--out',
        });
        process.stdout.write(`wrote ${raw.out}\n`);
      },
    );
}
