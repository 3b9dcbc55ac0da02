import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import type { ReactNode } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import type { Role } from '@/shared/roles';
import type { VehicleResponse } from '@/shared/schemas';
import { ToastProvider } from '@/src/components/ui';
import EditVehicle from '@/app/(app)/vehicles/[vehicleId]/edit';
import NewVehicle from '@/app/(app)/vehicles/new';

const WID = 'aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa';
const VID = 'cccccccc-cccc-4ccc-8ccc-cccccccccccc';
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

let mockRole: Role = 'inspector';
jest.mock('@/src/hooks/use-session', () => ({ useWorkshopId: () => WID, useRole: () => mockRole }));
jest.mock('expo-router', () => ({
  router: {
    replace: jest.fn(),
    back: jest.fn(),
    push: jest.fn(),
    dismissTo: jest.fn(),
    canGoBack: () => false,
  },
  useLocalSearchParams: () => ({ vehicleId: 'cccccccc-cccc-4ccc-8ccc-cccccccccccc' }),
}));
// A known, small plan list whatever the real body-plan data holds.
jest.mock('@/shared/body-plans', () => {
  const actual = jest.requireActual('@/shared/body-plans');
  const { fixturePlan } = jest.requireActual('./fixtures/fixture-plan');
  return {
    ...actual,
    BODY_PLANS: [fixturePlan],
    getBodyPlan: (k: string) => (k === fixturePlan.key ? fixturePlan : undefined),
  };
});
const { router } = jest.requireMock('expo-router') as { router: Record<string, jest.Mock> };

type Reply = { status: number; body?: unknown } | Error;
/** Writes are answered from this queue in order; reads get the server's current vehicle. */
let replies: Reply[] = [];
let onServer: VehicleResponse;
let sent: { method: string; url: string; body?: Record<string, unknown> }[] = [];
const writes = () => sent.filter((s) => s.method !== 'GET');

beforeEach(() => {
  mockRole = 'inspector';
  replies = [];
  sent = [];
  onServer = vehicle();
  jest.clearAllMocks();
  globalThis.fetch = jest.fn(async (url: string, init: RequestInit = {}) => {
    const method = init.method ?? 'GET';
    sent.push({ method, url, body: init.body ? JSON.parse(String(init.body)) : undefined });
    const r: Reply | undefined =
      method === 'GET'
        ? { status: 200, body: url.endsWith(VID) ? onServer : { items: [onServer] } }
        : replies.shift();
    if (!r) throw new Error(`no reply queued for ${method} ${url}`);
    if (r instanceof Error) throw r;
    return {
      ok: r.status < 300,
      status: r.status,
      text: async () => (r.body === undefined ? '' : JSON.stringify(r.body)),
    } as Response;
  }) as unknown as typeof fetch;
});

function vehicle(over: Partial<VehicleResponse> = {}): VehicleResponse {
  return {
    id: VID,
    workshopId: WID,
    year: 1931,
    make: 'Halvard',
    model: 'Tourer Six',
    bodyPlanKey: 'fixture-box',
    chassisNumber: 'HX-204',
    bodyNumber: '',
    clientName: 'Ines Marlow',
    storage: 'indoors',
    stage: 'intake',
    notes: '',
    version: 3,
    createdAt: '2025-04-01T09:00:00.000Z',
    updatedAt: '2025-04-01T09:00:00.000Z',
    deletedAt: null,
    summary: { surveys: 0, findings: 0, worstSeverity: null, lastSurveyDate: null },
    ...over,
  };
}

function wrap(children: ReactNode) {
  const client = new QueryClient({
    defaultOptions: {
      queries: { retry: false, gcTime: Infinity },
      mutations: { gcTime: Infinity },
    },
  });
  return render(
    <SafeAreaProvider
      initialMetrics={{
        frame: { x: 0, y: 0, width: 390, height: 844 },
        insets: { top: 0, left: 0, right: 0, bottom: 0 },
      }}
    >
      <QueryClientProvider client={client}>
        <ToastProvider>{children}</ToastProvider>
      </QueryClientProvider>
    </SafeAreaProvider>,
  );
}

function fillValidVehicle() {
  fireEvent.changeText(screen.getByTestId('vehicle-year'), '1931');
  fireEvent.changeText(screen.getByTestId('vehicle-make'), 'Halvard');
  fireEvent.changeText(screen.getByTestId('vehicle-model'), 'Tourer Six');
  fireEvent.press(screen.getByTestId('body-plan-fixture-box'));
}

