/** Worker module for the worker-pool tests: burns a task-dependent amount of work, then answers. */
import { serveWorkerTasks } from '../../../src/core/workerTasks.js';

serveWorkerTasks((input: { n: number; spin: number; fail?: boolean }) => {
  if (input.fail) throw new Error(`asked to fail on ${input.n}`);
  let acc = 0;
  for (let k = 0; k < input.spin; k++) acc += Math.sqrt(k);
  return { n: input.n, square: input.n * input.n, acc: acc > -1 };
});
