import { useId } from 'react';
import { CASE_STATUSES } from '@siteband/shared';
import { useTranslation } from 'react-i18next';
import type { CaseFilter } from '../../features/cases/filterCases';
import { Field } from './Field';

const STATUSES = ['all', ...CASE_STATUSES] as const;

/** Search by site or address, filter by status and by visit day. */
export function CaseFilters({ value, onChange }: { value: CaseFilter; onChange: (next: CaseFilter) => void }) {
  const { t } = useTranslation();
  const statusId = useId();
  return (
    <div className="sb-case-filters" role="search">
      <Field type="search" label={t('capture.cases.search')} value={value.text} onChange={(text) => onChange({ ...value, text })} />
      <div className="sb-field">
        <label htmlFor={statusId}>{t('capture.cases.statusFilter')}</label>
        <select id={statusId} className="sb-select" value={value.status} onChange={(e) => onChange({ ...value, status: e.target.value as CaseFilter['status'] })}>
          {STATUSES.map((s) => (
            <option key={s} value={s}>
              {s === 'all' ? t('capture.cases.allStatuses') : t(`capture.status.${s}`)}
            </option>
          ))}
        </select>
      </div>
      <Field type="date" label={t('capture.cases.from')} value={value.from} onChange={(from) => onChange({ ...value, from })} />
      <Field type="date" label={t('capture.cases.to')} value={value.to} onChange={(to) => onChange({ ...value, to })} />
    </div>
  );
}
