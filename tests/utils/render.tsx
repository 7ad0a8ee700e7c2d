// RNTL reads react-native's StyleSheet internally; under the web preset that needs React Native's jest
// natives first. Keep this import first in the file, and import this file first in every client test.
import '@react-native/jest-preset/jest/setup';

import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, type RenderOptions } from '@testing-library/react-native';
import type { ReactElement, ReactNode } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { renderRouter, type MockContextConfig } from 'expo-router/testing-library';

import { AppThemeProvider } from '@/components/ui/theme-provider';

export function createTestQueryClient() {
  return new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity }, mutations: { retry: false } },
  });
}

const metrics = { frame: { x: 0, y: 0, width: 390, height: 844 }, insets: { top: 0, left: 0, right: 0, bottom: 0 } };

export function Providers({ children, queryClient }: { children: ReactNode; queryClient: QueryClient }) {
  return (
    <SafeAreaProvider initialMetrics={metrics}>
      <QueryClientProvider client={queryClient}>
        <AppThemeProvider initialPreference="light">{children}</AppThemeProvider>
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}

/** Render with a fresh QueryClient (no retries), the theme and safe-area metrics. */
export function renderWithProviders(
  ui: ReactElement,
  { queryClient = createTestQueryClient(), ...options }: RenderOptions & { queryClient?: QueryClient } = {},
) {
  return {
    queryClient,
    ...render(ui, {
      ...options,
      wrapper: ({ children }) => <Providers queryClient={queryClient}>{children}</Providers>,
    }),
  };
}

/** A wrapper for `renderRouter(..., { wrapper })`. */
export function providersWrapper(queryClient = createTestQueryClient()) {
  return function Wrapper({ children }: { children: ReactNode }) {
    return <Providers queryClient={queryClient}>{children}</Providers>;
  };
}

/**
 * renderRouter with our providers. renderRouter switches jest to fake timers; RNTL's cleanup then
 * waits on a timer that never fires under this preset, so real timers come back right after rendering.
 */
export function renderRoute(
  routes: MockContextConfig,
  { initialUrl, queryClient = createTestQueryClient() }: { initialUrl: string; queryClient?: QueryClient },
) {
  const result = renderRouter(routes, { initialUrl, wrapper: providersWrapper(queryClient) });
  jest.useRealTimers();
  return { ...result, queryClient };
}

// ---- fetch stubs with real Response objects ----
// jsdom has no fetch API; whatwg-fetch (React Native's own fetch polyfill) supplies a spec Response.
// eslint-disable-next-line @typescript-eslint/no-require-imports -- the polyfill ships CommonJS only and must load before the stubs
const { Response: FetchResponse } = require('whatwg-fetch') as { Response: typeof Response };

export function jsonResponse(status: number, body?: unknown): Response {
  return new FetchResponse(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  }) as unknown as Response;
}

export function errorResponse(status: number, code: string, message: string, fields?: Record<string, string>) {
  return jsonResponse(status, { error: { code, message, ...(fields ? { fields } : {}) } });
}

export type FetchCall = { url: string; method: string; body: unknown };
type Handler = (call: FetchCall) => Response | Promise<Response>;

/** Replaces global fetch; each call is recorded with its parsed JSON body. */
export function stubFetch(handler: Handler) {
  const calls: FetchCall[] = [];
  const fetchMock = jest.fn(async (input: unknown, init?: { method?: string; body?: unknown }) => {
    const call = {
      url: String(input),
      method: init?.method ?? 'GET',
      body: typeof init?.body === 'string' ? JSON.parse(init.body) : undefined,
    };
    calls.push(call);
    return handler(call);
  });
  globalThis.fetch = fetchMock as unknown as typeof fetch;
  return { calls, fetchMock };
}

/** A fetch that never answers, to hold a query in its loading state. */
export function pendingFetch() {
  return stubFetch(() => new Promise<Response>(() => {}));
}

// ---- text queries ----
// Under react-native-web the host elements are DOM names (div, input), which RNTL's getByText does not
// recognise. Interactive elements are found by label (getByLabelText works); visible words with these.

type JsonNode = { type: string; props: Record<string, unknown>; children: (JsonNode | string)[] | null };

function collectText(node: JsonNode | JsonNode[] | string | null): string {
  if (node == null) return '';
  if (typeof node === 'string') return node;
  if (Array.isArray(node)) return node.map(collectText).join(' ');
  return (node.children ?? []).map(collectText).join('');
}

/** All visible text on screen, with runs of white space collapsed. */
export function screenText(): string {
  return collectText(screen.toJSON() as JsonNode | JsonNode[] | null)
    .replace(/\s+/g, ' ')
    .trim();
}
