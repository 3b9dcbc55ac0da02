import { QueryClient, QueryClientProvider, useQuery } from '@tanstack/react-query';
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { Text } from 'react-native';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import type { SessionResponse } from '@/shared/schemas';
import { ApiRequestError, request } from '@/src/api/client';
import { shouldRetry } from '@/src/api/query-client';
import { SessionProvider, useRole, useSession, type SessionValue } from '@/src/hooks/use-session';
import SignIn from '@/app/(auth)/sign-in';

jest.mock('expo-router', () => {
  const { Text: T } = jest.requireActual('react-native');
  return { Link: ({ children }: { children: React.ReactNode }) => <T>{children}</T> };
});

const ALICE = '11111111-1111-4111-8111-111111111111';
const BRUNO = '22222222-2222-4222-8222-222222222222';
const WS_A = 'aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa';
const WS_B = 'bbbbbbbb-bbbb-4bbb-8bbb-bbbbbbbbbbbb';

function session(userId: string, csrf: string): SessionResponse {
  return {
    user: {
      id: userId,
      name: userId === ALICE ? 'Alma Ferrant' : 'Bruno Lisk',
      email: 'x@example.test',
    },
    memberships: [
      {
        id: '33333333-3333-4333-8333-333333333333',
        workshopId: WS_A,
        workshopName: 'Ferrant Coachworks',
        role: 'owner',
      },
      {
        id: '44444444-4444-4444-8444-444444444444',
        workshopId: WS_B,
        workshopName: 'Lisk Body Shop',
        role: 'client',
      },
    ],
    csrfToken: csrf,
  };
}

type Call = { method: string; path: string; headers: Record<string, string>; body?: unknown };
let calls: Call[] = [];
let routes: Record<string, () => { status: number; body?: unknown }> = {};

function json(status: number, body?: unknown) {
  return {
    ok: status >= 200 && status < 300,
    status,
    text: async () => (body === undefined ? '' : JSON.stringify(body)),
  } as Response;
}

beforeEach(() => {
  calls = [];
  routes = {};
  const store = new Map<string, string>();
  Object.defineProperty(globalThis, 'localStorage', {
    configurable: true,
    value: {
      getItem: (k: string) => store.get(k) ?? null,
      setItem: (k: string, v: string) => store.set(k, v),
    },
  });
  globalThis.fetch = jest.fn(async (url: string, init: RequestInit = {}) => {
    const method = init.method ?? 'GET';
    const path = String(url);
    calls.push({
      method,
      path,
      headers: (init.headers ?? {}) as Record<string, string>,
      body: init.body ? JSON.parse(String(init.body)) : undefined,
    });
    const route = routes[`${method} ${path}`];
    if (!route) throw new Error(`unexpected ${method} ${path}`);
    const { status, body } = route();
    return json(status, body);
  }) as unknown as typeof fetch;
});

// gcTime Infinity: no garbage-collection timers left running after a test (jest would wait for them).
const testClient = () =>
  new QueryClient({
    defaultOptions: {
      queries: { retry: false, gcTime: Infinity },
      mutations: { gcTime: Infinity },
    },
  });

let current: SessionValue;
const keep = (value: SessionValue) => {
  current = value;
};
function Probe() {
  const value = useSession();
  keep(value);
  const role = useRole();
  return (
    <Text testID="probe">
      {current.status}|{current.user?.name ?? '-'}|{current.active?.workshopName ?? '-'}|{role}
    </Text>
  );
}

function renderSession(client = testClient()) {
  const utils = render(
    <QueryClientProvider client={client}>
      <SessionProvider>
        <Probe />
      </SessionProvider>
    </QueryClientProvider>,
  );
  return { ...utils, client };
}

const probe = () => screen.getByTestId('probe').props.children.join('');

