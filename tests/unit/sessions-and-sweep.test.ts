import fs from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, test } from "vitest";
import { tempDatabase } from "../helpers/temp-db";

// First, before anything opens the database: a fresh migrated file for the process's one client (getDb), with its uploads folder.
const { getDb } = await tempDatabase("sessions", { uploads: true });
const { users, workshops, memberships, jobs, files } = await import("@/db/schema");
const sessionsQ = await import("@/db/queries/sessions");
const { sweepOrphanUploads } = await import("@/server/files/sweep");

let userId = 0;
let jobId = 0;
let workshopId = 0;
beforeAll(() => {
  const db = getDb();
  workshopId = db.insert(workshops).values({ name: "Sweep Test Bench" }).returning().get().id;
  userId = db.insert(users).values({ email: "s@example.test", name: "S", passwordHash: "x" }).returning().get().id;
  db.insert(memberships).values({ workshopId, userId, role: "owner" }).run();
  jobId = db.insert(jobs).values({ workshopId, title: "Set", equipmentKind: "table-radio" }).returning().get().id;
});

const HOUR = 3_600_000;
const opts = { ttlMs: 14 * 24 * HOUR, idleMs: 8 * HOUR };

describe("server-side sessions", () => {
  test("a session lives until it is deleted; another user's cookie cannot borrow it", () => {
    const sid = sessionsQ.createSession(userId, opts);
    expect(sessionsQ.checkSession(sid, userId, opts)).toBe("live");
    expect(sessionsQ.checkSession(sid, userId + 1, opts)).toBe("ended");
    sessionsQ.deleteSession(sid);
    expect(sessionsQ.checkSession(sid, userId, opts)).toBe("ended");
  });

  test("idle longer than the timeout ends it; being seen moves the clock on", () => {
    const now = Date.now();
    const sid = sessionsQ.createSession(userId, { ...opts, now });
    expect(sessionsQ.checkSession(sid, userId, { idleMs: opts.idleMs, now: now + 7 * HOUR })).toBe("live");
    expect(sessionsQ.checkSession(sid, userId, { idleMs: opts.idleMs, now: now + 14 * HOUR })).toBe("live"); // seen 7 h before
    expect(sessionsQ.checkSession(sid, userId, { idleMs: opts.idleMs, now: now + 23 * HOUR })).toBe("ended");
  });

  test("signing out everywhere ends every session; a password change may keep one", () => {
    const a = sessionsQ.createSession(userId, opts);
    const b = sessionsQ.createSession(userId, opts);
    sessionsQ.deleteUserSessions(userId, a);
    expect(sessionsQ.checkSession(a, userId, opts)).toBe("live");
    expect(sessionsQ.checkSession(b, userId, opts)).toBe("ended");
    sessionsQ.endAllSessions(userId);
    expect(sessionsQ.checkSession(a, userId, opts)).toBe("ended");
  });
});

describe("the sweep of uploads whose row never committed", () => {
  const up = process.env.GLOWBENCH_UPLOADS!;
  const name = (c: string) => `${c.repeat(32)}.jpg`;
  const put = (n: string, ageMs: number) => {
    const p = path.join(up, n);
    fs.writeFileSync(p, "bytes");
    const t = new Date(Date.now() - ageMs);
    fs.utimesSync(p, t, t);
  };

  test("removes old orphans and their thumbnails; keeps recorded files, fresh uploads and anything not ours", async () => {
    fs.mkdirSync(up, { recursive: true });
    put(name("a"), 2 * HOUR); // orphan
    put(`${name("a")}.thumb.webp`, 2 * HOUR);
    put(name("b"), 2 * HOUR); // has a row
    put(name("c"), 60 * 1000); // orphan, but may still be mid-upload
    put("notes.txt", 2 * HOUR); // not an upload name
    getDb()
      .insert(files)
      .values({ jobId, workshopId, storedName: name("b"), originalName: "b.jpg", type: "image/jpeg", size: 5, kind: "photo", hasThumbnail: false })
      .run();

    expect(await sweepOrphanUploads()).toEqual([name("a")]);
    expect(fs.readdirSync(up).sort()).toEqual([name("b"), name("c"), "notes.txt"].sort());
    expect(await sweepOrphanUploads()).toEqual([]);
  });
});
