import { useId, useState } from 'react';
import type { CompoundGroup } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import { casStatus } from '../../features/library/casStatus';
import { PHASES, type CompoundDraft } from '../../features/library/compoundDraft';
import { slugOf } from '../../features/library/slugOf';
import { SourceField } from './SourceField';

const GROUPS: readonly CompoundGroup[] = ['toxic-industrial', 'gas', 'solvent-fuel', 'oxidiser-energetic', 'acid-base', 'look-alike'];

/** Identity of the compound: id (new compounds only, derived from the name until typed), name, synonyms, CAS RN, formula, family, phases. */
export function MainFieldsEditor({ draft, onChange, isNew, sources }: {
  draft: CompoundDraft;
  onChange: (draft: CompoundDraft) => void;
  isNew: boolean;
  sources: Readonly<Record<string, string>>;
}) {
  const { t } = useTranslation();
  const id = useId();
  // The id follows the name until the supervisor types one of their own.
  const [idTyped, setIdTyped] = useState(draft.id !== '');
  const cas = casStatus(draft.cas);
  const text = (key: 'name' | 'formula', label: string) => (
    <div className="sb-field">
      <label htmlFor={`${id}-${key}`}>{label}</label>
      <input
        id={`${id}-${key}`}
        className="sb-native-input"
        value={draft[key]}
        onChange={(e) => onChange({ ...draft, [key]: e.target.value, ...(key === 'name' && isNew && !idTyped ? { id: slugOf(e.target.value) } : {}) })}
      />
    </div>
  );
  const togglePhase = (phase: (typeof PHASES)[number], on: boolean) =>
    onChange({ ...draft, phases: on ? [...draft.phases, phase] : draft.phases.filter((p) => p !== phase) });
  return (
    <div className="sb-form-grid">
      {text('name', t('library.editor.name'))}
      {isNew && (
        <div className="sb-field">
          <label htmlFor={`${id}-id`}>{t('library.editor.id')}</label>
          <input
            id={`${id}-id`}
            className="sb-native-input"
            value={draft.id}
            aria-describedby={`${id}-id-hint`}
            onChange={(e) => {
              setIdTyped(e.target.value !== '');
              onChange({ ...draft, id: e.target.value });
            }}
          />
          <p id={`${id}-id-hint`} className="sb-muted">{t('library.editor.idHint')}</p>
        </div>
      )}
      <div className="sb-field">
        <label htmlFor={`${id}-cas`}>{t('library.detail.cas')}</label>
        <input
          id={`${id}-cas`}
          className="sb-native-input"
          inputMode="numeric"
          value={draft.cas}
          aria-invalid={cas === 'bad-check-digit' || cas === 'malformed'}
          aria-describedby={`${id}-cas-status`}
          onChange={(e) => onChange({ ...draft, cas: e.target.value })}
        />
        <p id={`${id}-cas-status`} className={cas === 'valid' ? 'sb-success' : cas === 'empty' ? 'sb-muted' : 'sb-error'} data-testid="cas-status" aria-live="polite">
          {t(`library.editor.cas.${cas}`)}
        </p>
      </div>
      {text('formula', t('library.detail.formula'))}
      <div className="sb-field">
        <label htmlFor={`${id}-group`}>{t('library.detail.group')}</label>
        <select id={`${id}-group`} className="sb-native-input" value={draft.group} onChange={(e) => onChange({ ...draft, group: e.target.value as CompoundGroup })}>
          {GROUPS.map((g) => (
            <option key={g} value={g}>{t(`library.group.${g}`)}</option>
          ))}
        </select>
      </div>
      <fieldset className="sb-choice">
        <legend>{t('library.editor.phases')}</legend>
        <div className="sb-choice__options">
          {PHASES.map((p) => (
            <label key={p} className="sb-choice__option">
              <input type="checkbox" checked={draft.phases.includes(p)} onChange={(e) => togglePhase(p, e.target.checked)} />
              {t(`library.phase.${p}`)}
            </label>
          ))}
        </div>
      </fieldset>
      <div className="sb-field sb-form-grid__wide">
        <label htmlFor={`${id}-synonyms`}>{t('library.editor.synonyms')}</label>
        <textarea
          id={`${id}-synonyms`}
          className="sb-native-input"
          rows={3}
          value={draft.synonyms}
          onChange={(e) => onChange({ ...draft, synonyms: e.target.value })}
          aria-describedby={`${id}-synonyms-hint`}
        />
        <p id={`${id}-synonyms-hint`} className="sb-muted">{t('library.editor.synonymsHint')}</p>
      </div>
      <div className="sb-form-grid__wide">
        <SourceField legend={t('library.editor.casSource')} value={draft.casSource} sources={sources} onChange={(casSource) => onChange({ ...draft, casSource })} testId="cas-source" />
      </div>
    </div>
  );
}
