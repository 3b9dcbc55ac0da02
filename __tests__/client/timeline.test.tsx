import { act, fireEvent, render, screen, within } from '@testing-library/react-native';
import Timeline from '@/app/(app)/vehicles/[vehicleId]/timeline';
import type { TimelineItem, TimelineKind } from '@/shared/schemas/recheck';
import { request } from '@/src/api/client';
import { TimelineList, timelineDistance } from '@/src/components/timeline/timeline-list';
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
    allDay: kind !== 'treatment',
    planned: false,
    detail: '',
    zoneKeys: [],
  }),
);

describe('vehicle timeline', () => {
  it('keeps the previous list on screen, marked as updating, until a new filter’s answer arrives', async () => {
    const pending: (() => void)[] = [];
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

describe('timeline list', () => {
  const zone = (k: string) => (k === 'sill-left' ? 'Left sill' : k);
  const item = (over: Partial<TimelineItem>): TimelineItem => ({
    kind: 'recheck',
    id: '00000000-0000-4000-8000-0000000000a0',
    at: '2026-10-22T00:00:00.000Z',
    allDay: true,
    planned: false,
    title: 'Re-check clean',
    detail: '',
    zoneKeys: ['sill-left'],
    ...over,
  });
  // Jest runs west of Greenwich (TZ, see jest.config.js), where midnight UTC is
  // the evening before: a day-only entry must still show its own day.
  it('runs where midnight UTC is the day before', () => {
    expect(new Date('2026-09-01T00:00:00.000Z').getDate()).toBe(31);
  });

  it('lists planned re-checks apart, soonest first, then what was recorded, newest first', () => {
    const later = item({
      id: '00000000-0000-4000-8000-0000000000a1',
      planned: true,
      at: '2027-01-30T00:00:00.000Z',
      title: 'Re-check due 30 Jan 2027',
    });
    const sooner = item({
      id: '00000000-0000-4000-8000-0000000000a2',
      planned: true,
      at: '2026-12-20T00:00:00.000Z',
      title: 'Re-check due 20 Dec 2026',
    });
    const done = item({ id: '00000000-0000-4000-8000-0000000000a3' });
    const survey = item({
      kind: 'survey',
      id: '00000000-0000-4000-8000-0000000000a4',
      at: '2026-09-01T00:00:00.000Z',
      title: 'Survey (baseline)',
      zoneKeys: [],
    });
    // The server sends newest first.
    render(<TimelineList items={[later, sooner, done, survey]} zoneLabel={zone} />);

    const planned = within(screen.getByTestId('timeline-planned'));
    expect(planned.getByText('Planned')).toBeTruthy();
    expect(planned.getAllByText(/^Re-check due/).map((n) => n.props.children)).toEqual([
      'Re-check due 20 Dec 2026',
      'Re-check due 30 Jan 2027',
    ]);
    const recorded = screen.getByTestId('timeline-recorded');
    expect(within(recorded).getByText('Recorded')).toBeTruthy();
    expect(within(recorded).queryByText(/^Re-check due/)).toBeNull();
    // A planned entry says how far off it is instead of repeating its date.
    expect(
      within(screen.getByTestId(`timeline-recheck-${later.id}`)).getByText(/^in \d+ days$/),
    ).toBeTruthy();
    // Day-only entries keep their day; zones are written out once.
    expect(
      within(screen.getByTestId(`timeline-survey-${survey.id}`)).getByText('1 Sep 2026'),
    ).toBeTruthy();
    expect(
      within(screen.getByTestId(`timeline-recheck-${done.id}`)).getAllByText('Left sill'),
    ).toHaveLength(1);
  });

  it('writes a clock time only for entries that have one, and no headings when nothing is planned', () => {
    const applied = item({
      kind: 'treatment',
      allDay: false,
      at: '2026-09-10T16:30:00.000Z',
      title: 'Spray',
    });
    render(<TimelineList items={[applied]} zoneLabel={zone} />);
    // 16:30 UTC is 12:30 in New York in September (EDT, UTC−4): the reader's own clock.
    expect(screen.getByText('10 Sep 2026, 12:30')).toBeTruthy();
    expect(screen.queryByText('Recorded')).toBeNull();
    expect(screen.queryByTestId('timeline-planned')).toBeNull();
  });
});

describe('timelineDistance', () => {
  it('counts calendar days from the reader’s today', () => {
    expect(timelineDistance('2026-12-01', '2026-12-01')).toBe('today');
    expect(timelineDistance('2026-12-02', '2026-12-01')).toBe('tomorrow');
    expect(timelineDistance('2027-01-01', '2026-12-01')).toBe('in 31 days');
    expect(timelineDistance('2026-11-30', '2026-12-01')).toBe('1 day late');
    expect(timelineDistance('2026-02-27', '2026-03-01')).toBe('2 days late');
  });
});
