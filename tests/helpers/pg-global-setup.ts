/**
 * Global setup of the api project: with TEST_PG=1 the API suite runs on PostgreSQL. A throwaway
 * cluster is started (scripts/lib/pg-cluster.ts) unless TEST_PG_URL already names one (npm test
 * starts one cluster for its PostgreSQL runs), the migrations run once into the template database
 * `reachline_template`, and every test file gets its own database copied from it
 * (tests/helpers/test-db.ts). Without TEST_PG this does nothing: the suite runs on SQLite.
 */
import knex from 'knex';
import { startPgCluster, type PgCluster } from '../../scripts/lib/pg-cluster';
import { buildPgTemplate } from './pg-template';

export default async function setup(): Promise<(() => void) | undefined> {
  if (process.env.TEST_PG !== '1' && !process.env.TEST_PG_URL) return undefined;
  let cluster: PgCluster | null = null;
  if (!process.env.TEST_PG_URL) {
    cluster = await startPgCluster();
    process.env.TEST_PG_URL = cluster.url;
  }
  await buildPgTemplate(knex, process.env.TEST_PG_URL);
  return () => cluster?.stop();
}
