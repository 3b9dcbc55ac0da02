import { act, fireEvent, render, screen } from '@testing-library/react-native';
import Timeline from '@/app/(app)/vehicles/[vehicleId]/timeline';
import type { TimelineItem, TimelineKind } from '@/shared/schemas/recheck';
import { request } from '@/src/api/client';
import { VID, WID } from './fixtures/reports';
import { TestProviders } from './support/providers';

jest.mock('@/src/api/client', () => ({
  ...jest.requireActual('@/src/api/client'),
  request: jest.fn(),
}));
jest.mock('@/src/hooks/use-session', () => ({
  useWorkshopId: () => '4a3c1f8e-1b2d-4c5e-8f90-1a2b3c4d5e6f',
}));
jest.mock('expo-router', () => ({
  useLocalSearchParams: () => ({ vehicleId: jest.requireActual('./fixtures/reports').VID }),
}));

const mockRequest = request as jest.MockedFunction<typeof request>;
const ITEMS: TimelineItem[] = (['survey', 'finding', 'treatment', 'recheck'] as const).map(
  (kind, i) => ({
    kind,
    id: `00000000-0000-4000-8000-00000000000${i}`,
    at: `2026-11-0${i + 1}T10:00:00.000Z`,
    title: `${kind} ${i}`,
    detail: '',
    zoneKeys: [],
  }),
);

describe('vehicle timeline', () => {
  it('keeps the previous list on screen, marked as updating, until a new filter’s answer arrives', async () => {
    const pending: Array<() => void> = [];
    mockRequest.mockImplementation(async (method, path) => {
      if (path === `/api/workshops/${WID}/vehicles/${VID}`) {
        return {
          id: VID,
          year: 1927,
          make: 'Aldermoor',
          model: 'Tourer',
          bodyPlanKey: 'tourer-4door',
        };
      }
      const kinds = new URL(path, 'http://x').searchParams
        .get('kinds')!
        .split(',') as TimelineKind[];
      const answer = { items: ITEMS.filter((i) => kinds.includes(i.kind)) };
      // The first answer comes at once; later ones wait until the test lets them go.
      if (!kinds.includes('survey')) await new Promise<void>((go) => pending.push(go));
      return answer;
    });
    render(<Timeline />, { wrapper: TestProviders });
    expect(await screen.findByTestId(`timeline-survey-${ITEMS[0].id}`)).toBeTruthy();
    expect(screen.queryByTestId('timeline-updating')).toBeNull();

    fireEvent.press(screen.getByTestId('timeline-filter-survey'));
    // Still the old list (no loading flash), with a note that a new one is coming.
    expect(await screen.findByTestId('timeline-updating')).toHaveTextContent('Updating the list…');
    expect(screen.getByTestId(`timeline-survey-${ITEMS[0].id}`)).toBeTruthy();

    // React Query hands the answer over on a zero-delay timer: let it run inside act().
    await act(async () => {
      pending.shift()!();
      await new Promise((r) => setTimeout(r, 50));
    });
    expect(screen.queryByTestId(`timeline-survey-${ITEMS[0].id}`)).toBeNull();
    expect(screen.getByTestId(`timeline-finding-${ITEMS[1].id}`)).toBeTruthy();
    expect(screen.queryByTestId('timeline-updating')).toBeNull();
    const asked = mockRequest.mock.calls.map(([, p]) => p).filter((p) => p.includes('timeline'));
    expect(asked.at(-1)).toContain('kinds=finding%2Ctreatment%2Crecheck');
  });
});
