import { Worker } from 'node:worker_threads';

/**
 * Starts a worker thread on a sibling module given as a URL without extension (`./x-worker`): the
 * built `.js` when the API runs compiled, else the `.ts` source. The API runs its TypeScript through
 * tsx, which a worker thread does not inherit, so a `.ts` worker first registers tsx's loader.
 * @example
 * const worker = startModuleWorker(new URL('./reading-worker', import.meta.url), import.meta.url);
 */
export function startModuleWorker(base: URL, callerUrl: string): Worker {
  const file = new URL(`${base.href}${callerUrl.slice(callerUrl.lastIndexOf('.'))}`);
  if (!file.pathname.endsWith('.ts')) return new Worker(file);
  // The specifier resolves from the working directory, the repository root for every command we run.
  const boot = `import('tsx/esm/api').then((tsx) => { tsx.register(); return import(${JSON.stringify(file.href)}); })`;
  return new Worker(boot, { eval: true });
}
