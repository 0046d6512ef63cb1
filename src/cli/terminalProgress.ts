/**
 * Progress on stderr, shown only when stderr is a terminal: one line rewritten in place.
 */
import type { Progress } from '../core/progress.js';
import { SILENT_PROGRESS } from '../core/progress.js';

export function terminalProgress(enabled: boolean): Progress {
  if (!enabled || !process.stderr.isTTY) return SILENT_PROGRESS;
  let stage = '';
  let total: number | undefined;
  let last = 0;
  let shown = 0; // length of the line on screen, so end() blanks all of it
  const show = (line: string) => {
    process.stderr.write(`\r${line}`);
    shown = Math.max(shown, line.length);
  };
  return {
    start(s, t) {
      stage = s;
      total = t;
      show(`${stage}…`);
    },
    update(done) {
      const now = Date.now();
      if (now - last < 100) return;
      last = now;
      const pct = total ? ` ${((100 * done) / total).toFixed(0)}%` : ` ${done}`;
      show(`${stage}${pct}   `);
    },
    end() {
      process.stderr.write(`\r${' '.repeat(shown)}\r`);
      shown = 0;
    },
  };
}
