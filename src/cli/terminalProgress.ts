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
  return {
    start(s, t) {
      stage = s;
      total = t;
      process.stderr.write(`\r${stage}…`);
    },
    update(done) {
      const now = Date.now();
      if (now - last < 100) return;
      last = now;
      const pct = total ? ` ${((100 * done) / total).toFixed(0)}%` : ` ${done}`;
      process.stderr.write(`\r${stage}${pct}   `);
    },
    end() {
      process.stderr.write(`\r${' '.repeat(stage.length + 8)}\r`);
    },
  };
}
