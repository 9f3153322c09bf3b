/** Child processes for `npm test`: Node tools started directly (no npx), with live or buffered output. */
import { spawn } from 'node:child_process';
import { seconds } from './timing';

export interface Finished {
  ok: boolean;
  code: number | null;
  /** The output, when it was buffered (steps that run side by side). */
  output: string;
}

/** Runs a Node script from node_modules (or scripts/) with the same Node that runs `npm test`. */
export function runNode(
  args: string[],
  { env = process.env, buffer = false }: { env?: NodeJS.ProcessEnv; buffer?: boolean } = {},
): Promise<Finished> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, args, {
      env,
      stdio: buffer ? ['ignore', 'pipe', 'pipe'] : 'inherit',
    });
    const chunks: Buffer[] = [];
    child.stdout?.on('data', (c: Buffer) => chunks.push(c));
    child.stderr?.on('data', (c: Buffer) => chunks.push(c));
    child.once('error', (err) => resolve({ ok: false, code: null, output: String(err) }));
    child.once('close', (code, signal) =>
      resolve({
        ok: code === 0,
        code,
        output: Buffer.concat(chunks).toString('utf8') + (signal ? `\n(stopped by ${signal})\n` : ''),
      }),
    );
  });
}

/** Prints the closing line of a step: "=== label: ok in 12.3 s" or "failed (exit 1)". */
export function report(label: string, r: Finished, startedAt: number): void {
  const verdict = r.ok ? 'ok' : `failed (exit ${r.code ?? 'signal'})`;
  console.log(`=== ${label}: ${verdict} in ${seconds(Date.now() - startedAt)}`);
}
