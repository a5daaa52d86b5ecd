import { useId, useState, type DragEvent } from 'react';
import { IonIcon } from '@ionic/react';
import { documentAttachOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import type { ScanFile } from '../../features/identify/protocol';
import './scan-form.css';

/** File types the import reads: JCAMP-DX and delimited text. */
const ACCEPT = '.jdx,.dx,.jcamp,.jcm,.csv,.tsv,.txt,text/csv,text/plain';

/** Reads a chosen file into memory for the worker. */
async function readScanFile(file: File): Promise<ScanFile> {
  return { name: file.name, bytes: await file.arrayBuffer() };
}

/** A large file picker that also takes a dropped file (instrument files unless `accept` says otherwise); the reading itself happens in the worker. */
export function ScanFilePicker({ label, hint, onFile, testId, accept = ACCEPT }: { label: string; hint: string; onFile: (file: ScanFile) => void; testId: string; accept?: string }) {
  const { t } = useTranslation();
  const inputId = useId();
  const [dragging, setDragging] = useState(false);

  async function take(files: FileList | null) {
    const file = files?.[0];
    if (file) onFile(await readScanFile(file));
  }

  function onDrop(event: DragEvent<HTMLLabelElement>) {
    event.preventDefault();
    setDragging(false);
    void take(event.dataTransfer.files);
  }

  return (
    <label
      htmlFor={inputId}
      className={`sb-drop${dragging ? ' sb-drop--active' : ''}`}
      onDragOver={(e) => {
        e.preventDefault();
        setDragging(true);
      }}
      onDragLeave={() => setDragging(false)}
      onDrop={onDrop}
    >
      <IonIcon icon={documentAttachOutline} aria-hidden="true" className="sb-drop__icon" />
      <span className="sb-drop__label">{label}</span>
      <span className="sb-muted">{hint}</span>
      <span className="sb-drop__button" aria-hidden="true">{t('identify.file.choose')}</span>
      <input
        id={inputId}
        className="sb-visually-hidden"
        type="file"
        accept={accept}
        data-testid={testId}
        onChange={(e) => {
          void take(e.target.files);
          // Choosing the same file again must re-run the import.
          e.target.value = '';
        }}
      />
    </label>
  );
}
