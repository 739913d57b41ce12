import { IonApp, setupIonicReact } from '@ionic/react';
import { IonReactRouter } from '@ionic/react-router';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { startConnectivityWatch } from '../lib/connectivity-watch';
import { AppRoutes } from './app-routes';
import { ErrorBoundary } from './error-boundary';

setupIonicReact({ mode: 'md' });

/** The whole app; tests pass a fresh query client for each render. */
export function App({ queryClient }: { queryClient: QueryClient }) {
  useEffect(() => startConnectivityWatch(), []);
  return (
    <QueryClientProvider client={queryClient}>
      <IonApp>
        <ErrorBoundary>
          <IonReactRouter future={{ v7_startTransition: true, v7_relativeSplatPath: true }}>
            <AppRoutes />
          </IonReactRouter>
        </ErrorBoundary>
      </IonApp>
    </QueryClientProvider>
  );
}
