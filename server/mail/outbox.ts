import "server-only";
import fs from "node:fs";
import path from "node:path";
import { localMailEnabled, mailDir } from "./config";
import type { StoredMail } from "@/lib/mail/sink";

/** Messages the local sink stored for one workshop, newest first; null when there is no local sink. */
export function readOutbox(workshopId: number, limit = 50): StoredMail[] | null {
  if (!localMailEnabled()) return null;
  const dir = mailDir();
  let names: string[];
  try {
    names = fs.readdirSync(dir).filter((n) => n.endsWith(".json") && !n.startsWith("."));
  } catch {
    return [];
  }
  const out: StoredMail[] = [];
  for (const name of names.sort().reverse()) {
    try {
      const mail = JSON.parse(fs.readFileSync(path.join(dir, name), "utf8")) as StoredMail;
      // A reset link is its member's alone: reset mail is sent untagged, and any message carrying such a
      // link (one stored before that rule, say) is kept out of the owner's view all the same.
      if (mail.workshopId === workshopId && !mail.text.includes("/reset-password/")) out.push(mail);
    } catch {
      // a file being written or not ours: skip it
    }
    if (out.length >= limit) break;
  }
  return out;
}
