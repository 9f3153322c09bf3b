/**
 * What /api/health reports: the database answers a query and the attachment storage is reachable.
 * Each probe has a time limit; the result is kept for one second, so a load balancer polling every
 * instance (or a flood of probes) costs the database at most one query per second per instance.
 */
import type { Knex } from 'knex';
import type { AppContext } from '../../context';

export interface HealthReport {
  ok: boolean;
  /** 'ok', or what went wrong. */
  database: string;
  /** 'ok', or what went wrong. */
  storage: string;
  dialect: string;
}

const LIMIT_MS = 2_000;
const KEEP_MS = 1_000;

function withLimit(work: Promise<unknown>): Promise<string> {
  let timer: NodeJS.Timeout | undefined;
  const limit = new Promise<string>((resolve) => {
    timer = setTimeout(() => resolve(`no answer within ${LIMIT_MS / 1000} s`), LIMIT_MS);
  });
  return Promise.race([
    work.then(
      () => 'ok',
      (err: unknown) => `unreachable: ${err instanceof Error ? err.message : String(err)}`.slice(0, 200),
    ),
    limit,
  ]).finally(() => clearTimeout(timer));
}

export function healthProbe(ctx: AppContext): () => Promise<HealthReport> {
  let last: { at: number; report: Promise<HealthReport> } | null = null;
  const dialect = String((ctx.db.client as { config: Knex.Config }).config.client);
  return () => {
    const now = Date.now();
    if (last && now - last.at < KEEP_MS) return last.report;
    const report = Promise.all([withLimit(ctx.db.raw('select 1')), withLimit(ctx.storage.check())]).then(
      ([database, storage]) => ({ ok: database === 'ok' && storage === 'ok', database, storage, dialect }),
    );
    last = { at: now, report };
    return report;
  };
}
