import { ChildProcess, execFileSync, spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/**
 * A MariaDB server of one test suite's own, on 127.0.0.1 and a free port, with its data in a temporary folder:
 * the fault suites stop and start it without touching the shared test database.
 */
export class PrivateMariaDb {
  readonly dir = mkdtempSync(join(tmpdir(), 'swapwright-faults-'));
  readonly socket = join(this.dir, 'mysqld.sock');
  readonly password = randomBytes(12).toString('hex');
  readonly database = 'swapwright_faults';
  port = 0;
  private server: ChildProcess | null = null;

  async install(): Promise<void> {
    execFileSync('mariadb-install-db', ['--no-defaults', `--datadir=${join(this.dir, 'data')}`, '--user=root', '--auth-root-authentication-method=normal', '--skip-test-db'], { stdio: 'ignore' });
    this.port = await freePort();
    await this.start();
    this.root(
      `CREATE USER 'swapwright'@'127.0.0.1' IDENTIFIED BY '${this.password}';` +
        `CREATE DATABASE \`${this.database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;` +
        `GRANT ALL ON \`${this.database}\`.* TO 'swapwright'@'127.0.0.1';`,
    );
  }

  /** The environment the API reads for its database. */
  env(): Record<string, string> {
    return { DB_HOST: '127.0.0.1', DB_PORT: String(this.port), DB_USER: 'swapwright', DB_PASSWORD: this.password, DB_NAME: this.database };
  }

  async start(): Promise<void> {
    this.server = spawn(
      'mariadbd',
      [
        '--no-defaults', `--datadir=${join(this.dir, 'data')}`, `--port=${this.port}`, '--bind-address=127.0.0.1', `--socket=${this.socket}`,
        `--pid-file=${join(this.dir, 'mysqld.pid')}`, '--user=root', `--log-error=${join(this.dir, 'error.log')}`, '--skip-name-resolve',
        '--innodb-buffer-pool-size=32M', '--character-set-server=utf8mb4', '--collation-server=utf8mb4_unicode_ci',
      ],
      { stdio: 'ignore' },
    );
    const until = Date.now() + 60_000;
    while (Date.now() < until) {
      try {
        execFileSync('mariadb-admin', ['--no-defaults', `--socket=${this.socket}`, '-uroot', 'ping'], { stdio: 'ignore' });
        return;
      } catch {
        await new Promise((resolve) => setTimeout(resolve, 100));
      }
    }
    throw new Error(`the private MariaDB did not start (see ${join(this.dir, 'error.log')})`);
  }

  /** A clean shutdown, as an operator or a failover would do it; waits until the process has ended. */
  async stop(): Promise<void> {
    const server = this.server;
    if (!server || server.exitCode !== null) return;
    const ended = new Promise((resolve) => server.once('exit', resolve));
    try {
      execFileSync('mariadb-admin', ['--no-defaults', `--socket=${this.socket}`, '-uroot', 'shutdown'], { stdio: 'ignore' });
    } catch {
      server.kill('SIGTERM');
    }
    await ended;
    this.server = null;
  }

  async destroy(): Promise<void> {
    await this.stop();
    rmSync(this.dir, { recursive: true, force: true });
  }

  private root(sql: string): void {
    execFileSync('mariadb', ['--no-defaults', `--socket=${this.socket}`, '-uroot', '-e', sql], { stdio: 'ignore' });
  }
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}
