import { sql } from "drizzle-orm";
import { integer } from "drizzle-orm/sqlite-core";

/** Columns every table spells the same way. */

export const id = () => integer("id").primaryKey({ autoIncrement: true });

/** Milliseconds since the epoch, filled in by SQLite when the row is written. */
const nowMs = sql`(unixepoch('subsec') * 1000)`;

export const createdAt = () => integer("created_at", { mode: "timestamp_ms" }).notNull().default(nowMs);
export const updatedAt = () => integer("updated_at", { mode: "timestamp_ms" }).notNull().default(nowMs);
export const startedAt = () => integer("started_at", { mode: "timestamp_ms" }).notNull().default(nowMs);
