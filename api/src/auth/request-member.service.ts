import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { AuthUser } from '../common/tenant/auth-user';
import { Role } from '../common/roles/role';
import { AccessTokenPayload } from './auth.constants';

interface Row {
  userId: string;
  shopId: string;
  role: Role;
  email: string;
  name: string;
  sessionVersion: number;
  customerId: string | null;
  ended: number | string;
}

const CURRENT_MEMBER_SQL = `SELECT m.userId, m.shopId, m.role, u.email, u.name, u.sessionVersion,
        (SELECT c.id FROM customers c WHERE m.role = 'customer' AND c.shopId = m.shopId AND c.userId = m.userId LIMIT 1) AS customerId,
        EXISTS (SELECT 1 FROM refresh_tokens r WHERE r.sessionId = ? AND r.revokedAt IS NOT NULL AND r.replacedById IS NULL) AS ended
   FROM memberships m JOIN users u ON u.id = m.userId
  WHERE m.id = ?`;

/** The part of mysql2's pool (or a pool cluster's namespace) used here. */
interface PreparedStatementPool {
  execute(sql: string, values: unknown[], callback: (error: Error | null, rows: unknown) => void): void;
}

/** The pools TypeORM's MySQL driver keeps (`poolCluster` when replication is configured). */
interface MysqlDriverPools {
  pool?: PreparedStatementPool;
  poolCluster?: { of(pattern: string): PreparedStatementPool };
}

/**
 * The signed-in member of a request in one round trip: the membership with its user, the session's state (session
 * version, sign-out) and, for a customer, the linked customer record. Every request reads the database's current
 * state, so with any number of API instances a sign-out, password reset, removed member or changed role counts on the
 * very next request everywhere (there is no per-instance copy to go stale). Anything but a current session of that
 * member answers null; the caller then takes the detailed path for the exact refusal.
 */
@Injectable()
export class RequestMemberService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async currentMember(payload: AccessTokenPayload): Promise<AuthUser | null> {
    if (typeof payload.mid !== 'string' || typeof payload.sid !== 'string' || typeof payload.sv !== 'number') return null;
    const rows = await this.executeOnPrimary(CURRENT_MEMBER_SQL, [payload.sid, payload.mid]);
    const row = rows[0];
    if (!row || row.userId !== payload.sub || Number(row.sessionVersion) !== payload.sv || Number(row.ended) !== 0) return null;
    return {
      userId: row.userId,
      email: row.email,
      name: row.name,
      membershipId: payload.mid,
      shopId: row.shopId,
      role: row.role,
      customerId: row.role === 'customer' ? row.customerId : null,
    };
  }

  /**
   * Runs on every authenticated request, so it skips TypeORM's per-query machinery (a query runner, subscriber
   * broadcast, a captured stack per query) and uses mysql2's prepared statement, cached per pooled connection. Always
   * the primary (with replication too): a sign-out must count on the very next request.
   */
  private executeOnPrimary(sql: string, values: unknown[]): Promise<Row[]> {
    const driver = this.dataSource.driver as unknown as MysqlDriverPools;
    const pool = driver.poolCluster ? driver.poolCluster.of('MASTER') : driver.pool;
    if (!pool) return this.dataSource.query(sql, values) as Promise<Row[]>;
    return new Promise((resolve, reject) => pool.execute(sql, values, (error, rows) => (error ? reject(error) : resolve(rows as Row[]))));
  }
}
