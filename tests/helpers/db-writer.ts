import { openDatabase } from "../../db/client";

/**
 * A writer for the crash and backup tests: opens the database as the app does (WAL, synchronous=NORMAL),
 * inserts one workshop row per transaction and prints its number only after the commit returned,
 * so every printed number is an acknowledged write. Runs until killed.
 */
const file = process.argv[2];
const { sqlite } = openDatabase(file);
const insert = sqlite.prepare("insert into workshops (name) values (?)");
let i = 0;
function burst() {
  for (let k = 0; k < 20; k++) {
    insert.run(`writer-${i}`);
    process.stdout.write(`${i}\n`);
    i++;
  }
  setImmediate(burst);
}
burst();
