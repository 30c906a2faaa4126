import '@fontsource/noto-sans/400.css';
import '@fontsource/noto-sans/500.css';
import '@fontsource/noto-sans/600.css';
import '@fontsource/noto-sans/700.css';
import './app/global.css';
import { RendererProvider } from '@fluentui/react-components';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider, createBrowserRouter } from 'react-router-dom';
import { AppProviders } from './app/AppProviders';
import { createQueryClient } from './app/create-query-client';
import { appRoutes } from './app/routes';
import { createStyleRenderer } from './app/style-renderer';
import { createApiClient } from './lib/api-client';

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element');

const router = createBrowserRouter(appRoutes);

createRoot(root).render(
  <StrictMode>
    <RendererProvider renderer={createStyleRenderer(document)} targetDocument={document}>
      <AppProviders apiClient={createApiClient()} queryClient={createQueryClient()}>
        <RouterProvider router={router} />
      </AppProviders>
    </RendererProvider>
  </StrictMode>,
);
