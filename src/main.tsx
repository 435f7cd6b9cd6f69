import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './ui/App';
import { AppProvider } from './ui/AppContext';
import { startRuntime } from './state/runtime';
import { documentApi } from './state/documentApi';
import { demoSketch } from './state/demo';
import { spawnViewFactorWorker } from './worker/spawn';
import { browserTabChannel } from './state/tabs/lease';
import { spawnExchangeWorker } from './state/exchange/background';
import './ui/styles.css';
import './ui/panels.css';

const runtime = startRuntime({
  storage: window.localStorage,
  api: documentApi,
  spawn: spawnViewFactorWorker,
  demo: demoSketch,
  channel: browserTabChannel(),
  exchangeWorker: spawnExchangeWorker,
});
// A closing tab lets go of the autosave, so a tab waiting on it is told.
window.addEventListener('pagehide', () => runtime.dispose());
// Browser tests read the store through this handle (never used by the app itself).
(window as unknown as { __tautline?: unknown }).__tautline = runtime;

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <AppProvider store={runtime.store} api={documentApi}>
      <App />
    </AppProvider>
  </StrictMode>,
);
