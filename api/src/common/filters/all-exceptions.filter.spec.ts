import { BadRequestException, Logger } from '@nestjs/common';
import { QueryFailedError } from 'typeorm';
import { AppError } from '../errors/app-error';
import { AllExceptionsFilter } from './all-exceptions.filter';

const errorStub = {
  unknown: new TypeError("Cannot read properties of undefined (reading 'secretColumn')"),
  duplicate: new QueryFailedError('INSERT INTO users ...', [], Object.assign(new Error("Duplicate entry 'a' for key 'uq_users_email'"), { code: 'ER_DUP_ENTRY', errno: 1062 })),
  badForeignKey: new QueryFailedError('INSERT INTO projects ...', [], Object.assign(new Error('fk_projects_customer fails'), { code: 'ER_NO_REFERENCED_ROW_2', errno: 1452 })),
  module: new AppError(404, 'customer_not_found', 'That customer does not exist in your shop.'),
  builtIn: new BadRequestException(['name must be a string', 'email must be an e-mail address']),
};

describe('AllExceptionsFilter', () => {
  const filter = new AllExceptionsFilter();

  beforeAll(() => jest.spyOn(Logger.prototype, 'error').mockImplementation(() => undefined));

  it('turns an unknown error into a generic 500 that leaks nothing', () => {
    const body = filter.toBody(errorStub.unknown, 'cid-1');
    expect(body).toMatchObject({ statusCode: 500, error: 'Internal Server Error', code: 'internal_error', correlationId: 'cid-1' });
    expect(body.message).toMatch(/^Something went wrong on our side/);
    expect(JSON.stringify(body)).not.toMatch(/secretColumn/);
  });

  it('answers 503 with what to do when the database cannot be reached, whichever way the driver says it', () => {
    const refused = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:3317'), { code: 'ECONNREFUSED', errno: -111 });
    const lost = new QueryFailedError('SELECT 1', [], Object.assign(new Error('Connection lost: The server closed the connection.'), { code: 'PROTOCOL_CONNECTION_LOST', fatal: true }));
    const shutdown = new QueryFailedError('SELECT 1', [], Object.assign(new Error('Server shutdown in progress'), { code: 'ER_SERVER_SHUTDOWN', errno: 1053 }));
    for (const error of [refused, lost, shutdown]) {
      const body = filter.toBody(error, 'cid-db');
      expect(body).toMatchObject({ statusCode: 503, code: 'database_unavailable' });
      expect(body.message).toMatch(/Try again in a moment/);
    }
  });

  it('answers a deadlock or lock wait timeout 503 "try again": the server rolled the whole transaction back', () => {
    // Source: MariaDB Server error codes 1213 (ER_LOCK_DEADLOCK) and 1205 (ER_LOCK_WAIT_TIMEOUT), which roll back the transaction or statement.
    const deadlock = new QueryFailedError('INSERT INTO measurement_sheets ...', [], Object.assign(new Error('Deadlock found when trying to get lock; try restarting transaction'), { code: 'ER_LOCK_DEADLOCK', errno: 1213 }));
    const waited = new QueryFailedError('UPDATE stock_levels ...', [], Object.assign(new Error('Lock wait timeout exceeded; try restarting transaction'), { code: 'ER_LOCK_WAIT_TIMEOUT', errno: 1205 }));
    for (const error of [deadlock, waited]) {
      const body = filter.toBody(error, 'cid-lock');
      expect(body).toMatchObject({ statusCode: 503, code: 'database_busy' });
      expect(body.message).toMatch(/nothing of this one was saved\. Try again/);
      expect(JSON.stringify(body)).not.toMatch(/measurement_sheets|stock_levels/);
    }
  });

  it('maps a duplicate key to 409 without naming the index', () => {
    const body = filter.toBody(errorStub.duplicate, 'cid-2');
    expect(body).toMatchObject({ statusCode: 409, code: 'duplicate' });
    expect(JSON.stringify(body)).not.toMatch(/uq_users_email/);
  });

  it('maps a missing foreign row to 400 bad_reference', () => {
    expect(filter.toBody(errorStub.badForeignKey, 'cid-3')).toMatchObject({ statusCode: 400, code: 'bad_reference' });
  });

  it("keeps a module's own code and message", () => {
    expect(filter.toBody(errorStub.module, 'cid-4')).toEqual({
      statusCode: 404,
      error: 'Not Found',
      code: 'customer_not_found',
      message: 'That customer does not exist in your shop.',
      details: ['That customer does not exist in your shop.'],
      correlationId: 'cid-4',
    });
  });

  it('lists every message of a built-in exception in details', () => {
    expect(filter.toBody(errorStub.builtIn, 'cid-5')).toMatchObject({
      statusCode: 400,
      message: 'name must be a string',
      details: ['name must be a string', 'email must be an e-mail address'],
    });
  });
});
