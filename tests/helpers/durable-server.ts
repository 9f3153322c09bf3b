/**
 * A child server for the durability test: the real startServer on a given SQLite file and port,
 * seeded with the demo, printing "READY <url>" once it listens. The test kills it with SIGKILL.
 */
import { startServer } from '../../server/start';

const [databaseUrl, dataDir, port] = process.argv.slice(2);
if (!databaseUrl || !dataDir) throw new Error('usage: durable-server <database> <data dir> [port]');
const server = await startServer({
  port: Number(port ?? 0),
  databaseUrl,
  dataDir,
  uploadDir: `${dataDir}/uploads`,
  seedDemo: true,
  passwordCost: 1024,
  loginRateLimit: 1000,
});
process.stdout.write(`READY ${server.url}\n`);
