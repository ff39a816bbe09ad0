// Fixed-window rate limits kept in PostgreSQL, so every app instance counts the same hits.
import { sql } from "drizzle-orm";
import { db } from "@/server/db";

export interface RateLimitRule {
  bucket: string;
  limit: number;
  windowSeconds: number;
}

export interface RateLimitOutcome {
  allowed: boolean;
  retryAfterSeconds: number;
}

/** Counts one hit for `key` and says whether it is still within the rule. One atomic statement. */
export async function hitRateLimit(rule: RateLimitRule, key: string): Promise<RateLimitOutcome> {
  const result = await db().execute<{ hits: number; window_start: Date }>(sql`
    insert into rate_limit_counters (bucket, key, window_start, hits)
    values (${rule.bucket}, ${key}, now(), 1)
    on conflict (bucket, key) do update set
      hits = case when rate_limit_counters.window_start <= now() - make_interval(secs => ${rule.windowSeconds})
                  then 1 else rate_limit_counters.hits + 1 end,
      window_start = case when rate_limit_counters.window_start <= now() - make_interval(secs => ${rule.windowSeconds})
                  then now() else rate_limit_counters.window_start end
    returning hits, window_start`);
  const row = result.rows[0];
  const windowEnds = new Date(row.window_start).getTime() + rule.windowSeconds * 1000;
  return {
    allowed: row.hits <= rule.limit,
    retryAfterSeconds: Math.max(1, Math.ceil((windowEnds - Date.now()) / 1000)),
  };
}

/** Takes back one hit, for attempts that turned out to be legitimate. */
export async function refundRateLimit(rule: RateLimitRule, key: string): Promise<void> {
  await db().execute(sql`update rate_limit_counters set hits = greatest(hits - 1, 0) where bucket = ${rule.bucket} and key = ${key}`);
}

/** Forgets the counter, for example after a successful sign-in to that account. */
export async function clearRateLimit(rule: RateLimitRule, key: string): Promise<void> {
  await db().execute(sql`delete from rate_limit_counters where bucket = ${rule.bucket} and key = ${key}`);
}
