/**
 * Global setup: compiles the program (tsc -p tsconfig.json, the same command as
 * `npm run build`) once before any test file runs, so the CLI tests, which run dist/ as a
 * user would, never test a stale build. A compile error stops the run with the compiler's
 * own messages. The start and end of the build are handed to the tests (`inject`), and
 * test/setup/setup.test.ts checks that dist/ is as new as every source file.
 */
import { spawnSync } from 'node:child_process';
import { join, resolve } from 'node:path';
import type { TestProject } from 'vitest/node';

const ROOT = resolve(import.meta.dirname, '../..');
const TSC = join(ROOT, 'node_modules/typescript/bin/tsc');

declare module 'vitest' {
  export interface ProvidedContext {
    distBuild: { startedMs: number; finishedMs: number };
  }
}

export default function buildOnce(project: TestProject): void {
  const startedMs = Date.now();
  const r = spawnSync(process.execPath, [TSC, '-p', join(ROOT, 'tsconfig.json')], { cwd: ROOT, encoding: 'utf8' });
  if (r.error) throw new Error(`building dist/ for the tests: cannot run ${TSC}: ${r.error.message}`);
  if (r.status !== 0) {
    throw new Error(`building dist/ for the tests failed (tsc exit ${r.status ?? r.signal}):\n${r.stdout}${r.stderr}`);
  }
  project.provide('distBuild', { startedMs, finishedMs: Date.now() });
}
