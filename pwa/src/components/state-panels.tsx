import { IonSpinner } from '@ionic/react';
import type { ReactNode } from 'react';

// The five states every data page can be in. Each says in plain words what is going on.

export function LoadingPanel({ what }: { what: string }) {
  return (
    <div className="pl-state pl-state-loading" role="status">
      <IonSpinner name="lines-small" aria-hidden="true" />
      <span>Loading {what}…</span>
    </div>
  );
}

export function EmptyPanel({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <section className="pl-state pl-state-empty" aria-label={title}>
      <h2>{title}</h2>
      {children}
    </section>
  );
}

export function ErrorPanel({ message, onRetry }: { message: string; onRetry?: () => void }) {
  return (
    <div className="pl-state pl-state-error" role="alert">
      <h2>Could not load this</h2>
      <p>{message}</p>
      {onRetry ? (
        <button type="button" className="pl-button pl-button-quiet" onClick={onRetry}>
          Try again
        </button>
      ) : null}
    </div>
  );
}

export function OfflinePanel({ children }: { children: ReactNode }) {
  return (
    <div className="pl-state pl-state-offline" role="status">
      <h2>You are offline</h2>
      <p>{children}</p>
    </div>
  );
}
