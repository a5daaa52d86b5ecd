import { randomUUID } from 'node:crypto';
import { Injectable, UnauthorizedException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { DataSource, IsNull, type Repository } from 'typeorm';
import type { User } from '../users/user.entity';
import { RefreshToken } from './refresh-token.entity';
import { hashRefreshToken, TokenService } from './token.service';

/** The message of every refused refresh: it does not say which check failed. */
export const INVALID_REFRESH_TOKEN = 'The refresh token is invalid, expired or revoked: sign in again';

/**
 * Refresh-token rotation. A sign-in starts a family; each refresh revokes the token it was given and
 * issues the next one of the family. A revoked token presented again means it was copied: the whole
 * family is revoked, so both the thief and the owner must sign in again.
 */
@Injectable()
export class RefreshTokensService {
  constructor(
    @InjectRepository(RefreshToken) private readonly refreshTokens: Repository<RefreshToken>,
    private readonly dataSource: DataSource,
    private readonly tokens: TokenService,
  ) {}

  /** Stores a new token for the user (a new family unless one is given) and returns its value. */
  async issue(userId: string, familyId: string = randomUUID()): Promise<string> {
    const { token, hash } = this.tokens.createRefreshToken();
    await this.refreshTokens.insert(this.newRow(userId, familyId, hash));
    return token;
  }

  /** Exchanges a valid refresh token for the next one of its family; 401 otherwise. */
  async rotate(token: string): Promise<{ user: User; refreshToken: string }> {
    const current = await this.refreshTokens.findOne({
      where: { tokenHash: hashRefreshToken(token) },
      relations: { user: true },
    });
    if (!current?.user) throw new UnauthorizedException(INVALID_REFRESH_TOKEN);
    if (current.revokedAt) {
      await this.revokeFamily(current.familyId);
      throw new UnauthorizedException(INVALID_REFRESH_TOKEN);
    }
    if (current.expiresAt.getTime() <= Date.now()) throw new UnauthorizedException(INVALID_REFRESH_TOKEN);
    if (!current.user.active) {
      await this.revokeFamily(current.familyId);
      throw new UnauthorizedException(INVALID_REFRESH_TOKEN);
    }

    const next = this.tokens.createRefreshToken();
    const nextRow = this.newRow(current.userId, current.familyId, next.hash);
    const rotated = await this.dataSource.transaction(async (manager) => {
      // Conditional update: of two requests racing with the same token, exactly one wins.
      const result = await manager
        .createQueryBuilder()
        .update(RefreshToken)
        .set({ revokedAt: new Date(), replacedBy: nextRow.id })
        .where('id = :id AND revokedAt IS NULL', { id: current.id })
        .execute();
      if (result.affected !== 1) return false;
      await manager.insert(RefreshToken, nextRow);
      return true;
    });
    if (!rotated) {
      await this.revokeFamily(current.familyId);
      throw new UnauthorizedException(INVALID_REFRESH_TOKEN);
    }
    return { user: current.user, refreshToken: next.token };
  }

  /** Sign-out: revokes the family of the token when it belongs to the user; unknown tokens are ignored. */
  async revokeSession(token: string, userId: string): Promise<void> {
    const row = await this.refreshTokens.findOneBy({ tokenHash: hashRefreshToken(token) });
    if (row && row.userId === userId) await this.revokeFamily(row.familyId);
  }

  /** Revokes every still-valid token of a family. */
  async revokeFamily(familyId: string): Promise<void> {
    await this.refreshTokens.update({ familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  private newRow(userId: string, familyId: string, tokenHash: string): RefreshToken {
    return this.refreshTokens.create({
      id: randomUUID(),
      userId,
      familyId,
      tokenHash,
      expiresAt: new Date(Date.now() + this.tokens.refreshTokenTtlSeconds * 1000),
      revokedAt: null,
      replacedBy: null,
    });
  }
}
