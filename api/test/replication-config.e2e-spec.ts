import 'reflect-metadata';
import { DataSource, Logger, QueryRunner } from 'typeorm';
import { validateDatabaseEnv } from '../src/config/env.validation';
import { buildDataSourceOptions, parseReplicaHosts } from '../src/database/typeorm-options';
import { User } from '../src/users/user.entity';

/** Records each statement with the side of the replication it ran on ('master' = the primary, 'slave' = a replica). */
class RoutingLog implements Logger {
  readonly entries: Array<{ mode: string; query: string }> = [];
  logQuery(query: string, _parameters?: unknown[], queryRunner?: QueryRunner) {
    this.entries.push({ mode: queryRunner?.getReplicationMode() ?? 'none', query });
  }
  logQueryError() {}
  logQuerySlow() {}
  logSchemaBuild() {}
  logMigration() {}
  log() {}
}

/**
 * TypeORM replication set up from DB_REPLICA_HOSTS. The "replica" here is the test server itself under a second
 * address, so the statements really run; the log shows where TypeORM sent each one.
 */
describe('read replicas from DB_REPLICA_HOSTS', () => {
  let dataSource: DataSource;
  const log = new RoutingLog();

  beforeAll(async () => {
    const env = validateDatabaseEnv({ ...process.env, DB_REPLICA_HOSTS: `${process.env.DB_HOST}:${process.env.DB_PORT}` });
    dataSource = new DataSource({ ...buildDataSourceOptions(env), logging: true, logger: log });
    await dataSource.initialize();
  });

  afterAll(async () => {
    await dataSource?.destroy();
  });

  it('reads the replica list: host and port, the primary port when none is given; refuses a malformed list', () => {
    expect(parseReplicaHosts('db-r1:3307, db-r2', 3306)).toEqual([
      { host: 'db-r1', port: 3307 },
      { host: 'db-r2', port: 3306 },
    ]);
    const options = buildDataSourceOptions(validateDatabaseEnv({ ...process.env, DB_REPLICA_HOSTS: 'db-r1:3307,db-r2' })) as {
      replication?: { master: { host: string }; slaves: Array<{ host: string; port: number }> };
    };
    expect(options.replication?.master.host).toBe(process.env.DB_HOST);
    expect(options.replication?.slaves.map((s) => `${s.host}:${s.port}`)).toEqual(['db-r1:3307', `db-r2:${process.env.DB_PORT}`]);
    expect(() => validateDatabaseEnv({ ...process.env, DB_REPLICA_HOSTS: 'db r1;3307' })).toThrow(/DB_REPLICA_HOSTS/);
  });

  it('sends a plain read to a replica', async () => {
    log.entries.length = 0;
    await dataSource.getRepository(User).find({ take: 1 });
    expect(log.entries.filter((e) => /^SELECT/i.test(e.query)).map((e) => e.mode)).toEqual(['slave']);
  });

  it('sends writes, and reads inside the same transaction (read-after-write), to the primary', async () => {
    log.entries.length = 0;
    await dataSource.transaction(async (manager) => {
      await manager.query('CREATE TEMPORARY TABLE replication_probe (id int)');
      await manager.query('INSERT INTO replication_probe VALUES (1)');
      const rows = (await manager.query('SELECT id FROM replication_probe')) as Array<{ id: number }>;
      expect(rows).toEqual([{ id: 1 }]);
      await manager.getRepository(User).find({ take: 1 });
    });
    const modes = new Set(log.entries.map((e) => e.mode));
    expect([...modes]).toEqual(['master']);
    expect(log.entries.some((e) => /^INSERT/i.test(e.query))).toBe(true);
  });
});
