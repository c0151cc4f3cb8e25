import { openDatabase } from "./client";
import { databasePath } from "./env";

// Opening the database applies every pending migration in db/migrations.
const { sqlite } = openDatabase();
console.log(`Database ready at ${databasePath()}`);
sqlite.close();
