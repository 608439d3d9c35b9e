import type { ThrottlerStorage } from '@nestjs/throttler';
import { createHash } from 'node:crypto';
import { DataSource } from 'typeorm';

type ThrottlerStorageRecord = Awaited<ReturnType<ThrottlerStorage['increment']>>;

/**
 * @nestjs/throttler's storage in MariaDB: a fixed window per client, route and throttler, counted with one atomic
 * upsert, so N API instances behind a load balancer share one count (the in-memory default counts per instance and
 * lets a guesser try N times the limit). Past the limit the client waits until the window ends (Retry-After).
 */
export class MariaDbThrottlerStorage implements ThrottlerStorage {
  private calls = 0;

  constructor(private readonly dataSource: DataSource) {}

  async increment(key: string, ttl: number, limit: number, _blockDuration: number, throttlerName: string): Promise<ThrottlerStorageRecord> {
    const id = createHash('sha256').update(`${throttlerName}:${key}`).digest('hex');
    const ttlMicroseconds = Math.max(1, Math.round(ttl)) * 1000;
    // In ON DUPLICATE KEY UPDATE the assignments run in order: hits is decided on the old expiresAt, then expiresAt moves.
    await this.dataSource.query(
      `INSERT INTO throttle_counters (id, hits, expiresAt) VALUES (?, 1, NOW(3) + INTERVAL ? MICROSECOND)
       ON DUPLICATE KEY UPDATE
         hits = IF(expiresAt <= NOW(3), 1, hits + 1),
         expiresAt = IF(expiresAt <= NOW(3), NOW(3) + INTERVAL ? MICROSECOND, expiresAt)`,
      [id, ttlMicroseconds, ttlMicroseconds],
    );
    const [row] = (await this.dataSource.query(
      'SELECT hits, GREATEST(0, TIMESTAMPDIFF(MICROSECOND, NOW(3), expiresAt)) AS leftUs FROM throttle_counters WHERE id = ?',
      [id],
    )) as Array<{ hits: number | string; leftUs: number | string }>;
    if ((this.calls = (this.calls + 1) % 200) === 0) {
      await this.dataSource.query('DELETE FROM throttle_counters WHERE expiresAt < NOW(3) - INTERVAL 1 HOUR LIMIT 1000');
    }
    const totalHits = Number(row?.hits ?? 1);
    const secondsLeft = Math.max(1, Math.ceil(Number(row?.leftUs ?? ttlMicroseconds) / 1e6));
    const isBlocked = totalHits > limit;
    return { totalHits, timeToExpire: secondsLeft, isBlocked, timeToBlockExpire: isBlocked ? secondsLeft : 0 };
  }
}
