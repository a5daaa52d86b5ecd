import { useTranslation } from 'react-i18next';
import { CautionNote } from '../components/CautionNote';
import { PageShell } from '../components/PageShell';
import { PlaceholderNotice } from '../components/PlaceholderNotice';

/** Where the inspector will check the instrument and record scans; built with the capture issue. */
export default function CapturePage() {
  const { t } = useTranslation();
  return (
    <PageShell title={t('pages.capture.title')}>
      <PlaceholderNotice>{t('pages.capture.body')}</PlaceholderNotice>
      <CautionNote laser />
    </PageShell>
  );
}
