import { eq, sql } from 'drizzle-orm';
import type { IncrementResponse, Options, Store } from 'express-rate-limit';
import type { Db } from '../db/database.ts';
import { requestCounts } from '../db/schema.ts';

/**
 * An express-rate-limit store in the database, so that several servers on one PostgreSQL count
 * together. Each step is one statement, so two servers counting the same key at once never lose
 * a hit: a fixed window per key, restarted by the first hit after it ends.
 */
export class RequestCountStore implements Store {
  readonly localKeys = false;
  private windowMs = 60_000;
  private lastSweep = 0;

  constructor(
    private readonly db: Db,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const name = this.prefix + key;
    const resetAt = new Date(Date.now() + this.windowMs);
    const [row] = await this.db
      .insert(requestCounts)
      .values({ key: name, hits: 1, resetAt })
      .onConflictDoUpdate({
        target: requestCounts.key,
        set: {
          hits: sql`case when ${requestCounts.resetAt} <= now() then 1 else ${requestCounts.hits} + 1 end`,
          resetAt: sql`case when ${requestCounts.resetAt} <= now() then excluded.reset_at else ${requestCounts.resetAt} end`,
        },
      })
      .returning({ hits: requestCounts.hits, resetAt: requestCounts.resetAt });
    this.sweepNowAndThen();
    return { totalHits: row!.hits, resetTime: row!.resetAt };
  }

  async decrement(key: string): Promise<void> {
    await this.db
      .update(requestCounts)
      .set({ hits: sql`greatest(${requestCounts.hits} - 1, 0)` })
      .where(eq(requestCounts.key, this.prefix + key));
  }

  async resetKey(key: string): Promise<void> {
    await this.db.delete(requestCounts).where(eq(requestCounts.key, this.prefix + key));
  }

  /** Ended windows are deleted at most once a minute, in the background. */
  private sweepNowAndThen(): void {
    const now = Date.now();
    if (now - this.lastSweep < 60_000) return;
    this.lastSweep = now;
    this.db
      .delete(requestCounts)
      .where(sql`${requestCounts.resetAt} < now() - interval '1 minute'`)
      .catch((error: unknown) => console.error('Could not delete old rate-limit counts:', (error as Error).message));
  }
}
