import { useEffect, useId, useState, type FormEvent } from 'react';
import { IonButton } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { Field } from '../cases/Field';
import { DEFAULT_QUEUE_QUERY, QUEUE_STATUSES, type QueueQuery } from '../../features/review/queueFilters';
import type { HazardRank } from '../../features/review/types';

type FilterPart = Omit<QueueQuery, 'sort' | 'order' | 'page' | 'pageSize'>;

function filtersOf(q: QueueQuery): FilterPart {
  const { status, inspectorId, site, from, to, hazard, compound, q: text } = q;
  return { status, inspectorId, site, from, to, hazard, compound, q: text };
}

export interface QueueFiltersFormProps {
  query: QueueQuery;
  /** Inspectors to offer (those the queue has shown so far). */
  inspectors: readonly { id: string; displayName: string }[];
  /** Compound names to suggest for the compound filter. */
  compoundNames: readonly string[];
  onApply: (filters: FilterPart) => void;
}

/** The queue's filters, applied together with one button so a half-typed value sends no query. */
export function QueueFiltersForm({ query, inspectors, compoundNames, onApply }: QueueFiltersFormProps) {
  const { t } = useTranslation();
  const [draft, setDraft] = useState<FilterPart>(() => filtersOf(query));
  const ids = { inspector: useId(), hazard: useId(), compounds: useId(), compound: useId() };
  // A link or the back button changes the query: show what is in force.
  const inForce = JSON.stringify(filtersOf(query));
  useEffect(() => setDraft(JSON.parse(inForce) as FilterPart), [inForce]);

  const set = (change: Partial<FilterPart>) => setDraft((d) => ({ ...d, ...change }));
  function submit(event: FormEvent) {
    event.preventDefault();
    onApply(draft);
  }
  function toggleStatus(status: (typeof QUEUE_STATUSES)[number], on: boolean) {
    set({ status: on ? [...draft.status, status] : draft.status.filter((s) => s !== status) });
  }

  return (
    <form className="sb-queue-filters" role="search" aria-label={t('review.queue.filtersLabel')} onSubmit={submit}>
      <fieldset className="sb-choice sb-queue-filters__wide">
        <legend>{t('review.queue.status')}</legend>
        <div className="sb-choice__options">
          {QUEUE_STATUSES.map((s) => (
            <label key={s} className="sb-choice__option">
              <input type="checkbox" checked={draft.status.includes(s)} onChange={(e) => toggleStatus(s, e.target.checked)} />
              {t(`capture.status.${s}`)}
            </label>
          ))}
        </div>
      </fieldset>
      <Field type="search" label={t('review.queue.text')} value={draft.q} onChange={(q) => set({ q })} />
      <Field label={t('review.queue.site')} value={draft.site} onChange={(site) => set({ site })} />
      <div className="sb-field">
        <label htmlFor={ids.inspector}>{t('review.queue.inspector')}</label>
        <select id={ids.inspector} className="sb-select" value={draft.inspectorId} onChange={(e) => set({ inspectorId: e.target.value })}>
          <option value="">{t('review.queue.anyInspector')}</option>
          {inspectors.map((i) => (
            <option key={i.id} value={i.id}>
              {i.displayName}
            </option>
          ))}
        </select>
      </div>
      <div className="sb-field">
        <label htmlFor={ids.hazard}>{t('review.queue.hazard')}</label>
        <select
          id={ids.hazard}
          className="sb-select"
          value={draft.hazard ?? ''}
          onChange={(e) => set({ hazard: e.target.value === '' ? null : (Number(e.target.value) as HazardRank) })}
        >
          <option value="">{t('review.queue.anyHazard')}</option>
          {[3, 2, 1].map((rank) => (
            <option key={rank} value={rank}>
              {t(`review.hazard.atLeast${rank}`)}
            </option>
          ))}
        </select>
      </div>
      <div className="sb-field">
        <label htmlFor={ids.compound}>{t('review.queue.compound')}</label>
        <input id={ids.compound} className="sb-text" list={ids.compounds} value={draft.compound} autoComplete="off" onChange={(e) => set({ compound: e.target.value })} />
        <datalist id={ids.compounds}>
          {compoundNames.map((name) => (
            <option key={name} value={name} />
          ))}
        </datalist>
      </div>
      <Field type="date" label={t('review.queue.from')} value={draft.from} onChange={(from) => set({ from })} />
      <Field type="date" label={t('review.queue.to')} value={draft.to} onChange={(to) => set({ to })} />
      <div className="sb-button-row sb-queue-filters__wide">
        <IonButton type="submit" className="sb-primary" data-testid="apply-filters">
          {t('review.queue.apply')}
        </IonButton>
        <IonButton type="button" fill="outline" onClick={() => onApply(filtersOf(DEFAULT_QUEUE_QUERY))}>
          {t('review.queue.reset')}
        </IonButton>
      </div>
    </form>
  );
}