describe('SessionProvider', () => {
  it('is signed out when the session check answers 401', async () => {
    routes['GET /api/auth/session'] = () => ({
      status: 401,
      body: { error: { code: 'unauthenticated', message: 'Sign in' } },
    });
    renderSession();
    expect(probe()).toBe('loading|-|-|client');
    await waitFor(() => expect(probe()).toBe('signed-out|-|-|client'));
    expect(current.loadError).toBeNull();
  });

  it('keeps a network failure apart from being signed out', async () => {
    routes['GET /api/auth/session'] = () => {
      throw new TypeError('Failed to fetch');
    };
    renderSession();
    await waitFor(() => expect(current.status).toBe('signed-out'));
    expect(current.loadError).toBeTruthy();
  });

  it('signs in, sends the CSRF token from the session answer, and opens the first workshop', async () => {
    routes['GET /api/auth/session'] = () => ({
      status: 401,
      body: { error: { code: 'unauthenticated', message: '' } },
    });
    routes['POST /api/auth/sign-in'] = () => ({ status: 200, body: session(ALICE, 'csrf-one') });
    renderSession();
    await waitFor(() => expect(current.status).toBe('signed-out'));

    await act(() => current.signIn({ email: 'alma@example.test', password: 'long enough' }));
    expect(probe()).toBe('signed-in|Alma Ferrant|Ferrant Coachworks|owner');

    routes['POST /api/workshops/x'] = () => ({ status: 204 });
    await request('POST', '/api/workshops/x');
    expect(calls.at(-1)?.headers['x-csrf-token']).toBe('csrf-one');
  });

  it('remembers the chosen workshop across a reload and uses its role', async () => {
    routes['GET /api/auth/session'] = () => ({ status: 200, body: session(ALICE, 'c') });
    const first = renderSession();
    await waitFor(() => expect(current.status).toBe('signed-in'));
    act(() => current.setActiveWorkshop(WS_B));
    expect(probe()).toBe('signed-in|Alma Ferrant|Lisk Body Shop|client');
    first.unmount();

    renderSession();
    await waitFor(() => expect(probe()).toBe('signed-in|Alma Ferrant|Lisk Body Shop|client'));
  });

  it('clears cached data when the person changes, so nothing of theirs shows to the next', async () => {
    routes['GET /api/auth/session'] = () => ({ status: 200, body: session(ALICE, 'c') });
    routes['POST /api/auth/sign-out'] = () => ({ status: 204 });
    const { client } = renderSession();
    await waitFor(() => expect(current.status).toBe('signed-in'));
    client.setQueryData(['vehicles', WS_A, 'list', {}], [{ id: 'secret' }]);

    await act(() => current.signOut());
    expect(current.status).toBe('signed-out');
    expect(client.getQueryData(['vehicles', WS_A, 'list', {}])).toBeUndefined();
    expect(calls.some((c) => c.method === 'POST' && c.path === '/api/auth/sign-out')).toBe(true);

    client.setQueryData(['vehicles', WS_A, 'list', {}], [{ id: 'left over' }]);
    routes['POST /api/auth/sign-in'] = () => ({ status: 200, body: session(BRUNO, 'c2') });
    await act(() => current.signIn({ email: 'bruno@example.test', password: 'long enough' }));
    expect(current.user?.id).toBe(BRUNO);
    expect(client.getQueryData(['vehicles', WS_A, 'list', {}])).toBeUndefined();
  });

  it('signs out when any query is answered 401 (expired session)', async () => {
    routes['GET /api/auth/session'] = () => ({ status: 200, body: session(ALICE, 'c') });
    routes['GET /api/things'] = () => ({
      status: 401,
      body: { error: { code: 'unauthenticated', message: 'expired' } },
    });
    function Things() {
      useQuery({ queryKey: ['things'], queryFn: () => request('GET', '/api/things') });
      return null;
    }
    const client = testClient();
    render(
      <QueryClientProvider client={client}>
        <SessionProvider>
          <Probe />
          <Things />
        </SessionProvider>
      </QueryClientProvider>,
    );
    await waitFor(() => expect(current.status).toBe('signed-out'));
  });
});

describe('query retry policy', () => {
  it('retries network and server failures but never a 4xx', async () => {
    expect(shouldRetry(0, new ApiRequestError(404, 'not_found', ''))).toBe(false);
    expect(shouldRetry(0, new ApiRequestError(409, 'stale_version', ''))).toBe(false);
    expect(shouldRetry(0, new ApiRequestError(0, 'network', ''))).toBe(true);
    expect(shouldRetry(0, new ApiRequestError(503, 'http_503', ''))).toBe(true);
    expect(shouldRetry(2, new ApiRequestError(503, 'http_503', ''))).toBe(false);
  });
});

describe('sign-in screen', () => {
  it('checks the fields first, then shows the server’s words for a wrong password', async () => {
    routes['GET /api/auth/session'] = () => ({
      status: 401,
      body: { error: { code: 'unauthenticated', message: '' } },
    });
    const client = testClient();
    render(
      <SafeAreaProvider
        initialMetrics={{
          frame: { x: 0, y: 0, width: 390, height: 844 },
          insets: { top: 0, left: 0, right: 0, bottom: 0 },
        }}
      >
        <QueryClientProvider client={client}>
          <SessionProvider>
            <SignIn />
            <Probe />
          </SessionProvider>
        </QueryClientProvider>
      </SafeAreaProvider>,
    );
    await waitFor(() => expect(current.status).toBe('signed-out'));

    fireEvent.press(screen.getByTestId('sign-in-submit'));
    expect(await screen.findByText('Enter a valid e-mail address')).toBeTruthy();
    expect(screen.getByText('Enter your password')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);

    routes['POST /api/auth/sign-in'] = () => ({
      status: 401,
      body: {
        error: {
          code: 'unauthenticated',
          message: 'That e-mail and password do not match an account.',
        },
      },
    });
    fireEvent.changeText(screen.getByTestId('sign-in-email'), ' Owner@Example.test ');
    fireEvent.changeText(screen.getByTestId('sign-in-password'), 'not the one');
    fireEvent.press(screen.getByTestId('sign-in-submit'));
    expect(
      await screen.findByText('That e-mail and password do not match an account.'),
    ).toBeTruthy();
    expect(calls.at(-1)?.body).toEqual({ email: 'owner@example.test', password: 'not the one' });
    expect(current.status).toBe('signed-out');
  });
});
