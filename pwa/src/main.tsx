import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '@ionic/react/css/core.css';
import '@ionic/react/css/normalize.css';
import '@ionic/react/css/structure.css';
import '@ionic/react/css/typography.css';
import './app/styles/fonts.css';
import './app/styles/theme.css';
import './app/styles/shell.css';
import './app/styles/pages.css';
import './app/styles/dialog.css';
import './app/styles/data.css';
import { App } from './app/app';
import { createQueryClient } from './app/query-client';
import { registerServiceWorker } from './app/register-service-worker';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

createRoot(root).render(
  <StrictMode>
    <App queryClient={createQueryClient()} />
  </StrictMode>,
);
registerServiceWorker();
