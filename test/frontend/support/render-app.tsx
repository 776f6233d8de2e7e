import { afterEach, vi, type Mock } from 'vitest';
import { cleanup, render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProvider } from '@/app/provider';
import { routes } from '@/app/router';
import { createQueryClient } from '@/lib/query-client';
import type { AppMetaDto, MeDto } from '@shared/schemas/auth.schema';
import { buildMeta } from './fixtures';

export interface MockResponse {
  status?: number;
  body?: unknown;
  headers?: Record<string, string>;
}

export interface ApiRequest {
  method: string;
  url: URL;
  body: unknown;
  headers: Record<string, string>;
}

/** Answers one request; return undefined to fall through to the next handler. */
export type Handler = (request: ApiRequest) => MockResponse | undefined | Promise<MockResponse | undefined>;

export const json = (body: unknown, status = 200, headers: Record<string, string> = {}): MockResponse => ({ status, body, headers });
export const apiError = (status: number, code: string, message: string, field?: string, headers: Record<string, string> = {}): MockResponse => ({
  status,
  body: { error: { code, message, ...(field ? { field } : {}) } },
  headers,
});

/** Routes by "METHOD /path"; the most recently added handler for a route wins. */
export class MockApi {
  readonly requests: ApiRequest[] = [];
  private readonly handlers = new Map<string, Handler[]>();
  readonly fetch: Mock;

  constructor() {
    this.fetch = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
      const url = new URL(typeof input === 'string' ? input : input instanceof URL ? input.href : input.url, 'http://localhost');
      const method = (init.method ?? 'GET').toUpperCase();
      const headers = Object.fromEntries(new Headers(init.headers).entries());
      const body = typeof init.body === 'string' && init.body ? JSON.parse(init.body) : undefined;
      const request: ApiRequest = { method, url, body, headers };
      this.requests.push(request);
      for (const handler of [...(this.handlers.get(`${method} ${url.pathname}`) ?? [])].reverse()) {
        const answer = await handler(request);
        if (answer) return toResponse(answer);
      }
      return toResponse(apiError(404, 'not_found', `No mock for ${method} ${url.pathname}`));
    });
  }

  on(route: string, handler: Handler | MockResponse): this {
    const list = this.handlers.get(route) ?? [];
    list.push(typeof handler === 'function' ? handler : () => handler);
    this.handlers.set(route, list);
    return this;
  }

  /** A handler that answers only when no handler added with `on` does. */
  fallback(route: string, handler: Handler | MockResponse): this {
    const list = this.handlers.get(route) ?? [];
    list.unshift(typeof handler === 'function' ? handler : () => handler);
    this.handlers.set(route, list);
    return this;
  }

  /** Requests to one path, oldest first. */
  calls(method: string, pathname: string): ApiRequest[] {
    return this.requests.filter((r) => r.method === method && r.url.pathname === pathname);
  }

  last(method: string, pathname: string): ApiRequest | undefined {
    return this.calls(method, pathname).at(-1);
  }
}

function toResponse({ status = 200, body, headers = {} }: MockResponse): Response {
  if (status === 204 || body === undefined) return new Response(null, { status, headers });
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json', ...headers } });
}

interface RenderAppOptions {
  meta?: AppMetaDto;
  /** The signed-in user; null for nobody signed in. */
  me?: MeDto | null;
  api?: MockApi;
}

/** Renders the whole app at `path` over a mocked API. */
export function renderApp(path: string, { meta = buildMeta(), me = null, api = new MockApi() }: RenderAppOptions = {}) {
  api.fallback('GET /api/meta', json({ data: meta }));
  api.fallback('GET /api/auth/me', () => (me ? json({ data: me }) : apiError(401, 'unauthenticated', 'Sign in to continue.')));
  vi.stubGlobal('fetch', api.fetch);

  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({
    queries: { ...queryClient.getDefaultOptions().queries, retry: false },
    mutations: { retry: false },
  });
  const router = createMemoryRouter(routes, { initialEntries: [path] });
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, api, router, queryClient };
}

/** Registers the clean-up every DOM test file needs (this project runs vitest without globals). */
export function registerDomCleanup() {
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });
}

// jsdom does not scroll; the router restores scroll positions on navigation.
window.scrollTo = () => {};
