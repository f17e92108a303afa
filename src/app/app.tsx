import { useState } from 'react';
import { RouterProvider } from 'react-router-dom';
import { queryClient } from '@/lib/query-client.ts';
import { AppProvider } from './provider.tsx';
import { createAppRouter } from './router.tsx';

export function App() {
  // One router for the page's life; creating it in render would reset navigation state.
  const [router] = useState(() => createAppRouter(queryClient));
  return (
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  );
}
