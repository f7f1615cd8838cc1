/**
 * The file rules of the command line: nothing the user owns is overwritten unless they say so,
 * never the input, and an output appears whole or not at all (temp file in the same folder, then
 * a rename, which replaces a name in one step on the same file system).
 */
import { randomBytes } from 'node:crypto';
import { promises as fs, constants as fsc, unlinkSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { MAX_UNPACKED_BYTES } from '../engine/package';

/** A refusal the user can act on: printed as one line, exit code 2. */
export class UsageError extends Error {
  override name = 'UsageError';
}

export const TEMP_PREFIX = '.fluxbook-tmp-';

function reason(error: unknown): string {
  const code = (error as NodeJS.ErrnoException).code;
  if (code === 'ENOENT') return 'no such file';
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  if (code === 'EISDIR') return 'is a folder, not a file';
  return error instanceof Error ? error.message : String(error);
}

/** The bytes of an input file, or a UsageError saying why there are none. */
export async function readInput(path: string): Promise<Buffer> {
  try {
    const stat = await fs.stat(path);
    if (stat.isDirectory()) throw new UsageError(`${path}: is a folder, not a workbook`);
    // Parts are stored or deflated, never much larger packed than unpacked: a file beyond the
    // unpacked limit cannot hold a workbook Fluxbook would read, so it is not read at all.
    if (stat.size > MAX_UNPACKED_BYTES) {
      throw new UsageError(`${path}: is ${(stat.size / 2 ** 30).toFixed(1)} GiB; Fluxbook reads workbooks of up to ${MAX_UNPACKED_BYTES / 2 ** 30} GiB unpacked`);
    }
    return await fs.readFile(path);
  } catch (error) {
    if (error instanceof UsageError) throw error;
    throw new UsageError(`${path}: ${reason(error)}`);
  }
}

/** The real path a file has or would have (its folder resolved when the file does not exist yet). */
async function realTarget(path: string): Promise<string> {
  const full = resolve(path);
  try {
    return await fs.realpath(full);
  } catch {
    try {
      return join(await fs.realpath(dirname(full)), basename(full));
    } catch {
      return full;
    }
  }
}

/** True when both names reach the same file: same real path, or the same inode (a hard link). */
export async function sameFile(a: string, b: string): Promise<boolean> {
  if ((await realTarget(a)) === (await realTarget(b))) return true;
  try {
    const [sa, sb] = await Promise.all([fs.stat(a), fs.stat(b)]);
    return sa.dev === sb.dev && sa.ino === sb.ino;
  } catch {
    return false;
  }
}

async function exists(path: string): Promise<boolean> {
  try {
    await fs.lstat(path);
    return true;
  } catch {
    return false;
  }
}

/** The sentence for a file-system refusal of `path`, or undefined when the error is not one a user can act on. */
export function fileProblem(path: string, error: unknown): string | undefined {
  const code = (error as NodeJS.ErrnoException).code;
  if (code === 'EACCES' || code === 'EPERM' || code === 'EROFS') return `${path}: cannot be written here (permission denied); choose a folder you may write to`;
  if (code === 'EISDIR') return `${path}: is a folder; give a file name for the output, such as ${join(path, 'recalculated.xlsx')}`;
  if (code === 'ENOSPC') return `${path}: the disk is full; nothing was written`;
  if (code === 'ENOTDIR') return `${path}: a part of this path is a file, not a folder`;
  if (code === 'ENAMETOOLONG') return `${path}: the name is too long`;
  return undefined;
}

/** The nearest part of `path` that exists, and what it is. */
async function nearestExisting(path: string): Promise<{ path: string; isFolder: boolean } | undefined> {
  for (let p = path; ; p = dirname(p)) {
    try {
      return { path: p, isFolder: (await fs.stat(p)).isDirectory() };
    } catch {
      if (dirname(p) === p) return undefined;
    }
  }
}

/** Checks an output path before any work: its folder exists and may be written, and it is not a file we may not replace. */
export async function checkOutput(out: string, options: { overwrite: boolean; notSameAs?: string }): Promise<void> {
  if (options.notSameAs !== undefined && (await sameFile(options.notSameAs, out))) {
    throw new UsageError(`${out}: is the input workbook; Fluxbook never writes over its input — give another --out`);
  }
  const full = resolve(out);
  const folder = dirname(full);
  const near = await nearestExisting(folder);
  if (near && !near.isFolder) throw new UsageError(`${out}: ${near.path} is a file, not a folder, so nothing can be written inside it`);
  if (!near || near.path !== folder) throw new UsageError(`${out}: the folder ${folder} does not exist`);
  try {
    if ((await fs.stat(full)).isDirectory()) throw new UsageError(fileProblem(out, Object.assign(new Error(), { code: 'EISDIR' }))!);
  } catch (error) {
    if (error instanceof UsageError) throw error;
  }
  try {
    await fs.access(folder, fsc.W_OK);
  } catch (error) {
    throw new UsageError(fileProblem(out, error) ?? `${out}: ${reason(error)}`);
  }
  if (!options.overwrite && (await exists(out))) {
    throw new UsageError(`${out}: exists already; give --overwrite to replace it, or another name`);
  }
}

let pendingTemps = new Set<string>();
let handlersInstalled = false;

/** What the command does before it exits on a signal (the progress bar gives the terminal back). */
let beforeSignalExit: () => void = () => {};

/**
 * On Ctrl-C or a polite kill: give the terminal back, remove the temp files of writes under way,
 * say so, and exit 130 (SIGINT) or 143 (SIGTERM); a SIGKILL leaves one temp file behind, never a
 * half output.
 */
export function installSignalHandlers(onExit: () => void = () => {}): void {
  beforeSignalExit = onExit;
  if (handlersInstalled) return;
  handlersInstalled = true;
  for (const [signal, code] of [
    ['SIGINT', 130],
    ['SIGTERM', 143],
  ] as const) {
    process.on(signal, () => {
      try {
        beforeSignalExit();
      } catch {
        // the terminal is given back as far as possible
      }
      for (const tmp of pendingTemps) {
        try {
          unlinkSync(tmp);
        } catch {
          // already gone
        }
      }
      pendingTemps = new Set();
      process.stderr.write(`fluxbook: ${signal === 'SIGINT' ? 'interrupted' : 'stopped'}; nothing written\n`);
      process.exit(code);
    });
  }
}

/**
 * Writes `target` whole or not at all: `write` fills a temp file beside it, which is flushed to
 * disk and then renamed onto the target. Without `overwrite` the final step is a hard link, which
 * fails rather than replace a file that appeared meanwhile (a rename where links are not possible).
 */
export async function writeAtomically(target: string, write: (tmp: string) => Promise<void>, options: { overwrite: boolean }): Promise<void> {
  installSignalHandlers(beforeSignalExit);
  const full = resolve(target);
  const tmp = join(dirname(full), `${TEMP_PREFIX}${process.pid}-${randomBytes(4).toString('hex')}-${basename(full)}`);
  pendingTemps.add(tmp);
  try {
    try {
      await write(tmp);
    } catch (error) {
      const problem = fileProblem(target, error);
      throw problem ? new UsageError(problem) : error;
    }
    const handle = await fs.open(tmp, fsc.O_RDONLY);
    try {
      await handle.sync();
    } finally {
      await handle.close();
    }
    try {
      if (options.overwrite) {
        await fs.rename(tmp, full);
      } else {
        await linkWithoutReplacing(tmp, full);
      }
    } catch (error) {
      const problem = error instanceof UsageError ? undefined : fileProblem(target, error);
      throw problem ? new UsageError(problem) : error;
    }
    await syncFolder(dirname(full));
  } finally {
    pendingTemps.delete(tmp);
    await fs.rm(tmp, { force: true });
  }
}

async function linkWithoutReplacing(tmp: string, full: string): Promise<void> {
  try {
    await fs.link(tmp, full);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'EEXIST') throw new UsageError(`${full}: appeared while Fluxbook was working; not replaced`);
    if (code !== 'EPERM' && code !== 'ENOTSUP' && code !== 'EOPNOTSUPP' && code !== 'EXDEV' && code !== 'ENOSYS') throw error;
    // A file system without hard links: check, then rename.
    if (await exists(full)) throw new UsageError(`${full}: appeared while Fluxbook was working; not replaced`);
    await fs.rename(tmp, full);
  }
}

/** Makes the rename itself durable; not every platform can open a folder, which is no fault. */
async function syncFolder(folder: string): Promise<void> {
  try {
    const handle = await fs.open(folder, fsc.O_RDONLY);
    try {
      await handle.sync();
    } finally {
      await handle.close();
    }
  } catch {
    // best effort
  }
}
