/**
 * The command line as it ships: built once per test run by scripts/build.mjs into a temporary
 * folder (so dist/ is left alone), then spawned. Spawning the bundle takes a fraction of the time
 * a TypeScript loader needs, which keeps the command-line tests fast.
 */
import { spawnSync, type SpawnSyncOptions } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

let built: string | undefined;

export function builtCli(): string {
  if (built !== undefined) return built;
  const dir = mkdtempSync(join(tmpdir(), 'tersely-built-cli-'));
  const result = spawnSync(process.execPath, ['scripts/build.mjs', '--only', 'cli', '--outdir', dir], { encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`building the CLI failed: ${result.stderr}`);
  built = join(dir, 'cli.cjs');
  return built;
}

export interface CliRun {
  readonly code: number | null;
  readonly stdout: string;
  readonly stderr: string;
  /** Set when the run was stopped by the timeout (a hang). */
  readonly timedOut: boolean;
}

/** Runs the built CLI; `stdin` is text to feed, or a file descriptor to read from. */
export function tersely(args: readonly string[], options: { readonly stdin?: string | number; readonly timeoutMs?: number; readonly cwd?: string } = {}): CliRun {
  const spawnOptions: SpawnSyncOptions = {
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1' },
    timeout: options.timeoutMs ?? 20_000,
    stdio: [typeof options.stdin === 'number' ? options.stdin : 'pipe', 'pipe', 'pipe'],
    ...(typeof options.stdin === 'string' ? { input: options.stdin } : {}),
    ...(options.cwd !== undefined ? { cwd: options.cwd } : {}),
  };
  const result = spawnSync(process.execPath, [builtCli(), ...args], spawnOptions);
  const timedOut = (result.error as NodeJS.ErrnoException | undefined)?.code === 'ETIMEDOUT';
  return { code: result.status, stdout: String(result.stdout ?? ''), stderr: String(result.stderr ?? ''), timedOut };
}
