import { IonContent, IonPage } from '@ionic/react';
import { OnlineIndicator } from '../../../components/online-indicator';
import { PlumblineLogo } from '../../../components/plumbline-logo';
import { SignInForm } from '../components/sign-in-form';

export function SignInPage() {
  return (
    <IonPage>
      <IonContent className="pl-content pl-sign-in">
        <main className="pl-sign-in-column">
          <div className="pl-sign-in-top">
            <PlumblineLogo size={44} withName />
            <OnlineIndicator />
          </div>
          <h1 className="pl-sign-in-title">Sign in</h1>
          <p className="pl-muted">
            Fieldwork kept level while it runs. Use the account your agency gave you.
          </p>
          <SignInForm />
          <p className="pl-sign-in-foot">
            Interviews logged on this device stay on it until the office has them, signed in or not.
          </p>
        </main>
      </IonContent>
    </IonPage>
  );
}
