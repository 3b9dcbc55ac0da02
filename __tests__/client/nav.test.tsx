import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { Text } from 'react-native';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import type { Role } from '@/shared/roles';
import type { SessionResponse } from '@/shared/schemas';
import AppLayout from '@/app/(app)/_layout';
import { AppShell } from '@/src/components/nav/app-shell';
import { activeNavKey, navItemsFor } from '@/src/components/nav/nav-items';
import { SessionProvider } from '@/src/hooks/use-session';

let mockWide = false;
jest.mock('@/src/hooks/use-breakpoint', () => ({
  useBreakpoint: () => ({ wide: mockWide, width: mockWide ? 1440 : 390 }),
}));
jest.mock('expo-router', () => {
  const { Text: T } = jest.requireActual('react-native');
  return {
    router: { navigate: jest.fn(), replace: jest.fn() },
    usePathname: () => '/vehicles/abc',
    Redirect: ({ href }: { href: string }) => <T testID="redirect">{href}</T>,
    Stack: () => <T testID="stack">stack</T>,
  };
});
const { router } = jest.requireMock('expo-router') as { router: Record<string, jest.Mock> };

const WS_A = 'aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa';
const WS_B = 'bbbbbbbb-bbbb-4bbb-8bbb-bbbbbbbbbbbb';

function session(roleA: Role, second = false): SessionResponse {
  return {
    user: {
      id: '11111111-1111-4111-8111-111111111111',
      name: 'Alma Ferrant',
      email: 'alma@example.test',
    },
    memberships: [
      {
        id: '33333333-3333-4333-8333-333333333333',
        workshopId: WS_A,
        workshopName: 'Ferrant Coachworks',
        role: roleA,
      },
      ...(second
        ? [
            {
              id: '44444444-4444-4444-8444-444444444444',
              workshopId: WS_B,
              workshopName: 'Lisk Body Shop',
              role: 'client' as const,
            },
          ]
        : []),
    ],
    csrfToken: 'c',
  };
}

let answers: Record<string, { status: number; body?: unknown } | Error> = {};
beforeEach(() => {
  mockWide = false;
  answers = {};
  jest.clearAllMocks();
  Object.defineProperty(globalThis, 'localStorage', { configurable: true, value: undefined });
  globalThis.fetch = jest.fn(async (url: string) => {
    const a = answers[url] ?? {
      status: 404,
      body: { error: { code: 'not_found', message: 'no' } },
    };
    if (a instanceof Error) throw a;
    return {
      ok: a.status < 300,
      status: a.status,
      text: async () => JSON.stringify(a.body),
    } as Response;
  }) as unknown as typeof fetch;
});

function renderWithSession(ui: React.ReactNode) {
  const client = new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity } },
  });
  return render(
    <SafeAreaProvider
      initialMetrics={{
        frame: { x: 0, y: 0, width: 390, height: 844 },
        insets: { top: 0, left: 0, right: 0, bottom: 0 },
      }}
    >
      <QueryClientProvider client={client}>
        <SessionProvider>{ui}</SessionProvider>
      </QueryClientProvider>
    </SafeAreaProvider>,
  );
}

const shell = () =>
  renderWithSession(
    <AppShell>
      <Text>content</Text>
    </AppShell>,
  );
const outboxOn = () => (answers['/api/dev/outbox'] = { status: 200, body: { items: [] } });

describe('navigation entries', () => {
  it('follows the role table: team for members.read roles, never for clients', () => {
    const keys = (role: Role, outbox: boolean) => navItemsFor(role, outbox).map((i) => i.key);
    expect(keys('owner', true)).toEqual(['due', 'vehicles', 'team', 'mail', 'settings', 'account']);
    expect(keys('applicator', false)).toEqual(['due', 'vehicles', 'team', 'settings', 'account']);
    expect(keys('client', true)).toEqual(['vehicles', 'mail', 'account']);
    expect(keys('client', false)).toEqual(['vehicles', 'account']);
  });

  it('marks the section a path belongs to', () => {
    expect(activeNavKey('/')).toBe('vehicles');
    expect(activeNavKey('/vehicles/x/surveys/new')).toBe('vehicles');
    expect(activeNavKey('/members')).toBe('team');
    expect(activeNavKey('/settings')).toBe('settings');
    expect(activeNavKey('/sign-in')).toBeNull();
  });
});

describe('AppShell', () => {
  it('on a phone shows a bottom bar with the owner’s entries, Mail once the outbox answers', async () => {
    answers['/api/auth/session'] = { status: 200, body: session('owner') };
    outboxOn();
    shell();
    await screen.findByTestId('nav-mail');
    expect(screen.getByTestId('bottom-bar')).toBeTruthy();
    expect(screen.queryByTestId('side-nav')).toBeNull();
    for (const key of ['vehicles', 'team', 'account'])
      expect(screen.getByTestId(`nav-${key}`)).toBeTruthy();
    expect(screen.getByTestId('nav-vehicles').props.accessibilityState).toMatchObject({
      selected: true,
    });
    expect(screen.getByTestId('nav-team').props.accessibilityState).toMatchObject({
      selected: false,
    });

    fireEvent.press(screen.getByTestId('nav-team'));
    expect(router.navigate).toHaveBeenCalledWith('/members');
  });

  it('hides Team from a client and Mail when the outbox is off (404)', async () => {
    answers['/api/auth/session'] = { status: 200, body: session('client') };
    shell();
    await screen.findByTestId('nav-account');
    await waitFor(() =>
      expect(globalThis.fetch).toHaveBeenCalledWith('/api/dev/outbox', expect.anything()),
    );
    expect(screen.queryByTestId('nav-team')).toBeNull();
    expect(screen.queryByTestId('nav-mail')).toBeNull();
  });

  it('on a wide screen shows side navigation with the workshop and a switcher', async () => {
    mockWide = true;
    answers['/api/auth/session'] = { status: 200, body: session('inspector', true) };
    shell();
    expect(await screen.findByTestId('side-nav')).toBeTruthy();
    expect(screen.queryByTestId('bottom-bar')).toBeNull();
    expect(screen.getByTestId('side-nav-workshop').props.children).toBe('Ferrant Coachworks');
    expect(screen.getByTestId('side-nav-team')).toBeTruthy();

    fireEvent.press(screen.getByTestId(`workshop-${WS_B}`));
    expect(router.replace).toHaveBeenCalledWith('/vehicles');
    await waitFor(() =>
      expect(screen.getByTestId('side-nav-workshop').props.children).toBe('Lisk Body Shop'),
    );
    // The role of the newly chosen workshop (client) decides the entries.
    expect(screen.queryByTestId('side-nav-team')).toBeNull();
  });
});

describe('signed-in layout', () => {
  it('sends a signed-out visitor to sign-in', async () => {
    answers['/api/auth/session'] = {
      status: 401,
      body: { error: { code: 'unauthenticated', message: 'no' } },
    };
    renderWithSession(<AppLayout />);
    expect(screen.getByTestId('loading-view')).toBeTruthy();
    expect((await screen.findByTestId('redirect')).props.children).toBe('/sign-in');
  });

  it('offers a retry, not the sign-in page, when the server cannot be reached', async () => {
    answers['/api/auth/session'] = new TypeError('Failed to fetch');
    renderWithSession(<AppLayout />);
    expect(await screen.findByTestId('error-view')).toBeTruthy();
    expect(screen.queryByTestId('redirect')).toBeNull();

    answers['/api/auth/session'] = { status: 200, body: session('owner') };
    fireEvent.press(screen.getByTestId('error-retry'));
    expect(await screen.findByTestId('stack')).toBeTruthy();
  });
});
