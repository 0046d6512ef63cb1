/**
 * Writes a text file line by line through a small in-memory batch (synchronous writes, so
 * the output order and bytes are fixed), counting lines (1-based numbers for truth.csv).
 */
import { closeSync, openSync, writeSync } from 'node:fs';

const BATCH_LINES = 8192;

export class LineWriter {
  private readonly fd: number;
  private batch: string[] = [];
  /** Lines written so far; the next line written gets number `lines + 1`. */
  lines = 0;

  constructor(readonly path: string) {
    this.fd = openSync(path, 'w');
  }

  /** Writes one line (without its newline); returns its 1-based line number. */
  write(line: string): number {
    this.batch.push(line);
    if (this.batch.length >= BATCH_LINES) this.flush();
    return ++this.lines;
  }

  flush(): void {
    if (this.batch.length === 0) return;
    writeSync(this.fd, this.batch.join('\n') + '\n');
    this.batch = [];
  }

  close(): void {
    this.flush();
    closeSync(this.fd);
  }
}
