import { useEffect, useState } from 'react';
import { useTranslation } from 'react-i18next';
import type { PhotoRow } from '../../db/photosTable';
import { SyncBadge } from './SyncBadge';

/** One stored photo as a thumbnail (from the bytes on the tablet) with its sync state. */
export function PhotoThumb({ photo, alt }: { photo: PhotoRow; alt: string }) {
  const { t } = useTranslation();
  const [url, setUrl] = useState<string>();
  useEffect(() => {
    if (!photo.bytes) return undefined;
    const next = URL.createObjectURL(new Blob([photo.bytes], { type: photo.data.contentType }));
    setUrl(next);
    return () => URL.revokeObjectURL(next);
  }, [photo.bytes, photo.data.contentType]);
  return (
    <figure className="sb-photo" data-testid="photo" data-sha256={photo.data.sha256}>
      {url ? <img src={url} alt={alt} /> : <div className="sb-photo__missing">{alt}</div>}
      <figcaption>
        <SyncBadge state={photo.sync} />
        {photo.uploadRefused ? (
          <span className="sb-error">{t('capture.sync.fileRefused', { reason: photo.uploadRefused })}</span>
        ) : (
          photo.rejectedReason && <span className="sb-error">{t('capture.sync.rejected', { reason: photo.rejectedReason })}</span>
        )}
      </figcaption>
    </figure>
  );
}
