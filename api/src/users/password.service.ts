import { Injectable } from '@nestjs/common';
import bcrypt from 'bcryptjs';

/** bcrypt work factor: about 0.3 s per hash on the project's 2-core machines. */
export const BCRYPT_COST = 12;

/** Hashes and checks passwords; also burns the same time for unknown emails, so timing tells nothing. */
@Injectable()
export class PasswordService {
  private dummyHash?: Promise<string>;

  /** A bcrypt hash of the password at the configured cost. */
  hash(password: string): Promise<string> {
    return bcrypt.hash(password, BCRYPT_COST);
  }

  /** True when the password matches the hash. */
  verify(password: string, hash: string): Promise<boolean> {
    return bcrypt.compare(password, hash);
  }

  /**
   * Compares against a hash of a random value and always resolves false: used when no user has the
   * email, so a wrong email takes as long as a wrong password.
   */
  async verifyDummy(password: string): Promise<false> {
    this.dummyHash ??= bcrypt.hash(`dummy-${Math.random()}`, BCRYPT_COST);
    await bcrypt.compare(password, await this.dummyHash);
    return false;
  }
}
