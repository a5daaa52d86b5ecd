import type { DataSource } from 'typeorm';
import { PasswordService } from '../users/password.service';
import { passwordPolicyProblem } from '@siteband/shared';
import { User } from '../users/user.entity';
import { DEMO_USERS } from './seed-data';

/** What a seed run did. */
export interface SeedReport {
  created: string[];
  updated: string[];
  unchanged: string[];
}

/**
 * Upserts the demo users by email: creates the missing ones, and brings existing ones back to the demo
 * name, role, active flag and password. Running it again changes nothing.
 */
export async function seedDemoData(dataSource: DataSource, demoPassword: string): Promise<SeedReport> {
  const problem = passwordPolicyProblem(demoPassword);
  if (problem) throw new Error(`SITEBAND_DEMO_PASSWORD is not acceptable: ${problem}`);
  const passwords = new PasswordService();
  const users = dataSource.getRepository(User);
  const report: SeedReport = { created: [], updated: [], unchanged: [] };

  for (const demo of DEMO_USERS) {
    const existing = await users.findOneBy({ email: demo.email });
    if (!existing) {
      await users.save(
        users.create({ ...demo, passwordHash: await passwords.hash(demoPassword), active: true }),
      );
      report.created.push(demo.email);
      continue;
    }
    const passwordMatches = existing.passwordHash !== null && (await passwords.verify(demoPassword, existing.passwordHash));
    const same =
      passwordMatches && existing.displayName === demo.displayName && existing.role === demo.role && existing.active;
    if (same) {
      report.unchanged.push(demo.email);
      continue;
    }
    existing.displayName = demo.displayName;
    existing.role = demo.role;
    existing.active = true;
    if (!passwordMatches) existing.passwordHash = await passwords.hash(demoPassword);
    await users.save(existing);
    report.updated.push(demo.email);
  }
  return report;
}
