import { useId, useState, type DragEvent, type FormEvent } from 'react';
import { IonButton, IonIcon } from '@ionic/react';
import { playOutline } from 'ionicons/icons';
import { useTranslation } from 'react-i18next';
import type { StructureInput } from '../../features/structure/structureWorkerClient';
import './structure.css';

/** The symmetry engine's default tolerance in Å (shared checkStructure). */
export const DEFAULT_TOLERANCE_A = 0.1;

/** Reads the first file of a drop or a file input as text. */
async function fileText(files: FileList | null): Promise<string | undefined> {
  const file = files?.[0];
  return file ? file.text() : undefined;
}

/** Paste or upload an XYZ/MOL structure, set tolerance and planar convention, then run the check. */
export function StructureInputForm({ onRun, busy }: { onRun: (input: StructureInput) => void; busy: boolean }) {
  const { t } = useTranslation();
  const id = useId();
  const [text, setText] = useState('');
  const [tolerance, setTolerance] = useState(String(DEFAULT_TOLERANCE_A));
  const [convention, setConvention] = useState<'yz' | 'xz'>('yz');
  const [dragging, setDragging] = useState(false);
  const [formError, setFormError] = useState<string>();

  function submit(event: FormEvent) {
    event.preventDefault();
    const value = Number(tolerance);
    if (text.trim() === '') return setFormError(t('library.structure.needText'));
    if (!Number.isFinite(value) || value <= 0) return setFormError(t('library.structure.badTolerance'));
    setFormError(undefined);
    onRun({ text, tolerance: value, convention });
  }

  async function drop(event: DragEvent) {
    event.preventDefault();
    setDragging(false);
    const dropped = await fileText(event.dataTransfer.files);
    if (dropped !== undefined) setText(dropped);
  }

  return (
    <form className="sb-form-grid sb-structure-form" onSubmit={submit} noValidate>
      <div
        className={`sb-field sb-form-grid__wide sb-dropzone${dragging ? ' sb-dropzone--active' : ''}`}
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={(e) => void drop(e)}
      >
        <label htmlFor={`${id}-text`}>{t('library.structure.textLabel')}</label>
        <textarea
          id={`${id}-text`}
          className="sb-native-input sb-mono sb-structure-text"
          rows={9}
          spellCheck={false}
          value={text}
          onChange={(e) => setText(e.target.value)}
          aria-describedby={`${id}-text-hint`}
        />
        <p id={`${id}-text-hint`} className="sb-muted">
          {t('library.structure.textHint')}
        </p>
      </div>
      <div className="sb-field">
        <label htmlFor={`${id}-file`}>{t('library.structure.fileLabel')}</label>
        <input
          id={`${id}-file`}
          className="sb-native-input sb-file"
          type="file"
          accept=".xyz,.mol,.sdf,text/plain,chemical/x-xyz,chemical/x-mdl-molfile"
          onChange={async (e) => {
            const read = await fileText(e.target.files);
            if (read !== undefined) setText(read);
          }}
        />
      </div>
      <div className="sb-field">
        <label htmlFor={`${id}-tol`}>{t('library.structure.toleranceLabel')}</label>
        <input
          id={`${id}-tol`}
          className="sb-native-input"
          type="number"
          inputMode="decimal"
          min="0.001"
          step="0.01"
          value={tolerance}
          onChange={(e) => setTolerance(e.target.value)}
          aria-describedby={`${id}-tol-hint`}
        />
        <p id={`${id}-tol-hint`} className="sb-muted">
          {t('library.structure.toleranceHint', { value: DEFAULT_TOLERANCE_A })}
        </p>
      </div>
      <fieldset className="sb-field sb-choice sb-form-grid__wide">
        <legend>{t('library.structure.conventionLabel')}</legend>
        <div className="sb-choice__options">
          {(['yz', 'xz'] as const).map((value) => (
            <label key={value} className="sb-choice__option">
              <input type="radio" name={`${id}-convention`} value={value} checked={convention === value} onChange={() => setConvention(value)} />
              {t(`library.structure.convention_${value}`)}
            </label>
          ))}
        </div>
        <p className="sb-muted">{t('library.structure.conventionHint')}</p>
      </fieldset>
      {formError && (
        <p className="sb-error sb-form-grid__wide" role="alert">
          {formError}
        </p>
      )}
      <div className="sb-form-grid__wide">
        <IonButton type="submit" className="sb-primary" disabled={busy}>
          <IonIcon icon={playOutline} slot="start" aria-hidden="true" />
          {busy ? t('library.structure.running') : t('library.structure.run')}
        </IonButton>
      </div>
    </form>
  );
}
