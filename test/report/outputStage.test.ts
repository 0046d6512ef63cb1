import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { fileSystemCause, makeDirectory, OutputDirectoryError, OutputStage } from '../../src/report/outputStage.js';

// A staged output directory: nothing reaches the output directory before commit(), and an
// abort leaves it as it was (rename within one file system, POSIX rename(2)). The error
// codes are the POSIX errno names (common practice).
describe('staged output directory', () => {
  const temp = () => mkdtempSync(join(tmpdir(), 'wayward-stage-'));

  it('files reach the directory only on commit, in the order staged, and the stage is gone after', async () => {
    const out = join(temp(), 'out');
    mkdirSync(out);
    writeFileSync(join(out, 'a.txt'), 'old a\n');
    writeFileSync(join(out, 'keep.txt'), 'not ours\n');
    const stage = await OutputStage.open(out);
    writeFileSync(stage.path('a.txt'), 'new a\n');
    writeFileSync(stage.path('b.txt'), 'new b\n');
    expect(readFileSync(join(out, 'a.txt'), 'utf8')).toBe('old a\n');
    expect(existsSync(join(out, 'b.txt'))).toBe(false);
    await stage.commit();
    expect(readdirSync(out).sort()).toEqual(['a.txt', 'b.txt', 'keep.txt']);
    expect(readFileSync(join(out, 'a.txt'), 'utf8')).toBe('new a\n');
  });

  it('abort leaves an existing directory exactly as it was', async () => {
    const out = join(temp(), 'out');
    mkdirSync(out);
    writeFileSync(join(out, 'a.txt'), 'old a\n');
    const stage = await OutputStage.open(out);
    writeFileSync(stage.path('a.txt'), 'new a\n');
    await stage.abort();
    expect(readdirSync(out)).toEqual(['a.txt']);
    expect(readFileSync(join(out, 'a.txt'), 'utf8')).toBe('old a\n');
  });

  it('abort removes the directories the stage created', async () => {
    const root = temp();
    const stage = await OutputStage.open(join(root, 'x', 'y', 'out'));
    expect(existsSync(join(root, 'x', 'y', 'out'))).toBe(true);
    await stage.abort();
    expect(readdirSync(root)).toEqual([]);
  });

  it('a target that is a directory stops the commit before any file is moved', async () => {
    const out = join(temp(), 'out');
    mkdirSync(join(out, 'b.txt'), { recursive: true });
    writeFileSync(join(out, 'a.txt'), 'old a\n');
    const stage = await OutputStage.open(out);
    writeFileSync(stage.path('a.txt'), 'new a\n');
    writeFileSync(stage.path('b.txt'), 'new b\n');
    await expect(stage.commit()).rejects.toThrow(`cannot write output directory ${out}: b.txt is a directory (EISDIR)`);
    expect(readFileSync(join(out, 'a.txt'), 'utf8')).toBe('old a\n');
    expect(readdirSync(out).sort()).toEqual(['a.txt', 'b.txt']);
  });

  it('a parent that is a regular file: the message names the directory and ENOTDIR', async () => {
    const root = temp();
    writeFileSync(join(root, 'file'), '');
    const dir = join(root, 'file', 'out');
    await expect(makeDirectory(dir)).rejects.toThrow(
      new OutputDirectoryError(dir, `${join(root, 'file')} is not a directory (ENOTDIR)`, 'ENOTDIR'));
    await expect(OutputStage.open(join(root, 'file'))).rejects.toThrow(
      `cannot write output directory ${join(root, 'file')}: exists and is not a directory (ENOTDIR)`);
  });

  it('a directory the file system will not create is reported with its real cause, not a hang', async () => {
    // procfs refuses new directories at its root with ENOENT (Linux); a recursive mkdir was
    // seen to loop there without end.
    if (!existsSync('/proc/self')) return;
    const dir = `/proc/wayward-${process.pid}/out`;
    await expect(makeDirectory(dir)).rejects.toThrow(
      `cannot write output directory ${dir}: cannot create /proc/wayward-${process.pid}: no such file or directory (ENOENT)`);
  });

  it('names the cause of each error code in words with the code', () => {
    const err = (code: string) => Object.assign(new Error('x'), { code });
    expect(fileSystemCause(err('EROFS'))).toBe('read-only file system (EROFS)');
    expect(fileSystemCause(err('EACCES'))).toBe('permission denied (EACCES)');
    expect(fileSystemCause(err('ENOSPC'))).toBe('no space left on device (ENOSPC)');
    expect(fileSystemCause(err('EWHATEVER'))).toBe('x');
  });

  it('output names are plain file names (caller misuse otherwise)', async () => {
    const stage = await OutputStage.open(join(temp(), 'out'));
    expect(() => stage.path('../escape.txt')).toThrow(RangeError);
    expect(() => stage.path('.hidden')).toThrow(RangeError);
    expect(() => stage.path('plots/a.svg')).toThrow(RangeError); // folder not declared
    await stage.folder('plots');
    expect(() => stage.path('plots/../a.svg')).toThrow(RangeError);
    expect(() => stage.path('plots/x/a.svg')).toThrow(RangeError);
    expect(() => stage.path('plots/.a')).toThrow(RangeError);
    await expect(stage.folder('a/b')).rejects.toThrow(RangeError);
    await stage.abort();
  });

  it('files in a declared folder reach it only on commit; the folder is made if missing, others in it are kept', async () => {
    const out = join(temp(), 'out');
    const stage = await OutputStage.open(out);
    await stage.folder('plots');
    writeFileSync(stage.path('plots/a.svg'), 'a\n');
    writeFileSync(stage.path('report.md'), 'r\n');
    expect(existsSync(join(out, 'plots'))).toBe(false);
    await stage.commit();
    expect(readdirSync(out).sort()).toEqual(['plots', 'report.md']);
    expect(readFileSync(join(out, 'plots', 'a.svg'), 'utf8')).toBe('a\n');
    writeFileSync(join(out, 'plots', 'old.svg'), 'old\n');
    const again = await OutputStage.open(out);
    await again.folder('plots');
    writeFileSync(again.path('plots/a.svg'), 'a2\n');
    await again.commit();
    expect(readdirSync(join(out, 'plots')).sort()).toEqual(['a.svg', 'old.svg']);
    expect(readFileSync(join(out, 'plots', 'a.svg'), 'utf8')).toBe('a2\n');
  });

  it('a declared folder that is a file in the output directory stops the commit before any file is moved', async () => {
    const out = join(temp(), 'out');
    mkdirSync(out);
    writeFileSync(join(out, 'plots'), 'a file\n');
    const stage = await OutputStage.open(out);
    writeFileSync(stage.path('report.md'), 'r\n');
    await stage.folder('plots');
    writeFileSync(stage.path('plots/a.svg'), 'a\n');
    await expect(stage.commit()).rejects.toThrow(`cannot write output directory ${out}: plots exists and is not a directory (ENOTDIR)`);
    expect(readdirSync(out)).toEqual(['plots']);
  });
});
