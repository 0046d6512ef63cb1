import { readAstrometryFile } from './src/io/index.js';
for (const n of [100, 300, 1000]) {
  const t0 = performance.now();
  const r = await readAstrometryFile(`/tmp/obsr-big${n}.txt`);
  console.log(r.lines, (performance.now() - t0).toFixed(0), 'ms', r.designations.designations.length);
}
