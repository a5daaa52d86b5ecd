import { describe, expect, it } from 'vitest';
import { createApiClient } from './client';
import { downloadFile, fileNameOf } from './download';

const user = { id: 'u-1', email: 'review@example.test', displayName: 'Reviewer', role: 'supervisor' as const };

/** A server whose first access token has expired: the report answers only the refreshed one. */
function server() {
  const calls: string[] = [];
  const fetchFn = async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const path = String(input);
    const authorization = new Headers(init.headers).get('Authorization');
    calls.push(`${path} ${authorization ?? '-'}`);
    if (path === '/api/auth/refresh') {
      return new Response(JSON.stringify({ accessToken: 'access-2', refreshToken: 'refresh-2', accessTokenExpiresIn: 900, user }), { status: 200 });
    }
    if (authorization !== 'Bearer access-2') return new Response(JSON.stringify({ statusCode: 401, message: 'Access token expired' }), { status: 401 });
    if (path === '/api/cases/c-1/report.pdf') {
      return new Response('%PDF-1.7 report', {
        status: 200,
        headers: { 'Content-Type': 'application/pdf', 'Content-Disposition': `attachment; filename="case.pdf"; filename*=UTF-8''case%20r%C3%A9sum%C3%A9.pdf` },
      });
    }
    return new Response(JSON.stringify({ statusCode: 404, error: 'Not Found', message: `Cannot GET ${path}` }), { status: 404 });
  };
  let tokens = { accessToken: 'access-1', refreshToken: 'refresh-1' };
  const client = createApiClient({
    fetchFn,
    tokens: { current: () => tokens, save: async (auth) => void (tokens = auth), clear: async () => undefined },
  });
  return { client, calls };
}

describe('downloading a file', () => {
  it('refreshes the token on a 401, and names the file from Content-Disposition', async () => {
    const { client, calls } = server();
    const file = await downloadFile(client, '/api/cases/c-1/report.pdf');
    expect(await file.blob.text()).toBe('%PDF-1.7 report');
    expect(file.fileName).toBe('case résumé.pdf');
    expect(calls).toEqual(['/api/cases/c-1/report.pdf Bearer access-1', '/api/auth/refresh -', '/api/cases/c-1/report.pdf Bearer access-2']);
  });

  it('reports a refused download with the API message', async () => {
    const { client } = server();
    const error = await downloadFile(client, '/api/cases/other/report.pdf').catch((e: unknown) => e);
    expect(error).toMatchObject({ kind: 'http', status: 404, message: 'Cannot GET /api/cases/other/report.pdf' });
  });

  it('turns a failed fetch into a network error', async () => {
    const client = createApiClient({
      fetchFn: async () => {
        throw new TypeError('Failed to fetch');
      },
      tokens: { current: () => ({ accessToken: 'a', refreshToken: 'r' }), save: async () => undefined, clear: async () => undefined },
    });
    await expect(downloadFile(client, '/api/review/queue.csv')).rejects.toMatchObject({ kind: 'network', status: 0 });
  });

  it('reads plain and extended file names', () => {
    expect(fileNameOf('attachment; filename="queue.csv"')).toBe('queue.csv');
    expect(fileNameOf('attachment; filename=scan.jdx')).toBe('scan.jdx');
    expect(fileNameOf("attachment; filename*=UTF-8''a%20b.pdf")).toBe('a b.pdf');
    expect(fileNameOf(null)).toBeNull();
  });
});
