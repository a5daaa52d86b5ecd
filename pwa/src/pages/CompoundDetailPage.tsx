import { useState } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { arrowBackOutline, copyOutline, createOutline, archiveOutline } from 'ionicons/icons';
import { useLocation, useNavigate, useParams } from 'react-router-dom';
import { useTranslation } from 'react-i18next';
import { PageShell } from '../components/PageShell';
import { BandsTable } from '../components/library/BandsTable';
import { CautionCardPanel } from '../components/library/CautionCardPanel';
import { CompoundFacts } from '../components/library/CompoundFacts';
import { FundamentalsTable } from '../components/library/FundamentalsTable';
import '../components/library/library.css';
import '../components/structure/structure.css';
import { StructureProblemAlert } from '../components/structure/StructureProblemAlert';
import { StructureSummary } from '../components/structure/StructureSummary';
import { canCurateLibrary } from '../features/library/canCurate';
import { libraryPaths } from '../features/library/libraryPaths';
import { useRetireCompound } from '../features/library/useCompoundMutations';
import { useCompound } from '../features/library/useLibrary';
import { useOnlineStatus } from '../features/network/onlineStatus';
import { useSession } from '../features/session/SessionProvider';
import { useStructureCheck } from '../features/structure/useStructureCheck';

/** One compound: identity, caution card, fundamentals with their derived activity, bands; supervisors may edit. */
export default function CompoundDetailPage() {
  const { t } = useTranslation();
  const { id = '' } = useParams();
  const paths = libraryPaths(useLocation().pathname);
  const navigate = useNavigate();
  const online = useOnlineStatus();
  const { session } = useSession();
  const curator = canCurateLibrary(session?.user.role);
  const { compound, query } = useCompound(id);
  const geometry = compound?.geometry;
  const structure = useStructureCheck(geometry ? { text: geometry.xyz, convention: geometry.planarConvention ?? 'yz' } : undefined);
  const retire = useRetireCompound();
  const [confirming, setConfirming] = useState(false);
  const sources = query.data?.library.sources ?? {};

  return (
    <PageShell title={compound?.name ?? t('library.detail.title')}>
      <div className="sb-detail-actions">
        <IonButton fill="outline" routerLink={paths.list} routerDirection="back" className="sb-back">
          <IonIcon icon={arrowBackOutline} slot="start" aria-hidden="true" />
          {t('library.detail.back')}
        </IonButton>
        {curator && compound && (
          <>
            <IonButton routerLink={paths.edit(compound.id)} className="sb-primary-inline" data-testid="edit-compound">
              <IonIcon icon={createOutline} slot="start" aria-hidden="true" />
              {t('library.detail.edit')}
            </IonButton>
            <IonButton fill="outline" routerLink={`${paths.add}?from=${encodeURIComponent(compound.id)}`}>
              <IonIcon icon={copyOutline} slot="start" aria-hidden="true" />
              {t('library.detail.copy')}
            </IonButton>
            <IonButton
              fill="outline"
              color="danger"
              disabled={!online || retire.isPending}
              onClick={() => {
                if (!confirming) return setConfirming(true);
                retire.mutate(compound.id, { onSuccess: () => navigate(paths.list) });
              }}
            >
              <IonIcon icon={archiveOutline} slot="start" aria-hidden="true" />
              {confirming ? t('library.detail.retireConfirm') : t('library.detail.retire')}
            </IonButton>
          </>
        )}
      </div>
      {retire.isError && (
        <p className="sb-error" role="alert">
          {t('library.detail.retireError', { message: retire.error.message })}
        </p>
      )}
      {query.isPending && <p className="sb-muted">{t('library.list.loading')}</p>}
      {query.data && !compound && (
        <p className="sb-error" role="alert">
          {t('library.detail.unknown', { id })}
        </p>
      )}
      {compound && (
        <>
          <CompoundFacts compound={compound} sources={sources} />
          <CautionCardPanel compound={compound} sources={sources} />
          {compound.fundamentals && <FundamentalsTable compound={compound} modes={structure.data?.check.vibrations.modes} sources={sources} />}
          {structure.isError && <StructureProblemAlert error={structure.error} />}
          {structure.data && <StructureSummary check={structure.data.check} />}
          {geometry && (
            <p className="sb-muted">{t('library.detail.source', { source: sources[geometry.source.ref] ?? geometry.source.ref, basis: geometry.source.basis })}</p>
          )}
          {compound.bands && compound.bands.length > 0 && <BandsTable compound={compound} sources={sources} />}
        </>
      )}
    </PageShell>
  );
}
