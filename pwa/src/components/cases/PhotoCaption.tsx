import { useState } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { createOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import { PHOTO_CAPTION_MAX_LENGTH, photoCaptionLength } from '@siteband/shared';
import type { PhotoRow } from '../../db/photosTable';
import { captureDb } from '../../features/cases/captureDb';
import { setPhotoCaption } from '../../features/photos/addPhoto';
import { TextEditForm } from './TextEditForm';

/** A photo's caption; on an open case edited in place, offline (only the metadata goes to the server again). */
export function PhotoCaption({ photo, alt, editable }: { photo: PhotoRow; alt: string; editable: boolean }) {
  const { t } = useTranslation();
  const [editing, setEditing] = useState(false);
  const caption = photo.data.caption ?? null;
  if (editing) {
    return (
      <div className="sb-photo-caption">
        <TextEditForm
          label={t('captions.editLabel', { alt })}
          initial={caption ?? ''}
          hint={(draft) => `${t('captions.editHint', { max: PHOTO_CAPTION_MAX_LENGTH })} ${t('captions.length', { count: photoCaptionLength(draft), max: PHOTO_CAPTION_MAX_LENGTH })}`}
          saveLabel={t('captions.save')}
          cancelLabel={t('captions.cancel')}
          onSave={(text) => setPhotoCaption(captureDb(), photo, text)}
          onDone={() => setEditing(false)}
          testId="photo-caption-form"
        />
      </div>
    );
  }
  return (
    <div className="sb-photo-caption">
      <p className={caption ? undefined : 'sb-muted'} data-testid="photo-caption">
        {caption ?? t('captions.none')}
      </p>
      {editable && (
        <IonButton fill="outline" data-testid="edit-photo-caption" onClick={() => setEditing(true)}>
          <IonIcon icon={createOutline} slot="start" aria-hidden="true" />
          {t('captions.edit')}
        </IonButton>
      )}
    </div>
  );
}
