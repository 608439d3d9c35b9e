import { DataSourceOptions } from 'typeorm';
import { DatabaseEnvironment } from '../config/env.validation';
import { ENTITIES } from './entities';
import { MIGRATIONS } from './migrations';

/** `host[:port]` entries of DB_REPLICA_HOSTS; a missing port is the primary's. */
export function parseReplicaHosts(list: string | undefined, defaultPort: number): Array<{ host: string; port: number }> {
  return (list ?? '')
    .split(',')
    .map((entry) => entry.trim())
    .filter(Boolean)
    .map((entry) => {
      const [host, port] = entry.split(':');
      return { host, port: port ? Number(port) : defaultPort };
    });
}

/**
 * With DB_REPLICA_HOSTS, TypeORM's replication: find/select outside a transaction on a replica (round robin), every
 * write, every transaction (so a read after a write in it sees the write) and raw queries on the primary.
 */
export function buildDataSourceOptions(env: DatabaseEnvironment): DataSourceOptions {
  const credentials = { username: env.DB_USER, password: env.DB_PASSWORD, database: env.DB_NAME };
  const replicas = parseReplicaHosts(env.DB_REPLICA_HOSTS, env.DB_PORT);
  const connection =
    replicas.length > 0
      ? {
          replication: {
            master: { host: env.DB_HOST, port: env.DB_PORT, ...credentials },
            slaves: replicas.map((replica) => ({ ...replica, ...credentials })),
            selector: 'RR' as const,
          },
        }
      : { host: env.DB_HOST, port: env.DB_PORT, ...credentials };
  return {
    type: 'mysql',
    ...connection,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'migrations',
    migrationsTransactionMode: 'each',
    synchronize: false,
    logging: ['error', 'warn', 'migration'],
  };
}
