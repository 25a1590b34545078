import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { render } from '@testing-library/react-native';
import type { ReactElement, ReactNode } from 'react';
import { createQueryClient } from '../../../hooks/queryClient';
import { ThemeProvider } from '../../../theme';

/** Renders inside the theme; `rerender` keeps the theme around the new element. */
export function renderThemed(ui: ReactElement) {
  return render(ui, { wrapper: ThemeProvider });
}

/**
 * Renders with the app's own query client settings, minus retries so failures show at once;
 * an infinite gcTime schedules no clean-up timers that would keep jest from exiting.
 */
export function renderWithQueries(ui: ReactElement, client: QueryClient = testQueryClient()) {
  const wrapper = ({ children }: { children: ReactNode }) => (
    <QueryClientProvider client={client}>
      <ThemeProvider>{children}</ThemeProvider>
    </QueryClientProvider>
  );
  return { client, ...render(ui, { wrapper }) };
}

export function testQueryClient(): QueryClient {
  const client = createQueryClient();
  client.setDefaultOptions({ queries: { retry: false, gcTime: Infinity }, mutations: { retry: false, gcTime: Infinity } });
  return client;
}

type StubbedCall = { url: string; method: string; headers: Record<string, string>; body: unknown };
type StubbedAnswer = { status: number; body?: unknown };

/**
 * Replaces global fetch with a scripted server: each call is recorded and answered by `answer`.
 * Only for these component tests; server and browser tests talk to the real server.
 */
export function stubFetch(answer: (call: StubbedCall) => StubbedAnswer) {
  const calls: StubbedCall[] = [];
  const fetchMock = jest.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const call: StubbedCall = {
      url: String(input),
      method: init?.method ?? 'GET',
      headers: (init?.headers ?? {}) as Record<string, string>,
      body: typeof init?.body === 'string' ? JSON.parse(init.body) : undefined,
    };
    calls.push(call);
    const { status, body } = answer(call);
    return {
      ok: status >= 200 && status < 300,
      status,
      json: async () => {
        if (body === undefined) throw new SyntaxError('Unexpected end of JSON input');
        return body;
      },
    } as Response;
  });
  global.fetch = fetchMock as unknown as typeof fetch;
  return { calls, fetchMock };
}
