/** Starts the API (and the built client) on the configured host and port. */
import { createApp } from './app';
import { loadConfig } from './config';
import { createDatabase } from './database';
import { createLogger } from './logger';

export async function startServer(env: NodeJS.ProcessEnv = process.env) {
  const config = loadConfig(env);
  const logger = createLogger(env['LOG_LEVEL']);
  const db = createDatabase(config);
  const app = createApp({ config, db, logger });
  const server = await new Promise<import('node:http').Server>((done, fail) => {
    const listening = app.listen(config.port, config.host, () => done(listening)).on('error', fail);
  });
  return {
    config,
    url: `http://${config.host}:${config.port}`,
    async close() {
      const closed = new Promise<void>((done) => server.close(() => done()));
      // Keep-alive connections would hold close() open until they time out.
      server.closeAllConnections();
      await closed;
      await db.destroy();
    },
  };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const running = await startServer();
  console.log(`Linewright listening on ${running.url}`);
  const stop = async () => {
    await running.close();
    process.exit(0);
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}
