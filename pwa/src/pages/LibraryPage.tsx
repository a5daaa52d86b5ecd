import { useDeferredValue, useState } from 'react';
import { IonIcon, IonItem, IonLabel, IonList } from '@ionic/react';
import { addCircleOutline, shapesOutline } from 'ionicons/icons';
import { useLocation } from 'react-router-dom';
import { useTranslation } from 'react-i18next';
import { PageShell } from '../components/PageShell';
import { CompoundList } from '../components/library/CompoundList';
import { LibraryFilters } from '../components/library/LibraryFilters';
import { LibraryVersionNote } from '../components/library/LibraryVersionNote';
import '../components/library/library.css';
import '../components/structure/structure.css';
import { canCurateLibrary } from '../features/library/canCurate';
import { libraryPaths } from '../features/library/libraryPaths';
import { searchCompounds, type CompoundFilter } from '../features/library/searchCompounds';
import { useLibrary } from '../features/library/useLibrary';
import { useSession } from '../features/session/SessionProvider';
import { formatNumber } from '../features/structure/formatNumber';

/** The compound library: search and filter the reference compounds; the structure check (and, for supervisors, a new compound) sits beside it. */
export default function LibraryPage() {
  const { t, i18n } = useTranslation();
  const paths = libraryPaths(useLocation().pathname);
  const library = useLibrary();
  const { session } = useSession();
  const [filter, setFilter] = useState<CompoundFilter>({});
  // Typing stays responsive on a slow tablet while the list catches up.
  const deferred = useDeferredValue(filter);
  const all = library.data?.library.compounds ?? [];
  const shown = searchCompounds(all, deferred, i18n.language);
  return (
    <PageShell title={t('pages.library.title')}>
      <IonList className="sb-link-list" lines="none">
        <IonItem routerLink={paths.structure} detail button className="sb-link-item">
          <IonIcon icon={shapesOutline} slot="start" aria-hidden="true" />
          <IonLabel>
            <h2>{t('pages.library.structureLink')}</h2>
            <p>{t('pages.library.structureLinkHint')}</p>
          </IonLabel>
        </IonItem>
        {canCurateLibrary(session?.user.role) && (
          <IonItem routerLink={paths.add} detail button className="sb-link-item" data-testid="add-compound">
            <IonIcon icon={addCircleOutline} slot="start" aria-hidden="true" />
            <IonLabel>
              <h2>{t('library.list.add')}</h2>
              <p>{t('library.list.addHint')}</p>
            </IonLabel>
          </IonItem>
        )}
      </IonList>
      <section className="sb-panel" aria-labelledby="compounds-heading">
        <h2 id="compounds-heading" className="sb-panel__heading">
          {t('library.list.heading')}
        </h2>
        {library.data && <LibraryVersionNote view={library.data} />}
        {library.isError && (
          <p className="sb-error" role="alert">
            {t('library.list.loadError', { message: library.error.message })}
          </p>
        )}
        <LibraryFilters filter={filter} onChange={setFilter} />
        {library.isPending && <p className="sb-muted">{t('library.list.loading')}</p>}
        {library.data && (
          <p className="sb-muted" role="status" data-testid="compound-count">
            {t('library.list.count', { shown: formatNumber(shown.length, i18n.language), total: formatNumber(all.length, i18n.language) })}
          </p>
        )}
        {library.data && shown.length === 0 && <p>{t('library.list.none')}</p>}
        <CompoundList compounds={shown} hrefOf={paths.compound} />
      </section>
    </PageShell>
  );
}
