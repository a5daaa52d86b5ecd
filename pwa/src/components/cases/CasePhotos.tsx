import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { casePaths } from '../../features/cases/casePaths';
import { useCasePhotos } from '../../features/photos/usePhotos';
import { PhotoThumb } from './PhotoThumb';

/** Every photo of a case, read from the tablet (offline too), in groups per sample; each opens full size. */
export function CasePhotos({ caseId, editable }: { caseId: string; editable: boolean }) {
  const { t } = useTranslation();
  const groups = useCasePhotos(caseId);
  return (
    <section className="sb-panel" aria-labelledby="case-photos-heading" data-testid="case-photos">
      <h2 id="case-photos-heading" className="sb-panel__heading">
        {t('editing.photos.caseHeading')}
      </h2>
      {groups && groups.length === 0 && <p className="sb-muted">{t('editing.photos.none')}</p>}
      {groups?.map((group) => {
        const key = group.owner.type === 'case' ? 'case' : group.owner.id;
        const label = group.owner.type === 'case' ? t('editing.photos.ofCase') : t('editing.photos.ofSample', { label: group.owner.label });
        return (
          <section key={key} className="sb-photo-group" aria-label={label} data-testid="photo-group">
            <h3 className="sb-photo-group__heading">
              {group.owner.type === 'sample' ? (
                <IonButton fill="clear" routerLink={casePaths.sample(caseId, group.owner.id)} className="sb-photo-group__link">
                  {label}
                </IonButton>
              ) : (
                label
              )}
              <span className="sb-muted"> {t('editing.photos.count', { count: group.photos.length })}</span>
            </h3>
            <div className="sb-photo-grid">
              {group.photos.map((photo, index) => (
                <PhotoThumb
                  key={photo.id}
                  photo={photo}
                  editable={editable}
                  alt={group.owner.type === 'sample' ? t('capture.photos.alt', { label: group.owner.label, number: index + 1 }) : t('editing.photos.caseAlt', { number: index + 1 })}
                />
              ))}
            </div>
          </section>
        );
      })}
    </section>
  );
}
