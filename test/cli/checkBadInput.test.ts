/**
 * `wayward check`: records set aside (duplicate, dates, other designations) and bad input — no
 * observations of the designation, an empty or missing file, no station placed, too few
 * observations for an orbit, usage errors — with their exit codes and messages. The records are
 * real ones of (12893) (test/fixtures/astrometry/README.md); the edited copies and the demo's
 * records are invented.
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CODES, DEMO, SAMPLE, fitJson } from './checkFitJson.js';
import { runCli, tempDir } from './cliHarness.js';

describe('check: records set aside and bad input', () => {
  const dir = tempDir('wayward-check-bad-');
  const lines = readFileSync(SAMPLE, 'utf8').split('\n').filter((l) => l !== '');
  const demo = readFileSync(`${DEMO}/check-body.obs80.txt`, 'utf8').split('\n').slice(0, 5);
  const third = lines[2]; // 12893 … C1996 04 22.50120, station 566
  const mixed = join(dir, 'mixed.txt');
  // Real records plus: the same record twice, one dated 2099, one 1750 (edited copies of a real
  // line), and five records of another body (the demo's).
  writeFileSync(mixed, [...lines, third, third.replace('1996 04 22', '2099 04 22'), third.replace('1996 04 22', '1750 04 22'), ...demo].join('\n') + '\n');

  it('fits the rest, lists each record set aside with its line and counts the other designation', () => {
    const out = join(dir, 'out');
    const r = runCli(['check', '12893', '--obs', mixed, '--obscodes', CODES, '--models', 'srp', '--out', out]);
    expect(r.status, r.stderr).toBe(0);
    const j = fitJson(out);
    expect(j.input.observationsFitted).toBe(143);
    expect(j.input.otherDesignations).toEqual([{ designation: '2030 QW12', observations: 5 }]);
    const n = lines.length;
    expect(j.input.setAside.map((s) => s.line)).toEqual([n + 1, n + 2, n + 3]);
    expect(j.input.setAside[0].reason).toBe('duplicate of line 3: the same station 566 at the same time');
    expect(j.input.setAside[1].reason).toMatch(/after the latest date accepted/);
    expect(j.input.setAside[2].reason).toMatch(/before 1800/);
    expect(r.stderr).toContain(`${mixed}:${n + 1}: duplicate of line 3`);
    expect(r.stderr).toContain('5 observations of 1 other designation(s) set aside');
    const csv = readFileSync(join(out, 'residuals.csv'), 'utf8');
    expect(csv).toContain(`${mixed},${n + 2},2099-04-22T`);
  });

  it('exits 1 naming the file when the designation has no observations, or the file none at all', () => {
    const r = runCli(['check', '2001 AB', '--obs', SAMPLE, '--obscodes', CODES]);
    expect(r.status).toBe(1);
    expect(r.stderr).toBe(`wayward: ${SAMPLE}: no observations of 2001 AB; the file holds observations of (12893) (143)\n`);
    const empty = join(dir, 'empty.txt');
    writeFileSync(empty, '');
    const e = runCli(['check', '(12893)', '--obs', empty, '--obscodes', CODES, '--out', join(dir, 'never')]);
    expect(e.status).toBe(1);
    expect(e.stderr).toBe(`wayward: ${empty}: no observations of (12893); the file holds no observations\n`);
    expect(existsSync(join(dir, 'never', 'fit.json'))).toBe(false);
  });

  it('exits 1 when no station can be placed, and when too few observations remain for an orbit', () => {
    const three = join(dir, 'three.txt');
    writeFileSync(three, lines.slice(0, 3).join('\n') + '\n');
    const r = runCli(['check', '(12893)', '--obs', three]);
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/none of the 3 observations of \(12893\) can be fitted: observatory code \w{3} is not in the built-in table/);
    const f = runCli(['check', '(12893)', '--obs', three, '--obscodes', CODES]);
    expect(f.status).toBe(1);
    expect(f.stderr).toMatch(/wayward: the gravity-only orbit fit of \(12893\) failed: orbit fit failed \(too-few-observations\): 3 usable observations for 6 unknowns/);
  });

  it('exits 1 on an unreadable file', () => {
    const r = runCli(['check', '(12893)', '--obs', join(dir, 'missing.txt')]);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('missing.txt');
  });

  it('exits 2 on usage errors', () => {
    expect(runCli(['check', '(12893)']).status).toBe(2); // no --obs
    expect(runCli(['check', '--obs', SAMPLE]).status).toBe(2); // no designation
    const bad = runCli(['check', '(12893)', '--obs', SAMPLE, '--models', 'gravity,warp']);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain("unknown model 'warp'");
    expect(runCli(['check', '(12893)', '--obs', SAMPLE, '--models', 'srp,srp']).status).toBe(2);
    expect(runCli(['check', '(12893)', '--obs', SAMPLE, '--station-min-share', '1.5']).status).toBe(2);
    expect(runCli(['check', '(12893)', '--obs', SAMPLE, '--not-after', 'soon']).status).toBe(2);
    for (const n of ['0', '1.5', 'two']) {
      const threads = runCli(['check', '(12893)', '--obs', SAMPLE, '--threads', n]);
      expect(threads.status, n).toBe(2);
      expect(threads.stderr).toContain(`'${n}' is not a positive integer`);
    }
  });
});
