import path from "node:path";
import { z } from "zod";

/**
 * Environment variables, read in one place. This module holds the reader and the storage settings, which the
 * data floor and its command-line scripts need (db/seed.ts, migrate, backup and restore run under tsx, outside
 * Next, where the "server-only" package throws); server/env.ts adds the server's settings on top. README.md,
 * "Environment", lists every variable.
 *
 * Values are validated once for each distinct set of them, not once per process: process.env stays the one
 * channel that every bundle of the server shares, and the local stand-ins started by instrumentation.ts fill in
 * SMTP_URL and the payment variables after start (server/env.ts, `provideLocally`), as tests do between cases.
 */

type Source = Readonly<Record<string, string | undefined>>;

/** The schema's variables from `source`, checked; an empty variable counts as unset (`GLOWBENCH_UPLOADS=` keeps the default). */
export function readEnv<S extends z.ZodObject>(schema: S, cache: { key?: string; value?: z.output<S> }, source: Source = process.env): z.output<S> {
  const names = Object.keys(schema.shape);
  const raw = Object.fromEntries(names.map((name) => [name, source[name] || undefined]));
  const key = JSON.stringify(names.map((name) => raw[name] ?? null));
  if (cache.key === key && cache.value) return cache.value;
  const parsed = schema.safeParse(raw);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${String(i.path[0])}: ${i.message}`);
    throw new Error(`Glowbench cannot start with these settings (see README.md, "Environment"):\n  ${problems.join("\n  ")}`);
  }
  cache.key = key;
  cache.value = parsed.data;
  return parsed.data;
}

export const storageSchema = z.object({
  /** The SQLite file; its folder is made and migrations applied on first start. */
  GLOWBENCH_DB: z.string().default(path.join("data", "glowbench.db")),
  /** Job photos and schematics; beside the database unless set. */
  GLOWBENCH_UPLOADS: z.string().optional(),
});

const storageCache = {};

export function storageEnv(source?: Source): z.output<typeof storageSchema> {
  return readEnv(storageSchema, storageCache, source);
}

export function databasePath(): string {
  return path.resolve(/*turbopackIgnore: true*/ storageEnv().GLOWBENCH_DB);
}

/** Where uploads of the database `dbFile` live: GLOWBENCH_UPLOADS, else `uploads/` beside the file. */
export function uploadsFolder(dbFile = databasePath()): string {
  return path.resolve(/*turbopackIgnore: true*/ storageEnv().GLOWBENCH_UPLOADS ?? path.join(path.dirname(dbFile), "uploads"));
}
