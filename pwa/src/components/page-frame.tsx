import { IonContent, IonHeader, IonPage, IonToolbar } from '@ionic/react';
import type { ReactNode } from 'react';
import { OfflineStrip, OnlineIndicator } from './online-indicator';
import { PlumblineLogo } from './plumbline-logo';
import { useHeaderSlot } from './header-slot';

interface PageFrameProps {
  title: string;
  /** One line under the title saying what this page is for. */
  lead?: string;
  children: ReactNode;
}

/** Every signed-in page: header with logo, title, online state and account; then content. */
export function PageFrame({ title, lead, children }: PageFrameProps) {
  const headerSlot = useHeaderSlot();
  return (
    <IonPage>
      <IonHeader className="pl-header">
        <IonToolbar className="pl-toolbar">
          <div className="pl-header-row">
            <span className="pl-header-logo">
              <PlumblineLogo size={28} />
            </span>
            <h1 className="pl-page-title">{title}</h1>
            <OnlineIndicator />
            {headerSlot}
          </div>
        </IonToolbar>
        <OfflineStrip />
      </IonHeader>
      <IonContent className="pl-content">
        <div className="pl-page-body">
          {lead ? <p className="pl-page-lead">{lead}</p> : null}
          {children}
        </div>
      </IonContent>
    </IonPage>
  );
}
