import { execFile } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** The repository root, from this file's place in apps/api/src/modules/reliability. */
export const REPO_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../../../..');

export interface ScriptResult {
  code: number;
  stdout: string;
  stderr: string;
  elapsedMs: number;
}

/** Runs a bash script of scripts/ with extra environment; resolves with its exit code, never rejects on one. */
export function runScript(script: string, args: string[], env: Record<string, string>): Promise<ScriptResult> {
  const started = performance.now();
  return new Promise((resolve) => {
    execFile('bash', [path.join(REPO_ROOT, 'scripts', script), ...args], { cwd: REPO_ROOT, env: { ...process.env, ...env } }, (err, stdout, stderr) => {
      const code = err ? (typeof err.code === 'number' ? err.code : 1) : 0;
      resolve({ code, stdout, stderr, elapsedMs: performance.now() - started });
    });
  });
}
