/**
 * The output directory of one run, staged. Every output is written into a staging directory
 * inside the output directory (same filesystem, so moving a file out of it is a rename) and
 * moved into place only by commit(), after all of them are complete. A run that fails before
 * commit() leaves the output directory exactly as it was: abort() removes the staging
 * directory and the directories the stage itself created (an output directory that did not
 * exist before is not left behind empty).
 *
 * commit() renames the files in the order they were staged (the caller stages summary.json
 * last, so its presence marks a complete set). Each rename is atomic (POSIX rename(2)); the
 * set is not, but the window is the few renames at the very end, after every check that
 * can be made beforehand (no target is a directory).
 *
 * Outputs may also go one level down, into a subfolder declared with folder() (for example
 * plots/): the subfolder is created in the output directory at commit() if missing, and
 * files already in it that this run does not write are left alone.
 *
 * Directories are created one level at a time, not with a recursive mkdir: that reports
 * the real cause (EROFS, EACCES, ENOTDIR) on the level that failed; Node 20's recursive
 * mkdir was seen to report ENOENT for a read-only file system and to loop without end
 * under /proc.
 */
import { promises as fs } from 'node:fs';
import { dirname, join, resolve } from 'node:path';

/** The output directory cannot be created or written. Message: one line naming it and the cause. */
export class OutputDirectoryError extends Error {
  readonly dir: string;
  readonly code: string;
  constructor(dir: string, cause: string, code = '') {
    super(`cannot write output directory ${dir}: ${cause}`);
    this.name = 'OutputDirectoryError';
    this.dir = dir;
    this.code = code;
  }
}

/** Plain words for the file-system error codes an output directory meets (POSIX errno names). */
const CAUSES: Readonly<Record<string, string>> = {
  EROFS: 'read-only file system',
  EACCES: 'permission denied',
  EPERM: 'operation not permitted',
  ENOTDIR: 'not a directory',
  EEXIST: 'exists and is not a directory',
  EISDIR: 'is a directory',
  ENOENT: 'no such file or directory',
  ENOSPC: 'no space left on device',
  EDQUOT: 'disk quota exceeded',
  EMFILE: 'too many open files',
  ENAMETOOLONG: 'file name too long',
};

/** 'read-only file system (EROFS)' for an errno error; its message for anything else. */
export function fileSystemCause(err: unknown): string {
  const code = (err as { code?: unknown })?.code;
  if (typeof code === 'string' && code in CAUSES) return `${CAUSES[code]} (${code})`;
  return err instanceof Error ? err.message : String(err);
}

function errnoCode(err: unknown): string {
  const code = (err as { code?: unknown })?.code;
  return typeof code === 'string' ? code : '';
}

/**
 * Makes `dir` and any missing parents, one level at a time. Returns the directories it
 * created, outermost first. OutputDirectoryError naming `dir` and the level that failed.
 */
export async function makeDirectory(dir: string): Promise<string[]> {
  const missing: string[] = [];
  let d = resolve(dir);
  for (;;) {
    try {
      const st = await fs.stat(d);
      if (!st.isDirectory()) {
        const what = d === resolve(dir) ? 'exists and is not a directory' : `${d} is not a directory`;
        throw new OutputDirectoryError(dir, `${what} (ENOTDIR)`, 'ENOTDIR');
      }
      break;
    } catch (err) {
      if (err instanceof OutputDirectoryError) throw err;
      const code = errnoCode(err);
      if ((code !== 'ENOENT' && code !== 'ENOTDIR') || dirname(d) === d) throw new OutputDirectoryError(dir, fileSystemCause(err), code);
      missing.push(d);
      d = dirname(d);
    }
  }
  const created: string[] = [];
  for (const m of missing.reverse()) {
    try {
      await fs.mkdir(m);
      created.push(m);
    } catch (err) {
      await removeEmpty(created);
      const where = m === resolve(dir) ? '' : `cannot create ${m}: `;
      throw new OutputDirectoryError(dir, where + fileSystemCause(err), errnoCode(err));
    }
  }
  return created;
}

