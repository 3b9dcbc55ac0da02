import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import Settings from '@/app/(app)/settings';
import type { Role } from '@/shared/roles';
import type { WorkshopResponse } from '@/shared/schemas';
import { DEFAULT_TREATMENT_SETTINGS } from '@/shared/treatments';
import { DEFAULT_WOOD_SETTINGS } from '@/shared/wood';
import { request } from '@/src/api/client';
import { useRole } from '@/src/hooks/use-session';
import { TestProviders } from './support/providers';

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

function serve(role: Role) {
  mockRole.mockReturnValue(role);
  const current: WorkshopResponse = {
    id: '4a3c1f8e-1b2d-4c5e-8f90-1a2b3c4d5e6f',
    name: 'Larchmere Coachworks',
    role,
    settings: {
      units: 'metric',
      paperSize: 'A4',
      region: '',
      labourRatePerHour: 40,
      currency: 'EUR',
      wood: DEFAULT_WOOD_SETTINGS,
      treatments: DEFAULT_TREATMENT_SETTINGS,
    },
  };
  mockRequest.mockImplementation(async (method, _path, opts) =>
    method === 'GET' ? current : { ...current, ...(opts as { body: object }).body },
  );
}

beforeEach(() => mockRequest.mockReset());

test('the owner switches printed reports to US Letter and the PATCH carries it', async () => {
  serve('owner');
  render(<Settings />, { wrapper: TestProviders });
  const a4 = await screen.findByTestId('settings-paper-A4');
  expect(a4).toBeChecked();
  expect(screen.getByTestId('settings-paper-Letter')).not.toBeChecked();
  fireEvent.press(screen.getByTestId('settings-paper-Letter'));
  fireEvent.press(screen.getByTestId('settings-save'));
  await waitFor(() => expect(mockRequest.mock.calls.some(([m]) => m === 'PATCH')).toBe(true));
  const patch = mockRequest.mock.calls.find(([m]) => m === 'PATCH')!;
  const body = (patch[2] as { body: { settings: WorkshopResponse['settings'] } }).body;
  expect(body.settings.paperSize).toBe('Letter');
  expect(body.settings.units).toBe('metric');
});

test('a reader sees the paper size without a control to change it', async () => {
  serve('inspector');
  render(<Settings />, { wrapper: TestProviders });
  expect(await screen.findByTestId('settings-view')).toHaveTextContent(/Report paper\s*A4/);
  expect(screen.queryByTestId('settings-paper')).toBeNull();
});
