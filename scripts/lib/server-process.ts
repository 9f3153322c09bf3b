/**
 * The real server entry (server/index.ts through tsx, or the bundle npm start runs: the tests pass
 * freshServerBundle when it is up to date) in a child process, configured by
 * environment variables; resolves with its URL once it prints "running at". Used by the
 * multi-instance and durability tests and by `npm run bench:load`.
 */
import { spawn, type ChildProcess } from 'node:child_process';

export interface ServerProcess {
  url: string;
  child: ChildProcess;
  /** Everything the process printed so far (stdout and stderr). */
  output: string[];
  /** Settles when the process exits (whether before or after this call). */
  exited: Promise<number | null>;
}

export function startServerProcess(
  env: Record<string, string>,
  name: string,
  timeoutMs = 60_000,
  /** A bundled entry to run with plain Node instead (the `serve.js` npm start runs). */
  bundle?: string,
): Promise<ServerProcess> {
  const args = bundle ? [bundle] : ['--import', 'tsx', 'server/index.ts'];
  const child = spawn(process.execPath, args, {
    env: { ...process.env, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  const output: string[] = [];
  return new Promise((resolve, reject) => {
    const timer = setTimeout(
      () => reject(new Error(`${name} did not start:\n${output.join('')}`)),
      timeoutMs,
    );
    child.stderr!.on('data', (c: Buffer) => output.push(c.toString()));
    child.stdout!.on('data', (c: Buffer) => {
      output.push(c.toString());
      const m = /running at (http:\/\/\S+)/.exec(output.join(''));
      if (m) {
        clearTimeout(timer);
        resolve({ url: m[1]!, child, output, exited });
      }
    });
    void exited.then((code) => {
      clearTimeout(timer);
      reject(new Error(`${name} exited (${code}):\n${output.join('')}`));
    });
  });
}
