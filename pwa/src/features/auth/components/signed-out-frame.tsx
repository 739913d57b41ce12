import { IonContent, IonPage } from '@ionic/react';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { OnlineIndicator } from '../../../components/online-indicator';
import { PlumblineLogo } from '../../../components/plumbline-logo';
import '../auth.css';

/** The frame of every signed-out page (sign-in, set a password, forgotten password, sign-up). */
export function SignedOutFrame({ title, lead, children, back = true }: { title: string; lead?: string; children: ReactNode; back?: boolean }) {
  return (
    <IonPage>
      <IonContent className="pl-content pl-sign-in">
        {/* Ionic gives ion-content the main landmark; a second main inside it would nest landmarks. */}
        <div className="pl-sign-in-column">
          <div className="pl-sign-in-top">
            <PlumblineLogo size={44} withName />
            <OnlineIndicator />
          </div>
          <h1 className="pl-sign-in-title">{title}</h1>
          {lead ? <p className="pl-muted">{lead}</p> : null}
          {children}
          {back ? (
            <p className="pl-sign-in-foot">
              <Link to="/sign-in">Back to sign-in</Link>
            </p>
          ) : null}
        </div>
      </IonContent>
    </IonPage>
  );
}
