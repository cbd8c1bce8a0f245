import { MantineProvider } from '@mantine/core';
import { Notifications } from '@mantine/notifications';
import { QueryClientProvider } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { AppErrorFallback } from '@/components/errors/app-error-fallback';
import { ErrorBoundary } from '@/components/errors/error-boundary';
import { SessionGate } from '@/features/auth/components/session-gate';
import { queryClient } from '@/lib/query-client';
import { cssVariablesResolver, theme } from '@/theme';

export function AppProvider({ children }: { children: ReactNode }) {
  return (
    <MantineProvider theme={theme} cssVariablesResolver={cssVariablesResolver} defaultColorScheme="light">
      <ErrorBoundary fallback={({ error }) => <AppErrorFallback error={error} />}>
        <Notifications position="top-right" />
        <QueryClientProvider client={queryClient}>
          <SessionGate>{children}</SessionGate>
        </QueryClientProvider>
      </ErrorBoundary>
    </MantineProvider>
  );
}
