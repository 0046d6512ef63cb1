/** Where the installed package lives (for the bundled demo data) and its version. */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The directory holding the project's package.json, found by walking up from this file. */
export function packageRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (let k = 0; k < 8; k++) {
    if (existsSync(join(dir, 'package.json'))) return dir;
    dir = dirname(dir);
  }
  throw new Error('wayward: cannot find the package root (package.json) above the program');
}

export function packageVersion(): string {
  const pkg = JSON.parse(readFileSync(join(packageRoot(), 'package.json'), 'utf8')) as { version: string };
  return pkg.version;
}

/** The bundled demo catalogue files. */
export function demoFiles(): string[] {
  const dir = join(packageRoot(), 'data', 'demo');
  return ['orbits.txt', 'comets.txt'].map((f) => join(dir, f)).filter((f) => existsSync(f));
}

/** The bundled published family list (data/families/, provenance in its README). */
export function bundledFamilyList(): string {
  return join(packageRoot(), 'data', 'families', 'families-2015.json');
}
