import { AuditChainHead } from '../audit/audit-chain-head.entity';
import { AuditEntry } from '../audit/audit-entry.entity';
import { RefreshToken } from '../auth/refresh-token.entity';
import { LibraryEdit } from '../library/library-edit.entity';
import { MailOutbox } from '../mail/mail-outbox.entity';
import { SYNC_ENTITY_CLASSES } from '../sync/sync-entities';
import { UserInvitation } from '../users/user-invitation.entity';
import { User } from '../users/user.entity';

/** Every entity, listed once (no globs: the same list works from sources under Jest and from dist). */
export const ENTITIES = [User, RefreshToken, ...SYNC_ENTITY_CLASSES, LibraryEdit, AuditEntry, AuditChainHead, MailOutbox, UserInvitation];
