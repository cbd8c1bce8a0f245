import { MantineProvider } from '@mantine/core';
import { Notifications } from '@mantine/notifications';
import { QueryClientProvider } from '@tanstack/react-query';
import { render as rtlRender, type RenderOptions } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactElement, ReactNode } from 'react';
import { MemoryRouter } from 'react-router-dom';
import { createQueryClient } from '@/lib/query-client';
import { cssVariablesResolver, theme } from '@/theme';

type Options = Omit<RenderOptions, 'wrapper'> & { route?: string };

/** Renders with the app's providers (Mantine in test mode, a fresh query client, a memory router). */
export function render(ui: ReactElement, { route = '/', ...options }: Options = {}) {
  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({ queries: { retry: false, staleTime: Infinity }, mutations: { retry: false } });
  const Wrapper = ({ children }: { children: ReactNode }) => (
    <MantineProvider theme={theme} cssVariablesResolver={cssVariablesResolver} env="test">
      <Notifications />
      <QueryClientProvider client={queryClient}>
        <MemoryRouter initialEntries={[route]}>{children}</MemoryRouter>
      </QueryClientProvider>
    </MantineProvider>
  );
  return { user: userEvent.setup({ delay: null }), queryClient, ...rtlRender(ui, { wrapper: Wrapper, ...options }) };
}

/** A JSON `Response`, for fetch stand-ins at the network boundary. */
export function jsonResponse(status: number, body?: unknown, headers: Record<string, string> = {}): Response {
  return new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json', ...headers },
  });
}

export * from '@testing-library/react';
