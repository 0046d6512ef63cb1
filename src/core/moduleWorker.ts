/**
 * Start a worker thread on a module that sits beside the caller, whether the program runs
 * compiled (…/dist, '.js') or from its TypeScript source (tests, tsx scripts, '.ts').
 *
 * Compiled: the sibling '.js' file is the worker's entry. From source: Node 20 does not carry
 * the parent's module loader hooks into worker threads (tried: neither a tsx-started parent
 * nor `execArgv: ['--import', 'tsx']` lets a worker load a '.ts' entry; "Unknown file
 * extension"), so the worker starts on a two-line ES module that registers tsx's ESM hooks
 * (a development dependency, resolved from the caller's location) and then imports the
 * '.ts' entry. This is the only place in the source that knows about tsx.
 */
import { Worker } from 'node:worker_threads';
import { createRequire } from 'node:module';
import { pathToFileURL } from 'node:url';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';

/**
 * A worker on the module `baseName` ('.js' or '.ts', as the caller's own file) in the folder
 * of `callerUrl` (the caller's import.meta.url), given `workerData`.
 */
export function startSiblingWorker(callerUrl: string, baseName: string, workerData: unknown): Worker {
  if (!callerUrl.endsWith('.ts')) return new Worker(new URL(`./${baseName}.js`, callerUrl), { workerData });
  const loader = tsxLoaderUrl(callerUrl);
  const entry = new URL(`./${baseName}.ts`, callerUrl).href;
  const code = `import { register } from ${JSON.stringify(loader)}; register(); await import(${JSON.stringify(entry)});`;
  return new Worker(new URL(`data:text/javascript,${encodeURIComponent(code)}`), { workerData });
}

/** URL of tsx's ESM register API, from its package.json exports map ('./esm/api' → import). */
function tsxLoaderUrl(from: string): string {
  const packageJson = createRequire(from).resolve('tsx/package.json');
  const exportsMap = JSON.parse(readFileSync(packageJson, 'utf8')).exports['./esm/api'];
  return pathToFileURL(join(dirname(packageJson), exportsMap.import.default)).href;
}
