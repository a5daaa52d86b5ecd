import { useEffect, type ReactNode } from 'react';
import { IonContent, IonHeader, IonPage, IonToolbar } from '@ionic/react';
import { useTranslation } from 'react-i18next';
import { BrandMark } from './BrandMark';
import { ConnectionBadge } from './ConnectionBadge';

/** Frame of every screen: product name, the page's own title, the connection status, then the content. */
export function PageShell({ title, children }: { title: string; children: ReactNode }) {
  const { t } = useTranslation();
  useEffect(() => {
    document.title = t('app.documentTitle', { page: title });
  }, [t, title]);
  return (
    <IonPage>
      <IonHeader className="sb-header">
        <IonToolbar className="sb-toolbar">
          <div className="sb-toolbar__row">
            <BrandMark />
            <h1 className="sb-page-title">{title}</h1>
            <ConnectionBadge />
          </div>
        </IonToolbar>
      </IonHeader>
      <IonContent className="sb-content">
        <div className="sb-main">{children}</div>
      </IonContent>
    </IonPage>
  );
}
