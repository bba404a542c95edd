// The databases the db integration tests run against: PGlite in memory always, and a real
// PostgreSQL when TEST_DATABASE_URL is set (each test file gets its own fresh database there).
import { randomBytes } from "node:crypto";
import pg from "pg";
import { openDatabase, type DbHandle } from "@/db/client";

export type Variant = { name: "pglite" | "postgres"; enabled: boolean; open: () => Promise<DbHandle> };

const postgresUrl = process.env.TEST_DATABASE_URL;

if (!postgresUrl) {
  console.warn("[tests/db] TEST_DATABASE_URL is not set: the PostgreSQL variant of the db tests is skipped.");
}

async function openFreshPostgres(): Promise<DbHandle> {
  const admin = new pg.Client({ connectionString: postgresUrl });
  await admin.connect();
  const name = `vierbein_test_${randomBytes(6).toString("hex")}`;
  await admin.query(`create database ${name}`);
  await admin.end();
  const url = new URL(postgresUrl!);
  url.pathname = `/${name}`;
  const handle = await openDatabase({ kind: "postgres", url: url.toString() });
  return {
    ...handle,
    async close() {
      await handle.close();
      const cleanup = new pg.Client({ connectionString: postgresUrl });
      await cleanup.connect();
      await cleanup.query(`drop database if exists ${name} with (force)`);
      await cleanup.end();
    },
  };
}

export const variants: Variant[] = [
  { name: "pglite", enabled: true, open: () => openDatabase({ kind: "pglite", dataDir: "memory://" }) },
  { name: "postgres", enabled: Boolean(postgresUrl), open: openFreshPostgres },
];
