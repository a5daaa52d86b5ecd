import { BCRYPT_COST, PasswordService } from './password.service';

describe('PasswordService', () => {
  const passwords = new PasswordService();
  let hash: string;

  beforeAll(async () => {
    hash = await passwords.hash('correct horse battery');
  });

  it('hashes with bcrypt at cost 12, never keeping the password', () => {
    expect(BCRYPT_COST).toBe(12);
    expect(hash).toMatch(/^\$2[aby]\$12\$[./A-Za-z0-9]{53}$/);
    expect(hash).not.toContain('correct horse');
  });

  it('salts: the same password hashes differently each time', async () => {
    expect(await passwords.hash('correct horse battery')).not.toBe(hash);
  });

  it('accepts the right password and refuses a wrong one', async () => {
    await expect(passwords.verify('correct horse battery', hash)).resolves.toBe(true);
    await expect(passwords.verify('correct horse batteri', hash)).resolves.toBe(false);
  });

  it('spends a full bcrypt comparison for an unknown user and always says no', async () => {
    const started = process.hrtime.bigint();
    await expect(passwords.verifyDummy('anything at all')).resolves.toBe(false);
    const ms = Number(process.hrtime.bigint() - started) / 1e6;
    // Cost 12 takes hundreds of milliseconds here; a short-circuit would take well under one.
    expect(ms).toBeGreaterThan(20);
  });
});
