import { useId } from 'react';
import { useTranslation } from 'react-i18next';
import type { CompoundDraft } from '../../features/library/compoundDraft';
import type { useCompoundValidation } from '../../features/library/useCompoundValidation';
import { FundamentalsEditor } from './FundamentalsEditor';
import { LiveStructureCheck } from './LiveStructureCheck';
import { SourceField } from './SourceField';

/** The optional geometry with its live structure check, and the fundamentals that come with it. */
export function GeometryEditor({ draft, onChange, check, sources }: {
  draft: CompoundDraft;
  onChange: (draft: CompoundDraft) => void;
  check: ReturnType<typeof useCompoundValidation>;
  sources: Readonly<Record<string, string>>;
}) {
  const { t } = useTranslation();
  const id = useId();
  const withGeometry = draft.xyz.trim() !== '';
  const structure = check.structure.data?.check;
  return (
    <section className="sb-panel" aria-labelledby="editor-geometry-heading">
      <h2 id="editor-geometry-heading" className="sb-panel__heading">{t('library.editor.geometry')}</h2>
      <p className="sb-muted">{t('library.editor.geometryHint')}</p>
      <div className="sb-structure-layout sb-structure-layout--split">
        <div>
          <div className="sb-field">
            <label htmlFor={`${id}-xyz`}>{t('library.editor.xyz')}</label>
            <textarea id={`${id}-xyz`} className="sb-native-input sb-mono sb-structure-text" rows={8} spellCheck={false} value={draft.xyz} onChange={(e) => onChange({ ...draft, xyz: e.target.value })} />
          </div>
          <fieldset className="sb-choice">
            <legend>{t('library.structure.conventionLabel')}</legend>
            <div className="sb-choice__options">
              {(['yz', 'xz'] as const).map((value) => (
                <label key={value} className="sb-choice__option">
                  <input type="radio" name={`${id}-convention`} checked={draft.convention === value} onChange={() => onChange({ ...draft, convention: value })} />
                  {t(`library.structure.convention_${value}`)}
                </label>
              ))}
            </div>
          </fieldset>
        </div>
        {withGeometry && <LiveStructureCheck outcome={check.structure.data} error={check.structure.error} running={check.structure.isFetching} problems={check.problems} />}
      </div>
      {withGeometry && (
        <>
          <SourceField legend={t('library.editor.geometrySource')} value={draft.geometrySource} sources={sources} onChange={(geometrySource) => onChange({ ...draft, geometrySource })} />
          <SourceField legend={t('library.editor.fundamentalsSource')} value={draft.fundamentalsSource} sources={sources} onChange={(fundamentalsSource) => onChange({ ...draft, fundamentalsSource })} />
          <FundamentalsEditor rows={draft.fundamentals} onChange={(fundamentals) => onChange({ ...draft, fundamentals })} modes={structure?.vibrations.modes} pointGroup={structure?.pointGroup} />
        </>
      )}
    </section>
  );
}
