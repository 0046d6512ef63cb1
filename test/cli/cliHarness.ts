/** Runs the built command line (dist/, compiled by test/setup/buildOnce.ts before the run) as a child process, as a user would. */
import { spawnSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

export const ROOT = resolve(import.meta.dirname, '../..');
export const MAIN = join(ROOT, 'dist/src/cli/main.js');

export interface CliRun {
  status: number;
  stdout: string;
  stderr: string;
}

export function runCli(args: string[], opts: { input?: string | Buffer; cwd?: string; env?: Record<string, string> } = {}): CliRun {
  const r = spawnSync(process.execPath, [MAIN, ...args], {
    cwd: opts.cwd ?? ROOT,
    input: opts.input,
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1', ...opts.env },
    maxBuffer: 64 * 1024 * 1024,
  });
  return { status: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}

export function tempDir(prefix = 'wayward-test-'): string {
  return mkdtempSync(join(tmpdir(), prefix));
}
