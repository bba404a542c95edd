// Server side: one database per process. PGlite on disk by default, node-postgres when
// DATABASE_URL is set; both run the same Drizzle schema and migrations.
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { PgDatabase, PgQueryResultHKT } from "drizzle-orm/pg-core";
import * as schema from "./schema";
import { migratePglite, migratePostgres } from "./migrate";

export type Schema = typeof schema;
/** The common face of the PGlite and node-postgres Drizzle databases. */
export type Db = PgDatabase<PgQueryResultHKT, Schema>;
export type DbKind = "pglite" | "postgres";

export type DbConfig = { kind: "pglite"; dataDir: string } | { kind: "postgres"; url: string };

export interface DbHandle {
  db: Db;
  kind: DbKind;
  close(): Promise<void>;
}

/** Reads the environment: DATABASE_URL wins; otherwise PGlite under DATA_DIR (default ./.data). */
export function configFromEnv(env: Record<string, string | undefined> = process.env): DbConfig {
  if (env.DATABASE_URL) return { kind: "postgres", url: env.DATABASE_URL };
  return { kind: "pglite", dataDir: env.DATA_DIR || "./.data" };
}

/** Opens a database and applies the migrations in drizzle/. Callers own the handle. */
export async function openDatabase(config: DbConfig): Promise<DbHandle> {
  return config.kind === "postgres" ? openPostgres(config.url) : openPglite(config.dataDir);
}

async function openPglite(dataDir: string): Promise<DbHandle> {
  const { PGlite } = await import("@electric-sql/pglite");
  const { drizzle } = await import("drizzle-orm/pglite");
  const inMemory = dataDir.startsWith("memory://");
  const location = inMemory ? dataDir : path.resolve(/* turbopackIgnore: true */ dataDir, "pglite");
  if (!inMemory) mkdirSync(location, { recursive: true });
  const client = await PGlite.create(location);
  try {
    await migratePglite(client);
  } catch (error) {
    await client.close();
    throw error;
  }
  const db = drizzle(client, { schema }) as unknown as Db;
  return { db, kind: "pglite", close: () => client.close() };
}

async function openPostgres(url: string): Promise<DbHandle> {
  const { Pool } = await import("pg");
  const { drizzle } = await import("drizzle-orm/node-postgres");
  const pool = new Pool({ connectionString: url, max: Number(process.env.DATABASE_POOL_SIZE || 10) });
  // An idle client that errors (server restart) must not crash the process.
  pool.on("error", (error) => console.error("[db] idle PostgreSQL client error", error));
  try {
    await migratePostgres(pool);
  } catch (error) {
    await pool.end();
    throw error;
  }
  const db = drizzle(pool, { schema }) as unknown as Db;
  return { db, kind: "postgres", close: () => pool.end() };
}

// Kept on globalThis so dev hot reload does not open a second PGlite on the same folder.
type Holder = { handle?: Promise<DbHandle>; kind?: DbKind };
const holderKey = Symbol.for("vierbein.db");
const holder: Holder = ((globalThis as Record<symbol, unknown>)[holderKey] ??= {}) as Holder;

/** The process-wide database, migrated on first use. */
export async function getDb(): Promise<Db> {
  return (await getDbHandle()).db;
}

export function getDbHandle(): Promise<DbHandle> {
  if (!holder.handle) {
    const config = configFromEnv();
    holder.kind = config.kind;
    holder.handle = openDatabase(config);
    // A failed open must not stay cached: the next call retries.
    holder.handle.catch(() => {
      holder.handle = undefined;
    });
  }
  return holder.handle;
}

/** Which store this process uses (decided by the environment, before the database opens). */
export function dbKind(): DbKind {
  return holder.kind ?? configFromEnv().kind;
}

/** Closes the process-wide database (server shutdown, end of tests). Safe to call twice. */
export async function closeDb(): Promise<void> {
  const pending = holder.handle;
  holder.handle = undefined;
  holder.kind = undefined;
  if (pending) await (await pending).close();
}
