import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '@ui/fonts.ts';
import './index.css';
import { AppProvider } from '@ui/app-provider.tsx';
import { router } from './app/router.tsx';

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <AppProvider router={router} />
  </StrictMode>,
);
