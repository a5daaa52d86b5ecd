import { useEffect, useState } from 'react';
import { useTranslation } from 'react-i18next';
import { useAttachmentBlob } from '../../features/review/useReview';

/** A photo of the case from the server, with its file name as the text alternative. */
export function ReviewPhoto({ attachmentId, fileName }: { attachmentId: string; fileName: string }) {
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
      <figcaption>{fileName}</figcaption>
    </figure>
  );
}
