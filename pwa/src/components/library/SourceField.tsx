import { useId } from 'react';
import { useTranslation } from 'react-i18next';
import { SOURCE_BASES, type SourceDraft } from '../../features/library/sourceDraft';

/**
 * A source picked from the library's own source list (shown with its full citation), with how the
 * value is known. Supervisors cannot add source keys here: the list is curated with the library.
 */
export function SourceField({ legend, value, sources, onChange, noneLabel, testId }: {
  legend: string;
  value: SourceDraft;
  sources: Readonly<Record<string, string>>;
  onChange: (value: SourceDraft) => void;
  /** Offered as the first choice when the source may be left unset (e.g. "the entry's band source"). */
  noneLabel?: string;
  testId?: string;
}) {
  const { t } = useTranslation();
  const id = useId();
  return (
    <fieldset className="sb-source-field" data-testid={testId}>
      <legend>{legend}</legend>
      <div className="sb-field">
        <label htmlFor={`${id}-ref`}>{t('library.editor.sourceRef')}</label>
        <select id={`${id}-ref`} className="sb-native-input" value={value.ref} onChange={(e) => onChange({ ...value, ref: e.target.value })}>
          <option value="">{noneLabel ?? t('library.editor.sourceChoose')}</option>
          {Object.entries(sources).map(([key, citation]) => (
            <option key={key} value={key}>{citation}</option>
          ))}
        </select>
      </div>
      {value.ref !== '' && (
        <div className="sb-source-field__more">
          <div className="sb-field">
            <label htmlFor={`${id}-basis`}>{t('library.editor.sourceBasis')}</label>
            <select id={`${id}-basis`} className="sb-native-input" value={value.basis} onChange={(e) => onChange({ ...value, basis: e.target.value as SourceDraft['basis'] })}>
              {SOURCE_BASES.map((b) => (
                <option key={b} value={b}>{t(`library.editor.basis.${b}`)}</option>
              ))}
            </select>
          </div>
          <div className="sb-field">
            <label htmlFor={`${id}-note`}>{t('library.editor.sourceNote')}</label>
            <input id={`${id}-note`} className="sb-native-input" value={value.note} onChange={(e) => onChange({ ...value, note: e.target.value })} />
          </div>
        </div>
      )}
    </fieldset>
  );
}
