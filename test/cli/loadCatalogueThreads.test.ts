/**
 * The catalogue `scan` and the other commands build (src/cli/loadCatalogue.ts) is the same
 * whether the orbit file is parsed on one thread or on two: the demo catalogue written five
 * times over (20 MB, over the 16 MiB below which one thread reads; invented data), so that
 * its header block reappears past the split and every body after the first copy is a
 * duplicate whose reject carries its raw text, read back from the file on the worker's part.
 * Columns compared bit for bit, rejects and per-file accounts field by field.
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadCatalogue } from '../../src/cli/loadCatalogue.js';
import { PARALLEL_MIN_BYTES } from '../../src/io/orbitExportParts.js';
import { runCli } from './cliHarness.js';

const DEMO = new URL('../../data/demo/orbits.txt', import.meta.url);
const dir = mkdtempSync(join(tmpdir(), 'wayward-load-threads-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('loadCatalogue on two threads', () => {
  it('the demo catalogue five times over: the same catalogue, rejects and accounts as on one thread', async () => {
    const demo = readFileSync(DEMO);
    const file = join(dir, 'demo-x5.txt');
    writeFileSync(file, Buffer.concat([demo, demo, demo, demo, demo]));
    expect(5 * demo.length).toBeGreaterThan(PARALLEL_MIN_BYTES);
    const one = await loadCatalogue([file], { threads: 1 });
    const two = await loadCatalogue([file], { threads: 2 });
    expect([one.twoThreadFiles, two.twoThreadFiles]).toEqual([0, 1]);
    expect(two.files).toEqual(one.files);
    expect(two.errors).toEqual(one.errors);
    expect(two.rejects.length).toBe(one.rejects.length);
    expect(two.rejects).toEqual(one.rejects);
    // 4 of the 5 copies' rows are duplicates of the first (each body kept once): counted from
    // the demo file itself, not from the reader
    const demoRows = one.catalogue.size;
    expect(one.rejects.filter((r) => r.kind === 'duplicate').length).toBeGreaterThanOrEqual(4 * demoRows);
    const a = one.catalogue as unknown as Record<string, unknown>;
    const b = two.catalogue as unknown as Record<string, unknown>;
    expect(Object.keys(b).sort()).toEqual(Object.keys(a).sort());
    for (const k of Object.keys(a)) {
      const x = a[k];
      const y = b[k];
      if (ArrayBuffer.isView(x) && ArrayBuffer.isView(y)) {
        expect(Buffer.from(y.buffer, y.byteOffset, y.byteLength).equals(Buffer.from(x.buffer, x.byteOffset, x.byteLength)), k).toBe(true);
      } else expect(y, k).toEqual(x);
    }
  }, 120_000);
});

describe('scan reading on two threads', () => {
  it('the demo catalogue five times over: every output file byte-identical with --threads 1 and 2', async () => {
    const demo = readFileSync(DEMO);
    const file = join(dir, 'demo-x5-scan.txt');
    writeFileSync(file, Buffer.concat([demo, demo, demo, demo, demo]));
    const outs = ['1', '2'].map((n) => {
      const out = join(dir, `scan-${n}`);
      const r = runCli(['scan', file, '-d', 'tisserand', '--threads', n, '--reproducible', '--quiet', '--out', out]);
      expect(r.status, r.stderr).toBe(0);
      return out;
    });
    const names = readdirSync(outs[0]).sort();
    expect(readdirSync(outs[1]).sort()).toEqual(names);
    expect(names).toContain('candidates.csv');
    for (const name of names) {
      expect(readFileSync(join(outs[1], name)).equals(readFileSync(join(outs[0], name))), name).toBe(true);
    }
    // without --reproducible the summary says how many files were read on two threads
    const timed = join(dir, 'scan-2-timed');
    expect(runCli(['scan', file, '-d', 'tisserand', '--threads', '2', '--quiet', '--out', timed]).status).toBe(0);
    expect(JSON.parse(readFileSync(join(timed, 'summary.json'), 'utf8')).resources.twoThreadReadFiles).toBe(1);
  }, 120_000);
});
