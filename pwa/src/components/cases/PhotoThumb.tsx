import { useEffect, useRef, useState } from 'react';
import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { useLiveQuery } from 'dexie-react-hooks';
import type { PhotoRow } from '../../db/photosTable';
import { captureDb } from '../../features/cases/captureDb';
import { heldBytes } from '../../features/photos/attachmentBytes';
import { recordDelete } from '../../features/sync/recordChange';
import { ConfirmDelete } from './ConfirmDelete';
import { PhotoCaption } from './PhotoCaption';
import { SyncBadge } from './SyncBadge';

/**
 * One stored photo as a thumbnail (from the bytes on the tablet) with its caption and sync state: a tap
 * opens it full size; on an open case its caption can be edited and it can be deleted after asking.
 */
export function PhotoThumb({ photo, alt, editable }: { photo: PhotoRow; alt: string; editable: boolean }) {
  const { t } = useTranslation();
  const [url, setUrl] = useState<string>();
  const viewer = useRef<HTMLDialogElement>(null);
  const bytes = useLiveQuery(() => (photo.bytesHeld ? heldBytes(captureDb(), photo.id) : undefined), [photo.id, photo.bytesHeld]);
  useEffect(() => {
    if (!bytes) return undefined;
    const next = URL.createObjectURL(new Blob([bytes], { type: photo.data.contentType }));
    setUrl(next);
    return () => URL.revokeObjectURL(next);
  }, [bytes, photo.data.contentType]);
  return (
    <figure className="sb-photo" data-testid="photo" data-photo-id={photo.id} data-sha256={photo.data.sha256}>
      {url ? (
        <button type="button" className="sb-photo__open" aria-label={t('editing.photos.open', { alt })} onClick={() => viewer.current?.showModal()}>
          <img src={url} alt={alt} />
        </button>
      ) : (
        <div className="sb-photo__missing">{alt}</div>
      )}
      {url && (
        <dialog ref={viewer} className="sb-photo-viewer" aria-label={alt} data-testid="photo-viewer">
          <img src={url} alt={alt} />
          {photo.data.caption && <p>{photo.data.caption}</p>}
          <IonButton className="sb-primary" onClick={() => viewer.current?.close()}>
            {t('editing.photos.close')}
          </IonButton>
        </dialog>
      )}
      <figcaption>
        <PhotoCaption photo={photo} alt={alt} editable={editable} />
        <SyncBadge state={photo.sync} />
        {photo.uploadRefused ? (
          <span className="sb-error">{t('capture.sync.fileRefused', { reason: photo.uploadRefused })}</span>
        ) : (
          photo.rejectedReason && <span className="sb-error">{t('capture.sync.rejected', { reason: photo.rejectedReason })}</span>
        )}
        {editable && <ConfirmDelete question={t('editing.photos.confirm')} testId="delete-photo" onDelete={() => recordDelete(captureDb(), 'attachment', photo.id)} />}
      </figcaption>
    </figure>
  );
}
