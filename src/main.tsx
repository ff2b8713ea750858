import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { startOffline } from '@/app/offline';
import { AppProvider } from '@/app/provider';
import { AppRouter } from '@/app/router';
import { registerServiceWorker } from '@/lib/service-worker';
import '@/styles/index.css';

// What the person last read is back in the cache before the first screen shows, also with no network.
void startOffline().then(() =>
  createRoot(document.getElementById('root')!).render(
    <StrictMode>
      <AppProvider>
        <AppRouter />
      </AppProvider>
    </StrictMode>,
  ),
);
registerServiceWorker();
