// Runs one of the repository's TypeScript scripts as npm runs it (node --import tsx), from the
// repository root, with the given stdin; for the command-line tests.
import { spawnSync } from 'node:child_process';
import { resolve } from 'node:path';

/** The repository root. */
export const ROOT = resolve(__dirname, '../../..');

/** What a finished script left behind. */
export interface ScriptRun {
  status: number | null;
  stdout: string;
  stderr: string;
}

/** Runs `node [nodeFlags] --import tsx <script> ...args` with `input` on stdin. */
export function runScript(script: string, args: string[] = [], input = '', nodeFlags: string[] = []): ScriptRun {
  const out = spawnSync(process.execPath, [...nodeFlags, '--import', 'tsx', script, ...args], {
    cwd: ROOT,
    input,
    encoding: 'utf8',
    timeout: 60_000,
    maxBuffer: 64 * 1024 * 1024,
  });
  if (out.error) throw out.error;
  return { status: out.status, stdout: out.stdout, stderr: out.stderr };
}

/** stderr split into lines, without the final newline. */
export function stderrLines(run: ScriptRun): string[] {
  return run.stderr === '' ? [] : run.stderr.replace(/\n$/, '').split('\n');
}
