import type { Response } from 'express';
import type { DataSource } from 'typeorm';
import { HealthController } from './health.controller';

interface FakeResponse {
  statusCode: number;
  status: jest.Mock;
}

function fakeResponse(): FakeResponse {
  const response: FakeResponse = { statusCode: 200, status: jest.fn() };
  response.status.mockImplementation((code: number) => {
    response.statusCode = code;
    return response;
  });
  return response;
}

describe('HealthController', () => {
  it('reports ok when the database answers', async () => {
    const dataSource = { isInitialized: true, query: jest.fn().mockResolvedValue([{ 1: 1 }]) } as unknown as DataSource;
    const response = fakeResponse();
    const body = await new HealthController(dataSource).check(response as unknown as Response);
    expect(body).toEqual({ status: 'ok', database: 'up', version: expect.stringMatching(/^\d+\.\d+\.\d+/) });
    expect(response.status).not.toHaveBeenCalled();
  });

  it('reports degraded with 503 when the database fails', async () => {
    const dataSource = { isInitialized: true, query: jest.fn().mockRejectedValue(new Error('gone')) } as unknown as DataSource;
    const response = fakeResponse();
    const body = await new HealthController(dataSource).check(response as unknown as Response);
    expect(body).toMatchObject({ status: 'degraded', database: 'down' });
    expect(response.statusCode).toBe(503);
  });

  it('reports degraded when the connection was never made', async () => {
    const dataSource = { isInitialized: false, query: jest.fn() } as unknown as DataSource;
    const body = await new HealthController(dataSource).check(fakeResponse() as unknown as Response);
    expect(body.database).toBe('down');
  });
});
