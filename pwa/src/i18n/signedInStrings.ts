import i18next from 'i18next';
import identify from './en/identify.json';
import library from './en/library.json';
import capture from './en/capture.json';
import caseArchive from './en/caseArchive.json';
import events from './en/events.json';
import escalations from './en/escalations.json';
import caseOutcome from './en/case-outcome.json';
import audit from './en/audit.json';
import review from './en/review.json';
import share from './en/share.json';
import editing from './en/editing.json';
import captions from './en/captions.json';
import scanEdit from './en/scanEdit.json';

/**
 * Adds the strings of the signed-in screens to the translation resources. The signed-in area
 * (pages/TabsLayout) calls this as it loads, so these files come with its chunk and stay out of the
 * first paint; the sign-in and lock screens' strings are in initI18n.
 */
export function addSignedInStrings(): void {
  i18next.addResourceBundle('en', 'translation', { identify, library, capture, events, escalations, caseOutcome, audit, review, caseArchive, share, editing, captions, scanEdit }, true, false);
}
