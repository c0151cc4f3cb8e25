import Database from "better-sqlite3";
import { drizzle, type BetterSQLite3Database } from "drizzle-orm/better-sqlite3";
import { migrate } from "drizzle-orm/better-sqlite3/migrator";
import fs from "node:fs";
import path from "node:path";
import { processSingleton } from "../lib/singleton";
import { databasePath } from "./env";
import * as schema from "./schema";

/** The one database client of the process: opened once, migrated once. */

export type Db = BetterSQLite3Database<typeof schema>;
/** What `getDb().transaction()` hands its callback. */
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
/** Query helpers take either, so they run alone or inside a caller's transaction. */
export type DbOrTx = Db | Tx;

export const MIGRATIONS_FOLDER = path.join(process.cwd(), "db", "migrations");

export function openDatabase(file = databasePath()): { sqlite: Database.Database; db: Db } {
  fs.mkdirSync(path.dirname(/*turbopackIgnore: true*/ file), { recursive: true });
  const sqlite = new Database(file);
  sqlite.pragma("journal_mode = WAL");
  sqlite.pragma("foreign_keys = ON");
  sqlite.pragma("busy_timeout = 5000");
  sqlite.pragma("synchronous = NORMAL");
  const db = drizzle(sqlite, { schema });
  migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
  return { sqlite, db };
}

/** Lazily opened so that `next build` never touches the database file. */
export function getDb(): Db {
  return processSingleton("Db", () => openDatabase()).db;
}
