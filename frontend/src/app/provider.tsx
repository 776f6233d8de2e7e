import { useState, type ReactNode } from 'react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { createQueryClient } from '@/lib/query-client';
import { ErrorBoundary } from '@/components/ui/error-boundary';
import { ToastProvider } from '@/components/ui/toast';

export function AppProvider({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createQueryClient());
  return (
    <ErrorBoundary
      fallback={() => (
        <main className="mx-auto flex min-h-dvh max-w-lg flex-col justify-center gap-4 p-6">
          <h1 className="text-2xl font-bold text-ink-950">Ferrule stopped unexpectedly</h1>
          <p className="text-ink-700">Reload the page to start again. Anything you had already saved is kept.</p>
          <button
            type="button"
            onClick={() => window.location.reload()}
            className="min-h-11 self-start rounded-[var(--radius-control)] bg-copper-700 px-4 font-semibold text-white hover:bg-copper-800"
          >
            Reload
          </button>
        </main>
      )}
    >
      <QueryClientProvider client={client}>
        <ToastProvider>{children}</ToastProvider>
      </QueryClientProvider>
    </ErrorBoundary>
  );
}
