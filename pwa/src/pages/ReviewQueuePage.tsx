import { useTranslation } from 'react-i18next';
import { PageShell } from '../components/PageShell';
import { PlaceholderNotice } from '../components/PlaceholderNotice';

/** The supervisor's queue of submitted cases; built with the review issue. */
export default function ReviewQueuePage() {
  const { t } = useTranslation();
  return (
    <PageShell title={t('pages.review.title')}>
      <PlaceholderNotice>{t('pages.review.body')}</PlaceholderNotice>
    </PageShell>
  );
}
