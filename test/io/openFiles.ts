/**
 * Whether a test left a file open: counts this process's descriptors on a path through
 * Linux /proc/self/fd (callers skip where it does not exist). Not a test file itself.
 */
import { readdirSync, readlinkSync, realpathSync } from 'node:fs';

/** True where descriptors can be listed (Linux). */
export const CAN_LIST_OPEN_FILES = (() => {
  try {
    readdirSync('/proc/self/fd');
    return true;
  } catch {
    return false;
  }
})();

/** How many descriptors of this process have `path` open (Linux /proc). */
function openCount(path: string): number {
  const real = realpathSync(path); // /proc names the resolved path (a symlinked tmpdir)
  return readdirSync('/proc/self/fd').filter((fd) => {
    try {
      return readlinkSync(`/proc/self/fd/${fd}`) === real;
    } catch {
      return false; // the descriptor readdir itself used, gone by now
    }
  }).length;
}

/**
 * Waits until `path` is no longer open, polling up to `limitMs`; returns how many
 * descriptors are still open then (closing is asynchronous, so a first look can be early;
 * the limit is generous and only bounds a failing test, it measures nothing).
 */
export async function closedWithin(path: string, limitMs = 2000): Promise<number> {
  for (let waited = 0; openCount(path) > 0 && waited < limitMs; waited += 10) {
    await new Promise((r) => setTimeout(r, 10));
  }
  return openCount(path);
}

