import type { Compound } from '@siteband/shared';
import { IonItem, IonLabel, IonList } from '@ionic/react';
import { useTranslation } from 'react-i18next';

/** The matching compounds, each a link to its detail page. */
export function CompoundList({ compounds, hrefOf }: { compounds: readonly Compound[]; hrefOf: (id: string) => string }) {
  const { t } = useTranslation();
  return (
    <IonList className="sb-link-list sb-compound-list" lines="none" data-testid="compound-list">
      {compounds.map((c) => (
        <IonItem key={c.id} routerLink={hrefOf(c.id)} detail button className="sb-link-item" data-testid={`compound-${c.id}`}>
          <IonLabel>
            <h2>{c.name}</h2>
            <p>
              {c.formula} · {t('library.list.cas', { cas: c.cas })}
              {c.hazards.unNumber && ` · ${t('library.list.un', { un: c.hazards.unNumber })}`}
              {c.geometry && ` · ${t('library.list.hasGeometry')}`}
            </p>
            {c.synonyms.length > 0 && <p>{c.synonyms.join(', ')}</p>}
          </IonLabel>
          {c.hazards.pictograms.length > 0 && (
            <span slot="end" className="sb-pictogram-codes">
              {c.hazards.pictograms.join(' ')}
            </span>
          )}
        </IonItem>
      ))}
    </IonList>
  );
}
