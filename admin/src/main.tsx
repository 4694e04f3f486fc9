import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProvider } from './app/provider';
import { AppRouter } from './app/router';
// Kept after react-dom, not sorted to the top: the bundle lays modules out in first-import order,
// and this entry (it also exports Chakra parts) placed before React DOM makes the startup script
// compress about 0.4 KiB worse.
import { createQueryClient } from '@nappe/web-kit/react';

const queryClient = createQueryClient();
const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element.');

createRoot(root).render(
  <StrictMode>
    <AppProvider queryClient={queryClient}>
      <AppRouter queryClient={queryClient} />
    </AppProvider>
  </StrictMode>,
);
