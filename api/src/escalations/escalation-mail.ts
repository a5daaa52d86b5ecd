import { GENERAL_CAUTIONS } from '@siteband/shared';
import type { Escalation } from '../scans/escalation.entity';

/** Why a mail about an escalation goes out. */
export type EscalationMailKind = 'escalation.raised' | 'escalation.reminder' | 'escalation.second_contact';

/** What a mail about one escalation shows. */
export interface EscalationMailFacts {
  escalation: Pick<Escalation, 'id' | 'reason' | 'hazardClasses' | 'raisedAt'>;
  siteName: string;
  address: string | null;
  inspectorName: string;
  /** Likely compounds of the escalated scan, best first (names only). */
  compounds: string[];
  /** APP_PUBLIC_URL. */
  publicUrl: string;
  /** Reminder number (2 = the first reminder after the arrival mail). */
  round: number;
}

/** The link into the app's escalation page. */
export function escalationLink(publicUrl: string, escalationId: string): string {
  return `${publicUrl}/tabs/escalations/${escalationId}`;
}

/** Subject and plain text of a mail about an escalation. Never carries a raw file: only facts and a link. */
export function escalationMail(kind: EscalationMailKind, facts: EscalationMailFacts): { subject: string; text: string } {
  const { escalation } = facts;
  const lead = {
    'escalation.raised': 'An escalation was raised and needs a safety officer.',
    'escalation.reminder': `Reminder ${facts.round - 1}: this escalation is still not acknowledged.`,
    'escalation.second_contact': 'You are the second contact: no safety officer has acknowledged this escalation yet.',
  }[kind];
  const prefix = kind === 'escalation.raised' ? 'Escalation' : kind === 'escalation.reminder' ? 'Reminder: escalation' : 'Second contact: escalation';
  const subject = `${prefix} at ${facts.siteName}${facts.compounds.length ? ` (${facts.compounds[0]})` : ''}`;
  const lines = [
    lead,
    '',
    `Case: ${facts.siteName}${facts.address ? `, ${facts.address}` : ''}`,
    `Raised by: ${facts.inspectorName}, ${escalation.raisedAt.toISOString()}`,
    `Reason: ${escalation.reason}`,
    `Likely compounds: ${facts.compounds.length ? facts.compounds.join('; ') : 'none named (raised by hand or no reliable result)'}`,
    `Hazard classes: ${escalation.hazardClasses.length ? escalation.hazardClasses.join('; ') : 'none named'}`,
    '',
    `Acknowledge it in Siteband: ${escalationLink(facts.publicUrl, escalation.id)}`,
    '',
    ...GENERAL_CAUTIONS,
  ];
  return { subject, text: lines.join('\n') };
}

/** The names of the likely compounds in a scan's stored result, best first, at most `limit`. */
export function likelyCompoundNames(result: Record<string, unknown> | null | undefined, limit = 3): string[] {
  const candidates = result?.candidates;
  if (!Array.isArray(candidates)) return [];
  return candidates
    .map((candidate: unknown) => (candidate && typeof candidate === 'object' ? (candidate as { name?: unknown }).name : undefined))
    .filter((name): name is string => typeof name === 'string' && name.length > 0)
    .slice(0, limit);
}
