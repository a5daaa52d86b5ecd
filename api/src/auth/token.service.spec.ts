import { JwtService } from '@nestjs/jwt';
import type { AppConfig } from '../config/app-config';
import { hashRefreshToken, TokenService } from './token.service';

const SECRET = 'a-test-secret-that-is-long-enough-0123456789';

function makeService(secret = SECRET, accessTtlSeconds = 900): TokenService {
  const config = { jwt: { secret, secretSource: 'env', accessTtlSeconds, refreshTtlSeconds: 86400, issuer: 'siteband' } } as AppConfig;
  const jwt = new JwtService({
    secret,
    signOptions: { algorithm: 'HS256', issuer: 'siteband', expiresIn: accessTtlSeconds },
    verifyOptions: { algorithms: ['HS256'], issuer: 'siteband' },
  });
  return new TokenService(jwt, config);
}

describe('TokenService', () => {
  const tokens = makeService();
  const user = { id: '5b1a2e4c-1111-4222-8333-944455556666', role: 'supervisor' as const };

  describe('access tokens', () => {
    it('round-trips the user id and role', async () => {
      const token = await tokens.signAccessToken(user);
      await expect(tokens.verifyAccessToken(token)).resolves.toEqual({ sub: user.id, role: 'supervisor' });
    });

    it('expire after the configured TTL', async () => {
      const token = await tokens.signAccessToken(user);
      const payload = JSON.parse(Buffer.from(token.split('.')[1], 'base64url').toString());
      expect(payload.exp - payload.iat).toBe(900);
      expect(payload.iss).toBe('siteband');
      expect(tokens.accessTokenTtlSeconds).toBe(900);
    });

    it('refuses a token signed with another secret', async () => {
      const foreign = await makeService('another-secret-that-is-long-enough-987654321').signAccessToken(user);
      await expect(tokens.verifyAccessToken(foreign)).rejects.toThrow();
    });

    it('refuses an expired token', async () => {
      const jwt = new JwtService({ secret: SECRET });
      const expired = await jwt.signAsync(
        { role: 'admin', typ: 'access', exp: Math.floor(Date.now() / 1000) - 10 },
        { subject: user.id, issuer: 'siteband' },
      );
      await expect(tokens.verifyAccessToken(expired)).rejects.toThrow(/expired/);
    });

    it('refuses an unsigned ("alg": "none") token', async () => {
      const b64 = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');
      const unsigned = `${b64({ alg: 'none', typ: 'JWT' })}.${b64({ sub: user.id, role: 'admin', typ: 'access', iss: 'siteband' })}.`;
      await expect(tokens.verifyAccessToken(unsigned)).rejects.toThrow();
    });

    it('refuses a validly signed token that is not an access token or names no known role', async () => {
      const jwt = new JwtService({ secret: SECRET, signOptions: { issuer: 'siteband' } });
      await expect(tokens.verifyAccessToken(await jwt.signAsync({ role: 'admin' }, { subject: user.id }))).rejects.toThrow(
        /not a Siteband access token/,
      );
      await expect(
        tokens.verifyAccessToken(await jwt.signAsync({ role: 'superuser', typ: 'access' }, { subject: user.id })),
      ).rejects.toThrow(/not a Siteband access token/);
    });
  });

  describe('refresh tokens', () => {
    it('are 256 random bits in base64url, stored only as their SHA-256', () => {
      const { token, hash } = tokens.createRefreshToken();
      expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
      expect(Buffer.from(token, 'base64url')).toHaveLength(32);
      expect(hash).toMatch(/^[0-9a-f]{64}$/);
      expect(hash).toBe(hashRefreshToken(token));
      expect(hash).not.toContain(token);
    });

    it('never repeat', () => {
      const seen = new Set(Array.from({ length: 200 }, () => tokens.createRefreshToken().token));
      expect(seen.size).toBe(200);
    });

    it('hash to the published SHA-256 test vector', () => {
      // FIPS 180-2 example: SHA-256("abc").
      expect(hashRefreshToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    });
  });
});
