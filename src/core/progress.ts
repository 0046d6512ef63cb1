/**
 * A progress sink that long computations report to. The CLI decides whether and how to
 * show it (stderr, only on a terminal); everything below the CLI only calls it.
 */
export interface Progress {
  /** A stage begins; `total` in work units when known. */
  start(stage: string, total?: number): void;
  /** `done` units of the current stage are complete (absolute, not an increment). */
  update(done: number): void;
  /** The current stage ended. */
  end(): void;
}

/** A Progress that does nothing. */
export const SILENT_PROGRESS: Progress = { start() {}, update() {}, end() {} };
