import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import { QueryTypes, type Sequelize } from 'sequelize';

/**
 * An express-rate-limit store over one PostgreSQL table, so a limit holds across every app
 * process behind a balancer; each count resets once its window has passed.
 */
export class PostgresRateLimitStore implements Store {
  private windowMs = 60_000;
  readonly localKeys = false;

  constructor(
    private readonly sequelize: Sequelize,
    readonly prefix: string,
  ) {}

  init(options: Options) {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const [row] = await this.sequelize.query<{ hits: number; reset_at: Date }>(
      'SELECT hits, reset_at FROM rate_limit_hits WHERE key = :key AND reset_at > now()',
      {
        replacements: { key: this.key(key) },
        type: QueryTypes.SELECT,
      },
    );
    return row ? { totalHits: row.hits, resetTime: row.reset_at } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const [row] = await this.sequelize.query<{ hits: number; reset_at: Date }>(
      `INSERT INTO rate_limit_hits (key, hits, reset_at) VALUES (:key, 1, now() + make_interval(secs => :seconds))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN rate_limit_hits.reset_at <= now() THEN 1 ELSE rate_limit_hits.hits + 1 END,
         reset_at = CASE WHEN rate_limit_hits.reset_at <= now() THEN EXCLUDED.reset_at ELSE rate_limit_hits.reset_at END
       RETURNING hits, reset_at`,
      { replacements: { key: this.key(key), seconds: this.windowMs / 1000 }, type: QueryTypes.SELECT },
    );
    // Now and then, forget counts whose window ended long ago.
    if (Math.random() < 0.01)
      await this.sequelize.query("DELETE FROM rate_limit_hits WHERE reset_at < now() - interval '1 day'");
    return { totalHits: row.hits, resetTime: row.reset_at };
  }

  async decrement(key: string) {
    await this.sequelize.query(
      'UPDATE rate_limit_hits SET hits = greatest(hits - 1, 0) WHERE key = :key AND reset_at > now()',
      { replacements: { key: this.key(key) } },
    );
  }

  async resetKey(key: string) {
    await this.sequelize.query('DELETE FROM rate_limit_hits WHERE key = :key', {
      replacements: { key: this.key(key) },
    });
  }

  private key(key: string) {
    return `${this.prefix}:${key}`;
  }
}
