import { DataSource } from 'typeorm';
import { HealthService } from './health.service';

const dataSourceStub = {
  up: () => ({ query: jest.fn().mockResolvedValue([{ ok: 1 }]) }) as unknown as DataSource,
  down: () => ({ query: jest.fn().mockRejectedValue(new Error('connect ECONNREFUSED 127.0.0.1:3317')) }) as unknown as DataSource,
};

describe('HealthService', () => {
  it('reports the database up', async () => {
    await expect(new HealthService(dataSourceStub.up()).check()).resolves.toEqual({ status: 'ok', database: 'up' });
  });

  it('answers 503 database_down without the driver message', async () => {
    const error = await new HealthService(dataSourceStub.down()).check().catch((e: unknown) => e);
    expect(error).toMatchObject({ code: 'database_down' });
    expect((error as { getStatus(): number }).getStatus()).toBe(503);
    expect((error as Error).message).not.toMatch(/ECONNREFUSED/);
  });
});
