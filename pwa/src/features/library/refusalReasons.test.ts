import { describe, expect, it } from 'vitest';
import { ApiError } from '../api/apiError';

/** The library's refusal as the API sends it: the joined message, and each reason under details[0].messages. */
function refusal(reasons: string[]): Response {
  const body = { statusCode: 400, error: 'Bad Request', message: `The compound was not saved: ${reasons.join('; ')}`, details: [{ field: 'compound', messages: reasons }], requestId: 'r-1' };
  return new Response(JSON.stringify(body), { status: 400, headers: { 'content-type': 'application/json' } });
}

describe('a refused library save', () => {
  it('carries every reason of details[0].messages, one per line', async () => {
    const reasons = ['demo.cas: "7782-50-5" is already the CAS RN of chlorine', 'demo: Γvib has 2 × A1; the fundamentals list 1'];
    const error = await ApiError.fromResponse(refusal(reasons));
    expect(error.status).toBe(400);
    expect(error.details).toEqual(reasons);
    expect(error.message).toBe(`The compound was not saved: ${reasons.join('; ')}`);
  });

  it('falls back to the message lines when the answer has no per-field reasons', async () => {
    const response = new Response(JSON.stringify({ statusCode: 409, message: 'Someone else saved first' }), { status: 409 });
    expect((await ApiError.fromResponse(response)).details).toEqual(['Someone else saved first']);
  });
});
