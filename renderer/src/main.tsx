// Renderer entry: starts the workspace with the desktop API of this environment.
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './App.js';
import { WorkspaceContext } from './state/workspace-context.js';
import { WorkspaceController } from './state/workspace-controller.js';
import { desktopApi } from './desktop/desktop-api.js';
import './styles.css';

const controller = new WorkspaceController(desktopApi());
const container = document.getElementById('root');
if (container !== null) {
  createRoot(container).render(
    <StrictMode>
      <WorkspaceContext.Provider value={controller}>
        <App />
      </WorkspaceContext.Provider>
    </StrictMode>,
  );
}

// What the workspace did (finished runs, notices, cohort readouts), readable after the screen has
// moved on: `__zeitlightActivity()` in the page returns the entries, oldest first.
Object.defineProperty(globalThis, '__zeitlightActivity', { value: () => controller.store.activity.entries(), configurable: true });

void controller.start();

window.addEventListener('beforeunload', (event) => {
  const state = controller.store.getSnapshot();
  if (desktopApi().platform === 'web' && state.history.present !== null && state.history.present !== state.saved) event.preventDefault();
});
