import { Logger, NotFoundException } from '@nestjs/common';
import { QueryFailedError } from 'typeorm';
import { toApiErrorBody } from './api-exception.filter';

describe('toApiErrorBody', () => {
  const logger = new Logger('test');
  beforeEach(() => {
    jest.spyOn(logger, 'error').mockImplementation(() => undefined);
  });

  it('hides an unexpected error behind a generic 500 sentence and logs it', () => {
    const body = toApiErrorBody(new Error('secret detail: connection string'), logger);
    expect(body.statusCode).toBe(500);
    expect(body.message).not.toContain('secret');
    expect(body.message).toMatch(/^Something went wrong on our side\./);
    expect(logger.error).toHaveBeenCalledWith(expect.stringContaining('secret detail'));
  });

  it('turns a unique violation into 409', () => {
    const error = new QueryFailedError('INSERT', [], Object.assign(new Error('duplicate key'), { code: '23505' }));
    expect(toApiErrorBody(error, logger)).toMatchObject({ statusCode: 409, error: 'Conflict' });
  });

  it("keeps an HttpException's status and makes its message a sentence", () => {
    expect(toApiErrorBody(new NotFoundException('no such thing'), logger)).toEqual({
      statusCode: 404,
      error: 'Not Found',
      message: 'No such thing.',
    });
  });
});
