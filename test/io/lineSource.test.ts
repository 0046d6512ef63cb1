/**
 * Line source and whole-file errors: missing file, directory, empty file, binary file,
 * gzip, CRLF / CR endings, a byte-order mark, chunk boundaries inside a CRLF pair and
 * inside a multi-byte character, lines across many chunk boundaries (against String.split),
 * standard input. Checksums against the SHA-256 examples of
 * FIPS 180-2 (appendix B.1, "abc"; the empty-message digest), from memory.
 */
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterAll, describe, expect, it } from 'vitest';
import { seededRandom } from '../../src/core/random.js';
import { forEachLine, UnreadableInputError } from '../../src/io/index.js';
import { HASH_THREAD_MIN_BYTES, sha256Of } from '../../src/io/sha256Thread.js';
import { CAN_LIST_OPEN_FILES, closedWithin } from './openFiles.js';

const dir = mkdtempSync(join(tmpdir(), 'wayward-lines-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, content: string | Buffer): string {
  const p = join(dir, name);
  writeFileSync(p, content);
  return p;
}

async function lines(path: string): Promise<{ texts: string[]; nos: number[]; sha256: string; gzip: boolean }> {
  const texts: string[] = [];
  const nos: number[] = [];
  const stats = await forEachLine(path, (t, n) => {
    texts.push(t);
    nos.push(n);
  });
  expect(stats.lines).toBe(texts.length);
  return { texts, nos, sha256: stats.sha256, gzip: stats.gzip };
}

async function fatal(path: string): Promise<string> {
  try {
    await forEachLine(path, () => {});
  } catch (err) {
    expect(err).toBeInstanceOf(UnreadableInputError);
    return (err as Error).message;
  }
  throw new Error('expected an UnreadableInputError');
}

describe('whole-file problems', () => {
  it('missing file', async () => {
    const p = join(dir, 'nope.txt');
    expect(await fatal(p)).toBe(`${p}: no such file`);
  });

  it('directory', async () => {
    const p = join(dir, 'sub');
    mkdirSync(p);
    expect(await fatal(p)).toBe(`${p}: is a directory, not a file`);
  });

  it('binary file (NUL bytes in the first chunk)', async () => {
    const p = file('data.bin', Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x00, 0x00, 0x41, 0x0a]));
    expect(await fatal(p)).toBe(`${p}: binary content (NUL byte at offset 4), not a text file`);
  });

  it.runIf(CAN_LIST_OPEN_FILES)('the file is closed after a fatal probe or a consumer that throws', async () => {
    const bin = file('closed.bin', Buffer.from([0x41, 0x00, 0x0a]));
    await fatal(bin);
    expect(await closedWithin(bin)).toBe(0);
    const boom = new Error('consumer failed');
    for (const p of [file('closed.txt', 'one\ntwo\n'), file('closed.gz', gzipSync('one\ntwo\n'))]) {
      await expect(forEachLine(p, () => { throw boom; })).rejects.toBe(boom);
      expect(await closedWithin(p), p).toBe(0);
    }
  });

  it('corrupt gzip', async () => {
    const gz = gzipSync('hello\nworld\n');
    const p = file('bad.gz', gz.subarray(0, gz.length - 6));
    expect(await fatal(p)).toMatch(new RegExp(`^${p.replace(/[.]/g, '\\.')}: corrupt gzip data \\(.+\\)$`));
  });
});

