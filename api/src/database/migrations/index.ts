import { CreateUsersAndRefreshTokens1796152400000 } from './1796152400000-CreateUsersAndRefreshTokens';
import { CreateFieldCaptureAndSync1796238800000 } from './1796238800000-CreateFieldCaptureAndSync';
import { CreateLibraryEdits1796240000000 } from './1796240000000-CreateLibraryEdits';
import { AddScanRecomputation1796250000000 } from './1796250000000-AddScanRecomputation';
import { CreateReviewDecisions1796260000000 } from './1796260000000-CreateReviewDecisions';
import { AddEscalationWorkflowAndMail1796270000000 } from './1796270000000-AddEscalationWorkflowAndMail';
import { AddUserInvitations1796270000001 } from './1796270000001-AddUserInvitations';
import { CreateAuditLog1796280000000 } from './1796280000000-CreateAuditLog';
import { AddPhotoCaptions1796290000100 } from './1796290000100-AddPhotoCaptions';

/** Every committed migration, oldest first (listed, not globbed, so sources and dist behave the same). */
export const MIGRATIONS = [
  CreateUsersAndRefreshTokens1796152400000,
  CreateFieldCaptureAndSync1796238800000,
  CreateLibraryEdits1796240000000,
  AddScanRecomputation1796250000000,
  CreateReviewDecisions1796260000000,
  AddEscalationWorkflowAndMail1796270000000,
  AddUserInvitations1796270000001,
  CreateAuditLog1796280000000,
  AddPhotoCaptions1796290000100,
];
