import { mkdirSync } from 'node:fs';
import path from 'node:path';
import connectSqlite3 from 'connect-sqlite3';
import session from 'express-session';
import sqlite3 from 'sqlite3';

export interface SessionStoreHandle {
  store: session.Store;
  close(): Promise<void>;
}

/**
 * Sessions persisted in their own SQLite file (connect-sqlite3), apart from MikroORM's database: its
 * untyped `sessions` table would break MikroORM's schema diff (STACK.md trap 4). ':memory:' for tests.
 */
export async function createSessionStore(file: string): Promise<SessionStoreHandle> {
  const memory = file === ':memory:';
  if (!memory) mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  const db = await new Promise<sqlite3.Database>((resolve, reject) => {
    const opened: sqlite3.Database = new sqlite3.Database(memory ? ':memory:' : path.resolve(file), (err) => (err ? reject(err) : resolve(opened)));
  });
  const SQLiteStore = connectSqlite3(session);
  const store = new SQLiteStore({ db, table: 'sessions' });
  // The store creates its table asynchronously; wait so the first request finds it.
  await new Promise<void>((resolve) => (store as unknown as { client: NodeJS.EventEmitter }).client.once('connect', () => resolve()));
  return {
    store,
    close: () => new Promise<void>((resolve) => db.close(() => resolve())),
  };
}