describe('contents', () => {
  it('empty file: zero lines, no error; SHA-256 of the empty message (FIPS 180-2, from memory)', async () => {
    const r = await lines(file('empty.txt', ''));
    expect(r.texts).toEqual([]);
    expect(r.sha256).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });

  it('last line without a terminator; SHA-256 of "abc" (FIPS 180-2 B.1, from memory)', async () => {
    const r = await lines(file('abc.txt', 'abc'));
    expect(r.texts).toEqual(['abc']);
    expect(r.sha256).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('LF, CRLF and CR endings give the same lines', async () => {
    const want = ['first line', '', '  third  ', 'last'];
    for (const [name, eol] of [['lf', '\n'], ['crlf', '\r\n'], ['cr', '\r']]) {
      const r = await lines(file(`${name}.txt`, want.join(eol) + eol));
      expect(r.texts, name).toEqual(want);
      expect(r.nos).toEqual([1, 2, 3, 4]);
    }
  });

  it('drops a UTF-8 byte-order mark', async () => {
    const r = await lines(file('bom.txt', '\ufeffdesignation,e\nx,1\n'));
    expect(r.texts).toEqual(['designation,e', 'x,1']);
  });

  it('gzip is read by its magic bytes, whatever the name', async () => {
    const text = Array.from({ length: 5000 }, (_, k) => `line ${k} ${'x'.repeat(k % 300)}`).join('\n') + '\n';
    const plain = await lines(file('plain.txt', text));
    const zipped = await lines(file('zipped.txt', gzipSync(text)));
    expect(zipped.gzip).toBe(true);
    expect(plain.gzip).toBe(false);
    expect(zipped.texts).toEqual(plain.texts);
    expect(zipped.sha256).not.toBe(plain.sha256); // the checksum is of the bytes as read
  });

  it('a CRLF pair and a multi-byte character split across the 1 MiB chunk boundary', async () => {
    const chunk = 1 << 20;
    const first = 'a'.repeat(chunk - 1); // CR is the last byte of chunk 1, LF the first of chunk 2
    const second = 'b'.repeat(chunk - 2) + 'é'; // the 2-byte é straddles the next boundary
    const r = await lines(file('split.txt', `${first}\r\n${second}tail\r\nend`));
    expect(r.texts.map((t) => t.length)).toEqual([chunk - 1, chunk - 2 + 5, 3]);
    expect(r.texts[1].endsWith('étail')).toBe(true);
  });

  it('lines of every length across many chunk boundaries, one longer than two chunks: the lines String.split gives', async () => {
    const random = seededRandom(7);
    const parts: string[] = [];
    for (let k = 0; k < 3000; k++) parts.push('x'.repeat(Math.floor(random() * 2000)) + (k % 7 === 0 ? 'é' : ''));
    parts.splice(1500, 0, 'y'.repeat((2 << 20) + 123)); // spans three chunks
    const text = parts.join('\r\n');
    const r = await lines(file('many.txt', text));
    expect(r.texts).toEqual(text.split('\r\n'));
    expect(r.nos[r.nos.length - 1]).toBe(parts.length);
  });

  it('an input past HASH_THREAD_MIN_BYTES is hashed on a worker thread: the digest node:crypto gives on the same bytes', async () => {
    const line = Buffer.from('K31YZ0E 26.94  0.15 K325A 231.48676 (synthetic line)\n', 'latin1');
    const count = Math.ceil((HASH_THREAD_MIN_BYTES + 12_345) / line.length);
    const bytes = Buffer.concat(Array.from({ length: count }, () => line));
    const hash = sha256Of(bytes.length);
    expect(hash.onThread).toBe(true);
    expect(sha256Of(HASH_THREAD_MIN_BYTES - 1).onThread).toBe(false);
    for (let k = 0; k < bytes.length; k += 1 << 20) hash.update(bytes.subarray(k, k + (1 << 20)));
    const want = createHash('sha256').update(bytes).digest('hex'); // OpenSSL through node:crypto, one thread
    expect(await hash.digest()).toBe(want);
    const p = file('large.txt', bytes);
    const r = await lines(p);
    expect(r.texts.length).toBe(count);
    expect(r.sha256).toBe(want);
    // a read that stops early (the consumer throws) abandons the hash and leaves nothing running
    const boom = new Error('stop');
    await expect(forEachLine(p, (_t, n) => { if (n === 1000) throw boom; })).rejects.toBe(boom);
    expect((await lines(p)).sha256).toBe(r.sha256);
  });

  it("reads standard input for '-'", () => {
    const script = "import('./src/io/index.ts').then(async (io) => { const got = []; " +
      "await io.forEachLine('-', (t, n) => got.push(n + ':' + t)); console.log(JSON.stringify(got)); })";
    const out = spawnSync(process.execPath, ['--import', 'tsx', '-e', script], {
      input: 'one\r\ntwo\r\n', cwd: new URL('../..', import.meta.url).pathname, encoding: 'utf8',
    });
    expect(out.stderr).toBe('');
    expect(JSON.parse(out.stdout)).toEqual(['1:one', '2:two']);
  });
});
