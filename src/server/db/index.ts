import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { serverEnv } from "@/env";
import * as schema from "./schema";

export type Database = NodePgDatabase<typeof schema>;
/** A transaction handle, for services that take part in a caller's transaction. */
export type Transaction = Parameters<Parameters<Database["transaction"]>[0]>[0];
export type Executor = Database | Transaction;

// One pool per process; kept on globalThis so that hot reload in development does not
// open a new pool on every edit.
const globalForDb = globalThis as unknown as { guylinePool?: Pool; guylineDb?: Database };

export function pool(): Pool {
  globalForDb.guylinePool ??= new Pool({ connectionString: serverEnv().DATABASE_URL, max: 10 });
  return globalForDb.guylinePool;
}

export function db(): Database {
  globalForDb.guylineDb ??= drizzle(pool(), { schema });
  return globalForDb.guylineDb;
}

export { schema };
