/** The wayward command-line program: every command registered on one commander program. */
import { Command } from 'commander';
import { packageVersion } from './packageInfo.js';
import { registerCheck } from './check.js';
import { registerCoorbitals } from './coorbitals.js';
import { registerFamilies } from './families.js';
import { registerPropagate } from './propagate.js';
import { registerScan } from './scan.js';

export function buildProgram(): Command {
  const program = new Command();
  program
    .name('wayward')
    .description('Screen minor-body orbit catalogues for bodies whose orbits do not behave like the natural population.')
    .version(packageVersion())
    .exitOverride()
    .configureOutput({ writeErr: (s) => process.stderr.write(s) });
  registerScan(program);
  registerPropagate(program);
  registerCoorbitals(program);
  registerFamilies(program);
  registerCheck(program);
  return program;
}
