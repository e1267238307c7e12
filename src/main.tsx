import '@fontsource/noto-sans/400.css';
import '@fontsource/noto-sans/500.css';
import '@fontsource/noto-sans/600.css';
import '@fontsource/noto-sans-mono/400.css';
import '@fontsource/noto-sans-mono/600.css';
import './styles.css';
import { QueryClientProvider } from '@tanstack/react-query';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { routes } from './App';
import { meKey } from './features/auth/api/queries';
import { createQueryClient } from './lib/queryClient';

// A 401 anywhere means the session ended: forgetting "me" lets AppLayout send the person to sign-in.
const queryClient = createQueryClient(() => queryClient.setQueryData(meKey, null));
const router = createBrowserRouter(routes);

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  </StrictMode>,
);
