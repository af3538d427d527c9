/**
 * A progress bar on stderr, our own few lines (no package): drawn only when stderr is a
 * terminal and only once the work has taken longer than `delayMs` (a quick run shows
 * nothing); redrawn at most every 100 ms; erased when done. Nothing is written when stderr
 * is not a terminal, so pipes, files and tests see clean output.
 */
export interface Progress {
  update: (done: number, total: number) => void;
  done: () => void;
}

export function progressBar(
  label: string,
  opts: { stream?: NodeJS.WriteStream; delayMs?: number; width?: number } = {},
): Progress {
  const stream = opts.stream ?? process.stderr;
  const delay = opts.delayMs ?? 1000;
  const width = opts.width ?? 30;
  const start = Date.now();
  let last = 0;
  let shown = false;
  if (!stream.isTTY) return { update: () => {}, done: () => {} };
  return {
    update(done, total) {
      const now = Date.now();
      if (now - start < delay || (now - last < 100 && done < total)) return;
      last = now;
      shown = true;
      const f = total > 0 ? done / total : 1;
      const full = Math.round(f * width);
      stream.write(
        `\r${label} [${'#'.repeat(full)}${'.'.repeat(width - full)}] ${String(Math.round(f * 100)).padStart(3)} % ${done}/${total}`,
      );
    },
    done() {
      if (shown) stream.write('\r\u001b[2K');
    },
  };
}
