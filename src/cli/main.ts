#!/usr/bin/env node
/**
 * The wayward command line. Exit codes: 0 success, 1 unreadable input or failure,
 * 2 usage error. Bad rows are never fatal: they are counted and written to rejects.csv.
 */
import { CommanderError } from 'commander';
import { buildProgram } from './program.js';

async function main(argv: string[]): Promise<number> {
  const program = buildProgram();
  try {
    await program.parseAsync(argv);
    return typeof process.exitCode === 'number' ? process.exitCode : 0;
  } catch (err) {
    if (err instanceof CommanderError) {
      if (err.code === 'commander.helpDisplayed' || err.code === 'commander.version' || err.exitCode === 0) return 0;
      return 2;
    }
    process.stderr.write(`wayward: ${err instanceof Error ? err.message : String(err)}\n`);
    return 1;
  }
}

main(process.argv).then((code) => {
  process.exitCode = code;
});
