import { describe, expect, it } from 'vitest';
import { mapInWorkers } from '../../src/core/workerPool.js';

// The worker module sits beside this URL (startSiblingWorker's rule).
const CALLER = new URL('./helpers/poolCaller.ts', import.meta.url).href;

describe('tasks spread over worker threads', () => {
  // Costs differ by task (late tasks cheap, early ones dear) so completion order differs
  // from input order; the results must still come back in input order.
  const inputs = Array.from({ length: 24 }, (_, n) => ({ n, spin: (24 - n) * 20_000 }));

  it('gives the results in input order, the same for one and for two threads', async () => {
    const one = await mapInWorkers<typeof inputs[number], { n: number; square: number }>(CALLER, 'poolTaskWorker', inputs, { threads: 1 });
    const two = await mapInWorkers<typeof inputs[number], { n: number; square: number }>(CALLER, 'poolTaskWorker', inputs, { threads: 2 });
    expect(one.map((r) => r.n)).toEqual(inputs.map((i) => i.n));
    expect(two).toEqual(one);
    expect(two[7].square).toBe(49);
  });

  it('a failing task rejects the whole map, naming the task', async () => {
    const bad = inputs.map((i) => (i.n === 5 ? { ...i, fail: true } : i));
    await expect(mapInWorkers(CALLER, 'poolTaskWorker', bad, { threads: 2 })).rejects.toThrow(/task 5 failed in a worker: asked to fail on 5/);
  });

  it('no inputs, no workers; a bad thread count is caller misuse', async () => {
    expect(await mapInWorkers(CALLER, 'poolTaskWorker', [], { threads: 2 })).toEqual([]);
    await expect(mapInWorkers(CALLER, 'poolTaskWorker', inputs, { threads: 0 })).rejects.toThrow(RangeError);
  });
});
