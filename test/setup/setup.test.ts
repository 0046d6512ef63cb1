/**
 * The test harness itself: dist/ was built by this run (test/setup/buildOnce.ts), so the
 * CLI tests run the current sources; property-based tests run from one fixed seed
 * (test/setup/propertySeed.ts), so their cases are the same run after run.
 */
import { readdirSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import fc from 'fast-check';
import { describe, expect, inject, it } from 'vitest';

const ROOT = resolve(import.meta.dirname, '../..');

function sourcesUnder(dir: string): string[] {
  return readdirSync(dir, { recursive: true, encoding: 'utf8' })
    .filter((f) => f.endsWith('.ts') && !f.endsWith('.d.ts'))
    .map((f) => join(dir, f));
}

describe('test harness', () => {
  it('dist/ was compiled by this run, after every source file was last changed', () => {
    const build = inject('distBuild');
    expect(build, 'the global setup did not build dist/').toBeDefined();
    expect(build.finishedMs).toBeGreaterThanOrEqual(build.startedMs);
    const sources = sourcesUnder(join(ROOT, 'src'));
    expect(sources.length).toBeGreaterThan(50);
    const stale: string[] = [];
    for (const src of sources) {
      const out = join(ROOT, 'dist', relative(ROOT, src)).replace(/\.ts$/, '.js');
      let outMs = -Infinity;
      try {
        outMs = statSync(out).mtimeMs;
      } catch {
        // missing: stale
      }
      // Written by this run's compile (1 s allows for a file system's coarse timestamps),
      // and not older than its source.
      if (outMs < build.startedMs - 1000 || outMs < statSync(src).mtimeMs) stale.push(relative(ROOT, out));
    }
    expect(stale).toEqual([]);
  });

  it('property-based tests run from one fixed seed: the same cases every run', () => {
    // Not imported from the setup file here: importing it would configure the seed itself.
    const seed = fc.readConfigureGlobal().seed;
    expect(Number.isSafeInteger(seed), `fast-check global seed: ${seed}`).toBe(true);
    // The same generator sampled twice gives the same values only under a fixed seed.
    expect(fc.sample(fc.integer(), 20)).toEqual(fc.sample(fc.integer(), 20));
  });
});
