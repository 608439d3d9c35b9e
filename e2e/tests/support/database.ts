import { createConnection, type Connection } from 'mysql2/promise';

/**
 * The e2e database the served API uses (scripts/stack.sh e2e exports DB_NAME=swapwright_e2e with the test services' env),
 * for the few states a journey cannot reach through the browser in its time, such as work that ran out of attempts.
 */
export async function withE2eDatabase<T>(work: (connection: Connection) => Promise<T>): Promise<T> {
  const { DB_HOST, DB_PORT, DB_USER, DB_PASSWORD, DB_NAME } = process.env;
  if (!DB_HOST || !DB_USER || !DB_NAME) throw new Error('DB_HOST, DB_USER and DB_NAME are not set: run the journey through bash scripts/stack.sh e2e.');
  const connection = await createConnection({ host: DB_HOST, port: Number(DB_PORT ?? 3306), user: DB_USER, password: DB_PASSWORD, database: DB_NAME });
  try {
    return await work(connection);
  } finally {
    await connection.end();
  }
}
