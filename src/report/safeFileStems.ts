/**
 * File-name stems for outputs named after catalogue designations, which hold spaces,
 * slashes, brackets and other characters a file name must not (or should better not) have.
 * Each stem keeps only ASCII letters, digits and '-' (every run of other characters becomes
 * one '_', none at either end), at most STEM_MAX_CHARS long, and is unique within one call
 * even on a file system that ignores case: a stem already taken gets '-2', '-3', … in the
 * order of the keys, so the same keys in the same order always give the same stems.
 */

/** Longest stem before a uniqueness suffix (file names stay far below the usual 255-byte limit). */
export const STEM_MAX_CHARS = 80;

/** The readable part of a stem: letters, digits, '-', runs of anything else as one '_'. */
export function readableStem(key: string): string {
  const s = key.normalize('NFKD').replace(/[^A-Za-z0-9-]+/g, '_').replace(/^_+|_+$/g, '').slice(0, STEM_MAX_CHARS);
  return s === '' ? 'body' : s;
}

/** One stem per key, in key order, unique without regard to case. */
export function safeFileStems(keys: readonly string[]): string[] {
  const taken = new Set<string>();
  return keys.map((key) => {
    const base = readableStem(key);
    let stem = base;
    for (let n = 2; taken.has(stem.toLowerCase()); n++) stem = `${base}-${n}`;
    taken.add(stem.toLowerCase());
    return stem;
  });
}
