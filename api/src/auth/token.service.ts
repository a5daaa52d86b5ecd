import { createHash, randomBytes } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { isRole, type Role } from '@siteband/shared';
import type { AppConfig } from '../config/app-config';
import { InjectConfig } from '../config/config.module';

/** What an access token says: whose it is and which role they had when it was issued. */
export interface AccessTokenClaims {
  sub: string;
  role: Role;
}

/** A new refresh token: the value for the client, and the hash that alone is stored. */
export interface NewRefreshToken {
  token: string;
  hash: string;
}

/** Signs and checks access tokens (HS256 JWT) and makes opaque refresh tokens. */
@Injectable()
export class TokenService {
  constructor(
    private readonly jwt: JwtService,
    @InjectConfig() private readonly config: AppConfig,
  ) {}

  /** Seconds an access token lives. */
  get accessTokenTtlSeconds(): number {
    return this.config.jwt.accessTtlSeconds;
  }

  /** Seconds a refresh token lives. */
  get refreshTokenTtlSeconds(): number {
    return this.config.jwt.refreshTtlSeconds;
  }

  /** A signed access token for the user. */
  signAccessToken(user: { id: string; role: Role }): Promise<string> {
    return this.jwt.signAsync({ role: user.role, typ: 'access' }, { subject: user.id });
  }

  /** The claims of a valid, unexpired access token; throws for anything else. */
  async verifyAccessToken(token: string): Promise<AccessTokenClaims> {
    const payload = await this.jwt.verifyAsync<{ sub?: unknown; role?: unknown; typ?: unknown }>(token);
    if (payload.typ !== 'access' || typeof payload.sub !== 'string' || !isRole(payload.role)) {
      throw new Error('not a Siteband access token');
    }
    return { sub: payload.sub, role: payload.role };
  }

  /** A random 256-bit refresh token (base64url) and its SHA-256. */
  createRefreshToken(): NewRefreshToken {
    const token = randomBytes(32).toString('base64url');
    return { token, hash: hashRefreshToken(token) };
  }
}

/** Hex SHA-256 of a refresh token: what the database keeps instead of the token. */
export function hashRefreshToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
