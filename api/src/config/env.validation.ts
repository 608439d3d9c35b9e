import 'reflect-metadata';
import { plainToInstance, Transform, Type } from 'class-transformer';
import {
  IsBoolean,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsOptional,
  IsString,
  IsUrl,
  Matches,
  ValidateIf,
  Max,
  Min,
  MinLength,
  validateSync,
  ValidationError,
} from 'class-validator';

import { JOB_KINDS, type JobKind } from '../jobs/job-kinds';

const REPLICA_HOSTS = /^\s*[A-Za-z0-9.-]+(:\d{1,5})?\s*(,\s*[A-Za-z0-9.-]+(:\d{1,5})?\s*)*$/;

export const STORAGE_DRIVERS = ['local', 's3'] as const;
export type StorageDriver = (typeof STORAGE_DRIVERS)[number];

export type NodeEnv = 'development' | 'test' | 'production';
export const NODE_ENVS: NodeEnv[] = ['development', 'test', 'production'];

/** What the TypeORM CLI needs: the database connection only. */
export class DatabaseEnvironment {
  @IsString()
  @IsNotEmpty()
  DB_HOST: string;

  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(65535)
  DB_PORT: number;

  @IsString()
  @IsNotEmpty()
  DB_USER: string;

  @IsString()
  DB_PASSWORD: string;

  @IsString()
  @IsNotEmpty()
  DB_NAME: string;

  /**
   * Read replicas of the MariaDB primary, `host[:port]` separated by commas (same user, password and database).
   * Plain reads outside a transaction go to a replica; writes, transactions and raw queries to the primary (DB_HOST).
   */
  @IsOptional()
  @Matches(REPLICA_HOSTS, { message: 'DB_REPLICA_HOSTS must be host[:port] entries separated by commas, e.g. db-r1:3306,db-r2' })
  DB_REPLICA_HOSTS?: string;
}

export class EnvironmentVariables extends DatabaseEnvironment {
  @IsIn(NODE_ENVS)
  NODE_ENV: NodeEnv = 'development';

  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(65535)
  PORT: number = 3000;

  /** Base of links in e-mails (password reset, invitations). */
  @IsUrl({ require_tld: false, require_protocol: true })
  APP_URL: string;

  @IsString()
  @MinLength(16, { message: 'JWT_SECRET must be at least 16 characters long' })
  JWT_SECRET: string;

  @IsString()
  @IsNotEmpty()
  SMTP_HOST: string;

  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(65535)
  SMTP_PORT: number;

  @IsString()
  @IsNotEmpty()
  MAIL_FROM: string;

  /** The local mail fake's HTTP endpoint; GET /api/dev/mail relays it when DEV_MAIL_ENABLED is true. */
  @IsOptional()
  @IsUrl({ require_tld: false, require_protocol: true })
  MAIL_FAKE_URL?: string;

  /**
   * Serves captured mail (which holds password-reset links) at GET /api/dev/mail, to signed-in owners only.
   * Off unless set to `true`; refused together with NODE_ENV=production.
   */
  @Transform(({ value }) => (value === undefined || value === '' ? false : value === 'true' ? true : value === 'false' ? false : value))
  @IsBoolean({ message: 'DEV_MAIL_ENABLED must be true or false' })
  DEV_MAIL_ENABLED: boolean = false;

  /** Attempts per client address and route on sign-in, sign-up and password reset, per window. */
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(100000)
  AUTH_RATE_LIMIT: number = 10;

  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(86400)
  AUTH_RATE_WINDOW_SECONDS: number = 60;

  /**
   * How many API processes serve the port (node:cluster): a number, or `auto` for one per CPU core. The API keeps
   * no state of its own between requests (sessions, rate-limit counters and jobs live in MariaDB), so workers are
   * interchangeable like separate instances behind a load balancer. Unset: 1 (a single process, no cluster).
   */
  @IsOptional()
  @Matches(/^(auto|[1-9]\d?)$/, { message: 'API_WORKERS must be auto or a whole number from 1 to 99' })
  API_WORKERS?: string;

  /** The payment provider's API base (the local fake in development and test: http://127.0.0.1:<port>). */
  @IsOptional()
  @IsUrl({ require_tld: false, require_protocol: true })
  PAYMENT_API_URL?: string;

  @IsOptional()
  @IsString()
  @MinLength(8)
  PAYMENT_SECRET_KEY?: string;

  /** Signs the provider's webhooks; the app refuses an event whose signature does not verify with it. */
  @IsOptional()
  @IsString()
  @MinLength(8)
  PAYMENT_WEBHOOK_SECRET?: string;

  /** The built web app; served for every non-/api path when set. */
  @IsOptional()
  @IsString()
  WEB_DIST_DIR?: string;

  @IsOptional()
  @IsString()
  UPLOAD_DIR?: string;

