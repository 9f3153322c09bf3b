/** Starts Reachline and shuts it down cleanly on SIGINT / SIGTERM. */
import { ConfigError } from './env';
import { startServer } from './start';

async function main(): Promise<void> {
  const running = await startServer();
  console.log(`Reachline is running at ${running.url}`);
  if (running.fakeSmtp)
    console.log(
      `Mail goes to the local fake SMTP server (${running.fakeSmtp.url}); read it on the Outbox screen.`,
    );
  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`${signal}: shutting down…`);
    const force = setTimeout(() => process.exit(1), 10_000);
    force.unref();
    running.close().then(
      () => process.exit(0),
      (err: unknown) => {
        console.error('Shutdown failed:', err);
        process.exit(1);
      },
    );
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error(err instanceof ConfigError ? err.message : err);
  process.exit(1);
});
