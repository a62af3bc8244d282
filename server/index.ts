/**
 * `npm start` entry (run by scripts/start.mjs after the client build): starts Boxwright on PORT
 * (default 3000) and prints the address and the demo sign-ins.
 */
import { DEMO_PASSWORD, DEMO_PEOPLE } from './seed.js';
import { startServer } from './start.js';

try {
  const server = await startServer({});
  const shown = `http://localhost:${server.port}`;
  console.log(`\nBoxwright is running at ${shown}`);
  if (process.env.NODE_ENV !== 'production') {
    console.log(`Demo sign-ins (password: ${DEMO_PASSWORD}):`);
    for (const person of DEMO_PEOPLE) console.log(`  ${person.role.padEnd(9)} ${person.email}`);
  }
  console.log('Press Ctrl+C to stop.\n');
  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`\n${signal}: stopping…`);
    server.close().then(
      () => process.exit(0),
      (err: unknown) => {
        console.error('Could not stop cleanly:', err instanceof Error ? err.message : err);
        process.exit(1);
      },
    );
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
} catch (err) {
  const code = (err as { code?: string }).code;
  const message =
    code === 'EADDRINUSE' ? `port ${process.env.PORT ?? 3000} is already in use; set PORT to another port` : err instanceof Error ? err.message : String(err);
  console.error(`Boxwright could not start: ${message}`);
  process.exit(1);
}
