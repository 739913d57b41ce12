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

/** Titles longer than this may not fit a 360 px header. */
const LONG_TITLE = 18;

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
          {/* A long title is cut short in a phone's header: the page repeats it in full (the heading keeps it for screen readers). */}
          {title.length > LONG_TITLE ? (
            <p className="pl-page-fulltitle" aria-hidden="true">
              {title}
            </p>
          ) : null}
          {lead ? <p className="pl-page-lead">{lead}</p> : null}
          {children}
        </div>
      </IonContent>
    </IonPage>
  );
}
