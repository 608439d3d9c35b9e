import { ConfigValidationError, validateEnv } from './env.validation';

const envStub = {
  complete: {
    NODE_ENV: 'test',
    PORT: '3100',
    APP_URL: 'http://127.0.0.1:3100',
    DB_HOST: '127.0.0.1',
    DB_PORT: '3317',
    DB_USER: 'swapwright',
    DB_PASSWORD: 'secret',
    DB_NAME: 'swapwright_test',
    JWT_SECRET: 'a-long-enough-secret-value',
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: '2535',
    MAIL_FROM: 'Swapwright <no-reply@swapwright.test>',
  },
};

describe('validateEnv', () => {
  it('converts ports to numbers', () => {
    const env = validateEnv(envStub.complete);
    expect(env.DB_PORT).toBe(3317);
    expect(env.PORT).toBe(3100);
  });

  it('names every bad variable once, in a readable list', () => {
    const { JWT_SECRET: _secret, ...withoutSecret } = envStub.complete;
    const attempt = () => validateEnv({ ...withoutSecret, DB_PORT: 'abc', NODE_ENV: 'staging' });
    expect(attempt).toThrow(ConfigValidationError);
    try {
      attempt();
    } catch (error) {
      const { problems } = error as ConfigValidationError;
      expect(problems).toHaveLength(3);
      expect(problems.join('\n')).toMatch(/JWT_SECRET/);
      expect(problems.join('\n')).toMatch(/DB_PORT must be an integer number/);
      expect((error as Error).message).toMatch(/^Swapwright cannot start/);
    }
  });

  it('leaves captured mail off unless DEV_MAIL_ENABLED is exactly true', () => {
    expect(validateEnv(envStub.complete).DEV_MAIL_ENABLED).toBe(false);
    expect(validateEnv({ ...envStub.complete, DEV_MAIL_ENABLED: 'false' }).DEV_MAIL_ENABLED).toBe(false);
    expect(validateEnv({ ...envStub.complete, DEV_MAIL_ENABLED: 'true' }).DEV_MAIL_ENABLED).toBe(true);
    expect(() => validateEnv({ ...envStub.complete, DEV_MAIL_ENABLED: 'yes' })).toThrow(/DEV_MAIL_ENABLED must be true or false/);
  });

  it('refuses captured mail in production', () => {
    expect(() => validateEnv({ ...envStub.complete, NODE_ENV: 'production', DEV_MAIL_ENABLED: 'true' })).toThrow(
      /DEV_MAIL_ENABLED must not be true when NODE_ENV is production/,
    );
  });

  it('takes API_WORKERS as auto or a whole number from 1 to 99 and refuses anything else, naming it', () => {
    expect(validateEnv({ ...envStub.complete, API_WORKERS: 'auto' }).API_WORKERS).toBe('auto');
    expect(validateEnv({ ...envStub.complete, API_WORKERS: '2' }).API_WORKERS).toBe('2');
    expect(validateEnv(envStub.complete).API_WORKERS).toBeUndefined();
    for (const bad of ['0', '-1', 'two', '1.5', '100']) {
      expect(() => validateEnv({ ...envStub.complete, API_WORKERS: bad })).toThrow(/API_WORKERS must be auto or a whole number from 1 to 99/);
    }
  });

  it('runs the background worker unless JOBS_WORKER_ENABLED is false, and keeps the crash switch out of production', () => {
    const env = validateEnv(envStub.complete);
    expect(env).toMatchObject({ JOBS_WORKER_ENABLED: true, JOBS_POLL_MS: 250, JOBS_LEASE_MS: 30000, JOBS_MAX_ATTEMPTS: 8 });
    expect(validateEnv({ ...envStub.complete, JOBS_WORKER_ENABLED: 'false' }).JOBS_WORKER_ENABLED).toBe(false);
    expect(() => validateEnv({ ...envStub.complete, JOBS_WORKER_ENABLED: 'off' })).toThrow(/JOBS_WORKER_ENABLED must be true or false/);
    expect(() => validateEnv({ ...envStub.complete, JOBS_POLL_MS: '5' })).toThrow(/JOBS_POLL_MS must not be less than 20/);
    expect(validateEnv({ ...envStub.complete, JOBS_CRASH_BEFORE_COMMIT: 'payment.event' }).JOBS_CRASH_BEFORE_COMMIT).toBe('payment.event');
    expect(() => validateEnv({ ...envStub.complete, JOBS_CRASH_BEFORE_COMMIT: 'everything' })).toThrow(/JOBS_CRASH_BEFORE_COMMIT must be one of/);
    expect(() => validateEnv({ ...envStub.complete, NODE_ENV: 'production', JOBS_CRASH_BEFORE_COMMIT: 'mail' })).toThrow(/for tests only/);
  });
});
