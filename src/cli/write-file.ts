import { UsageError } from '../core/errors.js';
import { closeSync, fsyncSync, linkSync, openSync, renameSync, rmSync, statSync, writeSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { randomBytes } from 'node:crypto';

export interface WriteOptions {
  /** Replace an existing file (the command's --force). */
  force: boolean;
  /** The option that named the file, for messages (default "--out"). */
  option?: string;
}

/**
 * Write `data` to `target` so that nothing the user had is lost:
 *  - the text goes to a temporary file in the target's own directory (same file system, so
 *    the final step is a rename, never a copy), flushed to disk, then moved into place;
 *  - without `force` an existing target is never replaced: the move is a hard link, which
 *    fails if the name exists, so even a file that appears meanwhile is kept;
 *  - on any failure the temporary file is removed and the previous target is untouched.
 * Errors the user can fix (missing directory, no permission, existing file, a directory in
 * the way) are UsageErrors naming the option, the path given and what was expected.
 */
export function writeFileSafe(target: string, data: string, opts: WriteOptions): void {
  const option = opts.option ?? '--out';
  const existing = statOrNull(target);
  if (existing?.isDirectory())
    throw new UsageError(`${option}: got "${target}", which is a directory; expected a file path`);
  if (existing && !opts.force) {
    throw new UsageError(
      `${option}: "${target}" already exists and was left untouched; pass --force to replace it, or choose another file`,
    );
  }
  const dir = dirname(target);
  const tmp = join(dir, `.${basename(target)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
  let fd: number | undefined;
  try {
    fd = openSync(tmp, 'wx', 0o644);
    writeSync(fd, data);
    fsyncSync(fd);
    closeSync(fd);
    fd = undefined;
    if (opts.force) renameSync(tmp, target);
    else {
      try {
        linkSync(tmp, target);
      } catch (le) {
        // A file system without hard links (some network and FAT mounts): fall back to a
        // rename after a last look, which narrows but cannot close the race.
        const code = (le as NodeJS.ErrnoException).code;
        if (
          code === 'EEXIST' ||
          !['EPERM', 'ENOTSUP', 'EOPNOTSUPP', 'ENOSYS', 'EXDEV'].includes(code ?? '') ||
          statOrNull(target)
        )
          throw le;
        renameSync(tmp, target);
      }
      rmSync(tmp, { force: true });
    }
  } catch (e) {
    if (fd !== undefined) {
      try {
        closeSync(fd);
      } catch {
        /* already closed */
      }
    }
    rmSync(tmp, { force: true });
    throw new UsageError(
      `${option}: cannot write "${target}" (${reason(e as NodeJS.ErrnoException, dir)}); expected a writable file path in an existing directory`,
    );
  }
}

function statOrNull(p: string) {
  try {
    return statSync(p);
  } catch {
    return null;
  }
}

function reason(e: NodeJS.ErrnoException, dir: string): string {
  switch (e.code) {
    case 'ENOENT':
      return `directory "${dir}" does not exist`;
    case 'ENOTDIR':
      return `"${dir}" is not a directory`;
    case 'EACCES':
    case 'EPERM':
      return `permission denied in "${dir}"`;
    case 'EROFS':
      return 'read-only file system';
    case 'ENOSPC':
      return 'no space left on the device';
    case 'EEXIST':
      return 'the file appeared while writing; it was left untouched (pass --force to replace it)';
    default:
      return e.message;
  }
}
