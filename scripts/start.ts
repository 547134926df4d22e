/**
 * `npm start`: a private MariaDB with demo data, the built client, and the API
 * on one Express process. Ctrl-C stops the server and the database cleanly.
 */
import { startServer } from '../server/main';
import { DEMO_USERS } from '../seeds/01_demo_team';
import { bringUpDatabase } from './bring-up';
import { buildClientIfStale } from './client-build';

const stack = await bringUpDatabase('start');
let server: Awaited<ReturnType<typeof startServer>> | undefined;

async function shutdown(code: number): Promise<never> {
  console.log('\nStopping Linewright…');
  await server?.close();
  await stack.stop();
  process.exit(code);
}
process.once('SIGINT', () => void shutdown(0));
process.once('SIGTERM', () => void shutdown(0));

try {
  buildClientIfStale();
  server = await startServer(stack.env);
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  await shutdown(1);
}

console.log(`
Linewright is running at ${server!.url}
API docs: ${server!.url}/api/docs

Demo sign-ins (local use only):
${DEMO_USERS.map((user) => `  ${user.role.padEnd(9)} ${user.email.padEnd(24)} ${user.password}`).join('\n')}

Press Ctrl-C to stop.`);
