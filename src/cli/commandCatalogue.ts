/**
 * The catalogue of a command that reads orbit dumps (coorbitals, families): the files named,
 * or the bundled demo catalogue when none; loaded, with one line per unreadable file. Throws
 * when no input could be read (the caller aborts its output stage: nothing is written).
 */
import { relative } from 'node:path';
import { inputErrorLine } from './inputErrorLine.js';
import { loadCatalogue } from './loadCatalogue.js';
import { demoFiles } from './packageInfo.js';

/** The files named, or the bundled demo catalogue's files relative to the working directory. */
export function commandFiles(files: readonly string[]): string[] {
  return files.length > 0 ? [...files] : demoFiles().map((f) => relative(process.cwd(), f) || f);
}

/** `threads` ≥ 2: a large plain orbit-export file is parsed on two threads (the same catalogue). */
export async function loadCommandCatalogue(files: string[], out: string, threads = 1): Promise<{ loaded: Awaited<ReturnType<typeof loadCatalogue>>; errors: string[] }> {
  const loaded = await loadCatalogue(files, { threads });
  const errors = loaded.errors.map(inputErrorLine);
  if (loaded.files.length > 0 && errors.length === loaded.files.length) throw new Error(`no input could be read; nothing written, ${out} left as it was`);
  return { loaded, errors };
}
