import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { AppProvider } from './app/provider';
import { createAppRouter } from './app/router';
import { createQueryClient } from './lib/query-client';
import { applyTheme, readStoredTheme } from './lib/theme';
import './styles/index.css';

applyTheme(readStoredTheme());

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no #root element');

const queryClient = createQueryClient();
const router = createAppRouter();

createRoot(container).render(
  <StrictMode>
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  </StrictMode>,
);
