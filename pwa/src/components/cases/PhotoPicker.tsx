import { useId, useState } from 'react';
import { useTranslation } from 'react-i18next';
import { PHOTO_CAPTION_MAX_LENGTH, photoCaptionLength } from '@siteband/shared';
import { captureDb } from '../../features/cases/captureDb';
import { addSamplePhotoFile } from '../../features/photos/addPhoto';
import { usePhotos } from '../../features/photos/usePhotos';
import { PhotoThumb } from './PhotoThumb';

/** Photos of a sample: the camera (or files), compressed to JPEG on the tablet, and what is stored. */
export function PhotoPicker({ caseId, sampleId, sampleLabel, editable }: { caseId: string; sampleId: string; sampleLabel: string; editable: boolean }) {
  const { t } = useTranslation();
  const inputId = useId();
  const captionId = useId();
  const captionHintId = useId();
  const [caption, setCaption] = useState('');
  const photos = usePhotos(sampleId);
  const [busy, setBusy] = useState(false);
  const [errors, setErrors] = useState<string[]>([]);

  async function take(files: FileList | null) {
    if (!files || files.length === 0) return;
    setBusy(true);
    const failed: string[] = [];
    // One at a time: each photo is decoded at full camera size, which is heavy on a tablet.
    for (const file of Array.from(files)) {
      try {
        await addSamplePhotoFile(captureDb(), { caseId, sampleId }, file, caption);
      } catch (error) {
        failed.push(t('capture.photos.failed', { file: file.name, reason: error instanceof Error ? error.message : String(error) }));
      }
    }
    // The caption went with these photos; the next ones get their own.
    if (failed.length === 0) setCaption('');
    setErrors(failed);
    setBusy(false);
  }

  return (
    <section className="sb-panel" aria-labelledby="photos-heading">
      <h2 id="photos-heading" className="sb-panel__heading">
        {t('capture.photos.heading')}
      </h2>
      {photos && photos.length === 0 && <p className="sb-muted">{t('capture.photos.none')}</p>}
      <div className="sb-photo-grid">
        {photos?.map((photo, index) => (
          <PhotoThumb key={photo.id} photo={photo} alt={t('capture.photos.alt', { label: sampleLabel, number: index + 1 })} editable={editable} />
        ))}
      </div>
      {editable && (
        <div className="sb-field">
          <label htmlFor={captionId}>{t('captions.addLabel')}</label>
          <textarea
            id={captionId}
            className="sb-text sb-text--area"
            rows={2}
            value={caption}
            aria-describedby={captionHintId}
            data-testid="new-photo-caption"
            onChange={(e) => setCaption(e.target.value)}
          />
          <p id={captionHintId} className="sb-field__hint">
            {t('captions.addHint', { max: PHOTO_CAPTION_MAX_LENGTH })} {t('captions.length', { count: photoCaptionLength(caption), max: PHOTO_CAPTION_MAX_LENGTH })}
          </p>
        </div>
      )}
      {editable && (
        <div className="sb-field">
          <label htmlFor={inputId} className="sb-file-button">
            {busy ? t('capture.photos.working') : t('capture.photos.take')}
          </label>
          <input
            id={inputId}
            className="sb-file-input"
            type="file"
            accept="image/*"
            capture="environment"
            multiple
            disabled={busy}
            data-testid="photo-input"
            onChange={(e) => {
              void take(e.target.files);
              e.target.value = '';
            }}
          />
          <p className="sb-field__hint">{t('capture.photos.hint')}</p>
        </div>
      )}
      {errors.length > 0 && (
        <ul className="sb-error" role="alert">
          {errors.map((e) => (
            <li key={e}>{e}</li>
          ))}
        </ul>
      )}
      {busy && <p role="status">{t('capture.photos.working')}</p>}
    </section>
  );
}
