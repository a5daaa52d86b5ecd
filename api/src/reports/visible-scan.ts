import { NotFoundException } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import { canSeeCase } from '../cases/case-access';
import { Case } from '../cases/case.entity';
import { Scan } from '../scans/scan.entity';

/** The scan when it exists, is not deleted and lies in a case the user may see; 404 otherwise (nothing revealed). */
export async function visibleScan(manager: EntityManager, scanId: string, user: AuthenticatedUser): Promise<Scan> {
  const scan = await manager.findOneBy(Scan, { id: scanId });
  const owner = scan && !scan.deletedAt ? await manager.findOneBy(Case, { id: scan.caseId }) : null;
  if (!scan || !owner || owner.deletedAt || !canSeeCase(user, owner)) throw new NotFoundException(`No scan with the id ${scanId} is visible to you`);
  return scan;
}
