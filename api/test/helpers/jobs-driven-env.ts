/**
 * Imported first by suites that drive the queue themselves: the app's configuration is read when its module loads,
 * so these are set before that. The worker stays off; failures retry after 1 s, then 2 s; the third attempt is the last.
 */
Object.assign(process.env, { JOBS_WORKER_ENABLED: 'false', JOBS_MAX_ATTEMPTS: '3', JOBS_RETRY_BASE_MS: '1000', JOBS_LEASE_MS: '2000' });
