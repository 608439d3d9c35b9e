import 'reflect-metadata';
import { plainToInstance, Type } from 'class-transformer';
import {
  IsIn,
  IsInt,
  IsNotEmpty,
  IsOptional,
  IsString,
  IsUrl,
  Max,
  Min,
  MinLength,
  validateSync,
  ValidationError,
} from 'class-validator';

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

  /** Read by GET /api/dev/mail in development and test. */
  @IsOptional()
  @IsUrl({ require_tld: false, require_protocol: true })
  MAIL_FAKE_URL?: string;

  /** The built web app; served for every non-/api path when set. */
  @IsOptional()
  @IsString()
  WEB_DIST_DIR?: string;

  @IsOptional()
  @IsString()
  UPLOAD_DIR?: string;
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
  return validateAs(EnvironmentVariables, raw);
}

export function validateDatabaseEnv(raw: Record<string, unknown>): DatabaseEnvironment {
  return validateAs(DatabaseEnvironment, raw);
}
