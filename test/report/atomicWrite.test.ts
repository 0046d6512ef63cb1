import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { AtomicFileWriter, writeFileAtomic } from '../../src/report/atomicWrite.js';

// Atomic replacement by rename within one directory (POSIX rename(2)): the target holds the
// old content until commit, the new content after, and no temporary file is left behind.
describe('atomic output files', () => {
  it('a streamed file replaces the old one only on commit', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'wayward-atomic-'));
    const target = join(dir, 'out.csv');
    writeFileSync(target, 'old\n');
    const w = new AtomicFileWriter(target);
    await w.write('new,');
    await w.write('rows\n');
    expect(readFileSync(target, 'utf8')).toBe('old\n');
    await w.commit();
    expect(readFileSync(target, 'utf8')).toBe('new,rows\n');
    expect(readdirSync(dir)).toEqual(['out.csv']);
  });

  it('abort leaves the old file and no temporary file, even right after opening', async () => {
    // An abort racing the stream's own open left the temporary file in about 3% of tries
    // (9 of 300 measured), hence 300 tries here, each in a directory of its own.
    const dirs: string[] = [];
    for (let k = 0; k < 300; k++) {
      const dir = mkdtempSync(join(tmpdir(), 'wayward-atomic-'));
      writeFileSync(join(dir, 'out.csv'), 'old\n');
      const w = new AtomicFileWriter(join(dir, 'out.csv'));
      await w.write('half a fi');
      await w.abort();
      dirs.push(dir);
    }
    await new Promise((resolve) => setTimeout(resolve, 50)); // let any late open land
    const left = dirs.filter((d) => readdirSync(d).length !== 1 || readFileSync(join(d, 'out.csv'), 'utf8') !== 'old\n');
    expect(left).toEqual([]);
  });

  it('a whole-file write that cannot be made throws and leaves nothing', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'wayward-atomic-'));
    await expect(writeFileAtomic(join(dir, 'missing-dir', 'x.json'), '{}')).rejects.toThrow(/ENOENT/);
    await writeFileAtomic(join(dir, 'x.json'), '{}\n');
    expect(readdirSync(dir)).toEqual(['x.json']);
    expect(readFileSync(join(dir, 'x.json'), 'utf8')).toBe('{}\n');
  });

  it('writes bytes as given (binary data, not text)', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'wayward-atomic-'));
    // Bytes that are not valid UTF-8 (0xff, a lone 0x80): a text round trip would change them.
    const bytes = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0xff, 0x00, 0x80, 0x0a]);
    await writeFileAtomic(join(dir, 'x.png'), bytes);
    expect(readFileSync(join(dir, 'x.png')).equals(bytes)).toBe(true);
    expect(readdirSync(dir)).toEqual(['x.png']);
  });
});
