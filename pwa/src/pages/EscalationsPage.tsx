import { useTranslation } from 'react-i18next';
import { CautionNote } from '../components/CautionNote';
import { PageShell } from '../components/PageShell';
import { PlaceholderNotice } from '../components/PlaceholderNotice';

/** The safety officer's escalations; built with the escalations issue. */
export default function EscalationsPage() {
  const { t } = useTranslation();
  return (
    <PageShell title={t('pages.escalations.title')}>
      <PlaceholderNotice>{t('pages.escalations.body')}</PlaceholderNotice>
      <CautionNote />
    </PageShell>
  );
}
