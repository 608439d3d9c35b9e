import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProvider } from '@/app/provider';
import { AppRouter } from '@/app/router';

/** Renders the app into #root, replacing the shell index.html painted. */
export function startApp(root: HTMLElement): void {
  createRoot(root).render(
    <StrictMode>
      <AppProvider>
        <AppRouter />
      </AppProvider>
    </StrictMode>,
  );
}