/** Removes directories (innermost first) if they are empty; never fails. */
async function removeEmpty(dirs: readonly string[]): Promise<void> {
  for (const d of [...dirs].reverse()) await fs.rmdir(d).catch(() => undefined);
}

/** A plain file or folder name: not empty, no separator, not starting with '.'. */
function isPlainName(name: string): boolean {
  return name !== '' && !name.includes('/') && !name.includes('\\') && !name.startsWith('.');
}

export class OutputStage {
  private readonly names: string[] = [];
  private readonly folders: string[] = [];
  private done = false;

  private constructor(
    readonly outDir: string,
    readonly stagingDir: string,
    private readonly created: string[],
  ) {}

  /** Creates the output directory if needed and an empty staging directory inside it. */
  static async open(outDir: string): Promise<OutputStage> {
    const created = await makeDirectory(outDir);
    const staging = join(outDir, `.wayward-staging-${process.pid}`);
    try {
      await fs.rm(staging, { recursive: true, force: true }); // a leftover of a killed run with this pid
      await fs.mkdir(staging);
    } catch (err) {
      await removeEmpty(created);
      throw new OutputDirectoryError(outDir, fileSystemCause(err), errnoCode(err));
    }
    return new OutputStage(outDir, staging, created);
  }

  /** Declares the subfolder `name` (a plain name) of the outputs; create it in the stage. */
  async folder(name: string): Promise<void> {
    if (!isPlainName(name)) throw new RangeError(`output folder '${name}' is not a plain name`);
    if (this.folders.includes(name)) return;
    await fs.mkdir(join(this.stagingDir, name));
    this.folders.push(name);
  }

  /**
   * Where to write the output `name` now: a plain file name, or 'FOLDER/NAME' inside a folder
   * declared with folder(); it reaches outDir on commit().
   */
  path(name: string): string {
    const parts = name.split('/');
    const plain = parts.every(isPlainName) && (parts.length === 1 || (parts.length === 2 && this.folders.includes(parts[0])));
    if (!plain) throw new RangeError(`output name '${name}' is not a plain file name or one in a declared folder`);
    if (!this.names.includes(name)) this.names.push(name);
    return join(this.stagingDir, name);
  }

  /** Moves every staged file into the output directory, in staging order, and removes the stage. */
  async commit(): Promise<void> {
    if (this.done) throw new RangeError('output stage already committed or aborted');
    try {
      for (const folder of this.folders) {
        const target = await fs.stat(join(this.outDir, folder)).catch(() => null);
        if (target && !target.isDirectory()) throw new OutputDirectoryError(this.outDir, `${folder} exists and is not a directory (ENOTDIR)`, 'ENOTDIR');
      }
      for (const folder of this.folders) {
        try {
          await fs.mkdir(join(this.outDir, folder));
          this.created.push(resolve(this.outDir, folder));
        } catch (err) {
          if (errnoCode(err) !== 'EEXIST') throw err;
        }
      }
      for (const name of this.names) {
        const target = await fs.stat(join(this.outDir, name)).catch(() => null);
        if (target?.isDirectory()) throw new OutputDirectoryError(this.outDir, `${name} is a directory (EISDIR)`, 'EISDIR');
      }
      for (const name of this.names) await fs.rename(join(this.stagingDir, name), join(this.outDir, name));
    } catch (err) {
      await this.abort();
      throw err instanceof OutputDirectoryError ? err : new OutputDirectoryError(this.outDir, fileSystemCause(err), errnoCode(err));
    }
    this.done = true;
    await fs.rm(this.stagingDir, { recursive: true, force: true });
  }

  /** Drops everything staged; the output directory is as it was before open(). Never fails. */
  async abort(): Promise<void> {
    if (this.done) return;
    this.done = true;
    await fs.rm(this.stagingDir, { recursive: true, force: true }).catch(() => undefined);
    await removeEmpty(this.created);
  }
}
