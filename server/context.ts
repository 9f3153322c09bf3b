/** What every feature needs: the configuration, the database and a way to wake the mail worker. */
import type { Knex } from 'knex';
import type { Config } from './env';
import type { EnginePool } from './engine/engine-pool';
import type { Storage } from './storage/storage';

export interface MailKick {
  /** Called after a commit that queued mail. */
  kick(): void;
}

export interface AppContext {
  config: Config;
  db: Knex;
  mail: MailKick;
  /** Attachment bytes: the local folder or an S3-compatible store. */
  storage: Storage;
  /** The engine for request paths that only compute (POST /api/check): worker threads or in-line. */
  engine: EnginePool;
}
