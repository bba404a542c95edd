// `npm run db:demo` — migrates the database named by the environment (DATABASE_URL, or
// PGlite under DATA_DIR) and loads the demo data. `--reset-content` also overwrites
// documents edited since the last load.
import { closeDb, dbKind, getDbHandle } from "../client";
import { loadDemo } from "./load";
import { DEMO_PASSWORD, demoAccounts } from "./people";

async function main() {
  const { db } = await getDbHandle();
  const counts = await loadDemo({ db, resetContent: process.argv.includes("--reset-content") });
  console.info(`[demo] loaded into ${dbKind()}: ${counts.users} accounts, ${counts.groups} group, ${counts.notebooks} notebooks`);
  console.info(`[demo] sign in as ${demoAccounts.map((a) => a.email).join(", ")} — password "${DEMO_PASSWORD}" (demo only)`);
}

main()
  .catch((error: unknown) => {
    console.error("[demo] failed", error);
    process.exitCode = 1;
  })
  .finally(() => closeDb());
