import { useEffect, useState } from 'react';
import { useTranslation } from 'react-i18next';
import { useAttachmentBlob } from '../../features/review/useReview';

/** A photo of the case from the server, with its file name as the text alternative and the inspector's caption. */
export function ReviewPhoto({ attachmentId, fileName, caption }: { attachmentId: string; fileName: string; caption: string | null }) {
  const { t } = useTranslation();
  const blob = useAttachmentBlob(attachmentId);
  const [url, setUrl] = useState<string>();
  useEffect(() => {
    if (!blob.data) return;
    const next = URL.createObjectURL(blob.data);
    setUrl(next);
    return () => URL.revokeObjectURL(next);
  }, [blob.data]);
  if (blob.isError) return <p className="sb-error">{t('review.case.photoFailed', { name: fileName, message: blob.error.message })}</p>;
  return (
    <figure className="sb-review-photo">
      {url ? <img src={url} alt={t('review.case.photoAlt', { name: fileName })} /> : <p className="sb-muted">{t('review.case.photoLoading')}</p>}
      <figcaption>
        {caption && <p className="sb-review-photo__caption" data-testid="review-photo-caption">{caption}</p>}
        <span className="sb-muted">{fileName}</span>
      </figcaption>
    </figure>
  );
}
