/**
 * A throwaway PostgreSQL cluster for tests and benchmarks: initdb into a temporary folder and
 * pg_ctl start on a free loopback port, as an unprivileged user (when run as root, the folder is
 * handed to the `postgres` account if it exists, else `nobody`). Never a system service: stop()
 * shuts the cluster down and deletes the folder. The binaries are found under
 * /usr/lib/postgresql/<version>/bin (Debian's layout), or in PG_BIN, or on the PATH.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { chmodSync, chownSync, existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export interface PgCluster {
  /** postgres://reachline@127.0.0.1:PORT/postgres (trust auth on loopback only). */
  url: string;
  port: number;
  dir: string;
  bin: string;
  /** The URL of another database in this cluster. */
  urlFor(database: string): string;
  stop(): void;
}

/** The folder holding initdb and pg_ctl, or null when PostgreSQL is not installed. */
export function findPgBin(env: NodeJS.ProcessEnv = process.env): string | null {
  if (env.PG_BIN && existsSync(join(env.PG_BIN, 'initdb'))) return env.PG_BIN;
  const root = '/usr/lib/postgresql';
  if (existsSync(root)) {
    const versions = readdirSync(root)
      .filter((v) => existsSync(join(root, v, 'bin', 'initdb')))
      .sort((a, b) => Number(b) - Number(a));
    if (versions.length > 0) return join(root, versions[0], 'bin');
  }
  const which = spawnSync('sh', ['-c', 'command -v initdb'], { encoding: 'utf8' });
  const found = which.stdout.trim();
  return which.status === 0 && found ? join(found, '..') : null;
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const address = srv.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      srv.close(() => resolve(port));
    });
  });
}

function idOf(user: string): { uid: number; gid: number } | null {
  const r = spawnSync('id', ['-u', user], { encoding: 'utf8' });
  const g = spawnSync('id', ['-g', user], { encoding: 'utf8' });
  if (r.status !== 0 || g.status !== 0) return null;
  return { uid: Number(r.stdout.trim()), gid: Number(g.stdout.trim()) };
}

export async function startPgCluster(): Promise<PgCluster> {
  const bin = findPgBin();
  if (!bin) {
    throw new Error(
      'PostgreSQL is not installed: install it (Debian: apt-get install -y postgresql) or set PG_BIN to the folder holding initdb and pg_ctl',
    );
  }
  const dir = mkdtempSync(join(tmpdir(), 'reachline-pg-'));
  const data = join(dir, 'data');
  const asRoot = process.getuid?.() === 0;
  let prefix: string[] = [];
  if (asRoot) {
    const user = idOf('postgres') ? 'postgres' : 'nobody';
    const ids = idOf(user);
    if (!ids) throw new Error('running as root and found neither a postgres nor a nobody account');
    chownSync(dir, ids.uid, ids.gid);
    chmodSync(dir, 0o700);
    prefix = ['runuser', '-u', user, '--'];
  }
  const run = (cmd: string, args: string[]) => {
    const full = [...prefix, join(bin, cmd), ...args];
    execFileSync(full[0], full.slice(1), { stdio: ['ignore', 'pipe', 'pipe'], cwd: dir });
  };
  const port = await freePort();
  try {
    run('initdb', [
      '-D',
      data,
      '-U',
      'reachline',
      '--auth=trust',
      '-E',
      'UTF8',
      '--no-sync',
      '--no-instructions',
    ]);
    run('pg_ctl', [
      '-D',
      data,
      '-l',
      join(dir, 'log'),
      '-w',
      '-t',
      '60',
      '-o',
      `-p ${port} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off -c synchronous_commit=off -c full_page_writes=off -c max_connections=200`,
      'start',
    ]);
  } catch (err) {
    const stderr = (err as { stderr?: Buffer }).stderr?.toString() ?? '';
    rmSync(dir, { recursive: true, force: true });
    throw new Error(`could not start a PostgreSQL cluster: ${stderr || String(err)}`);
  }
  const urlFor = (database: string) => `postgres://reachline@127.0.0.1:${port}/${database}`;
  let stopped = false;
  return {
    url: urlFor('postgres'),
    port,
    dir,
    bin,
    urlFor,
    stop() {
      if (stopped) return;
      stopped = true;
      try {
        run('pg_ctl', ['-D', data, '-m', 'immediate', '-w', 'stop']);
      } catch {
        // already gone
      }
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
