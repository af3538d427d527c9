import type { Command } from 'commander';

/** `shaftwise batch <dir> --out summary.csv`: advise every case file in a folder. */
export function registerBatch(program: Command): void {
  program
    .command('batch')
    .description(
      'advise every case file (*.yaml, *.yml, *.json) in a folder; one CSV row per case, one per support for a shaft case',
    )
    .argument('<dir>', 'folder of case files')
    .option('--out <file>', 'CSV summary to write (required)')
    .option('--force', 'replace an existing --out file')
    .exitOverride()
    .action(async (dir: string, raw: { out?: string; force?: boolean }) => {
      const { EXIT } = await import('../errors.js');
      const { UsageError } = await import('../../core/errors.js');
      const { statSync } = await import('node:fs');
      let st;
      try {
        st = statSync(dir);
      } catch {
        throw new UsageError(
          `batch: folder "${dir}" does not exist; expected a folder of case files (*.yaml, *.yml, *.json)`,
        );
      }
      if (!st.isDirectory())
        throw new UsageError(
          `batch: got "${dir}", which is not a folder; expected a folder of case files (*.yaml, *.yml, *.json)`,
        );
      if (raw.out === undefined)
        throw new UsageError('--out: missing; expected the CSV file to write, e.g. --out summary.csv');
      const { runBatch } = await import('../../explore/batch.js');
      const { batchCsv } = await import('../../report/explore/csv.js');
      const { progressBar } = await import('../../report/explore/progress.js');
      const { writeFileSafe } = await import('../write-file.js');
      const bar = progressBar('batch');
      let rows;
      try {
        rows = await runBatch(dir, { onProgress: bar.update });
      } finally {
        bar.done();
      }
      writeFileSafe(raw.out, batchCsv(rows), { force: raw.force === true, option: '--out' });
      const bad = rows.filter((r) => r.result === 'error');
      const none = rows.filter((r) => r.result === 'fail').length;
      process.stdout.write(
        `wrote ${raw.out}: ${rows.length} row${rows.length === 1 ? '' : 's'}, ${rows.length - bad.length - none} with a recommendation, ${none} with none feasible, ${bad.length} failed\n`,
      );
      for (const r of bad) process.stderr.write(`shaftwise: ${r.file}: ${r.error}\n`);
      if (bad.length) process.exitCode = EXIT.checkFailed;
    });
}
