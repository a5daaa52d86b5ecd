import { useId } from 'react';
import { useTranslation } from 'react-i18next';
import type { CompoundFilter } from '../../features/library/searchCompounds';

/** Search box and filters of the compound library list. */
export function LibraryFilters({ filter, onChange }: { filter: CompoundFilter; onChange: (filter: CompoundFilter) => void }) {
  const { t } = useTranslation();
  const id = useId();
  return (
    <div className="sb-library-filters">
      <div className="sb-field sb-library-search">
        <label htmlFor={`${id}-q`}>{t('library.list.search')}</label>
        <input
          id={`${id}-q`}
          type="search"
          className="sb-native-input"
          value={filter.text ?? ''}
          onChange={(e) => onChange({ ...filter, text: e.target.value })}
          aria-describedby={`${id}-q-hint`}
        />
        <p id={`${id}-q-hint`} className="sb-muted">
          {t('library.list.searchHint')}
        </p>
      </div>
      <fieldset className="sb-choice">
        <legend>{t('library.list.filters')}</legend>
        <div className="sb-choice__options">
          <label className="sb-choice__option">
            <input type="checkbox" checked={filter.hazardousOnly ?? false} onChange={(e) => onChange({ ...filter, hazardousOnly: e.target.checked })} />
            {t('library.list.hazardousOnly')}
          </label>
          <label className="sb-choice__option">
            <input type="checkbox" checked={filter.withGeometryOnly ?? false} onChange={(e) => onChange({ ...filter, withGeometryOnly: e.target.checked })} />
            {t('library.list.withGeometryOnly')}
          </label>
        </div>
      </fieldset>
      <div className="sb-field">
        <label htmlFor={`${id}-tech`}>{t('library.list.technique')}</label>
        <select
          id={`${id}-tech`}
          className="sb-select"
          value={filter.technique ?? ''}
          onChange={(e) => onChange({ ...filter, technique: e.target.value === '' ? undefined : (e.target.value as 'ir' | 'raman') })}
        >
          <option value="">{t('library.list.techniqueAny')}</option>
          <option value="ir">{t('library.list.techniqueIr')}</option>
          <option value="raman">{t('library.list.techniqueRaman')}</option>
        </select>
      </div>
    </div>
  );
}
