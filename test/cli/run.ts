/** Runs the fluxbook command from the sources (through tsx) as a user would, in a child process. */
import { spawn, spawnSync } from 'node:child_process';
import { resolve } from 'node:path';

export const ROOT = resolve(__dirname, '../..');
const ENTRY = resolve(ROOT, 'src/cli/fluxbook.ts');

export interface Run {
  status: number | null;
  stdout: string;
  stderr: string;
}

export function fluxbook(...args: string[]): Run {
  return fluxbookWith({}, ...args);
}

/** The same with more environment variables, e.g. NODE_OPTIONS to give the run a smaller heap. */
export function fluxbookWith(env: Record<string, string>, ...args: string[]): Run & { seconds: number } {
  const start = process.hrtime.bigint();
  const r = spawnSync(process.execPath, ['--import', 'tsx', ENTRY, ...args], { cwd: ROOT, encoding: 'utf8', timeout: 120_000, env: { ...process.env, ...env } });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr, seconds: Number(process.hrtime.bigint() - start) / 1e9 };
}

export function fluxbookAsync(...args: string[]) {
  return spawn(process.execPath, ['--import', 'tsx', ENTRY, ...args], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
}

export function tsxScript(script: string, ...args: string[]) {
  return spawn(process.execPath, ['--import', 'tsx', resolve(ROOT, script), ...args], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
}
