import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import type { ReactNode } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import Settings from '@/app/(app)/settings';
import type { Role } from '@/shared/roles';
import type { WorkshopResponse } from '@/shared/schemas';
import { DEFAULT_TREATMENT_SETTINGS } from '@/shared/treatments';
import { DEFAULT_WOOD_SETTINGS } from '@/shared/wood';
import { ApiRequestError, request } from '@/src/api/client';
import { ToastProvider } from '@/src/components/ui';
import { useRole } from '@/src/hooks/use-session';

jest.mock('@/src/api/client', () => ({
  ...jest.requireActual('@/src/api/client'),
  request: jest.fn(),
}));
jest.mock('@/src/hooks/use-session', () => ({
  useWorkshopId: () => '4a3c1f8e-1b2d-4c5e-8f90-1a2b3c4d5e6f',
  useRole: jest.fn(),
}));

const mockRequest = request as jest.MockedFunction<typeof request>;
const mockRole = useRole as jest.MockedFunction<typeof useRole>;
const WID = '4a3c1f8e-1b2d-4c5e-8f90-1a2b3c4d5e6f';

const workshop = (role: Role): WorkshopResponse => ({
  id: WID,
  name: 'Larchmere Coachworks',
  role,
  settings: {
    units: 'metric',
    paperSize: 'A4',
    region: 'Lower Vale',
    labourRatePerHour: 40,
    currency: 'EUR',
    wood: DEFAULT_WOOD_SETTINGS,
    treatments: {
      ...DEFAULT_TREATMENT_SETTINGS,
      timeZone: 'Europe/Berlin',
      regulatoryNotes: 'Fumigation needs a licensed operator here.',
    },
  },
});

type Patch = { settings: WorkshopResponse['settings'] };

function renderAs(role: Role) {
  mockRole.mockReturnValue(role);
  const current = workshop(role);
  mockRequest.mockImplementation(async (method, _path, opts) => {
    if (method === 'GET') return current;
    const body = (opts as { body: Patch }).body;
    return { ...current, settings: body.settings };
  });
  const queryClient = new QueryClient({
    defaultOptions: {
      queries: { retry: false, gcTime: Infinity },
      mutations: { retry: false, gcTime: Infinity },
    },
  });
  function wrapper({ children }: { children: ReactNode }) {
    return (
      <SafeAreaProvider
        initialMetrics={{
          frame: { x: 0, y: 0, width: 390, height: 844 },
          insets: { top: 0, left: 0, right: 0, bottom: 0 },
        }}
      >
        <QueryClientProvider client={queryClient}>
          <ToastProvider>{children}</ToastProvider>
        </QueryClientProvider>
      </SafeAreaProvider>
    );
  }
  render(<Settings />, { wrapper });
}

const patches = () => mockRequest.mock.calls.filter(([method]) => method === 'PATCH');

beforeEach(() => mockRequest.mockReset());

test('the owner edits the clearance rule, a plan and the notes, and the PATCH carries them', async () => {
  renderAs('owner');
  expect(await screen.findByTestId('settings-plan-termites')).toHaveProp(
    'value',
    '7, 30, 90, 180, 365',
  );
  fireEvent.changeText(screen.getByTestId('settings-clean-checks'), '4');
  fireEvent.changeText(screen.getByTestId('settings-min-span'), '180');
  fireEvent.changeText(screen.getByTestId('settings-plan-termites'), '7, 21, 60, 180');
  fireEvent.changeText(
    screen.getByTestId('settings-regulatory-notes'),
    'Notify the district office two days before fumigating.',
  );
  fireEvent.press(screen.getByTestId('settings-save'));

  await waitFor(() => expect(patches()).toHaveLength(1));
  const [, path, opts] = patches()[0];
  expect(path).toBe(`/api/workshops/${WID}`);
  const { settings } = (opts as { body: Patch }).body;
  expect(settings.region).toBe('Lower Vale');
  expect(settings.treatments.clearance).toEqual({ cleanChecksRequired: 4, minSpanDays: 180 });
  expect(settings.treatments.recheckPlans.termites).toEqual([7, 21, 60, 180]);
  expect(settings.treatments.recheckPlans.beetles).toEqual([14, 42, 90, 180, 365]);
  expect(settings.treatments.regulatoryNotes).toBe(
    'Notify the district office two days before fumigating.',
  );
  expect(settings.treatments.timeZone).toBe('Europe/Berlin');
});

test('a plan out of order shows an error beside it and sends nothing', async () => {
  renderAs('owner');
  fireEvent.changeText(await screen.findByTestId('settings-plan-fungi'), '30, 10');
  fireEvent.press(screen.getByTestId('settings-save'));

  expect(await screen.findByTestId('settings-plan-fungi-error')).toHaveTextContent(
    'List the days in increasing order, each once',
  );
  expect(screen.queryByTestId('settings-plan-beetles-error')).toBeNull();
  expect(patches()).toHaveLength(0);
});

test("the server's message for a treatment field shows beside that field", async () => {
  renderAs('owner');
  fireEvent.changeText(await screen.findByTestId('settings-min-span'), '30');
  mockRequest.mockImplementationOnce(async () => {
    throw new ApiRequestError(400, 'validation', 'Check the highlighted fields', {
      'settings.treatments.clearance.minSpanDays': 'Shorter than the last re-check of a plan',
    });
  });
  fireEvent.press(screen.getByTestId('settings-save'));

  expect(await screen.findByTestId('settings-min-span-error')).toHaveTextContent(
    'Shorter than the last re-check of a plan',
  );
});

test('a non-owner sees the treatment settings but no inputs', async () => {
  renderAs('inspector');
  expect(await screen.findByTestId('settings-view')).toBeTruthy();
  expect(screen.getByText('Fumigation needs a licensed operator here.')).toBeTruthy();
  expect(screen.getByText('3 clean re-checks over at least 365 days')).toBeTruthy();
  expect(screen.getByText('7, 30, 90, 180, 365')).toBeTruthy();
  expect(screen.getByText('Europe/Berlin')).toBeTruthy();
  expect(screen.queryByTestId('settings-treatments')).toBeNull();
  expect(screen.queryByTestId('settings-plan-termites')).toBeNull();
  expect(screen.queryByTestId('settings-save')).toBeNull();
});
