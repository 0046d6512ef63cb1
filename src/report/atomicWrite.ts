/**
 * Atomic output files: everything is written to a temporary sibling and renamed over the
 * target only when complete, so a reader never sees a half-written file and an
 * interrupted run leaves the previous output intact (rename is atomic within a
 * filesystem: POSIX rename(2)).
 */
import { createWriteStream, promises as fs, type WriteStream } from 'node:fs';
import { once } from 'node:events';

function tempPath(target: string): string {
  return `${target}.tmp-${process.pid}`;
}

/** Write a whole file atomically: text (written as UTF-8) or bytes. */
export async function writeFileAtomic(target: string, data: string | Uint8Array): Promise<void> {
  const tmp = tempPath(target);
  try {
    await fs.writeFile(tmp, data);
    await fs.rename(tmp, target);
  } catch (err) {
    await fs.rm(tmp, { force: true });
    throw err;
  }
}

/** A streamed output file that appears under its name only on commit(). */
export class AtomicFileWriter {
  private readonly stream: WriteStream;
  private readonly tmp: string;
  constructor(readonly target: string) {
    this.tmp = tempPath(target);
    this.stream = createWriteStream(this.tmp);
  }

  /** Append text, waiting when the stream's buffer is full. */
  async write(text: string): Promise<void> {
    if (!this.stream.write(text)) await once(this.stream, 'drain');
  }

  async commit(): Promise<void> {
    this.stream.end();
    await once(this.stream, 'finish');
    await fs.rename(this.tmp, this.target);
  }

  /**
   * Drop the temporary file. The stream is closed first: a stream still opening its file
   * would otherwise create it after the removal and leave it behind.
   */
  async abort(): Promise<void> {
    const closed = this.stream.closed ? Promise.resolve() : once(this.stream, 'close').catch(() => undefined);
    this.stream.destroy();
    await closed;
    await fs.rm(this.tmp, { force: true });
  }
}