  /** Where photos go: `local` (UPLOAD_DIR, the default) or `s3` (an S3-compatible object store, below). */
  @IsIn(STORAGE_DRIVERS, { message: `STORAGE_DRIVER must be one of: ${STORAGE_DRIVERS.join(', ')}` })
  STORAGE_DRIVER: StorageDriver = 'local';

  @ValidateIf((env: EnvironmentVariables) => env.STORAGE_DRIVER === 's3')
  @IsString()
  @IsNotEmpty({ message: 'S3_BUCKET must be set when STORAGE_DRIVER is s3' })
  S3_BUCKET?: string;

  @IsOptional()
  @IsString()
  S3_REGION?: string;

  /** An S3-compatible endpoint (MinIO, Ceph, the local fake); leave empty for AWS S3 itself. */
  @IsOptional()
  @IsUrl({ require_tld: false, require_protocol: true })
  S3_ENDPOINT?: string;

  @IsOptional()
  @IsString()
  S3_ACCESS_KEY_ID?: string;

  @IsOptional()
  @IsString()
  S3_SECRET_ACCESS_KEY?: string;

  /**
   * Runs the background-work loop (mail, quote PDFs by mail, payment events) in this process. On by default in every
   * instance (claims use FOR UPDATE SKIP LOCKED, so instances never take the same job); `false` for a process that only
   * answers requests, or a test that drives the queue itself.
   */
  @Transform(({ value }) => (value === undefined || value === '' ? true : value === 'true' ? true : value === 'false' ? false : value))
  @IsBoolean({ message: 'JOBS_WORKER_ENABLED must be true or false' })
  JOBS_WORKER_ENABLED: boolean = true;

  /** How often an idle worker looks for due jobs (a job enqueued in this process wakes it at once). */
  @Type(() => Number)
  @IsInt()
  @Min(20)
  @Max(60000)
  JOBS_POLL_MS: number = 250;

  /** How long a claimed job stays with its worker before another instance may take it over (the worker died). */
  @Type(() => Number)
  @IsInt()
  @Min(500)
  @Max(3600000)
  JOBS_LEASE_MS: number = 30000;

  /** Jobs one instance runs at the same time. */
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(16)
  JOBS_CONCURRENCY: number = 2;

  /** Attempts before a job is marked dead (with its last error); the wait between them doubles from JOBS_RETRY_BASE_MS. */
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(50)
  JOBS_MAX_ATTEMPTS: number = 8;

  @Type(() => Number)
  @IsInt()
  @Min(10)
  @Max(3600000)
  JOBS_RETRY_BASE_MS: number = 2000;

  /** Done jobs are deleted this many days after they finished (their effects stay; a payment event's id is kept apart). */
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(3650)
  JOBS_KEEP_DONE_DAYS: number = 14;

  /**
   * Fault injection for the restart tests: the process kills itself (SIGKILL) after a job of this kind did its work
   * and before its transaction commits. Refused together with NODE_ENV=production.
   */
  @IsOptional()
  @IsIn(JOB_KINDS, { message: `JOBS_CRASH_BEFORE_COMMIT must be one of: ${JOB_KINDS.join(', ')}` })
  JOBS_CRASH_BEFORE_COMMIT?: JobKind;
}

export class ConfigValidationError extends Error {
  constructor(public readonly problems: string[]) {
    super(
      `Swapwright cannot start: the configuration is not valid.\n` +
        problems.map((problem) => `  - ${problem}`).join('\n') +
        `\nSet these environment variables (see .local/<profile>/env.sh written by scripts/stack.sh) and start again.`,
    );
    this.name = 'ConfigValidationError';
  }
}

function flatten(errors: ValidationError[]): string[] {
  // One message per variable is enough to act on.
  return errors.map((error) => Object.values(error.constraints ?? {}).at(-1) ?? `${error.property} is not valid`);
}

function validateAs<T extends object>(cls: new () => T, raw: Record<string, unknown>): T {
  const instance = plainToInstance(cls, raw, { enableImplicitConversion: false });
  const errors = validateSync(instance, { whitelist: false, skipMissingProperties: false });
  if (errors.length > 0) throw new ConfigValidationError(flatten(errors));
  return instance;
}

export function validateEnv(raw: Record<string, unknown>): EnvironmentVariables {
  const env = validateAs(EnvironmentVariables, raw);
  if (env.NODE_ENV === 'production' && env.DEV_MAIL_ENABLED) {
    throw new ConfigValidationError(['DEV_MAIL_ENABLED must not be true when NODE_ENV is production (captured mail holds password-reset links)']);
  }
  if (env.NODE_ENV === 'production' && env.JOBS_CRASH_BEFORE_COMMIT) {
    throw new ConfigValidationError(['JOBS_CRASH_BEFORE_COMMIT is for tests only and must not be set when NODE_ENV is production']);
  }
  return env;
}

export function validateDatabaseEnv(raw: Record<string, unknown>): DatabaseEnvironment {
  return validateAs(DatabaseEnvironment, raw);
}
