/**
 * The read step alone, for scripts/bench-ingest.ts: `npx tsx scripts/bench/readStep.ts FILE
 * THREADS` loads FILE through the built loadCatalogue (dist/: stream, parse, clean, hash; its
 * worker threads start from the compiled files) on THREADS threads and prints one JSON line:
 * wall and process CPU seconds (all threads), rows, rejects, inputs parsed on two threads and
 * a SHA-256 over the catalogue's columns, rejects and accounts (to compare thread counts).
 */
import { createHash } from 'node:crypto';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

const [file, threadsText] = process.argv.slice(2);
const dist = pathToFileURL(resolve(import.meta.dirname, '..', '..', 'dist', 'src', 'cli', 'loadCatalogue.js')).href;
const { loadCatalogue } = (await import(dist)) as typeof import('../../src/cli/loadCatalogue.js');
const cpu0 = process.cpuUsage();
const t0 = process.hrtime.bigint();
const r = await loadCatalogue([file], { threads: Number(threadsText) });
const seconds = Number(process.hrtime.bigint() - t0) / 1e9;
const cpu = process.cpuUsage(cpu0);
const hash = createHash('sha256');
const cat = r.catalogue as unknown as Record<string, unknown>;
for (const k of Object.keys(cat).sort()) {
  const v = cat[k];
  hash.update(k);
  if (ArrayBuffer.isView(v)) hash.update(new Uint8Array(v.buffer, v.byteOffset, v.byteLength));
  else if (v instanceof Map) hash.update(JSON.stringify([...v]));
  else hash.update(JSON.stringify(v));
}
hash.update(JSON.stringify(r.rejects));
hash.update(JSON.stringify(r.files));
console.log(JSON.stringify({
  seconds, cpuSeconds: (cpu.user + cpu.system) / 1e6, rows: r.catalogue.size, rejects: r.rejects.length,
  twoThreadFiles: r.twoThreadFiles, sha256: hash.digest('hex'),
}));
