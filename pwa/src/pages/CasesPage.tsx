import { useTranslation } from 'react-i18next';
import { CautionNote } from '../components/CautionNote';
import { PageShell } from '../components/PageShell';
import { PlaceholderNotice } from '../components/PlaceholderNotice';

/** The inspector's cases; the list itself comes with the cases issue. */
export default function CasesPage() {
  const { t } = useTranslation();
  return (
    <PageShell title={t('pages.cases.title')}>
      <PlaceholderNotice>{t('pages.cases.body')}</PlaceholderNotice>
      <CautionNote />
    </PageShell>
  );
}