describe('new vehicle form', () => {
  it('checks the fields with the shared schema before sending anything', async () => {
    wrap(<NewVehicle />);
    fireEvent.press(screen.getByTestId('vehicle-submit'));
    expect(await screen.findByText('Enter the make')).toBeTruthy();
    expect(screen.getByText('Enter the model')).toBeTruthy();
    expect(screen.getByTestId('body-plan-error').props.children).toBe('Choose a body plan');
    expect(screen.getByText('Enter the year as four digits, e.g. 1931')).toBeTruthy();
    expect(globalThis.fetch).not.toHaveBeenCalled();

    fireEvent.changeText(screen.getByTestId('vehicle-year'), '1700');
    fireEvent.press(screen.getByTestId('vehicle-submit'));
    expect(await screen.findByText('Year looks too early')).toBeTruthy();
  });

  it('retries a create with the same client-made id, then opens the new vehicle', async () => {
    wrap(<NewVehicle />);
    fillValidVehicle();
    replies.push(new TypeError('Failed to fetch'));
    fireEvent.press(screen.getByTestId('vehicle-submit'));
    expect(await screen.findByText(/Cannot reach the Soundframe server/)).toBeTruthy();

    replies.push({ status: 201, body: vehicle() });
    fireEvent.press(screen.getByTestId('vehicle-submit'));
    await waitFor(() => expect(router.replace).toHaveBeenCalledWith(`/vehicles/${VID}`));

    expect(writes()).toHaveLength(2);
    const [first, second] = writes();
    expect(first.method).toBe('POST');
    expect(first.url).toBe(`/api/workshops/${WID}/vehicles`);
    expect(first.body?.id).toMatch(UUID);
    expect(second.body?.id).toBe(first.body?.id);
    expect(second.body).toMatchObject({
      year: 1931,
      make: 'Halvard',
      model: 'Tourer Six',
      bodyPlanKey: 'fixture-box',
      stage: 'intake',
    });
  });

  it('shows the server’s field errors beside their fields', async () => {
    wrap(<NewVehicle />);
    fillValidVehicle();
    replies.push({
      status: 400,
      body: {
        error: {
          code: 'validation_failed',
          message: 'Check the fields',
          fields: { bodyPlanKey: 'Unknown body plan' },
        },
      },
    });
    fireEvent.press(screen.getByTestId('vehicle-submit'));
    expect(await screen.findByText('Unknown body plan')).toBeTruthy();
    expect(screen.queryByTestId('form-message')).toBeNull();
  });

  it('is not offered to a role that cannot add vehicles', () => {
    mockRole = 'client';
    wrap(<NewVehicle />);
    expect(screen.queryByTestId('vehicle-form')).toBeNull();
    expect(screen.getByText('Your role in this workshop cannot add vehicles.')).toBeTruthy();
  });
});

describe('edit vehicle form', () => {
  it('sends the loaded version and, on a stale one, reloads the other person’s changes', async () => {
    wrap(<EditVehicle />);
    const model = await screen.findByTestId('vehicle-model');
    fireEvent.changeText(model, 'Tourer Eight');

    onServer = vehicle({ version: 4, model: 'Tourer Six Special' });
    replies.push({ status: 409, body: { error: { code: 'stale_version', message: 'stale' } } });
    fireEvent.press(screen.getByTestId('vehicle-submit'));
    expect(await screen.findByTestId('stale-version')).toBeTruthy();
    expect(writes()[0]).toMatchObject({
      method: 'PATCH',
      url: `/api/workshops/${WID}/vehicles/${VID}`,
    });
    expect(writes()[0].body).toMatchObject({ version: 3, model: 'Tourer Eight' });

    fireEvent.press(screen.getByTestId('reload-vehicle'));
    await waitFor(() =>
      expect(screen.getByTestId('vehicle-model').props.value).toBe('Tourer Six Special'),
    );
    expect(screen.queryByTestId('stale-version')).toBeNull();

    replies.push({ status: 200, body: vehicle({ version: 5, model: 'Tourer Six Special' }) });
    fireEvent.press(screen.getByTestId('vehicle-submit'));
    await waitFor(() => expect(router.replace).toHaveBeenCalledWith(`/vehicles/${VID}`));
    expect(writes()[1].body).toMatchObject({ version: 4 });
  });

  it('offers removal to the owner only, after a confirmation, with an undo', async () => {
    mockRole = 'owner';
    wrap(<EditVehicle />);
    fireEvent.press(await screen.findByTestId('delete-vehicle'));
    expect(writes()).toHaveLength(0);
    replies.push({ status: 204 });
    fireEvent.press(screen.getByTestId('confirm-ok'));
    await waitFor(() => expect(router.dismissTo).toHaveBeenCalledWith('/vehicles'));
    expect(writes()[0]).toMatchObject({
      method: 'DELETE',
      url: `/api/workshops/${WID}/vehicles/${VID}`,
    });

    replies.push({ status: 200, body: vehicle() });
    fireEvent.press(screen.getByTestId('toast-action'));
    await waitFor(() =>
      expect(writes()[1]).toMatchObject({
        method: 'POST',
        url: `/api/workshops/${WID}/vehicles/${VID}/restore`,
      }),
    );
    expect(await screen.findByText('1931 Halvard Tourer Six restored.')).toBeTruthy();
  });

  it('has no removal control for an inspector', async () => {
    wrap(<EditVehicle />);
    await screen.findByTestId('vehicle-form');
    expect(screen.queryByTestId('delete-vehicle')).toBeNull();
  });
});
