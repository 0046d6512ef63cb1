/**
 * scripts/make-synthetic-astrometry.ts end to end: the files it writes read back through the
 * project's readers, the same options give the same bytes, and usage errors exit 2.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { readAstrometryFile } from '../../../src/io/index.js';

const ROOT = fileURLToPath(new URL('../../../', import.meta.url));
const TSX = join(ROOT, 'node_modules', '.bin', 'tsx');

function run(args: string[]): { status: number | null; stdout: string; stderr: string } {
  const r = spawnSync(TSX, ['scripts/make-synthetic-astrometry.ts', ...args], { cwd: ROOT, encoding: 'utf8' });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe('make-synthetic-astrometry', () => {
  const tmp = mkdtempSync(join(tmpdir(), 'wayward-synth-'));
  afterAll(() => rmSync(tmp, { recursive: true, force: true }));
  const args = (out: string) => ['--out', out, '--count', '24', '--years', '1', '--start', '2030-01-01', '--epoch', '2030-07-01', '--a2', '1e-13', '--seed', '5'];

  it('writes 80-column and ADES files of the count asked for, the same bytes twice', async () => {
    const a = run(args(join(tmp, 'a')));
    expect(a.stderr).toBe('');
    expect(a.status).toBe(0);
    expect(run(args(join(tmp, 'b'))).status).toBe(0);
    for (const f of ['synthetic.obs80.txt', 'synthetic.psv', 'synthetic-elements.txt', 'synthetic-observations.csv']) {
      expect(readFileSync(join(tmp, 'b', f), 'utf8'), f).toBe(readFileSync(join(tmp, 'a', f), 'utf8'));
    }
    for (const f of ['synthetic.obs80.txt', 'synthetic.psv']) {
      const read = await readAstrometryFile(join(tmp, 'a', f));
      expect(read.rejected).toEqual([]);
      expect(read.observations.length).toBe(24);
      expect(read.designations.designations.map((d) => d.designation)).toEqual(['2031 QK12']);
    }
  });

  it('exits 2 on a usage error with a one-line reason', () => {
    const badStation = run(['--out', join(tmp, 'c'), '--stations', 'ZZZ:0.3']);
    expect(badStation.status).toBe(2);
    expect(badStation.stderr).toContain('station ZZZ');
    const badNumber = run(['--out', join(tmp, 'c'), '--count', 'many']);
    expect(badNumber.status).toBe(2);
    const tooEarly = run(['--out', join(tmp, 'c'), '--start', '1960-01-01']);
    expect(tooEarly.status).toBe(2);
    expect(tooEarly.stderr.trim().split('\n').length).toBe(1);
  });
});
