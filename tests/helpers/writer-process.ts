import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";

/** Starts tests/helpers/db-writer.ts on a database file and tracks the highest acknowledged row number. */
export function startWriter(dbFile: string): { child: ChildProcess; acked: () => number; waitFor: (n: number) => Promise<void> } {
  const root = process.cwd();
  // tsx loaded into this one node process (not the tsx CLI, which runs the script in a grandchild that
  // SIGKILL would not reach), so killing `child` really kills the writer mid-transaction.
  const child = spawn(process.execPath, ["--import", "tsx", path.join(root, "tests/helpers/db-writer.ts"), dbFile], {
    cwd: root,
    stdio: ["ignore", "pipe", "inherit"],
  });
  let last = -1;
  let buffer = "";
  child.stdout!.on("data", (chunk: Buffer) => {
    buffer += chunk.toString();
    const lines = buffer.split("\n");
    buffer = lines.pop() ?? "";
    for (const l of lines) if (l) last = Number(l);
  });
  const waitFor = async (n: number) => {
    const until = Date.now() + 60_000;
    while (last < n) {
      if (child.exitCode !== null) throw new Error(`writer exited with ${child.exitCode}`);
      if (Date.now() > until) throw new Error(`writer reached only ${last}`);
      await new Promise((r) => setTimeout(r, 20));
    }
  };
  return { child, acked: () => last, waitFor };
}
