import type { ClientRateLimitInfo, Options, Store } from "express-rate-limit";
import { and, eq, gt, lt, sql } from "drizzle-orm";
import type { Database } from "../db/client.ts";
import { rateLimitCounters } from "../db/schema/index.ts";

/** How often an increment also clears long-expired counters (1 in N), so the table stays small. */
const CLEANUP_ONE_IN = 200;

/**
 * An express-rate-limit store in PostgreSQL: one fixed-window counter per key, bumped by a
 * single atomic upsert, so every server process sharing the database counts the same hits and a
 * parallel burst gets at most the limit through. Time comes from the app's clock (tests move it).
 */
export class PostgresRateLimitStore implements Store {
  readonly localKeys = false;
  private windowMs = 60_000;

  constructor(
    private readonly db: Database,
    /** Keeps this limiter's keys apart from other limiters' (and test files' apart from each other). */
    readonly prefix: string,
    private readonly now: () => Date,
  ) {}

  init(options: Options) {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const [row] = await this.db.select().from(rateLimitCounters)
      .where(and(eq(rateLimitCounters.key, this.prefix + key), gt(rateLimitCounters.resetAt, this.now())));
    return row ? { totalHits: row.hits, resetTime: row.resetAt } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const now = this.now();
    const resetAt = new Date(now.getTime() + this.windowMs);
    const expired = sql`${rateLimitCounters.resetAt} <= ${now.toISOString()}::timestamptz`;
    const [row] = await this.db.insert(rateLimitCounters)
      .values({ key: this.prefix + key, hits: 1, resetAt })
      .onConflictDoUpdate({
        target: rateLimitCounters.key,
        set: {
          hits: sql`case when ${expired} then 1 else ${rateLimitCounters.hits} + 1 end`,
          resetAt: sql`case when ${expired} then excluded.reset_at else ${rateLimitCounters.resetAt} end`,
        },
      })
      .returning({ hits: rateLimitCounters.hits, resetAt: rateLimitCounters.resetAt });
    if (Math.random() * CLEANUP_ONE_IN < 1) {
      await this.db.delete(rateLimitCounters).where(lt(rateLimitCounters.resetAt, new Date(now.getTime() - 60 * 60_000)));
    }
    return { totalHits: row!.hits, resetTime: row!.resetAt };
  }

  async decrement(key: string): Promise<void> {
    await this.db.update(rateLimitCounters)
      .set({ hits: sql`greatest(${rateLimitCounters.hits} - 1, 0)` })
      .where(and(eq(rateLimitCounters.key, this.prefix + key), gt(rateLimitCounters.resetAt, this.now())));
  }

  async resetKey(key: string): Promise<void> {
    await this.db.delete(rateLimitCounters).where(eq(rateLimitCounters.key, this.prefix + key));
  }
}
