import { Attachment } from '../attachments/attachment.entity';
import { Case } from '../cases/case.entity';
import { SiteNote } from '../notes/site-note.entity';
import { Handover } from '../samples/handover.entity';
import { ReviewDecision } from '../review/review-decision.entity';
import { Sample } from '../samples/sample.entity';
import { EscalationNote } from '../escalations/escalation-note.entity';
import { Escalation } from '../scans/escalation.entity';
import { InstrumentCheck } from '../scans/instrument-check.entity';
import { Scan } from '../scans/scan.entity';
import { SyncChange } from './sync-change.entity';
import { SyncCounter } from './sync-counter.entity';

/** The entities of field capture, review, escalations and sync, for the one entity list of the data source. */
export const SYNC_ENTITY_CLASSES = [Case, Sample, Handover, InstrumentCheck, Scan, SiteNote, Escalation, Attachment, ReviewDecision, EscalationNote, SyncCounter, SyncChange];
